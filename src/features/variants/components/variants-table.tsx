/**
 * The variants of a run: sorted, filtered and paged by the server, with a column picker, a CSV
 * of the same query, marks, comments in a side panel, and up to four rows picked to compare.
 */
import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { RunRef } from '@/lib/api';
import type { ProjectRight } from '@/lib/api-types';
import type { RunDetail } from '@/lib/run-types';
import { useApi } from '@/lib/api-context';
import { fmtCount } from '@/lib/format';
import { comparePath, variantPath } from '@/lib/paths';
import { isFiltered } from '@/lib/variant-query';
import { Panel } from '@/components/panel';
import { ErrorPanel } from '@/components/error-panel';
import { BTN, LINK } from '@/components/ui';
import { useVariants } from '../api/get-variants';
import { useColumns } from '../hooks/use-columns';
import type { TableState } from '../hooks/use-table-state';
import { fieldOfColumn } from '../lib/columns';
import { nextSort, sortOf } from '../lib/table-state';
import { FilterBar } from './filter-bar';
import { ColumnPicker } from './column-picker';
import { Pager } from './pager';
import { VariantCell } from './variant-cell';
import { MarkButtons } from './mark-buttons';
import { CommentsPanel } from './comments-panel';

interface Props {
  run: RunDetail;
  runRef: RunRef;
  rights: readonly ProjectRight[];
  meId?: number;
  table: TableState;
  /** Why a chart selection was turned into ranges or cut short. */
  selectionNote?: string;
}

const MAX_COMPARE = 4;

export function VariantsTable({ run, runRef, rights, meId, table, selectionNote }: Props) {
  const api = useApi();
  const { query, update } = table;
  const q = useVariants(runRef, query);
  const cols = useColumns(run);
  const [compare, setCompare] = useState<number[]>([]);
  const [commentsFor, setCommentsFor] = useState<number>();
  const sort = sortOf(query.sort);
  const total = q.data?.total ?? 0;
  const header = (field: string, label: string, unit: string, sortable: boolean, right: boolean) => (
    <th key={field} scope="col" aria-sort={sort.field === field ? sort.dir : sortable ? 'none' : undefined}
      className={`whitespace-nowrap px-2 py-1 font-medium text-ink-2 ${right ? 'text-right' : 'text-left'}`}>
      {sortable ? (
        <button type="button" onClick={() => update({ sort: nextSort(query.sort, field) })} className="inline-flex items-center gap-1 hover:text-ink">
          {label}{unit && <span className="text-ink-3">({unit})</span>}
          <span aria-hidden="true" className="num text-ink-3">{sort.field === field ? (sort.dir === 'ascending' ? '↑' : '↓') : '↕'}</span>
        </button>
      ) : <>{label}{unit && <span className="text-ink-3"> ({unit})</span>}</>}
    </th>
  );
  return (
    <Panel title="Variants" count={q.data ? `${fmtCount(total)}${isFiltered(query) ? ` of ${fmtCount(run.variantCount)}` : ''}` : undefined}
      actions={<>
        {compare.length >= 2 ? <Link to={comparePath(runRef.slug, runRef.runId, compare)} className={BTN}>Compare {compare.length} variants</Link>
          : <span className="text-ink-3">Tick 2 to 4 rows to compare</span>}
        <a href={api.variantsCsvUrl(runRef, query)} download className={LINK}>CSV of these {fmtCount(total)} variants</a>
        <ColumnPicker all={cols.all} isShown={cols.isShown} toggle={cols.toggle} />
      </>}>
      <FilterBar run={run} query={query} update={update} />
      {query.ids && (
        <p className="m-0 flex flex-wrap items-center gap-2 border-b border-rule bg-select px-3 py-1 text-xs">
          <span>Chart selection: <span className="num">{fmtCount(query.ids.length)}</span> variants.</span>
          <button type="button" className={BTN} onClick={() => update({ ids: undefined })}>Show all</button>
        </p>
      )}
      {selectionNote && <p role="status" className="m-0 border-b border-rule px-3 py-1 text-xs text-warn">{selectionNote}</p>}
      {q.isError ? <div className="p-3"><ErrorPanel error={q.error} what="the variants" onRetry={() => void q.refetch()} /></div> : (
        <div className="relative overflow-x-auto" aria-busy={q.isFetching}>
          <table className="w-full border-collapse text-xs">
            <caption className="sr-only">Variants of run {runRef.runId}, sorted by {sort.field ?? 'index'}</caption>
            <thead className="bg-sheet">
              <tr className="border-b border-rule">
                <th scope="col" className="px-2 py-1 text-left font-medium text-ink-2"><span className="sr-only">Compare</span></th>
                {header('index', 'Index', '', true, false)}
                <th scope="col" className="px-2 py-1 text-left font-medium text-ink-2">Your mark</th>
                <th scope="col" className="px-2 py-1 text-left font-medium text-ink-2"><span className="sr-only">Comments</span></th>
                {cols.visible.map((c) => header(fieldOfColumn(c), c.label, c.unit, c.sortable, c.numeric))}
              </tr>
            </thead>
            <tbody className={q.isPlaceholderData ? 'opacity-60' : ''}>
              {q.data?.items.map((r) => (
                <tr key={r.index} data-variant={r.index} className={`border-b border-rule/60 ${compare.includes(r.index) ? 'bg-select' : 'hover:bg-paper'}`}>
                  <td className="px-2 py-0.5">
                    <input type="checkbox" aria-label={`Compare variant ${r.index}`} checked={compare.includes(r.index)}
                      disabled={!compare.includes(r.index) && compare.length >= MAX_COMPARE}
                      onChange={(e) => setCompare((c) => (e.target.checked ? [...c, r.index] : c.filter((x) => x !== r.index)))} />
                  </td>
                  <th scope="row" className="px-2 py-0.5 text-left font-medium">
                    <Link to={variantPath(runRef.slug, runRef.runId, r.index)} className={`num ${LINK}`}>{r.index}</Link>
                  </th>
                  <td className="px-2 py-0.5 whitespace-nowrap">
                    <MarkButtons runRef={runRef} row={r} meId={meId} canCandidate={rights.includes('variants:mark')} canReject={rights.includes('variants:reject')} />
                  </td>
                  <td className="px-2 py-0.5">
                    <button type="button" className={BTN} aria-haspopup="dialog" aria-expanded={commentsFor === r.index}
                      aria-label={`Comments on variant ${r.index}`} onClick={() => setCommentsFor(r.index)}>Comments</button>
                  </td>
                  {cols.visible.map((c) => <VariantCell key={c.key} column={c} row={r} />)}
                </tr>
              ))}
            </tbody>
          </table>
          {q.data?.items.length === 0 && <p className="m-0 px-3 py-3 text-xs text-ink-2">No variant matches these filters.</p>}
          {q.isPending && <p role="status" className="m-0 px-3 py-3 text-xs text-ink-3">Loading the variants…</p>}
        </div>
      )}
      {q.data && <Pager page={query.page} pageSize={query.pageSize} total={total} onPage={(p) => update({ page: p }, true)} onSize={(s) => update({ pageSize: s })} />}
      {commentsFor !== undefined && (
        <CommentsPanel runRef={runRef} index={commentsFor} canWrite={rights.includes('comments:write')} onClose={() => setCommentsFor(undefined)} />
      )}
    </Panel>
  );
}
