/** Member table: id, joints, length, force, T/C; sortable by any column; a tick puts a member in the cut. */
import { useMemo, useState } from 'react';
import { fmt, fmtSigned } from '@/lib/format';
import { sortRows, type MemberRow, type SortKey } from '../lib/member-rows';

interface Props {
  rows: readonly MemberRow[];
  units: { length: string; force: string };
  cut: readonly string[];
  onToggleCut: (id: string) => void;
}

const COLUMNS: { key: SortKey; label: (u: Props['units']) => string; numeric?: boolean }[] = [
  { key: 'id', label: () => 'Member' },
  { key: 'from', label: () => 'From' },
  { key: 'to', label: () => 'To' },
  { key: 'length', label: (u) => `Length (${u.length})`, numeric: true },
  { key: 'force', label: (u) => `Force (${u.force})`, numeric: true },
  { key: 'tc', label: () => 'T/C' },
];

const TC_CLASS: Record<MemberRow['tc'], string> = { T: 'text-tension', C: 'text-compression', '0': 'text-ink-3', '—': 'text-ink-3' };

export function MemberTable({ rows, units, cut, onToggleCut }: Props) {
  const [sort, setSort] = useState<{ key: SortKey; dir: 'ascending' | 'descending' }>({ key: 'id', dir: 'ascending' });
  const sorted = useMemo(() => sortRows(rows, sort.key, sort.dir), [rows, sort]);
  const inCut = new Set(cut);
  const toggleSort = (key: SortKey) =>
    setSort((s) => ({ key, dir: s.key === key && s.dir === 'ascending' ? 'descending' : 'ascending' }));
  return (
    <section aria-labelledby="members-h" className="rounded border border-rule bg-sheet">
      <h2 id="members-h" className="border-b border-rule px-3 py-1.5 text-xs font-semibold uppercase tracking-wide text-ink-2">
        Members <span className="num font-normal">({rows.length})</span>
      </h2>
      <div className="max-h-[28rem] overflow-auto">
        <table className="w-full border-collapse text-xs" aria-labelledby="members-h">
          <thead className="sticky top-0 bg-sheet">
            <tr className="border-b border-rule">
              <th scope="col" className="w-8 px-2 py-1 text-left font-medium text-ink-2">Cut</th>
              {COLUMNS.map((c) => (
                <th key={c.key} scope="col" aria-sort={sort.key === c.key ? sort.dir : 'none'}
                  className={`px-2 py-1 font-medium text-ink-2 ${c.numeric ? 'text-right' : 'text-left'}`}>
                  <button type="button" onClick={() => toggleSort(c.key)} className="inline-flex items-center gap-1 hover:text-ink">
                    {c.label(units)}
                    <span aria-hidden="true" className="num text-ink-3">{sort.key === c.key ? (sort.dir === 'ascending' ? '↑' : '↓') : '↕'}</span>
                  </button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {sorted.map((r) => (
              <tr key={r.id} data-member-row={r.id} className={`border-b border-rule/60 ${inCut.has(r.id) ? 'bg-select' : 'hover:bg-paper'}`}>
                <td className="px-2 py-0.5">
                  <input type="checkbox" checked={inCut.has(r.id)} onChange={() => onToggleCut(r.id)} aria-label={`Cut ${r.id}`} />
                </td>
                <th scope="row" className="num px-2 py-0.5 text-left font-medium text-ink">{r.id}</th>
                <td className="num px-2 py-0.5 text-ink-2">{r.from}</td>
                <td className="num px-2 py-0.5 text-ink-2">{r.to}</td>
                <td className="num px-2 py-0.5 text-right">{fmt(r.length)}</td>
                <td data-col="force" className="num px-2 py-0.5 text-right">{r.force === undefined ? '—' : fmtSigned(r.force)}</td>
                <td className={`num px-2 py-0.5 font-semibold ${TC_CLASS[r.tc]}`}>{r.tc}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
