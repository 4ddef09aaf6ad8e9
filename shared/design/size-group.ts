/**
 * Sizing one design group: the lightest catalogue section (sorted by area, so by weight) that
 * passes every length class of the group. Sections that cannot pass are skipped by necessary
 * conditions before any buckling strength is computed: area (tension and squash strength), second
 * moments (a buckling strength never exceeds the Euler load π²EI/Lc²) and radii (slenderness limits).
 */
import type { Envelope } from './envelope';
import type { GroupPlan } from './groups';
import type { PreparedDesign } from './prepare';
import type { SizingResult, SizingState } from './size';
import { envelopeUtilisation, passes } from './utilisation';

/** The buffers of one sizer, shared by size.ts and this file. */
export interface Run {
  design: PreparedDesign; plan: GroupPlan; env: Envelope; state: SizingState; result: SizingResult;
  /** Per group: the next choice, and the class that failed last (checked first next time). */
  next: Int32Array; hint: Int32Array;
  /** Check id scratch and length terms per class. */
  chk: Int32Array; terms: Float64Array;
}

/** Keeps round-off from skipping a section that sits exactly on a bound. */
const SLACK = 1 - 1e-12;

/** First index i with v[i] ≥ x in the non-decreasing array v (v.length when none). */
function lowerBound(v: Float64Array, x: number): number {
  let lo = 0, hi = v.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (v[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Whether section s passes every class of group g; starts from the class that failed last. */
function groupPasses(p: Run, g: number, s: number): boolean {
  const { env, design: d, hint } = p;
  const c0 = env.classStart[g], n = env.classStart[g + 1] - c0;
  for (let i = 0; i < n; i++) {
    const k = c0 + ((hint[g] + i) % n);
    if (!passes(d, s, env.clsT[k], env.clsC[k], env.clsLin[k], env.clsLout[k], env.clsTS[k] === 1)) {
      hint[g] = k - c0;
      return false;
    }
  }
  return true;
}

/** The lightest passing section of group g; when none passes, the one with the least utilisation (groupOk 0). */
export function sizeGroup(p: Run, g: number): number {
  const { env, design: d, result: r } = p;
  const cat = d.catalogue, rules = d.rules;
  const euler = rules.bucklingFactor * Math.PI * Math.PI * rules.E;
  let A = 0, Ix = 0, Iy = 0, rx = 0, ry = 0, compressed = false;
  for (let k = env.classStart[g]; k < env.classStart[g + 1]; k++) {
    const T = env.clsT[k], C = env.clsC[k], Lin = env.clsLin[k], Lout = env.clsLout[k];
    A = Math.max(A, T / d.tensionPerArea, C / d.compressionPerArea);
    if (C > 0) {
      compressed = true;
      const li = rules.K * Lin, lo = rules.K * Lout;
      Ix = Math.max(Ix, (C * li * li) / euler);
      Iy = Math.max(Iy, (C * lo * lo) / euler);
      rx = Math.max(rx, li / rules.limitCompression);
      ry = Math.max(ry, lo / rules.limitCompression);
    }
    if (env.clsTS[k]) {
      rx = Math.max(rx, Lin / rules.limitTension);
      ry = Math.max(ry, Lout / rules.limitTension);
    }
  }
  A *= SLACK; Ix *= SLACK; Iy *= SLACK; rx *= SLACK; ry *= SLACK;
  const nS = cat.A.length;
  const from = Math.max(lowerBound(cat.AMax, A), lowerBound(cat.IxMax, Ix), lowerBound(cat.IyMax, Iy));
  for (let s = from; s < nS; s++) {
    if (cat.A[s] < A || cat.Ix[s] < Ix || cat.Iy[s] < Iy || cat.rx[s] < rx || cat.ry[s] < ry) continue;
    if (compressed && d.wallUtil[s] > 1) continue;
    if (groupPasses(p, g, s)) {
      r.groupOk[g] = 1;
      return s;
    }
  }
  r.groupOk[g] = 0;
  let best = nS - 1, bestU = Infinity;
  for (let s = 0; s < nS; s++) {
    let u = 0;
    for (let k = env.classStart[g]; k < env.classStart[g + 1]; k++) {
      u = Math.max(u, envelopeUtilisation(d, s, env.clsT[k], env.clsC[k], env.clsLin[k], env.clsLout[k], env.clsTS[k] === 1, p.terms, p.chk));
    }
    if (u < bestU) { bestU = u; best = s; }
  }
  return best;
}
