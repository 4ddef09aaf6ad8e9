/**
 * Method of sections against the stiffness solution; the banded LDLᵀ and dense LU against ml-matrix.
 */
import { describe, expect, it } from 'vitest';
import { Matrix, solve as mlSolve } from 'ml-matrix';
import { frame, prattSpec } from '../fixtures/frames';
import { analyze } from '../../shared/engine/analyze';
import { cutSection } from '../../shared/engine/sections';
import { factorBandLdlt, solveBandLdlt, solveBandLdltMulti } from '../../shared/engine/linalg/banded-ldlt';
import { solveDense } from '../../shared/engine/linalg/dense-lu';

describe('method of sections', () => {
  it('cut forces equal the stiffness forces in a determinate Pratt truss', () => {
    const st = frame(prattSpec(8, 24, 2, 12));
    const an = analyze(st);
    const r = an.results[0];
    const ids = ['TC3', 'D3', 'BC3'].map((id) => st.memberIds.indexOf(id));
    const cut = cutSection(st, ids, an.loadings.loads, r.react);
    expect(cut.error).toBeUndefined();
    ids.forEach((e, k) => expect(cut.forces![k]).toBeCloseTo(r.forces[e], 8));
    // Statics (method of sections): the bottom chord of panel 3 = M(x = 6 m) / h with R = 42 kN.
    expect(cut.forces![2]).toBeCloseTo((42 * 6 - 12 * 3) / 2, 8);
  });

  it('refuses a cut that does not split the truss, and one of four members', () => {
    const st = frame(prattSpec(6, 24, 3, 10));
    const an = analyze(st);
    const two = cutSection(st, ['TC3', 'BC3'].map((id) => st.memberIds.indexOf(id)), an.loadings.loads, an.results[0].react);
    expect(two.error).toMatch(/does not split/);
  });
});

describe('linear algebra kernels against ml-matrix (LU with partial pivoting)', () => {
  it('banded LDLᵀ solves a banded SPD system', () => {
    const n = 30, bw = 4, W = bw + 1;
    const K = Matrix.zeros(n, n);
    let seed = 7;
    const rnd = () => ((seed = (seed * 16807) % 2147483647) / 2147483647) - 0.5;
    for (let i = 0; i < n; i++) for (let j = Math.max(0, i - bw); j < i; j++) { const v = rnd(); K.set(i, j, v); K.set(j, i, v); }
    for (let i = 0; i < n; i++) K.set(i, i, 3 + rnd());
    const band = new Float64Array(n * W);
    const first = new Int32Array(n).map((_, i) => Math.max(0, i - bw));
    for (let i = 0; i < n; i++) for (let j = first[i]; j <= i; j++) band[i * W + bw - i + j] = K.get(i, j);
    const diag = Float64Array.from({ length: n }, (_, i) => K.get(i, i));
    const d = new Float64Array(n), invD = new Float64Array(n);
    expect(factorBandLdlt({ n, bw, first }, band, diag, d, invD, 1e-10)).toBe(0);
    const f = Float64Array.from({ length: n }, () => rnd());
    const u = new Float64Array(n);
    solveBandLdlt({ n, bw, first }, band, invD, f, u);
    const ref = mlSolve(K, Matrix.columnVector(Array.from(f)));
    for (let i = 0; i < n; i++) expect(u[i]).toBeCloseTo(ref.get(i, 0), 10);
    // k right-hand sides interleaved (k = 3 takes the unrolled path), each against ml-matrix
    for (const k of [1, 2, 3, 4]) {
      const F = Matrix.zeros(n, k);
      const U = new Float64Array(n * k);
      for (let i = 0; i < n; i++) for (let c = 0; c < k; c++) { const v = rnd(); F.set(i, c, v); U[i * k + c] = v; }
      solveBandLdltMulti({ n, bw, first }, band, invD, U, k);
      const R = mlSolve(K, F);
      for (let i = 0; i < n; i++) for (let c = 0; c < k; c++) expect(U[i * k + c]).toBeCloseTo(R.get(i, c), 10);
    }
  });

  it('dense LU agrees with ml-matrix and reports a singular matrix', () => {
    const a = Float64Array.from([4, 1, 2, 1, 5, 3, 2, 3, 6]);
    const b = Float64Array.from([1, 2, 3]);
    const x = solveDense(a, 3, b)!;
    const ref = mlSolve(new Matrix([[4, 1, 2], [1, 5, 3], [2, 3, 6]]), Matrix.columnVector([1, 2, 3]));
    for (let i = 0; i < 3; i++) expect(x[i]).toBeCloseTo(ref.get(i, 0), 12);
    expect(solveDense(Float64Array.from([1, 2, 2, 4]), 2, Float64Array.from([1, 1]))).toBeUndefined();
  });
});
