/** The method-of-sections probe: the picked members, the free body, and the cut's forces beside the stiffness result. */
import type { ProbeResult } from '../lib/section-probe';
import { fmt, fmtSigned } from '@/lib/format';

interface Props {
  cut: readonly string[];
  result?: ProbeResult;
  forceUnit: string;
  onClear: () => void;
}

export function SectionProbe({ cut, result, forceUnit, onClear }: Props) {
  return (
    <section aria-labelledby="probe-h" className="rounded border border-rule bg-sheet">
      <div className="flex items-center gap-2 border-b border-rule px-3 py-1.5">
        <h2 id="probe-h" className="m-0 text-xs font-semibold uppercase tracking-wide text-ink-2">Method of sections</h2>
        <span className="num text-xs text-ink">{cut.length ? cut.join(' · ') : ''}</span>
        {cut.length > 0 && (
          <button type="button" onClick={onClear} className="ml-auto rounded border border-rule-strong px-1.5 text-[11px] hover:bg-paper">Clear cut</button>
        )}
      </div>
      <div className="px-3 py-2 text-xs" aria-live="polite">
        {!cut.length && <p className="m-0 text-ink-2">Pick up to three members that cut the truss in two: click them in the drawing (or Enter on a focused member), or tick them in the table. The free body's ΣFx = 0, ΣFy = 0 and ΣM = 0 give their forces.</p>}
        {cut.length > 0 && result && !result.ok && <p role="status" className="m-0 text-warn">{result.message}</p>}
        {result?.ok && (
          <>
            <table className="w-full border-collapse" aria-label="Cut forces">
              <thead>
                <tr className="border-b border-rule text-ink-2">
                  <th scope="col" className="py-0.5 text-left font-medium">Member</th>
                  <th scope="col" className="py-0.5 text-right font-medium">Sections ({forceUnit})</th>
                  <th scope="col" className="py-0.5 text-right font-medium">Stiffness ({forceUnit})</th>
                  <th scope="col" className="py-0.5 text-right font-medium">Difference</th>
                </tr>
              </thead>
              <tbody>
                {result.rows.map((r) => (
                  <tr key={r.member} data-probe-row={r.member} className="border-b border-rule/60">
                    <th scope="row" className="num py-0.5 text-left font-medium">{r.member}</th>
                    <td data-col="statics" className="num py-0.5 text-right">{fmtSigned(r.statics)}</td>
                    <td className="num py-0.5 text-right text-ink-2">{fmtSigned(r.stiffness)}</td>
                    <td className="num py-0.5 text-right text-ink-3">{fmt(Math.abs(r.statics - r.stiffness), 2)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            <p className="mt-1.5 mb-0 text-ink-2">
              Free body: <span className="num text-ink">{result.freeBody.join(' ')}</span> ({result.loading}). Reactions on the free body come from the stiffness analysis; the columns agree when the free body is in equilibrium.
            </p>
          </>
        )}
      </div>
    </section>
  );
}
