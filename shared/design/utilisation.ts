/**
 * The sizing loop's member checks: the same checks as `checkMember` (checks.ts) for the envelope
 * of a member (largest tension T and compression C over the combinations, kN, both ≥ 0) on a
 * catalogue section by index, without allocating. Lengths m.
 */
import { aiscFcr, enChi } from './checks';
import { CHECK } from './check-names';
import type { PreparedDesign } from './prepare';

/** Slots of the `terms` buffer filled by `lengthTerms`. */
const CAP = 0, CAP_CHECK = 1, SLENDER_T = 2, SLENDER_C = 3;
/** Length of a `terms` buffer. */
export const TERMS = 4;

/**
 * What depends on the section and the lengths only: compressive design strength (kN) and its check
 * id, tension slenderness over its limit, compression slenderness over its limit; written at `o`.
 * @param Lin - unbraced length in the truss plane, m; @param Lout - out of the plane, m
 */
export function lengthTerms(d: PreparedDesign, s: number, Lin: number, Lout: number, terms: Float64Array, o: number): void {
  const r = d.rules;
  const rx = d.catalogue.rx[s], ry = d.catalogue.ry[s], A = d.catalogue.A[s];
  const ti = Lin / rx, to = Lout / ry;
  terms[o + SLENDER_T] = (ti >= to ? ti : to) / r.limitTension;
  const li = r.K * ti, lo = r.K * to;
  const inPlane = li >= lo;
  const lam = inPlane ? li : lo;
  terms[o + SLENDER_C] = lam / r.limitCompression;
  let cap: number;
  let capChk: number = inPlane ? CHECK.bucklingIn : CHECK.bucklingOut;
  if (r.code === 'en1993-1-1') {
    cap = r.bucklingFactor * enChi(lam / r.lambda1, d.alpha[s]) * A * r.Fy;
    const sec = r.sectionFactor * A * r.Fy;
    if (sec < cap) { cap = sec; capChk = CHECK.sectionCompression; }
  } else {
    cap = r.bucklingFactor * aiscFcr(r.Fy, r.E, lam, r.inelasticLimit) * A;
  }
  terms[o + CAP] = cap;
  terms[o + CAP_CHECK] = capChk;
}

/**
 * Largest utilisation of section s for envelope forces T and C, given its `lengthTerms` at `o`.
 * @param tensionSlender - apply the tension slenderness limit: the member (or one of a class) is in
 *   tension or carries no force; a single member passes `T > 0 || C <= 0`
 * @param out - out[0] receives the governing check id (CHECK.*)
 */
export function combineTerms(d: PreparedDesign, s: number, T: number, C: number, tensionSlender: boolean, terms: Float64Array, o: number, out: Int32Array): number {
  let u = 0;
  let chk: number = CHECK.none;
  if (T > 0) {
    const ut = T / d.tensionCap[s];
    if (ut > u) { u = ut; chk = d.tensionCheck[s]; }
  }
  if (tensionSlender && terms[o + SLENDER_T] > u) { u = terms[o + SLENDER_T]; chk = CHECK.slenderTension; }
  if (C > 0) {
    const uc = C / terms[o + CAP];
    if (uc > u) { u = uc; chk = terms[o + CAP_CHECK]; }
    if (terms[o + SLENDER_C] > u) { u = terms[o + SLENDER_C]; chk = CHECK.slenderCompression; }
    // The wall ratio only says whether these checks apply: it governs only when it rules them out.
    const uw = d.wallUtil[s];
    if (uw > 1 && uw > u) { u = uw; chk = CHECK.wall; }
  }
  out[0] = chk;
  return u;
}

/** `lengthTerms` then `combineTerms` for one member or class. @returns the utilisation (≤ 1 passes) */
export function envelopeUtilisation(
  d: PreparedDesign, s: number, T: number, C: number, Lin: number, Lout: number, tensionSlender: boolean, terms: Float64Array, out: Int32Array,
): number {
  lengthTerms(d, s, Lin, Lout, terms, 0);
  return combineTerms(d, s, T, C, tensionSlender, terms, 0, out);
}

/** Whether section s passes every check for T and C: the cheap checks first, the buckling strength last. */
export function passes(d: PreparedDesign, s: number, T: number, C: number, Lin: number, Lout: number, tensionSlender: boolean): boolean {
  const r = d.rules, cat = d.catalogue;
  if (T > 0 && T > d.tensionCap[s]) return false;
  const ti = Lin / cat.rx[s], to = Lout / cat.ry[s];
  const t = ti >= to ? ti : to;
  if (tensionSlender && t > r.limitTension) return false;
  if (C <= 0) return true;
  if (d.wallUtil[s] > 1) return false;
  const lam = r.K * t;
  if (lam > r.limitCompression) return false;
  const A = cat.A[s];
  if (r.code === 'en1993-1-1') {
    if (C > r.sectionFactor * A * r.Fy) return false;
    return C <= r.bucklingFactor * enChi(lam / r.lambda1, d.alpha[s]) * A * r.Fy;
  }
  return C <= r.bucklingFactor * aiscFcr(r.Fy, r.E, lam, r.inelasticLimit) * A;
}
