/** The caution under every design result. */
export const CAUTION =
  'Preliminary study figures: connections, out-of-plane bracing, fatigue and vibration are not checked; review by a licensed engineer.';

export function CautionLine({ more }: { more?: readonly string[] }) {
  return (
    <div role="note" className="border-l-2 border-warn bg-sheet px-3 py-1.5 text-xs text-ink-2">
      <p className="m-0 font-medium text-ink">{CAUTION}</p>
      {more && more.length > 0 && (
        <details className="mt-1">
          <summary className="cursor-pointer text-ink-3">Scope of the analysis</summary>
          <ul className="mt-1 list-disc pl-4">{more.map((c) => <li key={c}>{c}</li>)}</ul>
        </details>
      )}
    </div>
  );
}
