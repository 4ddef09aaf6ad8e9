/**
 * Members: one visible path each (colour and dash by force sign, width by |force|), a wider
 * invisible hit line, halos for over-braced / highlighted / focused members, and cut marks.
 * Keyboard: one tab stop (roving tabindex); arrows move between members, Enter/Space picks.
 */
import type { KeyboardEvent } from 'react';
import { PALETTE } from '../lib/palette';
import { memberStroke } from '../lib/member-style';
import type { Pt, Scene, SceneMember } from '../lib/scene';
import { sx, sy } from '../lib/layout';
import { describeMember } from '../lib/describe';

export interface MemberLayerProps {
  scene: Scene;
  pos: Map<string, Pt>;
  u: number;
  selected: ReadonlySet<string>;
  highlighted: ReadonlySet<string>;
  /** Member whose halo shows focus or hover. */
  pointed?: string;
  activeIndex: number;
  onPoint: (id: string | undefined, how: 'hover' | 'focus', index: number) => void;
  onActivate?: (id: string) => void;
  onNavigate: (index: number) => void;
}

const ends = (m: SceneMember, pos: Map<string, Pt>) => {
  const a = pos.get(m.from);
  const b = pos.get(m.to);
  return a && b ? { x1: sx(a), y1: sy(a), x2: sx(b), y2: sy(b) } : undefined;
};

function Halos({ scene, pos, u, set, color, opacity, extra, skip }: {
  scene: Scene; pos: Map<string, Pt>; u: number; set: ReadonlySet<string>; color: string; opacity: number; extra: number; skip?: boolean;
}) {
  return (
    <g stroke={color} strokeOpacity={opacity} strokeLinecap="round" pointerEvents="none" data-export={skip ? 'skip' : undefined}>
      {scene.members.filter((m) => set.has(m.id)).map((m) => {
        const e = ends(m, pos);
        const w = memberStroke(m.sign, m.force, scene.peak, u).strokeWidth;
        return e && <line key={m.id} data-halo={m.id} {...e} strokeWidth={w + extra * u} />;
      })}
    </g>
  );
}

function cutMark(e: { x1: number; y1: number; x2: number; y2: number }, u: number): string {
  const [mx, my] = [(e.x1 + e.x2) / 2, (e.y1 + e.y2) / 2];
  const L = Math.hypot(e.x2 - e.x1, e.y2 - e.y1) || 1;
  const [tx, ty] = [(e.x2 - e.x1) / L, (e.y2 - e.y1) / L];
  const [nx, ny] = [-ty * 8 * u, tx * 8 * u];
  return [-2.2, 2.2].map((s) => {
    const [cx, cy] = [mx + tx * s * u, my + ty * s * u];
    return `M${cx - nx} ${cy - ny}L${cx + nx} ${cy + ny}`;
  }).join('');
}

export function MemberLayer(p: MemberLayerProps) {
  const { scene, pos, u } = p;
  const n = scene.members.length;
  const onKey = (e: KeyboardEvent, i: number, id: string) => {
    const next: Record<string, number> = { ArrowRight: i + 1, ArrowDown: i + 1, ArrowLeft: i - 1, ArrowUp: i - 1, Home: 0, End: n - 1 };
    if (e.key in next) {
      e.preventDefault();
      p.onNavigate((next[e.key] + n) % n);
    } else if ((e.key === 'Enter' || e.key === ' ') && p.onActivate) {
      e.preventDefault();
      p.onActivate(id);
    }
  };
  return (
    <>
      <Halos scene={scene} pos={pos} u={u} set={scene.overBraced} color={PALETTE.overBraced} opacity={0.3} extra={7} />
      <Halos scene={scene} pos={pos} u={u} set={p.highlighted} color={PALETTE.highlight} opacity={0.55} extra={8} />
      <Halos scene={scene} pos={pos} u={u} set={new Set(p.pointed ? [p.pointed] : [])} color={PALETTE.focus} opacity={0.5} extra={6} skip />
      <g data-layer="members" fill="none">
        {scene.members.map((m, i) => {
          const e = ends(m, pos);
          if (!e) return null;
          const s = memberStroke(m.sign, m.force, scene.peak, u);
          return (
            <g
              key={m.id}
              data-member-index={i}
              tabIndex={i === p.activeIndex ? 0 : -1}
              role={p.onActivate ? 'button' : 'img'}
              aria-pressed={p.onActivate ? p.selected.has(m.id) : undefined}
              aria-label={describeMember(m, scene.units).join(', ')}
              onMouseEnter={() => p.onPoint(m.id, 'hover', i)}
              onMouseLeave={() => p.onPoint(undefined, 'hover', i)}
              onFocus={() => p.onPoint(m.id, 'focus', i)}
              onBlur={() => p.onPoint(undefined, 'focus', i)}
              onClick={p.onActivate ? () => p.onActivate!(m.id) : undefined}
              onKeyDown={(ev) => onKey(ev, i, m.id)}
              style={{ cursor: p.onActivate ? 'pointer' : 'default' }}
            >
              <path
                data-member={m.id}
                data-sign={m.sign}
                d={`M${e.x1} ${e.y1}L${e.x2} ${e.y2}`}
                stroke={s.stroke}
                strokeWidth={s.strokeWidth}
                strokeDasharray={s.strokeDasharray}
                strokeLinecap="butt"
              />
              <line data-export="skip" {...e} stroke="transparent" strokeWidth={Math.max(s.strokeWidth, 12 * u)} />
            </g>
          );
        })}
      </g>
      <g data-layer="cuts" pointerEvents="none" stroke={PALETTE.ink} strokeWidth={1.6 * u} strokeLinecap="round">
        {scene.members.filter((m) => p.selected.has(m.id)).map((m) => {
          const e = ends(m, pos);
          return e && <path key={m.id} data-cut={m.id} d={cutMark(e, u)} />;
        })}
      </g>
    </>
  );
}
