/**
 * The sizing loop's allocation-free checks agree with `checkMember` (the published formulas, see
 * checks.test.ts), and the bound sizing skips sections by holds: a column strength never exceeds
 * the Euler load (AISC 360-16 §E3: Fcr ≤ 0.878·Fe in both regimes; EN 1993-1-1 §6.3.1: χ·λ̄² ≤ 1).
 */
import { describe, expect, it } from 'vitest';
import { aiscFcr, checkMember, compressionCapacity, enChi } from './checks';
import { CURVE_ALPHA } from './rules';
import { prepareDesign } from './prepare';
import { envelopeUtilisation, passes, TERMS } from './utilisation';

/** A small deterministic generator (LCG), so a failure repeats. */
function lcg(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
}

describe('envelope checks = checkMember', () => {
  for (const code of ['aisc360-16-lrfd', 'aisc360-16-asd', 'en1993-1-1'] as const) {
    it(code, () => {
      const d = prepareDesign({ code, material: code === 'en1993-1-1' ? 's355j2h' : 'a500-c-shaped', catalogue: 'all', K: 0.9 }).design!;
      const rnd = lcg(7);
      const terms = new Float64Array(TERMS), chk = new Int32Array(1);
      for (let i = 0; i < 2000; i++) {
        const s = Math.floor(rnd() * d.catalogue.sections.length);
        const L = { inPlane: 0.2 + 8 * rnd(), outOfPlane: 0.2 + 12 * rnd() };
        const T = rnd() < 0.3 ? 0 : 800 * rnd();
        const C = rnd() < 0.3 ? 0 : 800 * rnd();
        const sec = d.catalogue.sections[s];
        const ts = T > 0 || C <= 0;
        const want = Math.max(T > 0 || C === 0 ? checkMember(d.rules, sec, T, L).utilisation : 0, C > 0 ? checkMember(d.rules, sec, -C, L).utilisation : 0);
        const got = envelopeUtilisation(d, s, T, C, L.inPlane, L.outOfPlane, ts, terms, chk);
        expect(Math.abs(got - want)).toBeLessThanOrEqual(1e-12 * want);
        expect(passes(d, s, T, C, L.inPlane, L.outOfPlane, ts)).toBe(got <= 1);
        const single = T > 0 && C === 0 ? checkMember(d.rules, sec, T, L) : C > 0 && T === 0 ? checkMember(d.rules, sec, -C, L) : undefined;
        if (single) expect(chk[0]).toBe(single.check);
        if (C > 0) {
          const c = checkMember(d.rules, sec, -C, L);
          expect(compressionCapacity(d.rules, sec.A, c.slenderness, d.alpha[s])).toBeCloseTo(c.capacity, 9);
        }
      }
    });
  }
});

describe('the Euler bound sizing skips by', () => {
  it('AISC: Fcr/Fe ≤ 0.878 over 1 ≤ Lc/r ≤ 300 for Fy from 235 to 690 MPa', () => {
    const E = 200e6;
    for (const Fy of [235e3, 345e3, 450e3, 690e3]) {
      for (let lam = 1; lam <= 300; lam += 0.5) {
        const Fe = (Math.PI ** 2 * E) / lam ** 2;
        expect(aiscFcr(Fy, E, lam) / Fe).toBeLessThanOrEqual(0.878);
      }
    }
  });

  it('EN: χ·λ̄² ≤ 1 for every curve, 0 < λ̄ ≤ 4', () => {
    for (const a of Object.values(CURVE_ALPHA)) {
      for (let lb = 0.01; lb <= 4; lb += 0.01) expect(enChi(lb, a) * lb * lb).toBeLessThanOrEqual(1 + 1e-12);
    }
  });
});
