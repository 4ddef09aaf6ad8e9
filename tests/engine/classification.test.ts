/**
 * Classification: Calladine's relation, rank against ml-matrix, the pivot test against the SVD,
 * and frames that pass Maxwell's count yet fail.
 */
import { describe, expect, it } from 'vitest';
import { Matrix, SingularValueDecomposition } from 'ml-matrix';
import { frame, prattSpec, type FrameSpec } from '../fixtures/frames';
import { classify } from '../../shared/engine/classify';
import { equilibriumMatrix } from '../../shared/engine/equilibrium';
import { createKernel } from '../../shared/engine/kernel';

const square: FrameSpec = {
  nodes: [['A', 0, 0], ['B', 4, 0], ['C', 4, 3], ['D', 0, 3]],
  members: [['ab', 'A', 'B'], ['bc', 'B', 'C'], ['cd', 'C', 'D'], ['da', 'D', 'A']],
  supports: [['A', 'pin'], ['B', 'roller']],
};

/** Test frames: name, spec, expected status, k, s. */
const cases: [string, FrameSpec, string, number, number][] = [
  ['Pratt 6 panels, pin + roller', prattSpec(6, 24, 3, 10), 'determinate', 0, 0],
  ['Pratt 6 panels, pin + pin', prattSpec(6, 24, 3, 10, { supports: [['B0', 'pin'], ['B6', 'pin']] }), 'indeterminate', 0, 1],
  ['Pratt 6 panels, roller + roller', prattSpec(6, 24, 3, 10, { supports: [['B0', 'roller'], ['B6', 'roller']] }), 'unstable', 1, 0],
  // Count satisfied (m + r = 2j) but panel 2 has no diagonal and panel 5 has two: critical.
  ['Pratt, one panel bare, one doubly braced', prattSpec(6, 24, 3, 10, { drop: ['D2'], extra: [['D5x', 'B5', 'T4']] }), 'unstable', 1, 1],
  // Three vertical rollers: r = 3 satisfies the count, but parallel reactions cannot resist sway.
  ['Pratt on three vertical rollers', prattSpec(6, 24, 3, 10, { supports: [['B0', 'roller'], ['B3', 'roller'], ['B6', 'roller']] }), 'unstable', 1, 1],
  // An inclined roller whose reaction line passes through the pin: concurrent reactions.
  ['Pratt with a roller aimed at the pin', prattSpec(6, 24, 3, 10, { supports: [['B0', 'pin'], ['B6', 'roller', 180]] }), 'unstable', 1, 1],
  ['unbraced rectangle', square, 'unstable', 1, 0],
  ['braced rectangle', { ...square, members: [...square.members, ['ac', 'A', 'C']] }, 'determinate', 0, 0],
  ['rectangle with both diagonals', { ...square, members: [...square.members, ['ac', 'A', 'C'], ['bd', 'B', 'D']] }, 'indeterminate', 0, 1],
  // Three collinear joints: a flat two-bar chain between two pins, loaded at the middle joint.
  ['flat two-bar chain between pins', {
    nodes: [['A', 0, 0], ['B', 2, 0], ['C', 4, 0]], members: [['ab', 'A', 'B'], ['bc', 'B', 'C']],
    supports: [['A', 'pin'], ['C', 'pin']],
  }, 'unstable', 1, 1],
  ['no supports', { ...square, members: [...square.members, ['ac', 'A', 'C']], supports: [] }, 'unstable', 3, 0],
];

describe('classification of test frames', () => {
  for (const [name, spec, status, k, s] of cases) {
    it(name, () => {
      const st = frame(spec);
      const c = classify(st);
      expect([c.status, c.mechanisms, c.selfStress]).toEqual([status, k, s]);
      // Calladine (1978), Int. J. Solids Struct. 14: m + r − 2j = s − k.
      expect(c.members + c.reactions - 2 * c.joints).toBe(c.selfStress - c.mechanisms);
      expect(c.critical).toBe(c.countRule >= 0 && c.mechanisms > 0);
      // Second opinion on the rank: ml-matrix's SVD (Golub–Kahan), same tolerance rule (ENGINEERING.md §2).
      const { a, rows, cols } = equilibriumMatrix(st, st.x, st.y);
      const M = new Matrix(rows, cols);
      for (let r = 0; r < rows; r++) for (let q = 0; q < cols; q++) M.set(r, q, a[r * cols + q]);
      const sv = new SingularValueDecomposition(M, { autoTranspose: true }).diagonal;
      const tol = Math.max(rows, cols) * Number.EPSILON * Math.max(...sv);
      expect(c.rank).toBe(sv.filter((v) => v > tol).length);
      // The fast path's pivot test counts the same mechanisms.
      const kernel = createKernel(st, 1);
      expect(kernel.run(st.x, st.y, st.EA, new Float64Array(2 * st.nodeIds.length), 1)).toBe(k);
      // Mechanism modes really are mechanisms: Aᵀ d = 0; self-stress states really are: A t = 0.
      for (const mode of c.mechanismModes) {
        for (let q = 0; q < cols; q++) {
          let v = 0;
          for (let r = 0; r < rows; r++) v += a[r * cols + q] * mode.displacement[r];
          expect(Math.abs(v)).toBeLessThan(1e-9);
        }
      }
      for (const state of c.selfStressStates) {
        for (let r = 0; r < rows; r++) {
          let v = 0;
          for (let q = 0; q < cols; q++) v += a[r * cols + q] * state.forces[q];
          expect(Math.abs(v)).toBeLessThan(1e-9);
        }
      }
    });
  }

  it('simple trusses satisfy m = 2j − 3 (common practice) and are determinate on pin + roller (r = 3)', () => {
    for (const n of [2, 4, 6, 10, 16]) {
      const c = classify(frame(prattSpec(n, 2 * n, 1.5, 1)));
      expect(c.members).toBe(2 * c.joints - 3);
      expect(c.reactions).toBe(3);
      expect(c.status).toBe('determinate');
    }
  });

  it('says where: the bare panel and the doubly braced one', () => {
    const st = frame(prattSpec(6, 24, 3, 10, { drop: ['D2'], extra: [['D5x', 'B5', 'T4']] }));
    const c = classify(st);
    const codes = c.findings.map((f) => f.code);
    expect(codes).toContain('critical-form');
    const mech = c.findings.find((f) => f.code === 'mechanism')!;
    // The left part (B0, B1, T1 and the pin) stays; the rest shears through panel 2.
    expect(mech.joints).not.toContain('B0');
    expect(mech.joints).toContain('T2');
    const ss = c.findings.find((f) => f.code === 'self-stress')!;
    expect(ss.members).toEqual(expect.arrayContaining(['D5', 'D5x']));
    expect(ss.members).not.toContain('D3');
    expect(c.redundantMembers.map((e) => st.memberIds[e])).toContain('D5x');
    // Panel-level wording: the bare panel (between joints 1 and 2) and the doubly braced one (4–5).
    const bare = c.findings.filter((f) => f.code === 'panel-unbraced');
    expect(bare).toHaveLength(1);
    expect([...bare[0].joints!].sort()).toEqual(['B1', 'B2', 'T1', 'T2']);
    const dbl = c.findings.filter((f) => f.code === 'panel-double-braced');
    expect(dbl).toHaveLength(1);
    expect([...dbl[0].members!].sort()).toEqual(['D5', 'D5x']);
  });

  it('reports parallel and concurrent reactions, flat kinks, and special geometry', () => {
    const par = classify(frame(prattSpec(6, 24, 3, 10, { supports: [['B0', 'roller'], ['B3', 'roller'], ['B6', 'roller']] })));
    expect(par.findings.map((f) => f.code)).toContain('reactions-parallel');
    expect(par.specialGeometry).toBe(true);
    const conc = classify(frame(prattSpec(6, 24, 3, 10, { supports: [['B0', 'pin'], ['B6', 'roller', 180]] })));
    expect(conc.findings.map((f) => f.code)).toContain('reactions-concurrent');
    const kink = classify(frame(cases[9][1]));
    expect(kink.findings.find((f) => f.code === 'flat-kink')?.joints).toEqual(['B']);
    expect(kink.specialGeometry).toBe(true);
  });

  it('warns when a frame is nearly a mechanism (a chain with a 0.1 mm kink over 4 m)', () => {
    const st = frame({
      nodes: [['A', 0, 0], ['B', 2, -0.0001], ['C', 4, 0]], members: [['ab', 'A', 'B'], ['bc', 'B', 'C']],
      supports: [['A', 'pin'], ['C', 'pin']],
    });
    const c = classify(st);
    expect(c.status).toBe('determinate');
    expect(c.nearlyMechanism).toBe(true);
    expect(c.findings.map((f) => f.code)).toContain('near-mechanism');
  });
});
