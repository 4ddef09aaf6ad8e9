// Agreement between Panelpoint and the NumPy peer on the sampled variants: status, k, s, depth,
// peak tension and peak compression (kN).
import { readFileSync } from 'node:fs';

/** One variant's figures as a CSV row gives them (peaks NaN when unstable). */
export interface PeakRow {
  index: number;
  depth: number;
  status: string;
  joints: number;
  members: number;
  reactions: number;
  k: number;
  s: number;
  peakTension: number;
  peakCompression: number;
}

/** Rows of a CSV whose columns before any free text hold no commas, by variant index. */
export function readPeakCsv(file: string, columns: { tension: string; compression: string }, wanted?: ReadonlySet<number>): Map<number, PeakRow> {
  const lines = readFileSync(file, 'utf8').split('\n');
  const head = lines[0].split(',');
  const col = (name: string) => {
    const c = head.indexOf(name);
    if (c < 0) throw new Error(`${file}: no column ${name}`);
    return c;
  };
  const [ci, cd, cs, cj, cm, cr, ck, css, ct, cc] = ['index', 'depth', 'status', 'joints', 'members', 'reactions', 'k', 's', columns.tension, columns.compression].map(col);
  const num = (t: string) => (t === '' ? NaN : Number(t));
  const rows = new Map<number, PeakRow>();
  for (let l = 1; l < lines.length; l++) {
    const line = lines[l];
    if (!line) continue;
    const index = Number(line.slice(0, line.indexOf(',')));
    if (wanted && !wanted.has(index)) continue;
    const f = line.split(',');
    rows.set(index, { index: Number(f[ci]), depth: num(f[cd]), status: f[cs], joints: num(f[cj]), members: num(f[cm]), reactions: num(f[cr]), k: num(f[ck]), s: num(f[css]), peakTension: num(f[ct]), peakCompression: num(f[cc]) });
  }
  return rows;
}

/** Result of comparing two sets of rows. */
export interface Agreement {
  compared: number;
  /** Largest |a − b| / max(|a|, |b|) over the peaks of stable variants. */
  maxRelDiff: number;
  /** Largest |a − b|, kN. */
  maxAbsDiff: number;
  /** Peaks outside relTol·|b| + absTol. */
  outside: number;
  /** Variants missing on one side, or with another status, joint/member/reaction count, k, s or depth. */
  mismatches: number;
  /** First few mismatches, described. */
  examples: string[];
}

/**
 * Compare `ours` with `peer` on every index of `peer`. A peak agrees when |a − b| ≤ relTol·|b| + absTol
 * (absTol covers rounding of stored figures: Panelpoint's CSV keeps forces to 1e-6 kN).
 */
export function comparePeaks(ours: ReadonlyMap<number, PeakRow>, peer: ReadonlyMap<number, PeakRow>, relTol: number, absTol: number): Agreement {
  const r: Agreement = { compared: 0, maxRelDiff: 0, maxAbsDiff: 0, outside: 0, mismatches: 0, examples: [] };
  const note = (s: string) => {
    r.mismatches++;
    if (r.examples.length < 5) r.examples.push(s);
  };
  for (const [index, b] of peer) {
    const a = ours.get(index);
    if (!a) {
      note(`variant ${index}: not in Panelpoint's output`);
      continue;
    }
    r.compared++;
    const counts = (r: PeakRow) => `${r.status} j=${r.joints} m=${r.members} r=${r.reactions} k=${r.k} s=${r.s}`;
    if (counts(a) !== counts(b)) note(`variant ${index}: ${counts(a)} vs peer ${counts(b)}`);
    if (Number.isFinite(a.depth) && a.depth !== b.depth) note(`variant ${index}: depth ${a.depth} vs peer ${b.depth}`);
    for (const [x, y] of [[a.peakTension, b.peakTension], [a.peakCompression, b.peakCompression]]) {
      if (Number.isNaN(x) && Number.isNaN(y)) continue;
      if (Number.isNaN(x) !== Number.isNaN(y)) {
        note(`variant ${index}: peak ${x} vs peer ${y}`);
        continue;
      }
      const d = Math.abs(x - y);
      const scale = Math.max(Math.abs(x), Math.abs(y));
      r.maxAbsDiff = Math.max(r.maxAbsDiff, d);
      r.maxRelDiff = Math.max(r.maxRelDiff, scale > 0 ? d / scale : 0);
      if (d > relTol * Math.abs(y) + absTol) r.outside++;
    }
  }
  return r;
}
