/**
 * Panels of a truss: four-sided cycles of members. A mechanism that changes the length across a
 * panel shears it, so that panel lacks a diagonal; a panel crossed by two diagonals that carry a
 * self-stress is doubly braced. This is how a report can say which panel to fix.
 */
import type { Structure } from './structure';

/** A four-sided panel: joints in cycle order, and the members on its two diagonals (−1 when absent). */
export interface Panel {
  readonly joints: [number, number, number, number];
  readonly diagonals: [number, number];
}

/** Every four-member cycle a–b–c–d whose joints are distinct, with its diagonal members a–c and b–d. */
export function findPanels(st: Structure): Panel[] {
  const n = st.nodeIds.length;
  const edge = new Map<number, number>();
  const adj: number[][] = Array.from({ length: n }, () => []);
  for (let e = 0; e < st.from.length; e++) {
    const a = st.from[e], b = st.to[e];
    edge.set(a * n + b, e); edge.set(b * n + a, e);
    adj[a].push(b); adj[b].push(a);
  }
  const seen = new Set<string>();
  const out: Panel[] = [];
  for (let a = 0; a < n; a++) {
    for (const b of adj[a]) for (const d of adj[a]) {
      if (b >= d) continue;
      for (const c of adj[b]) {
        if (c === a || c === d || !edge.has(c * n + d)) continue;
        const key = [a, b, c, d].sort((p, q) => p - q).join(',') + (edge.has(a * n + c) ? 'x' : '') + (edge.has(b * n + d) ? 'y' : '');
        if (seen.has(key)) continue;
        seen.add(key);
        if (!isSimpleQuad(st, a, b, c, d)) continue;
        out.push({ joints: [a, b, c, d], diagonals: [edge.get(a * n + c) ?? -1, edge.get(b * n + d) ?? -1] });
      }
    }
  }
  return out;
}

/** The diagonals a–c and b–d must cross: a convex panel, not a bow-tie or a folded one. */
function isSimpleQuad(st: Structure, a: number, b: number, c: number, d: number): boolean {
  const cross = (o: number, p: number, q: number) => (st.x[p] - st.x[o]) * (st.y[q] - st.y[o]) - (st.y[p] - st.y[o]) * (st.x[q] - st.x[o]);
  return cross(a, c, b) * cross(a, c, d) < 0 && cross(b, d, a) * cross(b, d, c) < 0;
}

/** Does a joint-displacement mode change the distance between joints p and q (first order)? */
export function stretches(st: Structure, mode: Float64Array, p: number, q: number): boolean {
  const dx = st.x[q] - st.x[p], dy = st.y[q] - st.y[p];
  const L = Math.hypot(dx, dy);
  return Math.abs(((mode[2 * q] - mode[2 * p]) * dx + (mode[2 * q + 1] - mode[2 * p + 1]) * dy) / L) > 1e-6;
}
