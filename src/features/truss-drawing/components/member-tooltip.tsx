/** The hover / focus card of one member, drawn inside the SVG near the member's mid-point. */
import { PALETTE, MONO } from '../lib/palette';
import type { Pt, Scene, SceneMember } from '../lib/scene';
import { SIZE, sx, sy } from '../lib/layout';
import { describeMember } from '../lib/describe';

interface Props {
  member: SceneMember;
  scene: Scene;
  pos: Map<string, Pt>;
  u: number;
  viewBox: readonly [number, number, number, number];
  extra?: string;
}

export function MemberTooltip({ member, scene, pos, u, viewBox, extra }: Props) {
  const a = pos.get(member.from), b = pos.get(member.to);
  if (!a || !b) return null;
  const lines = describeMember(member, scene.units);
  if (extra) lines.push(extra);
  const fs = SIZE.tooltip * u;
  const lh = fs * 1.35;
  // Monospace: width is characters × advance (≈0.6 em).
  const w = Math.max(...lines.map((l) => l.length)) * fs * 0.61 + 12 * u;
  const h = lines.length * lh + 9 * u;
  const [vx, vy, vw, vh] = viewBox;
  const mx = (sx(a) + sx(b)) / 2;
  const my = (sy(a) + sy(b)) / 2;
  const x = Math.min(Math.max(mx + 10 * u, vx + 2 * u), vx + vw - w - 2 * u);
  const y = Math.min(Math.max(my - h - 10 * u, vy + 2 * u), vy + vh - h - 2 * u);
  return (
    <g data-export="skip" role="tooltip" id="pp-member-tooltip" pointerEvents="none">
      <rect x={x} y={y} width={w} height={h} rx={2.5 * u} fill={PALETTE.paper} stroke={PALETTE.ink} strokeOpacity={0.35} strokeWidth={1 * u} />
      {lines.map((l, i) => (
        <text key={i} x={x + 6 * u} y={y + 5 * u + lh * (i + 0.78)} fontFamily={MONO} fontSize={fs}
          fill={i === 1 && member.sign === 'tension' ? PALETTE.tension : i === 1 && member.sign === 'compression' ? PALETTE.compression : PALETTE.ink}
          fontWeight={i === 0 ? 600 : 400}>
          {l}
        </text>
      ))}
    </g>
  );
}
