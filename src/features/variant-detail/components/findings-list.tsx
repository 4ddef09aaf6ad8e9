/** Findings, why and where: each sentence with the joints and members it names, which can be shown on the drawing. */
import type { AnalysisJson } from '@shared/report/analysis-json';

type Finding = AnalysisJson['classification']['findings'][number];
export interface Highlight { members?: readonly string[]; joints?: readonly string[] }

const TONE: Record<Finding['level'], string> = {
  error: 'border-bad text-bad',
  warning: 'border-warn text-warn',
  info: 'border-note text-note',
};

export function FindingsList({ findings, shown, onShow }: { findings: readonly Finding[]; shown?: number; onShow: (index: number | undefined, h?: Highlight) => void }) {
  return (
    <section aria-labelledby="findings-h" className="rounded border border-rule bg-sheet">
      <h2 id="findings-h" className="border-b border-rule px-3 py-1.5 text-xs font-semibold uppercase tracking-wide text-ink-2">
        Findings <span className="num font-normal">({findings.length})</span>
      </h2>
      {findings.length === 0 ? (
        <p className="px-3 py-2 text-xs text-ink-2">None: no weak or over-braced region found.</p>
      ) : (
        <ol className="divide-y divide-rule">
          {findings.map((f, i) => {
            const where = [...(f.joints ?? []), ...(f.members ?? [])];
            return (
              <li key={`${f.code}-${i}`} className={`px-3 py-1.5 text-xs ${shown === i ? 'bg-select' : ''}`}>
                <div className="flex items-start gap-2">
                  <span className={`num mt-px shrink-0 rounded-sm border px-1 text-[10px] uppercase ${TONE[f.level]}`}>{f.level}</span>
                  <p className="m-0 text-ink">{f.message}</p>
                </div>
                {where.length > 0 && (
                  <p className="m-0 mt-1 pl-[3.2rem] leading-relaxed">
                    <span className="text-ink-3">where: </span>
                    <span className="num text-ink-2">{where.join(' ')}</span>
                    <button type="button" aria-pressed={shown === i}
                      className="ml-2 rounded border border-rule-strong px-1.5 text-[11px] text-ink hover:bg-paper"
                      onClick={() => (shown === i ? onShow(undefined) : onShow(i, { joints: f.joints, members: f.members }))}>
                      {shown === i ? 'Hide on drawing' : 'Show on drawing'}
                    </button>
                  </p>
                )}
              </li>
            );
          })}
        </ol>
      )}
    </section>
  );
}
