/** Compared variants in columns: parameters and figures in rows, the best per row marked, equal rows quiet. */
import type { VariantRow } from '@/lib/run-types';
import { Panel } from '@/components/panel';
import { differenceRows } from '../lib/differences';

export function DifferenceTable({ variants, paramNames }: { variants: readonly VariantRow[]; paramNames: readonly string[] }) {
  const rows = differenceRows(variants, paramNames);
  return (
    <Panel title="Differences" actions={<span className="text-ink-3"><span className="rounded-sm bg-select px-1 font-semibold text-ok">best</span> per row; rows that do not differ are greyed</span>}>
      <div className="relative overflow-x-auto">
        <table className="w-full border-collapse text-xs" aria-label="Differences between the compared variants">
          <thead>
            <tr className="border-b border-rule">
              <th scope="col" className="px-2 py-1 text-left font-medium text-ink-2">Parameter or figure</th>
              {variants.map((v) => <th key={v.index} scope="col" className="num px-2 py-1 text-right font-medium text-ink">variant {v.index}</th>)}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.key} data-row={r.key} data-differs={r.differs} className={`border-b border-rule/60 ${r.differs ? '' : 'text-ink-3'}`}>
                <th scope="row" className={`px-2 py-0.5 text-left font-normal ${r.key.startsWith('param:') ? 'num' : ''}`}>{r.label}{r.unit && <span className="text-ink-3"> ({r.unit})</span>}</th>
                {r.values.map((v, i) => {
                  const best = r.best.includes(i);
                  return (
                    <td key={i} data-best={best || undefined} className={`num px-2 py-0.5 text-right ${best ? 'bg-select font-semibold text-ok' : ''}`}>
                      {v}{best && <span className="sr-only">{' (best)'}</span>}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </Panel>
  );
}
