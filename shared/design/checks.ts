/**
 * Axial member checks of AISC 360-16 (Chapters D and E) and EN 1993-1-1 (§6.2.3, §6.2.4, §6.3.1)
 * for one member and one axial force. Forces kN (tension +), lengths m, stresses kN/m², areas m².
 */
import type { DesignRules } from './rules';
import { alphaFor, wallUtilisation } from './rules';
import type { SectionProps } from './sections';
import { CHECK, checkName, type CheckId } from './check-names';

const LN_0658 = Math.log(0.658);

/**
 * AISC 360-16 §E3 critical stress, kN/m²: Fe = π²E/(Lc/r)²; Lc/r ≤ 4.71√(E/Fy): Fcr = 0.658^(Fy/Fe)·Fy,
 * else Fcr = 0.877·Fe. @param slenderness - Lc/r
 * @param limit - 4.71·√(E/Fy), passed by callers that have it (DesignRules.inelasticLimit)
 */
export function aiscFcr(Fy: number, E: number, slenderness: number, limit = 4.71 * Math.sqrt(E / Fy)): number {
  const Fe = (Math.PI * Math.PI * E) / (slenderness * slenderness);
  return slenderness <= limit ? Math.exp((LN_0658 * Fy) / Fe) * Fy : 0.877 * Fe;
}

/**
 * EN 1993-1-1 §6.3.1.2 reduction factor: Φ = 0.5[1 + α(λ̄ − 0.2) + λ̄²], χ = 1/(Φ + √(Φ² − λ̄²)) ≤ 1.
 * @param lambdaBar - non-dimensional slenderness λ̄ = √(A·fy/Ncr)
 */
export function enChi(lambdaBar: number, alpha: number): number {
  const phi = 0.5 * (1 + alpha * (lambdaBar - 0.2) + lambdaBar * lambdaBar);
  const chi = 1 / (phi + Math.sqrt(phi * phi - lambdaBar * lambdaBar));
  return chi < 1 ? chi : 1;
}

/** Design tension strength of gross area A (m²), kN, and which check sets it (yield or rupture). */
export function tensionCapacity(r: DesignRules, A: number): { capacity: number; check: CheckId } {
  const yieldCap = r.yieldFactor * r.Fy * A;
  const ruptureCap = r.ruptureFactor * r.Fu * r.netAreaFactor * A;
  return ruptureCap < yieldCap ? { capacity: ruptureCap, check: CHECK.tensionRupture } : { capacity: yieldCap, check: CHECK.tensionYield };
}

/** Compressive design strength, kN, of area A (m²) at governing slenderness λ = K·L/r, with α (EN). */
export function compressionCapacity(r: DesignRules, A: number, lambda: number, alpha: number): number {
  if (r.code !== 'en1993-1-1') return r.bucklingFactor * aiscFcr(r.Fy, r.E, lambda, r.inelasticLimit) * A;
  const buckling = r.bucklingFactor * enChi(lambda / r.lambda1, alpha) * A * r.Fy;
  const section = r.sectionFactor * A * r.Fy;
  return buckling < section ? buckling : section;
}

/** Unbraced lengths of one member, m: for buckling in the truss plane and out of it. */
export interface MemberLengths {
  readonly inPlane: number;
  readonly outOfPlane: number;
}

/** One check of a member. */
export interface CheckLine {
  readonly id: CheckId;
  /** Check and clause, e.g. "tension yielding, AISC 360-16 §D2(a)". */
  readonly name: string;
  /** Demand over capacity (or slenderness over its limit). */
  readonly utilisation: number;
  /** Design strength, kN (φPn, Pn/Ω or N_Rd); undefined for limits that are not strengths. */
  readonly capacity?: number;
}

/** The outcome of checking one member under one force. */
export interface MemberCheck {
  /** Largest utilisation over the checks; ≤ 1 passes. */
  readonly utilisation: number;
  readonly check: CheckId;
  readonly name: string;
  /** Design strength in the force's sense, kN (tension or compression); 0 for a zero force. */
  readonly capacity: number;
  /** Governing slenderness: K·L/r in compression, L/r in tension or at zero force. */
  readonly slenderness: number;
  /** The axis with the larger slenderness. */
  readonly axis: 'in-plane' | 'out-of-plane';
  readonly checks: readonly CheckLine[];
}

/**
 * Check one member: tension (N > 0) by yielding and rupture plus the tension slenderness limit;
 * compression (N < 0) by flexural buckling about both axes (the larger slenderness governs), the
 * cross-section (EN §6.2.4), the compression slenderness limit and the wall slenderness (a slender
 * wall is outside these checks: its ratio over the limit, > 1, then governs; below 1 it is listed only). A zero force gets the tension slenderness limit.
 * @param N - axial force, kN, tension positive; @param L - unbraced lengths, m (K applied here)
 */
export function checkMember(r: DesignRules, s: SectionProps, N: number, L: MemberLengths): MemberCheck {
  const lines: CheckLine[] = [];
  const add = (id: CheckId, utilisation: number, capacity?: number) => lines.push({ id, name: checkName(r.code, id), utilisation, capacity });
  let slenderness: number, axis: MemberCheck['axis'], capacity = 0;
  if (N >= 0) {
    const lin = L.inPlane / s.rx, lout = L.outOfPlane / s.ry;
    slenderness = Math.max(lin, lout);
    axis = lin >= lout ? 'in-plane' : 'out-of-plane';
    if (N > 0) {
      const yieldCap = r.yieldFactor * r.Fy * s.A;
      const ruptureCap = r.ruptureFactor * r.Fu * r.netAreaFactor * s.A;
      add(CHECK.tensionYield, N / yieldCap, yieldCap);
      add(CHECK.tensionRupture, N / ruptureCap, ruptureCap);
      capacity = Math.min(yieldCap, ruptureCap);
    }
    add(CHECK.slenderTension, slenderness / r.limitTension);
  } else {
    const C = -N;
    const lin = r.K * (L.inPlane / s.rx), lout = r.K * (L.outOfPlane / s.ry);
    slenderness = Math.max(lin, lout);
    axis = lin >= lout ? 'in-plane' : 'out-of-plane';
    const alpha = alphaFor(r, s.shape);
    const buck = (lambda: number) =>
      r.code === 'en1993-1-1'
        ? r.bucklingFactor * enChi(lambda / r.lambda1, alpha) * s.A * r.Fy
        : r.bucklingFactor * aiscFcr(r.Fy, r.E, lambda, r.inelasticLimit) * s.A;
    const capIn = buck(lin), capOut = buck(lout);
    // The axis of larger slenderness first, so it is named when both strengths are equal (χ = 1).
    if (axis === 'in-plane') {
      add(CHECK.bucklingIn, C / capIn, capIn);
      add(CHECK.bucklingOut, C / capOut, capOut);
    } else {
      add(CHECK.bucklingOut, C / capOut, capOut);
      add(CHECK.bucklingIn, C / capIn, capIn);
    }
    capacity = Math.min(capIn, capOut);
    if (r.sectionFactor > 0) {
      const capSec = r.sectionFactor * s.A * r.Fy;
      add(CHECK.sectionCompression, C / capSec, capSec);
      capacity = Math.min(capacity, capSec);
    }
    add(CHECK.slenderCompression, slenderness / r.limitCompression);
    if (s.shape !== 'rod' && s.shape !== 'given') add(CHECK.wall, wallUtilisation(r, s.shape, s.wallRatio));
  }
  // The wall ratio only says whether these checks apply: it governs only when it rules them out.
  let gov = lines[0];
  for (const l of lines) if (l.utilisation > gov.utilisation && (l.id !== CHECK.wall || l.utilisation > 1)) gov = l;
  return { utilisation: gov.utilisation, check: gov.id, name: gov.name, capacity, slenderness, axis, checks: lines };
}
