/**
 * One-sided Jacobi SVD (Hestenes): accurate singular values and right singular vectors of a small
 * dense matrix. Not on the sweep's hot path: used to classify a frame in detail and to show its
 * mechanisms and self-stress states.
 */

/** Singular values and right singular vectors of a rows × cols matrix. */
export interface Svd {
  /** Singular values, one per column, in no particular order. */
  readonly sigma: Float64Array;
  /** Right singular vectors: column c of V is `v[r * cols + c]`. */
  readonly v: Float64Array;
  readonly cols: number;
}

/**
 * SVD of a row-major matrix by one-sided Jacobi rotations of its columns.
 * @param a - rows × cols, row-major; not modified
 */
export function jacobiSvd(a: Readonly<Float64Array>, rows: number, cols: number): Svd {
  // Work column-major: column c occupies w[c*rows .. c*rows+rows).
  const w = new Float64Array(rows * cols);
  for (let r = 0; r < rows; r++) for (let c = 0; c < cols; c++) w[c * rows + r] = a[r * cols + c];
  const v = new Float64Array(cols * cols);
  for (let c = 0; c < cols; c++) v[c * cols + c] = 1; // column-major too, transposed on return
  const eps = 2.220446049250313e-16;
  for (let sweep = 0; sweep < 80; sweep++) {
    let rotated = false;
    for (let p = 0; p < cols - 1; p++) {
      const op = p * rows;
      for (let q = p + 1; q < cols; q++) {
        const oq = q * rows;
        let alpha = 0;
        let beta = 0;
        let gamma = 0;
        for (let r = 0; r < rows; r++) {
          const x = w[op + r];
          const y = w[oq + r];
          alpha += x * x;
          beta += y * y;
          gamma += x * y;
        }
        if (gamma === 0 || Math.abs(gamma) <= eps * Math.sqrt(alpha * beta)) continue;
        rotated = true;
        const zeta = (beta - alpha) / (2 * gamma);
        const t = Math.sign(zeta || 1) / (Math.abs(zeta) + Math.sqrt(1 + zeta * zeta));
        const cs = 1 / Math.sqrt(1 + t * t);
        const sn = cs * t;
        for (let r = 0; r < rows; r++) {
          const x = w[op + r];
          const y = w[oq + r];
          w[op + r] = cs * x - sn * y;
          w[oq + r] = sn * x + cs * y;
        }
        const vp = p * cols;
        const vq = q * cols;
        for (let r = 0; r < cols; r++) {
          const x = v[vp + r];
          const y = v[vq + r];
          v[vp + r] = cs * x - sn * y;
          v[vq + r] = sn * x + cs * y;
        }
      }
    }
    if (!rotated) break;
  }
  const sigma = new Float64Array(cols);
  for (let c = 0; c < cols; c++) {
    let s = 0;
    for (let r = 0; r < rows; r++) s += w[c * rows + r] ** 2;
    sigma[c] = Math.sqrt(s);
  }
  const vr = new Float64Array(cols * cols);
  for (let c = 0; c < cols; c++) for (let r = 0; r < cols; r++) vr[r * cols + c] = v[c * cols + r];
  return { sigma, v: vr, cols };
}

/**
 * Basis of the null space from an SVD: the `count` columns of V with the smallest singular values.
 * @returns count vectors of length cols
 */
export function nullBasis(svd: Svd, count: number): Float64Array[] {
  const order = Array.from(svd.sigma.keys()).sort((i, j) => svd.sigma[i] - svd.sigma[j]);
  const out: Float64Array[] = [];
  for (let k = 0; k < count; k++) {
    const c = order[k];
    const vec = new Float64Array(svd.cols);
    for (let r = 0; r < svd.cols; r++) vec[r] = svd.v[r * svd.cols + c];
    out.push(vec);
  }
  return out;
}

/**
 * Rewrite a basis in reduced row-echelon form (partial pivoting) so each vector is as local as the
 * space allows, then scale each to a largest component of +1.
 */
export function localiseBasis(basis: Float64Array[], tol = 1e-9): Float64Array[] {
  const rows = basis.map((b) => Float64Array.from(b));
  const n = rows.length ? rows[0].length : 0;
  let lead = 0;
  for (let r = 0; r < rows.length && lead < n; lead++) {
    let best = r;
    for (let i = r + 1; i < rows.length; i++) if (Math.abs(rows[i][lead]) > Math.abs(rows[best][lead])) best = i;
    if (Math.abs(rows[best][lead]) <= tol) continue;
    [rows[r], rows[best]] = [rows[best], rows[r]];
    const piv = rows[r][lead];
    for (let c = 0; c < n; c++) rows[r][c] /= piv;
    for (let i = 0; i < rows.length; i++) {
      if (i === r) continue;
      const f = rows[i][lead];
      if (f !== 0) for (let c = 0; c < n; c++) rows[i][c] -= f * rows[r][c];
    }
    r++;
  }
  for (const row of rows) {
    let big = 0;
    for (let c = 0; c < n; c++) if (Math.abs(row[c]) > Math.abs(big)) big = row[c];
    if (big !== 0) for (let c = 0; c < n; c++) row[c] = Math.abs(row[c] / big) < 1e-12 ? 0 : row[c] / big;
  }
  return rows;
}
