/**
 * Dense LU with partial pivoting, for the statics cross-check of determinate frames (A·t = −f).
 */

/**
 * Solve a square system. @param a - n × n row-major, not modified. @returns x, or undefined when singular.
 */
export function solveDense(a: Readonly<Float64Array>, n: number, b: Readonly<Float64Array>): Float64Array | undefined {
  const m = Float64Array.from(a);
  const x = Float64Array.from(b);
  let scale = 0;
  for (let i = 0; i < n * n; i++) scale = Math.max(scale, Math.abs(m[i]));
  for (let col = 0; col < n; col++) {
    let piv = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(m[r * n + col]) > Math.abs(m[piv * n + col])) piv = r;
    if (Math.abs(m[piv * n + col]) <= 1e-13 * scale) return undefined;
    if (piv !== col) {
      for (let c = 0; c < n; c++) [m[col * n + c], m[piv * n + c]] = [m[piv * n + c], m[col * n + c]];
      [x[col], x[piv]] = [x[piv], x[col]];
    }
    const inv = 1 / m[col * n + col];
    for (let r = col + 1; r < n; r++) {
      const f = m[r * n + col] * inv;
      if (f === 0) continue;
      for (let c = col; c < n; c++) m[r * n + c] -= f * m[col * n + c];
      x[r] -= f * x[col];
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = x[r];
    for (let c = r + 1; c < n; c++) s -= m[r * n + c] * x[c];
    x[r] = s / m[r * n + r];
  }
  return x;
}
