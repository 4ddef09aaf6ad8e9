/**
 * Force envelopes for sizing: per member the largest tension and compression over the
 * combinations (kN, both ≥ 0) and where they occur; per design group, "length classes" of members
 * with the same unbraced lengths (m), whose envelope is checked once instead of per member.
 */
import type { GroupPlan } from './groups';

/** Preallocated envelope buffers for one topology. */
export interface Envelope {
  /** Per member: largest tension and compression, kN (≥ 0), and their combination (−1: none). */
  readonly T: Float64Array;
  readonly C: Float64Array;
  readonly Tc: Int32Array;
  readonly Cc: Int32Array;
  /** Per member: unbraced lengths in and out of the truss plane, m. */
  readonly Lin: Float64Array;
  readonly Lout: Float64Array;
  /** Per member: its length class. Classes of group g: classStart[g] .. classStart[g + 1] − 1. */
  readonly classOf: Int32Array;
  readonly classStart: Int32Array;
  /** Per class: envelope forces, kN, and the (largest) unbraced lengths of its members, m. */
  readonly clsT: Float64Array;
  readonly clsC: Float64Array;
  readonly clsLin: Float64Array;
  readonly clsLout: Float64Array;
  /** Per class: 1 when a member of it is in tension or carries no force (the tension slenderness limit applies). */
  readonly clsTS: Uint8Array;
}

/** Buffers for nM members in nG design groups. */
export function createEnvelope(nM: number, nG: number): Envelope {
  const f = () => new Float64Array(nM);
  return {
    T: f(), C: f(), Tc: new Int32Array(nM), Cc: new Int32Array(nM), Lin: f(), Lout: f(),
    classOf: new Int32Array(nM), classStart: new Int32Array(nG + 1), clsT: f(), clsC: f(), clsLin: f(), clsLout: f(), clsTS: new Uint8Array(nM),
  };
}

/** Lengths within this relative tolerance share a class (the class takes the larger). */
const SAME = 1e-9;

/**
 * Unbraced lengths per member (the plan's fixed lengths, else the member length) and the length
 * classes of each group. @param length - member lengths, m
 */
export function buildClasses(env: Envelope, plan: GroupPlan, length: Readonly<Float64Array>): void {
  const { Lin, Lout, classOf, classStart, clsLin, clsLout } = env;
  const { start, order, inPlane, outOfPlane } = plan;
  const nG = plan.names.length;
  let k = 0;
  for (let g = 0; g < nG; g++) {
    const k0 = k;
    classStart[g] = k0;
    for (let i = start[g]; i < start[g + 1]; i++) {
      const e = order[i];
      const fi = inPlane[e], fo = outOfPlane[e];
      // NaN (no fixed length) fails the comparison: the member's own length.
      const li = fi >= 0 ? fi : length[e];
      const lo = fo >= 0 ? fo : length[e];
      Lin[e] = li;
      Lout[e] = lo;
      let c = k0;
      while (c < k && !(Math.abs(clsLin[c] - li) <= SAME * li && Math.abs(clsLout[c] - lo) <= SAME * lo)) c++;
      if (c === k) {
        clsLin[k] = li;
        clsLout[k] = lo;
        k++;
      } else {
        if (li > clsLin[c]) clsLin[c] = li;
        if (lo > clsLout[c]) clsLout[c] = lo;
      }
      classOf[e] = c;
    }
  }
  classStart[nG] = k;
}

/** Forces within this fraction of the largest |force| of an analysis count as zero. */
export const ZERO_FORCE_RATIO = 1e-9;

/**
 * Envelope of each member over `combos` combinations of `forces` ([c · nM + e], kN). Forces within
 * ZERO_FORCE_RATIO of the largest |force| count as zero, so round-off does not turn a zero-force
 * member into a compression member.
 */
export function memberEnvelope(env: Envelope, forces: Readonly<Float64Array>, combos: number): void {
  const { T, C, Tc, Cc } = env;
  const nM = T.length;
  let peak = 0;
  for (let i = 0; i < combos * nM; i++) {
    const a = Math.abs(forces[i]);
    if (a > peak) peak = a;
  }
  const zero = ZERO_FORCE_RATIO * peak;
  T.fill(0);
  C.fill(0);
  Tc.fill(-1);
  Cc.fill(-1);
  for (let c = 0; c < combos; c++) {
    const o = c * nM;
    for (let e = 0; e < nM; e++) {
      const N = forces[o + e];
      if (N > zero && N > T[e]) { T[e] = N; Tc[e] = c; }
      else if (N < -zero && -N > C[e]) { C[e] = -N; Cc[e] = c; }
    }
  }
}

/** Envelope per class: the largest member tension and compression in it, and the tension slenderness flag. */
export function classEnvelope(env: Envelope): void {
  const { T, C, classOf, clsT, clsC, clsTS, classStart } = env;
  const nK = classStart[classStart.length - 1];
  clsT.fill(0, 0, nK);
  clsC.fill(0, 0, nK);
  clsTS.fill(0, 0, nK);
  for (let e = 0; e < T.length; e++) {
    const k = classOf[e];
    if (T[e] > clsT[k]) clsT[k] = T[e];
    if (C[e] > clsC[k]) clsC[k] = C[e];
    if (T[e] > 0 || C[e] <= 0) clsTS[k] = 1;
  }
}
