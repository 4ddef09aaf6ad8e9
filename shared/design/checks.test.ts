/**
 * Member checks against the published formulas, worked by hand in the comments.
 * Section for all: CHS 114.3 × 6.0 (D = 114.3 mm, t = 6.0 mm, d = D − 2t = 102.3 mm)
 *   A = π(D² − d²)/4 = π(13064.49 − 10465.29)/4 = π·2599.20/4 = 2041.41 mm²
 *   r = √(I/A) = √(D² + d²)/4 = √23529.78/4 = 38.3485 mm
 * AISC material: ASTM A500 Gr. C round, Fy = 46 ksi = 46 × 6.894757 = 317.159 MPa,
 *   Fu = 62 ksi = 427.475 MPa, E = 29,000 ksi = 199,948 MPa; 4.71·√(E/Fy) = 4.71·√630.43 = 118.261.
 * EN material: S355J2H, fy = 355 MPa, fu = 490 MPa, E = 210,000 MPa;
 *   λ1 = π·√(E/fy) = π·√591.549 = π·24.3218 = 76.4091.
 */
import { describe, expect, it } from 'vitest';
import { aiscFcr, checkMember, enChi } from './checks';
import { CHECK } from './check-names';
import { materialFrom } from './materials';
import { designRules } from './rules';
import { readSection } from './sections';

const a500 = materialFrom('a500-c-round', 'material').material!;
const s355h = materialFrom('s355j2h', 'material').material!;
const lrfd = designRules('aisc360-16-lrfd', a500);
const asd = designRules('aisc360-16-asd', a500);
const en = designRules('en1993-1-1', s355h);
const chs = readSection({ shape: 'chs', D: 114.3, t: 6 }, 's').section!;
const both = (L: number) => ({ inPlane: L, outOfPlane: L });
const rel = (got: number, want: number, tol = 2e-5) => expect(Math.abs(got / want - 1)).toBeLessThan(tol);

describe('AISC 360-16 §E3 flexural buckling, CHS 114.3×6.0, A500 Gr. C', () => {
  it('Lc = 1.0 m: stocky, Fy/Fe small (§E3 eq. E3-2)', () => {
    // Lc/r = 1000/38.3485 = 26.0766 ≤ 118.261 → eq. (E3-2).
    // Fe = π²E/(Lc/r)² = 9.86960 × 199948 / 679.989 = 2902.11 MPa; Fy/Fe = 317.159/2902.11 = 0.109285
    // Fcr = 0.658^0.109285 × 317.159 = 0.955289 × 317.159 = 302.978 MPa
    // φcPn = 0.90 × 302.978 × 2041.41 / 1000 = 556.65 kN
    rel(aiscFcr(a500.Fy, a500.E, 26.0766) / 1000, 302.978, 5e-5);
    const c = checkMember(lrfd, chs, -300, both(1.0));
    rel(c.slenderness, 26.0766);
    rel(c.capacity, 556.65);
    rel(c.utilisation, 300 / 556.65);
    expect(c.check).toBe(CHECK.bucklingIn);
    expect(c.name).toContain('§E3');
  });

  it('Lc = 3.5 m: inelastic (§E3 eq. E3-2), LRFD and ASD', () => {
    // Lc/r = 3500/38.3485 = 91.2681 ≤ 118.261 → eq. (E3-2).
    // Fe = 9.86960 × 199948 / 8329.87 = 236.907 MPa; Fy/Fe = 317.159/236.907 = 1.33875
    // Fcr = 0.658^1.33875 × 317.159 = 0.571019 × 317.159 = 181.104 MPa
    // Pn = 181.104 × 2041.41 / 1000 = 369.706 kN; φcPn = 0.90 × 369.706 = 332.74 kN; Pn/Ωc = 369.706/1.67 = 221.38 kN
    const c = checkMember(lrfd, chs, -200, both(3.5));
    rel(c.slenderness, 91.2681);
    rel(c.capacity, 332.74);
    rel(checkMember(asd, chs, -200, both(3.5)).capacity, 221.38);
  });

  it('Lc = 5.5 m: elastic, Lc/r > 4.71√(E/Fy) (§E3 eq. E3-3)', () => {
    // Lc/r = 5500/38.3485 = 143.421 > 118.261 → eq. (E3-3).
    // Fe = 9.86960 × 199948 / 20569.7 = 95.9377 MPa; Fcr = 0.877 × 95.9377 = 84.1374 MPa
    // φcPn = 0.90 × 84.1374 × 2041.41 / 1000 = 154.58 kN
    // N = −140 kN: 140/154.58 = 0.906 is above the slenderness ratio 143.421/200 = 0.717, so buckling governs.
    const c = checkMember(lrfd, chs, -140, both(5.5));
    rel(c.slenderness, 143.421);
    rel(c.capacity, 154.58);
    rel(c.utilisation, 140 / 154.58);
    expect(c.check).toBe(CHECK.bucklingIn);
  });

  it('the two regimes meet at Lc/r = 4.71√(E/Fy) (Fy/Fe = 2.25: 0.658^2.25 ≈ 0.390 ≈ 0.877/2.25)', () => {
    const lim = lrfd.inelasticLimit;
    const below = aiscFcr(a500.Fy, a500.E, lim * (1 - 1e-9));
    const above = aiscFcr(a500.Fy, a500.E, lim * (1 + 1e-9));
    expect(Math.abs(below / above - 1)).toBeLessThan(2e-3);
  });
});

describe('EN 1993-1-1 §6.3.1 flexural buckling, same CHS, S355J2H, curve a (α = 0.21)', () => {
  it('L = 1.0 m', () => {
    // λ̄ = 26.0766/76.4091 = 0.341276 (= √(A·fy/Ncr), Ncr = π²EI/L² = 6222.24 kN)
    // Φ = 0.5[1 + 0.21(0.341276 − 0.2) + 0.341276²] = 0.5[1 + 0.029668 + 0.116469] = 0.573069
    // χ = 1/(0.573069 + √(0.328408 − 0.116469)) = 1/(0.573069 + 0.460368) = 0.967646
    // Nb,Rd = 0.967646 × 2041.41 × 355 / 1.0 / 1000 = 701.25 kN
    rel(enChi(0.341276, 0.21), 0.967646);
    rel(checkMember(en, chs, -500, both(1.0)).capacity, 701.25);
  });

  it('L = 3.5 m', () => {
    // λ̄ = 91.2681/76.4091 = 1.194466; Φ = 0.5[1 + 0.21 × 0.994466 + 1.426749] = 1.317793
    // χ = 1/(1.317793 + √(1.736579 − 1.426749)) = 1/(1.317793 + 0.556624) = 0.533499
    // Nb,Rd = 0.533499 × 2041.41 × 355 / 1000 = 386.63 kN
    rel(checkMember(en, chs, -300, both(3.5)).capacity, 386.63);
  });

  it('L = 5.5 m', () => {
    // λ̄ = 143.421/76.4091 = 1.877018; Φ = 0.5[1 + 0.21 × 1.677018 + 3.523196] = 2.437685
    // χ = 1/(2.437685 + √(5.942308 − 3.523196)) = 1/(2.437685 + 1.555349) = 0.250436
    // Nb,Rd = 0.250436 × 2041.41 × 355 / 1000 = 181.49 kN
    const c = checkMember(en, chs, -150, both(5.5));
    rel(c.capacity, 181.49);
    rel(c.utilisation, 150 / 181.49);
    expect(c.name).toContain('§6.3.1');
  });

  it('λ̄ ≤ 0.2 gives χ = 1 (§6.3.1.2(4)) and the cross-section check §6.2.4 takes over', () => {
    expect(enChi(0.2, 0.21)).toBeCloseTo(1, 12);
    expect(enChi(0.1, 0.76)).toBe(1);
    // L = 0.2 m: λ̄ = (200/38.3485)/76.4091 = 0.0683, so χ = 1. With γM0 = 1.1 and γM1 = 1.0 the
    // cross-section resistance Nc,Rd = A·fy/γM0 = 2041.41 × 355/1.1/1000 = 658.82 kN is below
    // Nb,Rd = χ·A·fy/γM1 = 724.70 kN and governs.
    const c = checkMember(designRules('en1993-1-1', s355h, { gammaM0: 1.1 }), chs, -100, both(0.2));
    rel(c.capacity, 658.82);
    expect(c.check).toBe(CHECK.sectionCompression);
    expect(c.name).toContain('§6.2.4');
  });

  it('α by curve (Table 6.1): a0 0.13, b 0.34, c 0.49, d 0.76 lower χ in order at λ̄ = 1', () => {
    const chis = [0.13, 0.21, 0.34, 0.49, 0.76].map((a) => enChi(1, a));
    for (let i = 1; i < chis.length; i++) expect(chis[i]).toBeLessThan(chis[i - 1]);
    // curve b at λ̄ = 1: Φ = 0.5[1 + 0.34 × 0.8 + 1] = 1.136; χ = 1/(1.136 + √(1.290496 − 1)) = 1/1.674978 = 0.597023
    rel(enChi(1, 0.34), 0.597023, 1e-6);
  });
});

describe('tension: AISC 360-16 §D2 and EN 1993-1-1 §6.2.3', () => {
  it('rupture on Ae = 0.85·Ag governs A500 Gr. C (§D2(b))', () => {
    // yielding: φtFyAg = 0.90 × 317.159 × 2041.41 = 582.71 kN; rupture: φtFuAe = 0.75 × 427.475 × 0.85 × 2041.41 = 556.31 kN
    const c = checkMember(lrfd, chs, 500, both(3));
    expect(c.check).toBe(CHECK.tensionRupture);
    rel(c.capacity, 556.31);
    rel(c.checks.find((l) => l.id === CHECK.tensionYield)!.capacity!, 582.71);
    // ASD: Pn/Ωt = 317.159 × 2041.41 / 1.67 = 387.69 kN; Fu·Ae/2.00 = 427.475 × 0.85 × 2041.41 / 2 = 370.88 kN
    rel(checkMember(asd, chs, 300, both(3)).capacity, 370.88);
  });

  it('with Ae = Ag yielding governs (§D2(a))', () => {
    const c = checkMember(designRules('aisc360-16-lrfd', a500, { netAreaFactor: 1 }), chs, 500, both(3));
    expect(c.check).toBe(CHECK.tensionYield);
    rel(c.capacity, 582.71);
  });

  it('EN: Nu,Rd = 0.9·Anet·fu/γM2 = 0.9 × 0.85 × 2041.41 × 490/1.25 = 612.18 kN < Npl,Rd = 724.70 kN', () => {
    const c = checkMember(en, chs, 600, both(3));
    expect(c.check).toBe(CHECK.tensionRupture);
    rel(c.capacity, 612.18);
    expect(c.name).toContain('§6.2.3');
  });
});

describe('slenderness limits and both axes', () => {
  it('compression Lc/r ≤ 200 (§E2 user note) and tension L/r ≤ 300 (§D1 user note)', () => {
    // Lc = 200 × 38.3485 mm = 7.6697 m sits on the limit; 1 % longer fails it.
    const at = 0.2 * 38.34855;
    expect(checkMember(lrfd, chs, -1, both(at * 1.01)).check).toBe(CHECK.slenderCompression);
    rel(checkMember(lrfd, chs, -1, both(at)).checks.find((l) => l.id === CHECK.slenderCompression)!.utilisation, 1, 1e-6);
    const t = checkMember(lrfd, chs, 1, both(0.3 * 38.34855 * 1.01));
    expect(t.check).toBe(CHECK.slenderTension);
    rel(t.utilisation, 1.01, 1e-6);
    // A zero-force member takes the tension limit.
    expect(checkMember(lrfd, chs, 0, both(10)).check).toBe(CHECK.slenderTension);
  });

  it('the larger of K·Lin/rx and K·Lout/ry governs (RHS 200×100×8: H in the truss plane)', () => {
    // rx = √(Ix/A), Ix = (100·200³ − 84·184³)/12 from outer minus inner rectangles; ry likewise with sides swapped.
    const rhs = readSection({ shape: 'rhs', H: 200, B: 100, t: 8 }, 's').section!;
    const Ix = (100 * 200 ** 3 - 84 * 184 ** 3) / 12, Iy = (200 * 100 ** 3 - 184 * 84 ** 3) / 12, A = 200 * 100 - 184 * 84;
    rel(rhs.rx, Math.sqrt(Ix / A) / 1000, 1e-12);
    rel(rhs.ry, Math.sqrt(Iy / A) / 1000, 1e-12);
    const inPlane = checkMember(lrfd, rhs, -100, { inPlane: 4, outOfPlane: 4 });
    expect(inPlane.axis).toBe('out-of-plane'); // ry < rx
    const braced = checkMember(lrfd, rhs, -100, { inPlane: 4, outOfPlane: 1 });
    expect(braced.axis).toBe('in-plane');
    rel(braced.slenderness, 4 / rhs.rx);
    // K = 0.9 shortens both: Lc = 0.9 × 4 m.
    rel(checkMember(designRules('aisc360-16-lrfd', a500, { K: 0.9 }), rhs, -100, { inPlane: 4, outOfPlane: 1 }).slenderness, (0.9 * 4) / rhs.rx);
  });

  it('a slender wall fails in compression (AISC Table B4.1a: D/t > 0.11·E/Fy = 69.35)', () => {
    const thin = readSection({ shape: 'chs', D: 400, t: 5 }, 's').section!; // D/t = 80
    const c = checkMember(lrfd, thin, -10, both(1));
    expect(c.check).toBe(CHECK.wall);
    rel(c.utilisation, 80 / ((0.11 * a500.E) / a500.Fy), 1e-9);
    expect(checkMember(lrfd, thin, 10, both(1)).utilisation).toBeLessThan(1);
  });
});
