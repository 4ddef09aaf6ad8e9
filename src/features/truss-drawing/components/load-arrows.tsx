/** Joint loads as arrows pointing at the joint, length scaled by magnitude, value at the tail. */
import { PALETTE, MONO } from '../lib/palette';
import type { Pt, Scene } from '../lib/scene';
import { arrowLength, SIZE, sx, sy } from '../lib/layout';
import { fmt } from '@/lib/format';

interface Props {
  scene: Scene;
  /** Joint positions (moved while a mechanism animates). */
  pos: Map<string, Pt>;
  u: number;
  showValues: boolean;
}

export function LoadArrows({ scene, pos, u, showValues }: Props) {
  return (
    <g data-layer="loads" fill={PALETTE.load} stroke={PALETTE.load}>
      {scene.loads.map((l) => {
        const p = pos.get(l.node);
        if (!p) return null;
        const dx = l.fx / l.magnitude;
        const dy = -l.fy / l.magnitude;
        const gap = (SIZE.joint + 2) * u;
        const tip = { x: sx(p) - dx * gap, y: sy(p) - dy * gap };
        const len = arrowLength(l.magnitude, scene.maxLoad, u);
        const tail = { x: tip.x - dx * len, y: tip.y - dy * len };
        const h = SIZE.arrowHead * u;
        const w = 3.2 * u;
        const base = { x: tip.x - dx * h, y: tip.y - dy * h };
        const head = `M${tip.x} ${tip.y}L${base.x - dy * w} ${base.y + dx * w}L${base.x + dy * w} ${base.y - dx * w}Z`;
        const label = { x: tail.x - dx * SIZE.label * 0.9 * u, y: tail.y - dy * SIZE.label * 0.9 * u + 0.35 * SIZE.label * u };
        return (
          <g key={l.node} data-load={l.node}>
            <title>{`Load at ${l.node}: ${fmt(l.magnitude)} ${scene.units.force} (fx ${fmt(l.fx)}, fy ${fmt(l.fy)})`}</title>
            <path d={`M${tail.x} ${tail.y}L${base.x} ${base.y}`} fill="none" strokeWidth={1.3 * u} />
            <path d={head} stroke="none" />
            {showValues && (
              <text x={label.x} y={label.y} fontSize={SIZE.label * u} fontFamily={MONO} textAnchor="middle" stroke="none">
                {fmt(l.magnitude, 3)}
              </text>
            )}
          </g>
        );
      })}
    </g>
  );
}
