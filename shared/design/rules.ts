/**
 * The numbers a design code contributes to a member check, resolved once per design spec:
 * resistance factors (AISC φ or 1/Ω; EN 1/γM), slenderness limits, wall limits, buckling curve.
 * Stresses in kN/m².
 */
import type { BucklingCurve, DesignCode } from '../schemas/design';
import type { ResolvedMaterial } from './materials';
import type { ShapeKind } from './sections';

/** EN 1993-1-1 Table 6.1 imperfection factors α. */
export const CURVE_ALPHA: Readonly<Record<BucklingCurve, number>> = { a0: 0.13, a: 0.21, b: 0.34, c: 0.49, d: 0.76 };

/** Everything a member check needs besides the section and the force. */
export interface DesignRules {
  readonly code: DesignCode;
  /** Yield and tensile strength, elastic modulus, kN/m². */
  readonly Fy: number;
  readonly Fu: number;
  readonly E: number;
  /** Effective length factor. */
  readonly K: number;
  /** Ae/Ag (AISC) or Anet/A (EN). */
  readonly netAreaFactor: number;
  /** Largest K·L/r in compression and L/r in tension. */
  readonly limitCompression: number;
  readonly limitTension: number;
  /** Design strength = factor × nominal strength: yielding, rupture, buckling, cross-section compression (0: not a check of this code). */
  readonly yieldFactor: number;
  readonly ruptureFactor: number;
  readonly bucklingFactor: number;
  readonly sectionFactor: number;
  /** AISC §E3: 4.71·√(E/Fy), the slenderness where Fcr turns elastic. */
  readonly inelasticLimit: number;
  /** EN §6.3.1.3: λ1 = π·√(E/fy). */
  readonly lambda1: number;
  /** Fixed buckling curve (EN), or undefined to choose by shape. */
  readonly curve?: BucklingCurve;
  /** Largest wall ratio of a compression member: round (D/t) and flat walls (b/t). */
  readonly wallLimitRound: number;
  readonly wallLimitFlat: number;
}

/** Options of the design spec that shape the rules. */
export interface RuleOptions {
  K?: number;
  netAreaFactor?: number;
  slenderness?: { compression?: number; tension?: number };
  curve?: BucklingCurve;
  gammaM0?: number;
  gammaM1?: number;
  gammaM2?: number;
}

/**
 * Resolve the rules of one code for one material.
 * AISC 360-16: φt = 0.90 / Ωt = 1.67 (§D2(a)), φt = 0.75 / Ωt = 2.00 (§D2(b)), φc = 0.90 / Ωc = 1.67
 * (§E1); walls: round HSS λr = 0.11·E/Fy, rectangular HSS walls λr = 1.40·√(E/Fy) (Table B4.1a,
 * from memory). EN 1993-1-1: γM0 = 1.0, γM1 = 1.0, γM2 = 1.25 recommended (§6.1 note 2B); walls:
 * class 3 limits of Table 5.2, tubes d/t ≤ 90ε², internal parts c/t ≤ 42ε, ε = √(235/fy) (from
 * memory). Slenderness limits 200 and 300 default for both codes (AISC §E2 and §D1 user notes;
 * for EN a project choice).
 */
export function designRules(code: DesignCode, m: ResolvedMaterial, o: RuleOptions = {}): DesignRules {
  const { Fy, Fu, E } = m;
  const common = {
    code, Fy, Fu, E,
    K: o.K ?? 1.0,
    netAreaFactor: o.netAreaFactor ?? 0.85,
    limitCompression: o.slenderness?.compression ?? 200,
    limitTension: o.slenderness?.tension ?? 300,
    inelasticLimit: 4.71 * Math.sqrt(E / Fy),
    lambda1: Math.PI * Math.sqrt(E / Fy),
  };
  if (code === 'en1993-1-1') {
    const g0 = o.gammaM0 ?? 1.0, g1 = o.gammaM1 ?? 1.0, g2 = o.gammaM2 ?? 1.25;
    const eps = Math.sqrt(235 / (Fy / 1000));
    return {
      ...common, yieldFactor: 1 / g0, ruptureFactor: 0.9 / g2, bucklingFactor: 1 / g1, sectionFactor: 1 / g0,
      curve: o.curve, wallLimitRound: 90 * eps * eps, wallLimitFlat: 42 * eps,
    };
  }
  const lrfd = code === 'aisc360-16-lrfd';
  return {
    ...common,
    yieldFactor: lrfd ? 0.9 : 1 / 1.67,
    ruptureFactor: lrfd ? 0.75 : 1 / 2.0,
    bucklingFactor: lrfd ? 0.9 : 1 / 1.67,
    sectionFactor: 0,
    wallLimitRound: (0.11 * E) / Fy,
    wallLimitFlat: 1.4 * Math.sqrt(E / Fy),
  };
}

/**
 * Imperfection factor α for a shape under EN 1993-1-1: the spec's curve, else curve a for hollow
 * sections taken as hot-finished (Table 6.2) and curve c for rods and given sections (solid bars are
 * not listed in Table 6.2: curve c is common practice; from memory). AISC rules return 0 (unused).
 */
export function alphaFor(r: DesignRules, shape: ShapeKind): number {
  if (r.code !== 'en1993-1-1') return 0;
  if (r.curve) return CURVE_ALPHA[r.curve];
  return shape === 'rod' || shape === 'given' ? CURVE_ALPHA.c : CURVE_ALPHA.a;
}

/** Wall ratio over its limit (> 1: slender wall, local buckling not covered); 0 for rod and given. */
export function wallUtilisation(r: DesignRules, shape: ShapeKind, wallRatio: number): number {
  if (shape === 'chs') return wallRatio / r.wallLimitRound;
  if (shape === 'shs' || shape === 'rhs') return wallRatio / r.wallLimitFlat;
  return 0;
}
