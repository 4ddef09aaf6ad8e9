/**
 * The fast path: direct stiffness method on a narrowly banded K, factored once per variant as
 * L·D·Lᵀ with a pivot test, solved for every combination. Built once per topology; `run` does not
 * allocate. See ENGINEERING.md §2 (fast path) and §3.
 */
import type { Topology } from './structure';
import { reactionCount } from './structure';
import { bandOrder } from './numbering';
import { factorBandLdlt, solveBandLdlt, type BandShape } from './linalg/banded-ldlt';

/** A pivot at or below this fraction of its diagonal counts as a mechanism (ENGINEERING.md §6). */
export const PIVOT_TOL = 1e-10;

export const STATUS_UNSTABLE = 0;
export const STATUS_DETERMINATE = 1;
export const STATUS_INDETERMINATE = 2;

/** A reusable analyser for one topology and a fixed number of load combinations. */
export interface Kernel {
  readonly nJoints: number;
  readonly nMembers: number;
  readonly nReactions: number;
  readonly nFree: number;
  readonly shape: BandShape;
  /** Mechanisms k of the last run (collapsed pivots). */
  k: number;
  /** States of self-stress s of the last run, from Calladine's relation m + r − 2j = s − k. */
  s: number;
  /** STATUS_* of the last run. */
  status: number;
  /** Member forces per combination, kN, tension positive: forces[c * m + e]. Valid when stable. */
  readonly forces: Float64Array;
  /** Joint displacements per combination, m: disp[c * 2j + 2i] (ux), +1 (uy). */
  readonly disp: Float64Array;
  /** Reactions per combination and support, kN, global x and y: react[c * 2ns + 2q] (rx), +1 (ry). */
  readonly react: Float64Array;
  /** Member lengths of the last run, m. */
  readonly length: Float64Array;
  /**
   * Analyse one variant.
   * @param x - joint x, m; @param y - joint y, m; @param EA - axial stiffness per member, kN
   * @param loads - joint loads per combination, kN: loads[c * 2j + 2i] (fx), +1 (fy)
   * @param combos - how many combinations to solve (≤ the kernel's capacity)
   * @returns k (0 when stable)
   */
  run(x: Readonly<Float64Array>, y: Readonly<Float64Array>, EA: Readonly<Float64Array>, loads: Readonly<Float64Array>, combos: number): number;
}

/** Build the kernel for one topology. @param maxCombos - combinations solved per run at most */
export function createKernel(topo: Topology, maxCombos: number): Kernel {
  const nJ = topo.nodeIds.length;
  const nM = topo.from.length;
  const { from, to, supports } = topo;
  const order = bandOrder(nJ, from, to);
  // Per joint: two dof slots, each a dof index (-1 restrained) and a direction (bx, by).
  const slotDof = new Int32Array(2 * nJ).fill(-2);
  const slotDir = new Float64Array(4 * nJ);
  const supportOf = new Int32Array(nJ).fill(-1);
  supports.forEach((s, q) => (supportOf[s.node] = q));
  let nFree = 0;
  let nReactions = 0;
  for (const s of supports) nReactions += reactionCount(s);
  for (let p = 0; p < nJ; p++) {
    const i = order[p];
    const q = supportOf[i];
    const s = q >= 0 ? supports[q] : undefined;
    if (!s) {
      slotDof[2 * i] = nFree++;
      slotDir.set([1, 0], 4 * i);
      slotDof[2 * i + 1] = nFree++;
      slotDir.set([0, 1], 4 * i + 2);
    } else if (s.kind === 'roller') {
      slotDof[2 * i] = nFree++;
      slotDir.set([-Math.sin(s.angle), Math.cos(s.angle)], 4 * i);
      slotDof[2 * i + 1] = -1;
    } else {
      slotDof[2 * i] = -1;
      slotDof[2 * i + 1] = -1;
    }
  }
  const first = new Int32Array(nFree);
  for (let r = 0; r < nFree; r++) first[r] = r;
  let bw = 0;
  for (let e = 0; e < nM; e++) {
    const dofs = [slotDof[2 * from[e]], slotDof[2 * from[e] + 1], slotDof[2 * to[e]], slotDof[2 * to[e] + 1]].filter((d) => d >= 0);
    for (const a of dofs) for (const b of dofs) if (b < a) {
      if (b < first[a]) first[a] = b;
      bw = Math.max(bw, a - b);
    }
  }
  const W = bw + 1;
  const shape: BandShape = { n: nFree, bw, first };
  const band = new Float64Array(nFree * W);
  const diag = new Float64Array(nFree);
  const d = new Float64Array(nFree);
  const invD = new Float64Array(nFree);
  const rhs = new Float64Array(nFree);
  const cosT = new Float64Array(nM);
  const sinT = new Float64Array(nM);
  const stiff = new Float64Array(nM);
  const length = new Float64Array(nM);
  const ns = supports.length;
  const forces = new Float64Array(maxCombos * nM);
  const disp = new Float64Array(maxCombos * 2 * nJ);
  const react = new Float64Array(maxCombos * 2 * ns);
  const countRule = nM + nReactions - 2 * nJ;

  const p: Plan = { nJ, nM, ns, nFree, bw, W, from, to, slotDof, slotDir, supportOf, supports, shape, band, diag, d, invD, rhs, cosT, sinT, stiff, length, forces, disp, react };
  const kernel: Kernel = {
    nJoints: nJ, nMembers: nM, nReactions, nFree, shape, k: 0, s: 0, status: STATUS_UNSTABLE,
    forces, disp, react, length,
    run(x, y, EA, loads, combos) {
      assemble(p, x, y, EA);
      const k = factorBandLdlt(shape, band, diag, d, invD, PIVOT_TOL);
      kernel.k = k;
      kernel.s = countRule + k;
      if (k > 0) {
        kernel.status = STATUS_UNSTABLE;
        return k;
      }
      kernel.status = kernel.s > 0 ? STATUS_INDETERMINATE : STATUS_DETERMINATE;
      for (let cmb = 0; cmb < combos; cmb++) solveCombination(p, cmb, loads);
      return 0;
    },
  };
  return kernel;
}

/** Everything one topology's runs share; passed to module-level functions so V8 optimises them once for all kernels. */
interface Plan {
  nJ: number; nM: number; ns: number; nFree: number; bw: number; W: number;
  from: Int32Array; to: Int32Array; slotDof: Int32Array; slotDir: Float64Array; supportOf: Int32Array;
  supports: Topology['supports']; shape: BandShape;
  band: Float64Array; diag: Float64Array; d: Float64Array; invD: Float64Array; rhs: Float64Array;
  cosT: Float64Array; sinT: Float64Array; stiff: Float64Array; length: Float64Array;
  forces: Float64Array; disp: Float64Array; react: Float64Array;
}

function assemble(p: Plan, x: Readonly<Float64Array>, y: Readonly<Float64Array>, EA: Readonly<Float64Array>): void {
  const { nM, nFree, bw, W, from, to, slotDof, slotDir, band, diag, cosT, sinT, stiff, length } = p;
  band.fill(0);
  for (let e = 0; e < nM; e++) {
    const a = from[e];
    const b = to[e];
    const dx = x[b] - x[a];
    const dy = y[b] - y[a];
    const L = Math.sqrt(dx * dx + dy * dy);
    const c = dx / L;
    const s = dy / L;
    cosT[e] = c;
    sinT[e] = s;
    length[e] = L;
    const ke = EA[e] / L;
    stiff[e] = ke;
    // Elongation = e·(u_b − u_a), projected on each free slot direction of the two joints.
    const d0 = slotDof[2 * a], d1 = slotDof[2 * a + 1], d2 = slotDof[2 * b], d3 = slotDof[2 * b + 1];
    const g0 = -(c * slotDir[4 * a] + s * slotDir[4 * a + 1]);
    const g1 = -(c * slotDir[4 * a + 2] + s * slotDir[4 * a + 3]);
    const g2 = c * slotDir[4 * b] + s * slotDir[4 * b + 1];
    const g3 = c * slotDir[4 * b + 2] + s * slotDir[4 * b + 3];
    addPair(band, bw, W, ke, d0, g0, d0, g0); addPair(band, bw, W, ke, d1, g1, d0, g0); addPair(band, bw, W, ke, d1, g1, d1, g1);
    addPair(band, bw, W, ke, d2, g2, d0, g0); addPair(band, bw, W, ke, d2, g2, d1, g1); addPair(band, bw, W, ke, d2, g2, d2, g2);
    addPair(band, bw, W, ke, d3, g3, d0, g0); addPair(band, bw, W, ke, d3, g3, d1, g1); addPair(band, bw, W, ke, d3, g3, d2, g2);
    addPair(band, bw, W, ke, d3, g3, d3, g3);
  }
  for (let r = 0; r < nFree; r++) diag[r] = band[r * W + bw];
}

/** Add ke·gp·gq to K[dp][dq] (or K[dq][dp]: the lower triangle is stored), skipping restrained slots. */
function addPair(band: Float64Array, bw: number, W: number, ke: number, dp: number, gp: number, dq: number, gq: number): void {
  if (dp < 0 || dq < 0) return;
  const v = ke * gp * gq;
  if (dp >= dq) band[dp * W + bw - dp + dq] += v;
  else band[dq * W + bw - dq + dp] += v;
}

function solveCombination(p: Plan, cmb: number, loads: Readonly<Float64Array>): void {
  const { nJ, nM, ns, from, to, slotDof, slotDir, supportOf, supports, shape, band, invD, rhs, cosT, sinT, stiff, forces, disp, react } = p;
  const lo = cmb * 2 * nJ;
  for (let i = 0; i < nJ; i++) {
    const fx = loads[lo + 2 * i];
    const fy = loads[lo + 2 * i + 1];
    const d0 = slotDof[2 * i];
    const d1 = slotDof[2 * i + 1];
    if (d0 >= 0) rhs[d0] = fx * slotDir[4 * i] + fy * slotDir[4 * i + 1];
    if (d1 >= 0) rhs[d1] = fx * slotDir[4 * i + 2] + fy * slotDir[4 * i + 3];
  }
  solveBandLdlt(shape, band, invD, rhs, rhs);
  for (let i = 0; i < nJ; i++) {
    const d0 = slotDof[2 * i];
    const d1 = slotDof[2 * i + 1];
    const u0 = d0 >= 0 ? rhs[d0] : 0;
    const u1 = d1 >= 0 ? rhs[d1] : 0;
    disp[lo + 2 * i] = u0 * slotDir[4 * i] + u1 * slotDir[4 * i + 2];
    disp[lo + 2 * i + 1] = u0 * slotDir[4 * i + 1] + u1 * slotDir[4 * i + 3];
  }
  const fo = cmb * nM;
  for (let e = 0; e < nM; e++) {
    const a = from[e];
    const b = to[e];
    const du = disp[lo + 2 * b] - disp[lo + 2 * a];
    const dv = disp[lo + 2 * b + 1] - disp[lo + 2 * a + 1];
    forces[fo + e] = stiff[e] * (cosT[e] * du + sinT[e] * dv);
  }
  // Reactions: load + member forces + reaction = 0 at each supported joint.
  const ro = cmb * 2 * ns;
  for (let q = 0; q < ns; q++) {
    const i = supports[q].node;
    react[ro + 2 * q] = -loads[lo + 2 * i];
    react[ro + 2 * q + 1] = -loads[lo + 2 * i + 1];
  }
  for (let e = 0; e < nM; e++) {
    const N = forces[fo + e];
    const qa = supportOf[from[e]];
    const qb = supportOf[to[e]];
    if (qa >= 0) {
      react[ro + 2 * qa] -= N * cosT[e];
      react[ro + 2 * qa + 1] -= N * sinT[e];
    }
    if (qb >= 0) {
      react[ro + 2 * qb] += N * cosT[e];
      react[ro + 2 * qb + 1] += N * sinT[e];
    }
  }
}
