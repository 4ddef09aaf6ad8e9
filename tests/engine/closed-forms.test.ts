/**
 * The stiffness engine against statics closed forms and a classic indeterminate solution.
 */
import { describe, expect, it } from 'vitest';
import { frame, prattSpec } from '../fixtures/frames';
import { analyze } from '../../shared/engine/analyze';

const force = (st: ReturnType<typeof frame>, forces: Float64Array, id: string) => forces[st.memberIds.indexOf(id)];

describe('parallel-chord Pratt truss, simply supported, equal panel loads', () => {
  // Method of sections for a simply supported parallel-chord truss (any statics text):
  // chord force at a section = M / h, M the bending moment of the equivalent simple beam;
  // diagonal force = V / sin θ, V the shear in the panel.
  for (const [n, span, h, P] of [[6, 24, 3, 10], [10, 30, 2.5, 7.5], [8, 16, 1.2, 20]] as const) {
    it(`${n} panels, span ${span} m, depth ${h} m, P = ${P} kN`, () => {
      const st = frame(prattSpec(n, span, h, P));
      const a = analyze(st);
      expect(a.classification.status).toBe('determinate');
      const f = a.results[0].forces;
      const w = span / n;
      const R = (P * (n - 1)) / 2;
      const moment = (x: number) => {
        let M = R * x;
        for (let i = 1; i < n; i++) if (i * w < x) M -= P * (x - i * w);
        return M;
      };
      for (let i = 1; i <= n; i++) {
        // Bottom chord of panel i: moments about the top joint where the cut top chord and diagonal meet.
        // End panels have no top chord: the cut meets the end post, and the moment centre is T1 or T(n−1).
        const xm = i === 1 ? w : i === n ? (n - 1) * w : i <= n / 2 ? (i - 1) * w : i * w;
        const ref = moment(xm) / h;
        expect(force(st, f, `BC${i}`)).toBeCloseTo(ref, 8);
      }
      for (let i = 2; i < n; i++) {
        // Top chord of panel i: moments about the bottom joint where the cut bottom chord and diagonal meet.
        const xm = i <= n / 2 ? i * w : (i - 1) * w;
        expect(force(st, f, `TC${i}`)).toBeCloseTo(-moment(xm) / h, 8);
        // Diagonal of panel i: V / sin θ, tension for this Pratt orientation.
        const V = Math.abs(R - P * (i - 1)); // loads left of panel i: joints 1..i−1
        const sin = h / Math.hypot(w, h);
        expect(force(st, f, `D${i}`)).toBeCloseTo(V / sin, 8);
      }
      // Reactions: R = P (n − 1) / 2 each (symmetry).
      expect(a.results[0].react[1]).toBeCloseTo(R, 8);
      expect(a.results[0].react[3]).toBeCloseTo(R, 8);
      // Statics cross-check built into the engine for determinate frames.
      expect(a.results[0].staticsDifference!).toBeLessThan(1e-8);
      expect(a.results[0].residual).toBeLessThan(1e-8);
    });
  }
});

describe('three bars meeting at one loaded joint (statically indeterminate, degree 1)', () => {
  // Compatibility solution of the symmetric three-bar frame, equal EA, middle bar vertical of length L,
  // outer bars at angle α from the vertical (Timoshenko, Strength of Materials, Part I — from memory):
  // N_mid = P / (1 + 2 cos³α), N_side = P cos²α / (1 + 2 cos³α); vertical deflection = N_mid L / EA.
  for (const deg of [30, 45, 60]) {
    it(`α = ${deg}°`, () => {
      const al = (deg * Math.PI) / 180;
      const L = 3;
      const P = 100;
      const EA = 2.0e8 * 0.004;
      const half = L * Math.tan(al);
      const st = frame({
        nodes: [['A', -half, L], ['B', 0, L], ['C', half, L], ['D', 0, 0]],
        members: [['a', 'A', 'D'], ['b', 'B', 'D'], ['c', 'C', 'D']],
        supports: [['A', 'pin'], ['B', 'pin'], ['C', 'pin']],
        loads: [['D', 0, -P]],
        EA,
      });
      const an = analyze(st);
      expect(an.classification.status).toBe('indeterminate');
      expect(an.classification.degree).toBe(1); // m + r − 2j = 3 + 6 − 8 = 1
      const den = 1 + 2 * Math.cos(al) ** 3;
      const f = an.results[0].forces;
      expect(f[1]).toBeCloseTo(P / den, 9);
      expect(f[0]).toBeCloseTo((P * Math.cos(al) ** 2) / den, 9);
      expect(f[2]).toBeCloseTo((P * Math.cos(al) ** 2) / den, 9);
      expect(an.results[0].disp[7]).toBeCloseTo(-((P / den) * L) / EA, 12);
    });
  }
});
