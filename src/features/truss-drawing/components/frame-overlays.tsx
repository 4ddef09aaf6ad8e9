/** Layers under and over the members: shaded panels, free body, ghost and deflected frames, joints and labels. */
import { PALETTE, MONO } from '../lib/palette';
import type { Pt, Scene } from '../lib/scene';
import { SIZE, sx, sy } from '../lib/layout';
import { fmt } from '@/lib/format';

type Pos = Map<string, Pt>;
const poly = (joints: readonly string[], pos: Pos) =>
  joints.map((j) => pos.get(j)).filter((p): p is Pt => !!p).map((p) => `${sx(p)},${sy(p)}`).join(' ');

/** Hatch pattern ids used by the shaded panels. */
export function DrawingDefs({ u }: { u: number }) {
  const s = 7 * u;
  return (
    <defs>
      <pattern id="pp-hatch-unbraced" patternUnits="userSpaceOnUse" width={s} height={s} patternTransform="rotate(45)">
        <rect width={s} height={s} fill={PALETTE.unbraced} fillOpacity={0.07} />
        <line x1={0} y1={0} x2={0} y2={s} stroke={PALETTE.unbraced} strokeOpacity={0.55} strokeWidth={1.1 * u} />
      </pattern>
    </defs>
  );
}

export function PanelShading({ scene, pos, u }: { scene: Scene; pos: Pos; u: number }) {
  return (
    <g data-layer="panels">
      {scene.unbracedPanels.map((j) => (
        <polygon key={`u-${j.join()}`} data-panel="unbraced" data-joints={j.join(' ')} points={poly(j, pos)}
          fill="url(#pp-hatch-unbraced)" stroke={PALETTE.unbraced} strokeWidth={1.2 * u} strokeDasharray={`${3 * u} ${2 * u}`}>
          <title>{`Unbraced panel ${j.join('–')}: the mechanism shears it`}</title>
        </polygon>
      ))}
      {scene.doubleBracedPanels.map((j) => (
        <polygon key={`d-${j.join()}`} data-panel="double-braced" data-joints={j.join(' ')} points={poly(j, pos)}
          fill={PALETTE.overBraced} fillOpacity={0.08} stroke="none">
          <title>{`Doubly braced panel ${j.join('–')}: one diagonal is redundant`}</title>
        </polygon>
      ))}
    </g>
  );
}

/** Soft discs on joints: the probe's free body, or the joints a finding names. */
export function JointHalos({ joints, pos, u, color, layer }: { joints: readonly string[]; pos: Pos; u: number; color: string; layer: string }) {
  return (
    <g data-layer={layer} pointerEvents="none" fill={color} fillOpacity={0.28}>
      {joints.map((j) => {
        const p = pos.get(j);
        return p && <circle key={j} data-joint-halo={j} cx={sx(p)} cy={sy(p)} r={9 * u} />;
      })}
    </g>
  );
}

/** The frame drawn through other joint positions: the rest shape behind an animation, or the deflected shape. */
export function FrameLines({ scene, pos, u, color, width, dash, opacity, layer }: {
  scene: Scene; pos: Pos; u: number; color: string; width: number; dash?: string; opacity?: number; layer: string;
}) {
  const d = scene.members.map((m) => {
    const a = pos.get(m.from), b = pos.get(m.to);
    return a && b ? `M${sx(a)} ${sy(a)}L${sx(b)} ${sy(b)}` : '';
  }).join('');
  return <path data-layer={layer} d={d} pointerEvents="none" fill="none" stroke={color} strokeWidth={width * u} strokeDasharray={dash} strokeOpacity={opacity} strokeLinecap="round" />;
}

export function Joints({ scene, pos, u, labels }: { scene: Scene; pos: Pos; u: number; labels: boolean }) {
  const midY = (scene.extent.y0 + scene.extent.y1) / 2;
  return (
    <g data-layer="joints" pointerEvents="none">
      {[...pos].map(([id, p]) => (
        <circle key={id} data-joint={id} cx={sx(p)} cy={sy(p)} r={SIZE.joint * u} fill={PALETTE.paper} stroke={PALETTE.ink} strokeWidth={1 * u} />
      ))}
      {labels && [...pos].map(([id, p]) => {
        const below = (scene.nodes.get(id)?.y ?? 0) < midY || scene.extent.h === 0;
        return (
          <text key={`l-${id}`} x={sx(p) + 4 * u} y={sy(p) + (below ? 12 : -6) * u} fontSize={SIZE.label * u}
            fontFamily={MONO} fill={PALETTE.label} paintOrder="stroke" stroke={PALETTE.paper} strokeWidth={2.5 * u}>
            {id}
          </text>
        );
      })}
    </g>
  );
}

/** Force values at member mid-points, with a paper halo so they read over lines. */
export function ForceLabels({ scene, pos, u }: { scene: Scene; pos: Pos; u: number }) {
  return (
    <g data-layer="force-labels" pointerEvents="none" fontFamily={MONO} fontSize={SIZE.label * u} paintOrder="stroke" stroke={PALETTE.paper} strokeWidth={3 * u}>
      {scene.members.map((m) => {
        const a = pos.get(m.from), b = pos.get(m.to);
        if (!a || !b || m.force === undefined) return null;
        const [dx, dy] = [Math.abs(sx(b) - sx(a)), Math.abs(sy(b) - sy(a))];
        const flat = dx > 3 * dy;
        const upright = dy > 3 * dx;
        // Verticals are labelled low (40 % up) so they do not meet the diagonals' labels at mid-height.
        const [lo, hi] = sy(a) > sy(b) ? [a, b] : [b, a];
        const t = upright ? 0.4 : 0.5;
        const [mx, my] = [sx(lo) + t * (sx(hi) - sx(lo)), sy(lo) + t * (sy(hi) - sy(lo))];
        // A vertical on the right edge is labelled on its left, so the label stays inside the frame.
        const rightEdge = upright && mx > scene.extent.x1 - 0.05 * scene.extent.w;
        const fill = m.sign === 'tension' ? PALETTE.tension : m.sign === 'compression' ? PALETTE.compression : PALETTE.label;
        return (
          <text key={m.id} x={mx + (upright ? (rightEdge ? -4 : 4) * u : 0)} y={my + (flat ? -5 * u : 3.5 * u)} fill={fill}
            textAnchor={upright ? (rightEdge ? 'end' : 'start') : 'middle'}>
            {fmt(m.force, 4)}
          </text>
        );
      })}
    </g>
  );
}
