/**
 * Coordinates of every family: no zero-length member, no coincident joints, mirror symmetry about
 * midspan where the pattern is symmetric, and the outline dimensions the parameters state.
 */
import { describe, expect, it } from 'vitest';
import { families, getFamily, withDefaults } from './registry';
import type { Params } from './types';

const PANELS: Record<string, [number, number]> = {
  pratt: [4, 10], howe: [4, 10], warren: [3, 8], 'warren-verticals': [2, 8], 'k-panel': [2, 6],
  'w-web': [4, 8], fan: [6, 10], 'king-post': [2, 4], 'queen-post': [4, 6], scissors: [4, 8],
  'howe-roof': [4, 8], 'pratt-roof': [4, 10], bowstring: [4, 8], cantilever: [1, 5],
  'compound-link': [3, 7], 'compound-three-bar': [3, 7],
};
/** Families whose members (not only joints) mirror about midspan in the default linkage. */
const ASYMMETRIC_JOINTS = new Set(['cantilever']);
const ASYMMETRIC_MEMBERS = new Set(['cantilever', 'compound-three-bar']);

function laidOut(id: string, p: Params) {
  const f = getFamily(id)!;
  const q = withDefaults(f, p);
  const t = f.topology(q);
  const x = new Float64Array(t.nodeIds.length);
  const y = new Float64Array(t.nodeIds.length);
  f.geometry(q, t, x, y);
  return { f, q, t, x, y };
}

const TOL = 1e-9;

describe('joints and members of every family', () => {
  it('lists a panel pair for every family', () => expect(Object.keys(PANELS).sort()).toEqual(families.map((f) => f.id).sort()));
  for (const f of families) {
    for (const n of PANELS[f.id]) {
      it(`${f.id}, ${n} panels: no zero-length member, no coincident joints, finite coordinates`, () => {
        const { t, x, y } = laidOut(f.id, { panels: n });
        for (let i = 0; i < x.length; i++) {
          expect(Number.isFinite(x[i]) && Number.isFinite(y[i])).toBe(true);
          for (let j = i + 1; j < x.length; j++) expect(Math.hypot(x[i] - x[j], y[i] - y[j])).toBeGreaterThan(1e-3);
        }
        for (let e = 0; e < t.from.length; e++) {
          const a = t.from[e];
          const b = t.to[e];
          expect(Math.hypot(x[b] - x[a], y[b] - y[a])).toBeGreaterThan(1e-3);
        }
      });
      if (ASYMMETRIC_JOINTS.has(f.id)) continue;
      it(`${f.id}, ${n} panels: joints${ASYMMETRIC_MEMBERS.has(f.id) ? '' : ' and members'} mirror about midspan (x → span − x)`, () => {
        const { q, t, x, y } = laidOut(f.id, { panels: n });
        const span = q.span as number;
        const mirror = new Int32Array(x.length).fill(-1);
        for (let i = 0; i < x.length; i++) {
          for (let j = 0; j < x.length; j++) if (Math.abs(x[j] - (span - x[i])) < TOL && Math.abs(y[j] - y[i]) < TOL) mirror[i] = j;
          expect(mirror[i]).toBeGreaterThanOrEqual(0);
        }
        if (ASYMMETRIC_MEMBERS.has(f.id)) return;
        const key = (a: number, b: number) => (a < b ? `${a}-${b}` : `${b}-${a}`);
        const bars = new Set(Array.from(t.from, (a, e) => key(a, t.to[e])));
        for (let e = 0; e < t.from.length; e++) expect(bars.has(key(mirror[t.from[e]], mirror[t.to[e]]))).toBe(true);
      });
    }
  }
});

describe('outline dimensions', () => {
  const at = (r: ReturnType<typeof laidOut>, id: string) => {
    const j = r.t.nodeIds.indexOf(id);
    return [r.x[j], r.y[j]];
  };
  it('flat: bottom chord at y = 0, top chord at y = depth', () => {
    const r = laidOut('pratt', { span: 30, depth: 3, panels: 6 });
    expect(at(r, 'B6')).toEqual([30, 0]);
    expect(at(r, 'T2')[0]).toBeCloseTo(10, 12);
    expect(at(r, 'T2')[1]).toBeCloseTo(3, 12);
  });
  it('warren: top joints over the middles of the bottom panels', () => {
    const r = laidOut('warren', { span: 20, depth: 2, panels: 5 });
    expect(at(r, 'T1')[0]).toBeCloseTo(2, 12);
    expect(at(r, 'T5')[0]).toBeCloseTo(18, 12);
  });
  it('pitched: apex at rise; slope sets rise = span/2 · tan(slope) (trigonometry)', () => {
    const r = laidOut('pratt-roof', { span: 12, rise: 2, panels: 6 });
    expect(at(r, 'T3')[1]).toBeCloseTo(2, 12);
    const s = laidOut('howe-roof', { span: 12, rise: 2, slope: 30, panels: 6 });
    expect(at(s, 'T3')[1]).toBeCloseTo(6 * Math.tan(Math.PI / 6), 12);
    expect(s.q.rise).toBeCloseTo(6 * Math.tan(Math.PI / 6), 12);
    // a point on the rafter: T1 at x = 2 is one third of the way up
    expect(at(s, 'T1')[1]).toBeCloseTo((2 / 6) * 6 * Math.tan(Math.PI / 6), 12);
  });
  it('scissors: bottom chord rises to bottomRatio · rise at midspan', () => {
    const r = laidOut('scissors', { span: 12, rise: 3, bottomRatio: 0.5, panels: 6 });
    expect(at(r, 'B3')[1]).toBeCloseTo(1.5, 12);
    expect(at(r, 'B1')[1]).toBeCloseTo(0.5, 12);
  });
  it('bowstring: parabola y = 4h·x(L − x)/L²; circle through supports and crown (geometry)', () => {
    const par = laidOut('bowstring', { span: 24, rise: 4, panels: 8, curve: 'parabolic' });
    expect(at(par, 'T2')[1]).toBeCloseTo((4 * 4 * 6 * 18) / 24 ** 2, 12);
    const cir = laidOut('bowstring', { span: 24, rise: 4, panels: 8, curve: 'circular' });
    const R = (12 ** 2 + 4 ** 2) / (2 * 4);
    // every top joint lies on the circle of radius R centred at (12, 4 − R)
    for (const id of ['T1', 'T2', 'T3', 'T4', 'T7']) {
      const [x, y] = at(cir, id);
      expect(Math.hypot(x - 12, y - (4 - R))).toBeCloseTo(R, 9);
    }
    expect(at(cir, 'T4')[1]).toBeCloseTo(4, 12);
  });
  it('cantilever: wall joints B0 (0, 0) and T0 (0, depth); the bottom chord rises to the tip', () => {
    const r = laidOut('cantilever', { span: 4, depth: 1.2, panels: 4, tip: 'square', tipDepth: 0.4 });
    expect(at(r, 'B0')).toEqual([0, 0]);
    expect(at(r, 'T0')).toEqual([0, 1.2]);
    expect(at(r, 'T4')[1] - at(r, 'B4')[1]).toBeCloseTo(0.4, 12);
  });
  it('compound-link: common joint C at mid-depth of midspan; concurrent link passes through C (collinear)', () => {
    const r = laidOut('compound-link', { span: 21, depth: 3, panels: 7, linkage: 'concurrent' });
    expect(at(r, 'C')[0]).toBeCloseTo(10.5, 12);
    expect(at(r, 'C')[1]).toBeCloseTo(1.5, 12);
    const e = r.t.groups.indexOf('link');
    const [ax, ay] = [r.x[r.t.from[e]], r.y[r.t.from[e]]];
    const [bx, by] = [r.x[r.t.to[e]], r.y[r.t.to[e]]];
    const [cx, cy] = at(r, 'C');
    expect((bx - ax) * (cy - ay) - (by - ay) * (cx - ax)).toBeCloseTo(0, 9);
  });
  it('geometry writes the same coordinates into reused buffers and scales with depth', () => {
    const f = getFamily('k-panel')!;
    const p = withDefaults(f, {});
    const t = f.topology(p);
    const x = new Float64Array(t.nodeIds.length).fill(99);
    const y = new Float64Array(t.nodeIds.length).fill(99);
    f.geometry(p, t, x, y);
    const y1 = Float64Array.from(y);
    f.geometry({ ...p, depth: 2 * (p.depth as number) }, t, x, y);
    for (let i = 0; i < y.length; i++) expect(y[i]).toBeCloseTo(2 * y1[i], 12);
  });
});
