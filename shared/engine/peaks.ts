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

/** Reusable peak figures for hot loops (indices −1 when absent). */
export class PeakScratch {
  tensionMember = -1;
  tension = 0;
  compressionMember = -1;
  compression = 0;
  displacementNode = 0;
  displacement = 0;
}

/** Peaks into a reused scratch record: no allocation. Forces kN, displacements m. */
export function findPeaksInto(out: PeakScratch, forces: Readonly<Float64Array>, fo: number, m: number, disp: Readonly<Float64Array>, uo: number, nJ: number): PeakScratch {
  let tMax = 0, tIdx = -1, cMin = 0, cIdx = -1, big = 0;
  for (let e = 0; e < m; e++) {
    const a = Math.abs(forces[fo + e]);
    if (a > big) big = a;
  }
  const cut = big * NEGLIGIBLE;
  for (let e = 0; e < m; e++) {
    const N = forces[fo + e];
    if (N > tMax && N > cut) { tMax = N; tIdx = e; }
    if (N < cMin && -N > cut) { cMin = N; cIdx = e; }
  }
  let u2 = -1, uIdx = 0;
  for (let i = 0; i < nJ; i++) {
    const ux = disp[uo + 2 * i], uy = disp[uo + 2 * i + 1];
    const v = ux * ux + uy * uy;
    if (v > u2) { u2 = v; uIdx = i; }
  }
  out.tensionMember = tIdx; out.tension = tMax;
  out.compressionMember = cIdx; out.compression = cMin;
  out.displacementNode = uIdx; out.displacement = Math.sqrt(Math.max(0, u2));
  return out;
}

/** Peaks from forces (kN) and displacements (m) at the given offsets. */
export function findPeaks(forces: Readonly<Float64Array>, fo: number, m: number, disp: Readonly<Float64Array>, uo: number, nJ: number): Peaks {
  const p = findPeaksInto(new PeakScratch(), forces, fo, m, disp, uo, nJ);
  return {
    ...(p.tensionMember >= 0 ? { tension: { member: p.tensionMember, force: p.tension } } : {}),
    ...(p.compressionMember >= 0 ? { compression: { member: p.compressionMember, force: p.compression } } : {}),
    maxDisplacement: { node: p.displacementNode, value: p.displacement },
  };
}
