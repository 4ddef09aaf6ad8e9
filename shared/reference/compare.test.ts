/**
 * The comparison rule of reference cases: |got − want| ≤ absolute + relative·|want| (the rule
 * the case schema states), exact classification, figures the recomputation lacks.
 */
import { describe, expect, it } from 'vitest';
import { allowanceFor, compareCase, severity, type Recomputed } from './compare';
import type { ReferenceExpected } from '../schemas/reference-case';

const classification = { status: 'determinate', joints: 3, members: 2, reactions: 4, mechanisms: 0, selfStress: 0, critical: false };
const want = { ...classification, status: 'determinate' as const };

// A two-bar frame with P = 60 kN at the apex, sin θ = 0.6: N = −P/(2 sin θ) = −50 kN (method of joints).
const got: Recomputed = {
  classification,
  results: {
    G: {
      memberForces: { AB: -50, BC: -50 },
      reactions: { A: { rx: 40, ry: 30 }, C: { rx: -40, ry: 30 } },
      displacements: { B: { ux: 0, uy: -4.16666666667e-4 } },
    },
  },
};
const allow = { force: 0.01, displacement: 1e-6, relative: 1e-3 };

describe('compareCase', () => {
  it('passes a figure just inside its allowance and fails it just outside (the rule abs + rel·|want|)', () => {
    const allowed = (w: number) => 0.01 + 1e-3 * Math.abs(w);
    const inside = -50 - 0.9 * allowed(-50);
    const outside = -50 - 1.1 * allowed(-50);
    const at = (v: number): ReferenceExpected => ({ classification: want, results: { G: { memberForces: { AB: v } } } });
    const a = compareCase(at(inside), got, allow);
    expect(a.ok).toBe(true);
    expect(a.worst?.figure).toBe('results.G.memberForces.AB');
    expect(severity(a.worst!)).toBeCloseTo(0.9 * allowed(-50) / allowed(inside), 9);
    const b = compareCase(at(outside), got, allow);
    expect(b.ok).toBe(false);
    expect(b.failures).toHaveLength(1);
    const f = b.failures[0];
    expect(f.figure).toBe('results.G.memberForces.AB');
    expect(f.difference!).toBeCloseTo(1.1 * allowed(-50), 12);
    expect(f.allowed!).toBeCloseTo(allowed(outside), 12);
  });

  it('uses the displacement allowance for displacements and the force allowance for reactions', () => {
    const e: ReferenceExpected = {
      classification: want,
      results: { G: { reactions: { A: { ry: 30.005 } }, displacements: { B: { uy: -4.16666666667e-4 + 2e-6 } } } },
    };
    const c = compareCase(e, got, allow);
    expect(c.failures.map((f) => f.figure)).toEqual(['results.G.displacements.B.uy']);
    expect(c.failures[0].kind).toBe('displacement');
  });

  it('compares the classification exactly and puts a mismatch first', () => {
    const e: ReferenceExpected = { classification: { ...want, status: 'indeterminate', selfStress: 1 }, results: { G: { memberForces: { AB: -49 } } } };
    const c = compareCase(e, got, allow);
    expect(c.ok).toBe(false);
    expect(c.failures.map((f) => f.figure)).toEqual(['classification.status', 'classification.selfStress', 'results.G.memberForces.AB']);
    expect(c.worst?.figure).toBe('classification.status');
    expect(c.worst?.want).toBe('indeterminate');
    expect(c.worst?.got).toBe('determinate');
  });

  it('fails a member, support, node or loading the recomputation lacks, and names it', () => {
    const e: ReferenceExpected = {
      classification: want,
      results: {
        G: { memberForces: { AB: -50, XY: 1 }, reactions: { B: { rx: 0 } }, displacements: { Q: { ux: 0 } } },
        'ULS 2': { memberForces: { AB: -50 } },
      },
    };
    const c = compareCase(e, got, allow);
    expect(c.failures.map((f) => [f.figure, f.note])).toEqual([
      ['results.G.memberForces.XY', "no member 'XY' in the recomputation"],
      ['results.G.reactions.B.rx', "no support at node 'B' in the recomputation"],
      ['results.G.displacements.Q.ux', "no node 'Q' in the recomputation"],
      ['results["ULS 2"]', "loading 'ULS 2' missing in the recomputation (it has G)"],
    ]);
    expect(c.failures.every((f) => f.got === undefined)).toBe(true);
  });

  it('says why every loading is missing when the frame is unstable', () => {
    const unstable: Recomputed = { classification: { ...classification, status: 'unstable', mechanisms: 1 }, results: {} };
    const c = compareCase({ classification: want, results: { G: {} } }, unstable, allow);
    expect(c.failures.map((f) => f.figure)).toEqual(['classification.status', 'classification.mechanisms', 'results.G']);
    expect(c.failures[2].note).toMatch(/unstable/);
  });

  it('passes a case with the classification only, and notes a weight it cannot compare yet', () => {
    const c = compareCase({ classification: want, weight: 1.5 }, got, allow);
    expect(c.ok).toBe(true);
    expect(c.compared).toBe(7);
    expect(c.worst).toBeUndefined();
    expect(c.notes).toEqual(['expected.weight (1.5 kN) not compared: member weight is not yet computed']);
  });

  it('fails a non-finite recomputed figure', () => {
    const bad: Recomputed = { classification, results: { G: { memberForces: { AB: NaN } } } };
    expect(compareCase({ classification: want, results: { G: { memberForces: { AB: -50 } } } }, bad, allow).ok).toBe(false);
  });
});

describe('allowanceFor', () => {
  it('turns kN and m into the model units: 1e-3 kN = 1 N, 1e-6 m = 1e-3 mm (SI prefixes)', () => {
    const a = allowanceFor({ absolute: { force: 1e-3, displacement: 1e-6 }, relative: 1e-9 }, { forceFactor: 1e-3, lengthFactor: 1e-3 });
    expect(a.force).toBeCloseTo(1, 12);
    expect(a.displacement).toBeCloseTo(1e-3, 15);
    expect(a.relative).toBe(1e-9);
  });
});
