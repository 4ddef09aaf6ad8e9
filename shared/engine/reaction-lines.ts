/**
 * Lines of action of the reactions: are they all parallel, or do they all meet at one point?
 * (Statics, common practice: a body held by parallel or concurrent reactions alone can move.)
 */
import type { Structure } from './structure';
import type { ReactionComponent } from './equilibrium';

/** Parallel or concurrent reaction lines. @returns concurrent: the meeting point, m */
export function reactionLines(st: Structure, comps: readonly ReactionComponent[]): { parallel: boolean; concurrent?: [number, number] } {
  if (comps.length === 0) return { parallel: false };
  const dir = comps.map((r) => [Math.cos(r.angle), Math.sin(r.angle)] as const);
  const pt = comps.map((r) => [st.x[r.node], st.y[r.node]] as const);
  const cross = (a: readonly number[], b: readonly number[]) => a[0] * b[1] - a[1] * b[0];
  const parallel = dir.every((d) => Math.abs(cross(d, dir[0])) < 1e-9);
  if (parallel) return { parallel: true };
  const j = dir.findIndex((d) => Math.abs(cross(d, dir[0])) >= 1e-9);
  const den = cross(dir[0], dir[j]);
  const w = [pt[j][0] - pt[0][0], pt[j][1] - pt[0][1]];
  const t = cross(w, dir[j]) / den;
  const p: [number, number] = [pt[0][0] + t * dir[0][0], pt[0][1] + t * dir[0][1]];
  let size = 1;
  for (let i = 0; i < st.x.length; i++) size = Math.max(size, Math.abs(st.x[i]), Math.abs(st.y[i]));
  const onLine = (k: number) => Math.abs(cross([p[0] - pt[k][0], p[1] - pt[k][1]], dir[k])) < 1e-9 * size;
  return comps.every((_, k) => onLine(k)) ? { parallel: false, concurrent: p } : { parallel: false };
}
