/**
 * Symmetric positive semi-definite matrices in variable-band (skyline) row storage, factored as
 * L·D·Lᵀ in place with a pivot test. Row i keeps columns first[i]..i in `band[i*W + (j - i + bw)]`,
 * W = bw + 1; entries left of first[i] are zero and stay zero (no fill outside the profile).
 */

/** Shape of a banded matrix. */
export interface BandShape {
  /** Order of the matrix. */
  readonly n: number;
  /** Half-bandwidth (largest i − j with K[i][j] ≠ 0). */
  readonly bw: number;
  /** First stored column of each row. */
  readonly first: Int32Array;
}

/**
 * Factor in place. On return the strict lower band holds L, `d` holds the pivots (0 where a pivot
 * collapsed) and `invD` their inverses (0 where collapsed).
 * A pivot collapses when it falls to `relTol` × its original diagonal or below: each such pivot is one
 * mechanism (a direction with no stiffness).
 * @param diag - the original diagonal K[i][i], read for the pivot test
 * @returns the number of collapsed pivots
 */
export function factorBandLdlt(
  shape: BandShape,
  band: Float64Array,
  diag: Float64Array,
  d: Float64Array,
  invD: Float64Array,
  relTol: number,
): number {
  const { n, bw, first } = shape;
  const W = bw + 1;
  let collapsed = 0;
  for (let i = 0; i < n; i++) {
    const ri = i * W + bw - i; // band[ri + j] = K[i][j]
    const j0 = first[i];
    for (let j = j0; j < i; j++) {
      const rj = j * W + bw - j;
      const k0 = j0 > first[j] ? j0 : first[j];
      let s = band[ri + j];
      for (let k = k0; k < j; k++) s -= band[ri + k] * band[rj + k];
      band[ri + j] = s; // u_ij = L_ij · d_j for now
    }
    let dii = band[ri + i];
    for (let j = j0; j < i; j++) {
      const u = band[ri + j];
      const l = u * invD[j];
      dii -= u * l;
      band[ri + j] = l;
    }
    if (dii <= relTol * diag[i]) {
      collapsed++;
      d[i] = 0;
      invD[i] = 0;
    } else {
      d[i] = dii;
      invD[i] = 1 / dii;
    }
    band[ri + i] = d[i];
  }
  return collapsed;
}

/**
 * Solve K·u = f with a factor from {@link factorBandLdlt} (all pivots kept). `u` may alias `f`.
 */
export function solveBandLdlt(shape: BandShape, band: Float64Array, invD: Float64Array, f: Float64Array, u: Float64Array): void {
  const { n, bw, first } = shape;
  const W = bw + 1;
  if (u !== f) u.set(f.subarray(0, n));
  for (let i = 0; i < n; i++) {
    const ri = i * W + bw - i;
    let s = u[i];
    for (let j = first[i]; j < i; j++) s -= band[ri + j] * u[j];
    u[i] = s;
  }
  for (let i = 0; i < n; i++) u[i] *= invD[i];
  for (let i = n - 1; i >= 0; i--) {
    const ri = i * W + bw - i;
    const ui = u[i];
    for (let j = first[i]; j < i; j++) u[j] -= band[ri + j] * ui;
  }
}

/**
 * Solve K·U = F for k right-hand sides at once, stored interleaved (u[i·k + c]), in place: each
 * entry of L is read once for all of them. Same factor as {@link solveBandLdlt}.
 */
export function solveBandLdltMulti(shape: BandShape, band: Float64Array, invD: Float64Array, u: Float64Array, k: number): void {
  if (k === 3) {
    solveBandLdlt3(shape, band, invD, u);
    return;
  }
  const { n, bw, first } = shape;
  const W = bw + 1;
  for (let i = 0; i < n; i++) {
    const ri = i * W + bw - i;
    const oi = i * k;
    for (let j = first[i]; j < i; j++) {
      const l = band[ri + j];
      const oj = j * k;
      for (let c = 0; c < k; c++) u[oi + c] -= l * u[oj + c];
    }
  }
  for (let i = 0; i < n; i++) {
    const d = invD[i];
    for (let c = 0; c < k; c++) u[i * k + c] *= d;
  }
  for (let i = n - 1; i >= 0; i--) {
    const ri = i * W + bw - i;
    const oi = i * k;
    for (let j = first[i]; j < i; j++) {
      const l = band[ri + j];
      const oj = j * k;
      for (let c = 0; c < k; c++) u[oj + c] -= l * u[oi + c];
    }
  }
}

/** {@link solveBandLdltMulti} for three right-hand sides (the usual sweep: three combinations), unrolled. */
function solveBandLdlt3(shape: BandShape, band: Float64Array, invD: Float64Array, u: Float64Array): void {
  const { n, bw, first } = shape;
  const W = bw + 1;
  for (let i = 0; i < n; i++) {
    const ri = i * W + bw - i;
    const oi = 3 * i;
    let a = u[oi], b = u[oi + 1], c = u[oi + 2];
    for (let j = first[i]; j < i; j++) {
      const l = band[ri + j];
      const oj = 3 * j;
      a -= l * u[oj];
      b -= l * u[oj + 1];
      c -= l * u[oj + 2];
    }
    u[oi] = a;
    u[oi + 1] = b;
    u[oi + 2] = c;
  }
  for (let i = 0; i < n; i++) {
    const d = invD[i];
    u[3 * i] *= d;
    u[3 * i + 1] *= d;
    u[3 * i + 2] *= d;
  }
  for (let i = n - 1; i >= 0; i--) {
    const ri = i * W + bw - i;
    const oi = 3 * i;
    const a = u[oi], b = u[oi + 1], c = u[oi + 2];
    for (let j = first[i]; j < i; j++) {
      const l = band[ri + j];
      const oj = 3 * j;
      u[oj] -= l * a;
      u[oj + 1] -= l * b;
      u[oj + 2] -= l * c;
    }
  }
}
