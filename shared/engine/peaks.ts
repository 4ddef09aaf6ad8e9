/**
 * Peak figures of one loading: largest tension, largest compression, largest joint displacement.
 */

/** Peaks of one loading; member and node are indices. */
export interface Peaks {
  /** Largest tension, kN (> 0), or undefined when no member is in tension. */
  tension?: { member: number; force: number };
  /** Largest compression, kN (< 0), or undefined when no member is in compression. */
  compression?: { member: number; force: number };
  /** Largest joint displacement magnitude, m. */
  maxDisplacement: { node: number; value: number };
}

/** Forces below this fraction of the largest count as zero when looking for peaks. */
const NEGLIGIBLE = 1e-9;

/** Peaks from forces (kN) and displacements (m) at the given offsets. */
export function findPeaks(forces: Readonly<Float64Array>, fo: number, m: number, disp: Readonly<Float64Array>, uo: number, nJ: number): Peaks {
  let tMax = 0, tIdx = -1, cMin = 0, cIdx = -1, big = 0;
  for (let e = 0; e < m; e++) big = Math.max(big, Math.abs(forces[fo + e]));
  const cut = big * NEGLIGIBLE;
  for (let e = 0; e < m; e++) {
    const N = forces[fo + e];
    if (N > tMax && N > cut) { tMax = N; tIdx = e; }
    if (N < cMin && -N > cut) { cMin = N; cIdx = e; }
  }
  let uMax = -1, uIdx = 0;
  for (let i = 0; i < nJ; i++) {
    const u = Math.hypot(disp[uo + 2 * i], disp[uo + 2 * i + 1]);
    if (u > uMax) { uMax = u; uIdx = i; }
  }
  return {
    ...(tIdx >= 0 ? { tension: { member: tIdx, force: tMax } } : {}),
    ...(cIdx >= 0 ? { compression: { member: cIdx, force: cMin } } : {}),
    maxDisplacement: { node: uIdx, value: Math.max(0, uMax) },
  };
}
