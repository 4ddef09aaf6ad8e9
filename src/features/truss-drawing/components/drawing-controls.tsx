/** The toolbar over the drawing: labels, deflection scale, mechanism animation, export. */
import { useId } from 'react';
import { fmt, fmtSmallLength } from '@/lib/format';

export interface DrawingControlsProps {
  labels: boolean;
  onLabels: (v: boolean) => void;
  values: boolean;
  onValues: (v: boolean) => void;
  hasForces: boolean;
  deflection?: { percent: number; onPercent: (v: number) => void; factor: number; max: number; node?: string; unit: string };
  mechanism?: { playing: boolean; onPlaying: (v: boolean) => void; mode: number; modes: number; onMode: (v: number) => void; reducedMotion: boolean };
  onExport: (kind: 'svg' | 'png') => void;
}

const btn = 'rounded border border-rule-strong bg-sheet px-2 py-0.5 text-xs text-ink hover:bg-paper active:bg-rule';

export function DrawingControls(p: DrawingControlsProps) {
  const id = useId();
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-1.5 border-b border-rule px-3 py-1.5 text-xs text-ink-2">
      <label className="inline-flex items-center gap-1.5">
        <input type="checkbox" checked={p.labels} onChange={(e) => p.onLabels(e.target.checked)} />
        Joint labels
      </label>
      {p.hasForces && (
        <label className="inline-flex items-center gap-1.5">
          <input type="checkbox" checked={p.values} onChange={(e) => p.onValues(e.target.checked)} />
          Force values
        </label>
      )}
      {p.deflection && (
        <div className="inline-flex items-center gap-2">
          <label htmlFor={`${id}-defl`}>Deflected shape</label>
          <input id={`${id}-defl`} type="range" min={0} max={15} step={0.5} value={p.deflection.percent}
            onChange={(e) => p.deflection!.onPercent(Number(e.target.value))}
            aria-describedby={`${id}-defl-out`} className="w-28 accent-[var(--color-focus)]" />
          <output id={`${id}-defl-out`} htmlFor={`${id}-defl`} className="num text-ink">
            {p.deflection.percent}% of span · ×{fmt(p.deflection.factor, 3)} · max {fmtSmallLength(p.deflection.max, p.deflection.unit)}
            {p.deflection.node ? ` at ${p.deflection.node}` : ''}
          </output>
        </div>
      )}
      {p.mechanism && (
        <div className="inline-flex items-center gap-2">
          <button type="button" className={btn} aria-pressed={p.mechanism.playing}
            onClick={() => p.mechanism!.onPlaying(!p.mechanism!.playing)}>
            {p.mechanism.playing ? 'Pause mechanism' : 'Animate mechanism'}
          </button>
          {p.mechanism.modes > 1 && (
            <label className="inline-flex items-center gap-1">
              Mode
              <select value={p.mechanism.mode} onChange={(e) => p.mechanism!.onMode(Number(e.target.value))}
                className="rounded border border-rule-strong bg-sheet px-1 py-0.5">
                {Array.from({ length: p.mechanism.modes }, (_, i) => <option key={i} value={i}>{i + 1}</option>)}
              </select>
            </label>
          )}
          {p.mechanism.reducedMotion && !p.mechanism.playing && <span className="text-ink-3">reduced motion: shown still</span>}
        </div>
      )}
      <div className="ml-auto inline-flex items-center gap-1.5">
        <span className="text-ink-3">Export</span>
        <button type="button" className={btn} onClick={() => p.onExport('svg')}>SVG</button>
        <button type="button" className={btn} onClick={() => p.onExport('png')}>PNG</button>
      </div>
    </div>
  );
}
