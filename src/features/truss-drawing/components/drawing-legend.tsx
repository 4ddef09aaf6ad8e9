/** What the line styles mean: only the entries the drawing uses. */
import type { ReactNode } from 'react';
import { PALETTE } from '../lib/palette';
import type { Scene } from '../lib/scene';

function Swatch({ children }: { children: ReactNode }) {
  return <svg width={30} height={12} viewBox="0 0 30 12" aria-hidden="true" className="shrink-0">{children}</svg>;
}
const line = (stroke: string, width: number, dash?: string, opacity = 1) =>
  <line x1={1} y1={6} x2={29} y2={6} stroke={stroke} strokeWidth={width} strokeDasharray={dash} strokeOpacity={opacity} />;

export function DrawingLegend({ scene, deflected, animated, cut }: { scene: Scene; deflected: boolean; animated: boolean; cut: boolean }) {
  const signs = new Set(scene.members.map((m) => m.sign));
  const items: [string, ReactNode][] = [];
  if (signs.has('tension')) items.push(['Tension (solid)', line(PALETTE.tension, 3)]);
  if (signs.has('compression')) items.push(['Compression (dashed)', line(PALETTE.compression, 3, '7 3.5')]);
  if (signs.has('zero')) items.push(['≈ zero force', line(PALETTE.zero, 1)]);
  if (signs.has('tension') || signs.has('compression')) items.push([`Width ∝ |force|, peak ${Number(scene.peak.toPrecision(4))} ${scene.units.force}`, <><line x1={1} y1={6} x2={29} y2={6} stroke={PALETTE.neutral} strokeWidth={1.5} /><line x1={15} y1={6} x2={29} y2={6} stroke={PALETTE.neutral} strokeWidth={5} /></>]);
  if (signs.has('unknown')) items.push(['Member (no forces: unstable)', line(PALETTE.neutral, 2)]);
  if (deflected) items.push(['Deflected shape (scaled)', line(PALETTE.deflected, 1.2)]);
  if (animated) items.push(['Rest position', line(PALETTE.ghost, 1, '3 2')]);
  if (scene.unbracedPanels.length) items.push(['Unbraced panel', <rect x={2} y={1} width={26} height={10} fill={PALETTE.unbraced} fillOpacity={0.15} stroke={PALETTE.unbraced} strokeDasharray="3 2" />]);
  if (scene.overBraced.size) items.push(['Redundant member (carries self-stress)', line(PALETTE.overBraced, 8, undefined, 0.35)]);
  if (scene.loads.length) items.push([`Load (${scene.units.force})`, <><line x1={2} y1={6} x2={22} y2={6} stroke={PALETTE.load} strokeWidth={1.3} /><path d="M29 6L22 3L22 9Z" fill={PALETTE.load} /></>]);
  if (cut) items.push(['Cut member', <path d="M13 1L13 11M17 1L17 11" stroke={PALETTE.ink} strokeWidth={1.6} />]);
  return (
    <ul aria-label="Legend" className="flex flex-wrap gap-x-4 gap-y-1 px-3 py-1.5 text-xs text-ink-2">
      {items.map(([label, sw]) => (
        <li key={label} className="inline-flex items-center gap-1.5"><Swatch>{sw}</Swatch>{label}</li>
      ))}
    </ul>
  );
}
