/**
 * The fast path: direct stiffness method on a narrowly banded K, factored once per variant as
 * L·D·Lᵀ with a pivot test, solved for every combination. Built once per topology; `run` does not
 * allocate. See ENGINEERING.md §2 (fast path) and §3.
 */
import type { Topology } from './structure';
import { reactionCount } from './structure';
import { bandOrder } from './numbering';
import { factorBandLdlt, solveBandLdltMulti, type BandShape } from './linalg/banded-ldlt';

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

/**
 * Build the kernel for one topology.
 * @param maxCombos - combinations solved per run at most
 * @param opts.reactions - compute support reactions (default true; a sweep records none and skips them)
 */
export function createKernel(topo: Topology, maxCombos: number, opts: { reactions?: boolean } = {}): Kernel {
  const withReactions = opts.reactions ?? true;
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
  const rhs = new Float64Array(nFree * Math.max(1, maxCombos));
  const cosT = new Float64Array(nM);
  const sinT = new Float64Array(nM);
  const stiff = new Float64Array(nM);
  const length = new Float64Array(nM);
  const ns = supports.length;
  const forces = new Float64Array(maxCombos * nM);
  const disp = new Float64Array(maxCombos * 2 * nJ);
  const react = new Float64Array(maxCombos * 2 * ns);
  const countRule = nM + nReactions - 2 * nJ;

  // Per member: the band offset of each of its ten (p ≥ q) slot pairs, −1 where a slot is restrained,
  // and the slot directions of its two ends, so assembly does no index arithmetic per variant.
  const PAIRS = [[0, 0], [1, 0], [1, 1], [2, 0], [2, 1], [2, 2], [3, 0], [3, 1], [3, 2], [3, 3]];
  const offsets = new Int32Array(10 * nM);
  const ends = new Float64Array(8 * nM);
  for (let e = 0; e < nM; e++) {
    const dof = [slotDof[2 * from[e]], slotDof[2 * from[e] + 1], slotDof[2 * to[e]], slotDof[2 * to[e] + 1]];
    PAIRS.forEach(([pp, qq], k) => {
      const a = dof[pp], b = dof[qq];
      offsets[10 * e + k] = a < 0 || b < 0 ? -1 : Math.max(a, b) * W + bw - Math.max(a, b) + Math.min(a, b);
    });
    ends.set(slotDir.subarray(4 * from[e], 4 * from[e] + 4), 8 * e);
    ends.set(slotDir.subarray(4 * to[e], 4 * to[e] + 4), 8 * e + 4);
  }
  const sm: number[] = [];
  for (let e = 0; e < nM; e++) {
    if (supportOf[from[e]] >= 0) sm.push(e, supportOf[from[e]], 1);
    if (supportOf[to[e]] >= 0) sm.push(e, supportOf[to[e]], -1);
  }
  const supportMembers = Int32Array.from(sm);
  const p: Plan = { nJ, nM, ns, nFree, bw, W, from, to, slotDof, slotDir, supportOf, supports, shape, band, diag, d, invD, rhs, cosT, sinT, stiff, length, forces, disp, react, offsets, ends, supportMembers, withReactions };
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
      solveAll(p, combos, loads);
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
  offsets: Int32Array; ends: Float64Array;
  /** Triples (member, support index, +1 at the member's start joint / −1 at its end joint). */
  supportMembers: Int32Array;
  withReactions: boolean;
}

function assemble(p: Plan, x: Readonly<Float64Array>, y: Readonly<Float64Array>, EA: Readonly<Float64Array>): void {
  const { nM, nFree, bw, W, from, to, band, diag, cosT, sinT, stiff, length, offsets: off, ends } = p;
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
    // Elongation = e·(u_b − u_a), projected on each slot direction of the two ends.
    const q = 8 * e;
    const g0 = -(c * ends[q] + s * ends[q + 1]);
    const g1 = -(c * ends[q + 2] + s * ends[q + 3]);
    const g2 = c * ends[q + 4] + s * ends[q + 5];
    const g3 = c * ends[q + 6] + s * ends[q + 7];
    const k0 = ke * g0, k1 = ke * g1, k2 = ke * g2, k3 = ke * g3;
    const o = 10 * e;
    let t: number;
    if ((t = off[o]) >= 0) band[t] += k0 * g0;
    if ((t = off[o + 1]) >= 0) band[t] += k1 * g0;
    if ((t = off[o + 2]) >= 0) band[t] += k1 * g1;
    if ((t = off[o + 3]) >= 0) band[t] += k2 * g0;
    if ((t = off[o + 4]) >= 0) band[t] += k2 * g1;
    if ((t = off[o + 5]) >= 0) band[t] += k2 * g2;
    if ((t = off[o + 6]) >= 0) band[t] += k3 * g0;
    if ((t = off[o + 7]) >= 0) band[t] += k3 * g1;
    if ((t = off[o + 8]) >= 0) band[t] += k3 * g2;
    if ((t = off[o + 9]) >= 0) band[t] += k3 * g3;
  }
  for (let r = 0; r < nFree; r++) diag[r] = band[r * W + bw];
}

function solveAll(p: Plan, combos: number, loads: Readonly<Float64Array>): void {
  const { nJ, nM, from, to, slotDof, slotDir, shape, band, invD, rhs, cosT, sinT, stiff, forces, disp } = p;
  if (combos === 0) return;
  const n2 = 2 * nJ;
  // All right-hand sides at once, interleaved: rhs[dof · combos + c].
  for (let i = 0; i < nJ; i++) {
    const d0 = slotDof[2 * i], d1 = slotDof[2 * i + 1];
    const ax = slotDir[4 * i], ay = slotDir[4 * i + 1], bx = slotDir[4 * i + 2], by = slotDir[4 * i + 3];
    for (let c = 0, lo = 0; c < combos; c++, lo += n2) {
      const fx = loads[lo + 2 * i], fy = loads[lo + 2 * i + 1];
      if (d0 >= 0) rhs[d0 * combos + c] = fx * ax + fy * ay;
      if (d1 >= 0) rhs[d1 * combos + c] = fx * bx + fy * by;
    }
  }
  solveBandLdltMulti(shape, band, invD, rhs, combos);
  // Joint displacements from the dof values, every combination per joint.
  for (let i = 0; i < nJ; i++) {
    const d0 = slotDof[2 * i], d1 = slotDof[2 * i + 1];
    const ax = slotDir[4 * i], ay = slotDir[4 * i + 1], bx = slotDir[4 * i + 2], by = slotDir[4 * i + 3];
    for (let c = 0, lo = 0; c < combos; c++, lo += n2) {
      const u0 = d0 >= 0 ? rhs[d0 * combos + c] : 0;
      const u1 = d1 >= 0 ? rhs[d1 * combos + c] : 0;
      disp[lo + 2 * i] = u0 * ax + u1 * bx;
      disp[lo + 2 * i + 1] = u0 * ay + u1 * by;
    }
  }
  // Member forces N = EA/L · e·(u_b − u_a), every combination per member.
  for (let e = 0; e < nM; e++) {
    const a2 = 2 * from[e], b2 = 2 * to[e];
    const k = stiff[e], ce = cosT[e], se = sinT[e];
    for (let c = 0, lo = 0; c < combos; c++, lo += n2) {
      forces[c * nM + e] = k * (ce * (disp[lo + b2] - disp[lo + a2]) + se * (disp[lo + b2 + 1] - disp[lo + a2 + 1]));
    }
  }
  if (p.withReactions) for (let c = 0; c < combos; c++) reactions(p, c, loads);
}

/** Reactions of combination `cmb`: load + member forces + reaction = 0 at each supported joint. */
function reactions(p: Plan, cmb: number, loads: Readonly<Float64Array>): void {
  const { nJ, nM, ns, supports, cosT, sinT, forces, react } = p;
  const lo = cmb * 2 * nJ;
  const fo = cmb * nM;
  const ro = cmb * 2 * ns;
  for (let q = 0; q < ns; q++) {
    const i = supports[q].node;
    react[ro + 2 * q] = -loads[lo + 2 * i];
    react[ro + 2 * q + 1] = -loads[lo + 2 * i + 1];
  }
  // Only members that touch a support contribute: pairs (member, support slot, sign) listed once per topology.
  const sm = p.supportMembers;
  for (let k = 0; k < sm.length; k += 3) {
    const N = forces[fo + sm[k]] * sm[k + 2];
    const o = ro + 2 * sm[k + 1];
    react[o] -= N * cosT[sm[k]];
    react[o + 1] -= N * sinT[sm[k]];
  }
}
