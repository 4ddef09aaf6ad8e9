/**
 * Joint, member and reaction counts of every family at two panel counts, against counts derived
 * here from each pattern; Maxwell's rule; and an independent rank check of the equilibrium matrix.
 */
import { describe, expect, it } from 'vitest';
import { families, getFamily, withDefaults } from './registry';
import type { FamilyTopology, Params } from './types';

interface Expected { j: number; m: number }
/** Counts derived from each pattern by hand (the comment states the parts). */
const EXPECTED: Record<string, { panels: [number, number]; count: (n: number, p: Params) => Expected }> = {
  // chords n + n, verticals n + 1, diagonals n
  pratt: { panels: [4, 10], count: (n) => ({ j: 2 * (n + 1), m: 4 * n + 1 }) },
  howe: { panels: [4, 10], count: (n) => ({ j: 2 * (n + 1), m: 4 * n + 1 }) },
  'warren-verticals': { panels: [2, 8], count: (n) => ({ j: 2 * (n + 1), m: 4 * n + 1 }) },
  // bottom n + 1 and top n joints; bottom chord n, top chord n − 1, diagonals 2n
  warren: { panels: [3, 8], count: (n) => ({ j: 2 * n + 1, m: 4 * n - 1 }) },
  // 2(n + 1) chord joints and n mid-height joints; chords 2n, vertical pieces 2n + 1, diagonals 2n
  'k-panel': { panels: [2, 6], count: (n) => ({ j: 3 * n + 2, m: 6 * n + 1 }) },
  // bottom n + 1, top n − 1 joints; chords n + n, verticals n − 1, diagonals n − 2
  'pratt-roof': { panels: [4, 10], count: (n) => ({ j: 2 * n, m: 4 * n - 3 }) },
  'howe-roof': { panels: [4, 8], count: (n) => ({ j: 2 * n, m: 4 * n - 3 }) },
  scissors: { panels: [4, 8], count: (n) => ({ j: 2 * n, m: 4 * n - 3 }) },
  bowstring: { panels: [4, 8], count: (n) => ({ j: 2 * n, m: 4 * n - 3 }) },
  // bottom n joints (tie in n − 1 panels), top n − 1; chords n + n − 1, webs 2(n − 2)
  'w-web': { panels: [4, 8], count: (n) => ({ j: 2 * n - 1, m: 4 * n - 5 }) },
  // bottom 4 joints, top n − 1; chords 3 + n, webs n/2 from each inner tie joint
  fan: { panels: [6, 10], count: (n) => ({ j: n + 3, m: 2 * n + 3 }) },
  // 3 bottom joints, n − 1 top; chords 2 + n, post 1, struts n − 2
  'king-post': { panels: [2, 4], count: (n) => ({ j: n + 2, m: 2 * n + 1 }) },
  // 4 bottom joints, n − 1 top; chords 3 + n, posts 2, struts n − 2
  'queen-post': { panels: [4, 6], count: (n) => ({ j: n + 3, m: 2 * n + 3 }) },
  // pointed: 2n wall/panel joints + tip; chords 2n, verticals n, diagonals n − 1
  cantilever: { panels: [1, 5], count: (n) => ({ j: 2 * n + 1, m: 4 * n - 1 }) },
  // two Pratt trusses of c + 1 columns (c = (n − 1)/2): 2 × (4c + 1) bars, 4 bars to C, one link
  'compound-link': { panels: [3, 7], count: (n) => ({ j: 2 * n + 3, m: 4 * n + 3 }) },
  // two trusses of 2c + 3 joints and 4c + 3 bars each, three joining bars
  'compound-three-bar': { panels: [3, 7], count: (n) => ({ j: 2 * n + 4, m: 4 * n + 5 }) },
};

const reactions = (t: FamilyTopology) => t.supports.reduce((r, s) => r + (s.kind === 'pin' ? 2 : 1), 0);

function coords(id: string, p: Params) {
  const f = getFamily(id)!;
  const q = withDefaults(f, p);
  const t = f.topology(q);
  const x = new Float64Array(t.nodeIds.length);
  const y = new Float64Array(t.nodeIds.length);
  f.geometry(q, t, x, y);
  return { t, x, y };
}

/**
 * Rank of the equilibrium matrix (2j × (m + r), unit member vectors and reaction directions) by
 * Gaussian elimination with full pivoting; pivots below 1e-9 of the largest entry count as zero.
 * Written here so the check does not depend on the engine. Returns k = 2j − ρ and s = m + r − ρ.
 */
function mechanismsAndSelfStress(t: FamilyTopology, x: Float64Array, y: Float64Array): { k: number; s: number } {
  const rows = 2 * x.length;
  const cols: number[][] = [];
  for (let e = 0; e < t.from.length; e++) {
    const a = t.from[e];
    const b = t.to[e];
    const L = Math.hypot(x[b] - x[a], y[b] - y[a]);
    const c = new Array(rows).fill(0);
    c[2 * b] = (x[b] - x[a]) / L; c[2 * b + 1] = (y[b] - y[a]) / L;
    c[2 * a] = -c[2 * b]; c[2 * a + 1] = -c[2 * b + 1];
    cols.push(c);
  }
  for (const s of t.supports) {
    const dirs = s.kind === 'pin' ? [0, Math.PI / 2] : [s.angle];
    for (const th of dirs) {
      const c = new Array(rows).fill(0);
      c[2 * s.node] = Math.cos(th); c[2 * s.node + 1] = Math.sin(th);
      cols.push(c);
    }
  }
  const A = cols.map((c) => [...c]);
  let rank = 0;
  const tol = 1e-9;
  const used = new Array(cols.length).fill(false);
  for (let r = 0; r < rows; r++) {
    let best = -1; let bestRow = -1; let big = tol;
    for (let c = 0; c < A.length; c++) if (!used[c]) for (let i = r; i < rows; i++) if (Math.abs(A[c][i]) > big) { big = Math.abs(A[c][i]); best = c; bestRow = i; }
    if (best < 0) break;
    for (const col of A) [col[r], col[bestRow]] = [col[bestRow], col[r]];
    used[best] = true;
    const piv = A[best][r];
    for (let c = 0; c < A.length; c++) {
      if (used[c]) continue;
      const f = A[c][r] / piv;
      if (f !== 0) for (let i = r; i < rows; i++) A[c][i] -= f * A[best][i];
    }
    rank++;
  }
  return { k: rows - rank, s: cols.length - rank };
}

describe('the rank check itself', () => {
  const frame = (nodes: [number, number][], bars: [number, number][]): [FamilyTopology, Float64Array, Float64Array] => [{
    nodeIds: nodes.map((_, i) => `J${i}`), memberIds: bars.map((_, e) => `m${e}`),
    from: Int32Array.from(bars, (b) => b[0]), to: Int32Array.from(bars, (b) => b[1]),
    supports: [{ node: 0, kind: 'pin', angle: 0 }, { node: 1, kind: 'roller', angle: Math.PI / 2 }],
    topChord: new Int32Array(0), bottomChord: new Int32Array(0), groups: bars.map(() => 'web'),
  }, Float64Array.from(nodes, (n) => n[0]), Float64Array.from(nodes, (n) => n[1])];
  it('a triangle on pin + roller is determinate; a square panel without diagonal has one mechanism; with two, one self-stress', () => {
    // statics: 3 joints, 3 bars, r = 3 → k = s = 0; the square: m + r = 7 < 8 → k = 1; crossed: s = 1
    expect(mechanismsAndSelfStress(...frame([[0, 0], [4, 0], [2, 2]], [[0, 1], [1, 2], [2, 0]]))).toEqual({ k: 0, s: 0 });
    const sq: [number, number][] = [[0, 0], [4, 0], [4, 3], [0, 3]];
    expect(mechanismsAndSelfStress(...frame(sq, [[0, 1], [1, 2], [2, 3], [3, 0]]))).toEqual({ k: 1, s: 0 });
    expect(mechanismsAndSelfStress(...frame(sq, [[0, 1], [1, 2], [2, 3], [3, 0], [0, 2], [1, 3]]))).toEqual({ k: 0, s: 1 });
  });
});

describe('counts per family and panel count', () => {
  it('covers every family', () => {
    expect(Object.keys(EXPECTED).sort()).toEqual(families.map((f) => f.id).sort());
  });
  for (const f of families) {
    const spec = EXPECTED[f.id];
    for (const n of spec.panels) {
      it(`${f.id}, ${n} panels: j and m as the pattern gives, m = 2j − 3 with r = 3 (common practice; Maxwell 1864)`, () => {
        const p = withDefaults(f, { panels: n });
        expect(f.check(p)).toEqual([]);
        const t = f.topology(p);
        const e = spec.count(n, p);
        expect(t.nodeIds.length).toBe(e.j);
        expect(t.memberIds.length).toBe(e.m);
        expect(reactions(t)).toBe(3);
        expect(e.m).toBe(2 * e.j - 3);
        expect(t.from.length).toBe(e.m);
        expect(t.groups.length).toBe(e.m);
      });
      it(`${f.id}, ${n} panels: equilibrium matrix of full rank, no mechanism, no self-stress (Calladine 1978)`, () => {
        const { t, x, y } = coords(f.id, { panels: n });
        expect(mechanismsAndSelfStress(t, x, y)).toEqual({ k: 0, s: 0 });
      });
    }
  }
});

describe('variants that change the counts', () => {
  it('cantilever with a square tip: one more joint, two more bars (chord pattern)', () => {
    for (const n of [1, 5]) {
      const { t, x, y } = coords('cantilever', { panels: n, tip: 'square' });
      expect([t.nodeIds.length, t.memberIds.length]).toEqual([2 * n + 2, 4 * n + 1]);
      expect(mechanismsAndSelfStress(t, x, y)).toEqual({ k: 0, s: 0 });
    }
  });
  it('cantilever wall supports: pin-pin drops the wall post (r = 4); all three determinate (Maxwell 1864: m + r = 2j)', () => {
    for (const [supports, r] of [['pin-pin', 4], ['pin-roller', 3], ['roller-pin', 3]] as const) {
      const { t, x, y } = coords('cantilever', { panels: 4, supports });
      expect(reactions(t)).toBe(r);
      expect(t.memberIds.length + r).toBe(2 * t.nodeIds.length);
      expect(mechanismsAndSelfStress(t, x, y)).toEqual({ k: 0, s: 0 });
    }
  });
  it('pin-pin on a simple truss: one self-stress state (Calladine 1978: m + r − 2j = s − k)', () => {
    const { t, x, y } = coords('pratt', { supports: 'pin-pin' });
    expect(mechanismsAndSelfStress(t, x, y)).toEqual({ k: 0, s: 1 });
  });
  it('roller-roller: one mechanism, the horizontal slide (all reactions parallel)', () => {
    const { t, x, y } = coords('howe-roof', { supports: 'roller-roller' });
    expect(reactions(t)).toBe(2);
    expect(mechanismsAndSelfStress(t, x, y)).toEqual({ k: 1, s: 0 });
  });
  it('pin-inclined: stable at 60°, a mechanism at 0° where the roller reaction passes through the pin', () => {
    const ok = coords('warren', { supports: 'pin-inclined', rollerAngle: 60 });
    expect(mechanismsAndSelfStress(ok.t, ok.x, ok.y)).toEqual({ k: 0, s: 0 });
    const bad = coords('warren', { supports: 'pin-inclined', rollerAngle: 0 });
    expect(mechanismsAndSelfStress(bad.t, bad.x, bad.y)).toEqual({ k: 1, s: 1 });
  });
  for (const [id, linkage] of [['compound-link', 'concurrent'], ['compound-three-bar', 'concurrent'], ['compound-three-bar', 'parallel']]) {
    it(`${id} linkage ${linkage}: the count is satisfied yet the frame is unstable (a critical form)`, () => {
      for (const n of [3, 7]) {
        const { t, x, y } = coords(id, { panels: n, linkage });
        expect(t.memberIds.length + reactions(t)).toBe(2 * t.nodeIds.length);
        const { k, s } = mechanismsAndSelfStress(t, x, y);
        expect(k).toBeGreaterThan(0);
        expect(s).toBe(k);
      }
    });
  }
});

describe('ids, groups and chord chains', () => {
  for (const f of families) {
    for (const n of EXPECTED[f.id].panels) {
      it(`${f.id}, ${n} panels`, () => {
        const { t, x } = coords(f.id, { panels: n });
        expect(new Set(t.nodeIds).size).toBe(t.nodeIds.length);
        expect(new Set(t.memberIds).size).toBe(t.memberIds.length);
        const prefix: Record<string, string> = { top: 'TC', bottom: 'BC', diagonal: 'D', vertical: 'V', link: 'L', web: 'W' };
        t.groups.forEach((g, e) => expect(t.memberIds[e]).toMatch(new RegExp(`^${prefix[g]}\\d+$`)));
        for (const chain of [t.topChord, t.bottomChord]) {
          expect(x[chain[0]]).toBeCloseTo(0, 12);
          expect(x[chain[chain.length - 1]]).toBeCloseTo(x.reduce((a, v) => Math.max(a, v), 0), 12);
          for (let k = 1; k < chain.length; k++) expect(x[chain[k]]).toBeGreaterThan(x[chain[k - 1]]);
        }
        // Joints numbered along the span keep the band narrow (the largest index gap of a member).
        for (let j = 1; j < x.length; j++) expect(x[j]).toBeGreaterThanOrEqual(x[j - 1] - 1e-12);
        let band = 0;
        for (let e = 0; e < t.from.length; e++) band = Math.max(band, Math.abs(t.from[e] - t.to[e]));
        expect(band).toBeLessThanOrEqual(6);
      });
    }
  }
});
