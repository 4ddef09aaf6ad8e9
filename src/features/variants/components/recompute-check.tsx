/** The server's check of a variant: recomputed from the study, do the figures match what the CLI pushed? */
import type { RecomputeCheck as Check } from '@/lib/run-types';

function describe(d: unknown): { figure: string; text: string } {
  if (typeof d === 'string') return { figure: '', text: d };
  if (d && typeof d === 'object') {
    const o = d as Record<string, unknown>;
    const figure = String(o.figure ?? o.field ?? o.path ?? '');
    const rest = Object.entries(o).filter(([k]) => !['figure', 'field', 'path'].includes(k)).map(([k, v]) => `${k} ${typeof v === 'number' ? v : JSON.stringify(v)}`);
    return { figure, text: rest.join(' · ') };
  }
  return { figure: '', text: String(d) };
}

export function RecomputeCheck({ check }: { check: Check }) {
  const diffs = check.differences ?? [];
  return (
    <section aria-labelledby="recompute-h" className={`rounded border bg-sheet px-3 py-1.5 text-xs ${check.matches ? 'border-rule' : 'border-bad/50'}`}>
      <h2 id="recompute-h" className="m-0 inline text-xs font-semibold uppercase tracking-wide text-ink-2">Recompute check </h2>
      {check.matches ? (
        <span data-testid="recompute" className="text-ok">the server rebuilt this variant from the study and its figures match the pushed ones.</span>
      ) : (
        <>
          <span data-testid="recompute" className="text-bad">the server's recomputation differs from the pushed figures in {diffs.length} place{diffs.length === 1 ? '' : 's'}: the run may come from another engine version.</span>
          {diffs.length > 0 && (
            <ul className="m-0 mt-1 list-none p-0">
              {diffs.map((d, i) => {
                const { figure, text } = describe(d);
                return <li key={i} className="num">{figure && <span className="text-ink">{figure} </span>}<span className="text-ink-2">{text}</span></li>;
              })}
            </ul>
          )}
        </>
      )}
      {check.note && <p data-testid="recompute-note" className="m-0 mt-1 text-ink-2">{check.note}</p>}
    </section>
  );
}
