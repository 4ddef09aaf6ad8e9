/**
 * Method of sections: cut up to three members, take the free body of one side, and solve its three
 * equilibrium equations (ΣFx = 0, ΣFy = 0, ΣM = 0) for the forces in the cut members.
 */
import type { Structure } from './structure';
import { solveDense } from './linalg/dense-lu';

/** Outcome of a cut. */
export interface SectionResult {
  /** Cut member indices, in the order asked. */
  readonly members: number[];
  /** Joints of the free body used. */
  readonly side: number[];
  /** Forces in the cut members from statics, kN, tension positive; undefined with `error`. */
  readonly forces?: Float64Array;
  /** Why the cut cannot be solved. */
  readonly error?: string;
}

/**
 * Solve a cut for one loading.
 * @param loads - joint loads [fx0, fy0, ...], kN
 * @param react - reactions per support [rx, ry, ...], kN, used for supports on the free body
 */
export function cutSection(st: Structure, cut: readonly number[], loads: Readonly<Float64Array>, react: Readonly<Float64Array>): SectionResult {
  const nJ = st.nodeIds.length;
  const members = [...cut];
  const parent = Int32Array.from({ length: nJ }, (_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i])));
  const isCut = new Set(cut);
  for (let e = 0; e < st.from.length; e++) if (!isCut.has(e)) parent[find(st.from[e])] = find(st.to[e]);
  const root = find(st.from[cut[0]]);
  const inA = (i: number) => find(i) === root;
  for (const e of cut) {
    if (inA(st.from[e]) === inA(st.to[e])) {
      return { members, side: [], error: `cutting ${cut.map((m) => st.memberIds[m]).join(', ')} does not split the truss in two: member ${st.memberIds[e]} has both ends on one side` };
    }
  }
  if (cut.length > 3) return { members, side: [], error: 'a cut gives three equations: cut at most three members' };
  const sideA: number[] = [];
  const sideB: number[] = [];
  for (let i = 0; i < nJ; i++) (inA(i) ? sideA : sideB).push(i);
  const reactionsOn = (side: number[]) => st.supports.filter((s) => side.includes(s.node)).length;
  const side = reactionsOn(sideA) <= reactionsOn(sideB) ? sideA : sideB;
  const onSide = new Uint8Array(nJ);
  for (const i of side) onSide[i] = 1;
  let cx = 0, cy = 0;
  for (const i of side) { cx += st.x[i]; cy += st.y[i]; }
  cx /= side.length; cy /= side.length;
  // Known external forces on the free body: loads and reactions, as (Fx, Fy, M about the centroid).
  const known = [0, 0, 0];
  const addForce = (i: number, fx: number, fy: number) => {
    known[0] += fx; known[1] += fy; known[2] += (st.x[i] - cx) * fy - (st.y[i] - cy) * fx;
  };
  for (const i of side) addForce(i, loads[2 * i], loads[2 * i + 1]);
  st.supports.forEach((s, q) => { if (onSide[s.node]) addForce(s.node, react[2 * q], react[2 * q + 1]); });
  // One column per cut member: a unit tension pulls the free body's end toward the other end.
  const B = cut.map((e) => {
    const [i, o] = onSide[st.from[e]] ? [st.from[e], st.to[e]] : [st.to[e], st.from[e]];
    const dx = st.x[o] - st.x[i];
    const dy = st.y[o] - st.y[i];
    const L = Math.hypot(dx, dy);
    const ux = dx / L, uy = dy / L;
    return [ux, uy, (st.x[i] - cx) * uy - (st.y[i] - cy) * ux];
  });
  const n = cut.length;
  const N = new Float64Array(n * n);
  const rhs = new Float64Array(n);
  for (let p = 0; p < n; p++) {
    for (let q = 0; q < n; q++) N[p * n + q] = B[p][0] * B[q][0] + B[p][1] * B[q][1] + B[p][2] * B[q][2];
    rhs[p] = -(B[p][0] * known[0] + B[p][1] * known[1] + B[p][2] * known[2]);
  }
  const forces = solveDense(N, n, rhs);
  if (!forces) {
    return { members, side, error: 'the cut members are parallel or meet at one point: the three equations cannot separate their forces' };
  }
  return { members, side, forces };
}
