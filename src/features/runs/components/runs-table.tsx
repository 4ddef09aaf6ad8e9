/** Runs as a dense table: when, who, CLI version, commit, status and the count per variant status. */
import { Link } from 'react-router-dom';
import type { RunSummary, VariantStatus } from '@/lib/run-types';
import { STATUSES } from '@/lib/figures';
import { fmtCount, fmtWhen, shortCommit } from '@/lib/format';
import { runPath, shortRun } from '@/lib/paths';
import { LINK, TD, TH } from '@/components/ui';

const SHORT: Record<VariantStatus, string> = { determinate: 'Determinate', indeterminate: 'Indeterminate', unstable: 'Unstable', error: 'Failed' };
const COUNT_TONE: Record<VariantStatus, string> = { determinate: 'text-ok', indeterminate: 'text-note', unstable: 'text-bad', error: 'text-warn' };

export function RunsTable({ slug, runs, caption }: { slug: string; runs: readonly RunSummary[]; caption: string }) {
  if (!runs.length) return <p className="m-0 px-3 py-2 text-xs text-ink-2">No runs pushed yet: <span className="num">panelpoint push</span> sends one from the CLI.</p>;
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full border-collapse text-xs">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr className="border-b border-rule">
            <th scope="col" className={TH}>Run</th>
            <th scope="col" className={TH}>Pushed</th>
            <th scope="col" className={TH}>By</th>
            <th scope="col" className={TH}>CLI</th>
            <th scope="col" className={TH}>Commit</th>
            <th scope="col" className={TH}>Status</th>
            <th scope="col" className={`${TH} text-right`}>Variants</th>
            {STATUSES.map((s) => <th key={s} scope="col" className={`${TH} text-right`}>{SHORT[s]}</th>)}
          </tr>
        </thead>
        <tbody>
          {runs.map((r) => (
            <tr key={r.runId} data-run={r.runId} className="border-b border-rule/60 hover:bg-paper">
              <th scope="row" className={`${TD} text-left font-medium`}>
                <Link to={runPath(slug, r.runId)} className={`num ${LINK}`} title={r.runId}>{shortRun(r.runId)}</Link>
              </th>
              <td className={`${TD} num text-ink-2`}>{fmtWhen(r.pushedAt)}</td>
              <td className={TD}>{r.pushedBy?.name ?? <span className="text-ink-3">deleted account</span>}</td>
              <td className={`${TD} num text-ink-2`}>{r.cliVersion}</td>
              <td className={`${TD} num text-ink-2`} title={r.gitCommit ?? 'no commit recorded'}>{shortCommit(r.gitCommit)}</td>
              <td className={`${TD} ${r.status === 'complete' ? 'text-ink-2' : 'text-warn'}`}>{r.status}</td>
              <td className={`${TD} num text-right`}>{fmtCount(r.variantCount)}</td>
              {STATUSES.map((s) => (
                <td key={s} className={`${TD} num text-right ${r.byStatus?.[s] ? COUNT_TONE[s] : 'text-ink-3'}`}>{fmtCount(r.byStatus?.[s] ?? 0)}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
