/** Reference cases of a project with their latest check; one case's source and file; the history of CI checks. */
import { useState } from 'react';
import type { ReferenceCaseDetail, ReferenceCaseSummary } from '@/lib/api-types';
import { fmtWhen, shortCommit } from '@/lib/format';
import { Panel } from '@/components/panel';
import { QueryState } from '@/components/query-state';
import { CheckPill } from '@/components/status-pill';
import { TD, TH } from '@/components/ui';
import { useCase, useCases, useChecks } from '../api/get-cases';
import { CheckHistory } from './check-history';

function sourceOf(c: ReferenceCaseSummary): { kind?: string; citation?: string } {
  const s = c.source as { kind?: string; citation?: string } | null;
  return s && typeof s === 'object' ? s : {};
}

function CaseSource({ c }: { c: ReferenceCaseDetail }) {
  const source = sourceOf(c);
  return (
    <div className="px-3 py-2 text-xs">
      {c.description && <p className="m-0 text-ink">{c.description}</p>}
      {source.citation && <p className="m-0 mt-1 text-ink-2"><span className="num uppercase text-ink-3">{source.kind}</span> · {source.citation}</p>}
      <details className="mt-1"><summary className="cursor-pointer text-ink-3">The case file</summary>
        <pre className="num mt-1 max-h-72 overflow-auto rounded bg-paper p-2 text-[11px]">{JSON.stringify(c.body, null, 2)}</pre>
      </details>
    </div>
  );
}

function CaseTable({ list, picked, onPick }: { list: ReferenceCaseSummary[]; picked?: ReferenceCaseSummary; onPick: (c?: ReferenceCaseSummary) => void }) {
  return (
    <div className="relative overflow-x-auto"><table className="w-full border-collapse text-xs">
      <caption className="sr-only">Reference cases</caption>
      <thead><tr className="border-b border-rule"><th scope="col" className={TH}>Case</th><th scope="col" className={TH}>Source</th><th scope="col" className={TH}>Frozen</th><th scope="col" className={TH}>Latest check</th></tr></thead>
      <tbody>
        {list.map((c) => {
          const on = picked?.id === c.id;
          return (
            <tr key={c.id} data-case={c.name} className={`border-b border-rule/60 ${on ? 'bg-select' : ''}`}>
              <th scope="row" className={`${TD} text-left font-normal`}>
                <button type="button" aria-pressed={on} onClick={() => onPick(on ? undefined : c)} className="num whitespace-nowrap text-left text-tension hover:underline">{c.name}</button>
              </th>
              <td className={`${TD} num whitespace-nowrap text-ink-3`}>{sourceOf(c).kind ?? '—'}</td>
              <td className={`${TD} num whitespace-nowrap text-ink-2`} title={c.frozenBy ? `by ${c.frozenBy.name}` : undefined}>{fmtWhen(c.createdAt).slice(0, 10)}</td>
              <td className={`${TD} whitespace-nowrap`}>{c.latest ? <><CheckPill status={c.latest.status} /> <span className="num text-ink-3">{fmtWhen(c.latest.createdAt).slice(0, 10)} · {shortCommit(c.latest.gitCommit)}</span></> : <span className="text-ink-3">never</span>}</td>
            </tr>
          );
        })}
      </tbody>
    </table></div>
  );
}

export function ReferenceCases({ slug }: { slug: string }) {
  const cases = useCases(slug);
  const [picked, setPicked] = useState<ReferenceCaseSummary>();
  const detail = useCase(slug, picked ? String(picked.id) : undefined);
  const checks = useChecks(slug, picked?.name);
  return (
    <div className="flex max-w-7xl flex-col gap-3">
      <Panel title="Cases" count={cases.data?.length} actions={<span className="text-ink-3">Pick a case for its source, its file and its own checks.</span>}>
        <QueryState q={cases} what="the reference cases">
          {(list) => list.length === 0
            ? <p className="m-0 px-3 py-2 text-xs text-ink-2">No reference case kept on the server yet (<span className="num">panelpoint freeze --push</span>).</p>
            : <CaseTable list={list} picked={picked} onPick={setPicked} />}
        </QueryState>
      </Panel>
      <div className={`grid grid-cols-1 gap-3 ${picked ? 'xl:grid-cols-[minmax(0,1fr)_minmax(0,1.4fr)]' : ''}`}>
        {picked && <Panel plain title={picked.name}><QueryState q={detail} what="the case">{(c) => <CaseSource c={c} />}</QueryState></Panel>}
        <Panel title={picked ? 'Checks of this case' : 'CI checks, all cases'}>
          <QueryState q={checks} what="the checks">{(list) => <CheckHistory checks={list} showCase={!picked} />}</QueryState>
        </Panel>
      </div>
    </div>
  );
}
