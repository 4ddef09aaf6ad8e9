/**
 * Joint loads from study loads: tributary lengths along each chord (statics: the joint loads of
 * a uniform load are its resultant split by tributary length), self-weight and point loads.
 */
import { describe, expect, it } from 'vitest';
import type { StudyLoad } from '../schemas/study-loads';
import { STEEL_UNIT_WEIGHT, addCaseLoads, loadedEntries, unknownJoints } from './loads';
import { families, getFamily, withDefaults } from './registry';
import type { Params } from './types';

/**
 * Per family, two panel counts and the plan length of the first segment of each chord chain as
 * a fraction of the span, from the pattern (what the end joint's half share is half of).
 */
const END_SEGMENT: Record<string, { panels: [number, number]; top: (n: number) => number; bottom: (n: number) => number }> = {
  pratt: { panels: [4, 10], top: (n) => 1 / n, bottom: (n) => 1 / n },
  howe: { panels: [4, 10], top: (n) => 1 / n, bottom: (n) => 1 / n },
  'warren-verticals': { panels: [2, 8], top: (n) => 1 / n, bottom: (n) => 1 / n },
  'k-panel': { panels: [2, 6], top: (n) => 1 / n, bottom: (n) => 1 / n },
  // the end diagonal runs from the support to T1 over half a panel
  warren: { panels: [3, 8], top: (n) => 1 / (2 * n), bottom: (n) => 1 / n },
  'pratt-roof': { panels: [4, 10], top: (n) => 1 / n, bottom: (n) => 1 / n },
  'howe-roof': { panels: [4, 8], top: (n) => 1 / n, bottom: (n) => 1 / n },
  scissors: { panels: [4, 8], top: (n) => 1 / n, bottom: (n) => 1 / n },
  bowstring: { panels: [4, 8], top: (n) => 1 / n, bottom: (n) => 1 / n },
  // the tie has one panel fewer than the top chord
  'w-web': { panels: [4, 8], top: (n) => 1 / n, bottom: (n) => 1 / (n - 1) },
  fan: { panels: [6, 10], top: (n) => 1 / n, bottom: () => 1 / 3 },
  'king-post': { panels: [2, 4], top: (n) => 1 / n, bottom: () => 1 / 2 },
  // posts at the third points; with 6 panels the outer rafter is halved
  'queen-post': { panels: [4, 6], top: (n) => (n === 4 ? 1 / 3 : 1 / 6), bottom: () => 1 / 3 },
  cantilever: { panels: [1, 5], top: (n) => 1 / n, bottom: (n) => 1 / n },
  'compound-link': { panels: [3, 7], top: (n) => 1 / n, bottom: (n) => 1 / n },
  'compound-three-bar': { panels: [3, 7], top: (n) => 1 / n, bottom: (n) => 1 / n },
};

function setUp(id: string, p: Params) {
  const f = getFamily(id)!;
  const q = withDefaults(f, p);
  const t = f.topology(q);
  const x = new Float64Array(t.nodeIds.length);
  const y = new Float64Array(t.nodeIds.length);
  f.geometry(q, t, x, y);
  const area = new Float64Array(t.from.length).fill(0.004);
  const out = new Float64Array(2 * t.nodeIds.length);
  return { q, t, x, y, area, out, span: q.span as number };
}

const sumFy = (out: Float64Array) => out.reduce((s, v, i) => (i % 2 ? s + v : s), 0);
const sumFx = (out: Float64Array) => out.reduce((s, v, i) => (i % 2 ? s : s + v), 0);

describe('area loads by plan projection, every family', () => {
  it('covers every family', () => expect(Object.keys(END_SEGMENT).sort()).toEqual(families.map((f) => f.id).sort()));
  for (const f of families) {
    for (const n of END_SEGMENT[f.id].panels) {
      for (const chord of ['top', 'bottom'] as const) {
        it(`${f.id}, ${n} panels, ${chord} chord: total = value × spacing × span; end joints take half their segment`, () => {
          const s = setUp(f.id, { panels: n });
          const load: StudyLoad = { case: 'S', kind: 'area', value: 0.8, spacing: 5, chord };
          addCaseLoads([load], s.t, s.x, s.y, s.area, s.out);
          // statics: the resultant of 0.8 kN/m² × 5 m over the plan span, downward
          expect(sumFy(s.out)).toBeCloseTo(-0.8 * 5 * s.span, 9);
          expect(sumFx(s.out)).toBe(0);
          const chain = chord === 'top' ? s.t.topChord : s.t.bottomChord;
          const seg = END_SEGMENT[f.id][chord](n) * s.span;
          expect(s.out[2 * chain[0] + 1]).toBeCloseTo(-0.8 * 5 * seg / 2, 9);
          // the last segment matches the first: mirror image, or a regular panel (cantilever)
          expect(s.out[2 * chain[chain.length - 1] + 1]).toBeCloseTo(-0.8 * 5 * seg / 2, 9);
        });
      }
    }
  }
});

describe('tributary lengths in detail', () => {
  it('pratt: end joints half a panel, inner joints a full panel of w × span / n', () => {
    const s = setUp('pratt', { span: 24, panels: 8 });
    addCaseLoads([{ case: 'L', kind: 'line', value: 2, chord: 'top' }], s.t, s.x, s.y, s.area, s.out);
    const at = (id: string) => s.out[2 * s.t.nodeIds.indexOf(id) + 1];
    expect(at('T0')).toBeCloseTo(-2 * 3 / 2, 12);
    expect(at('T4')).toBeCloseTo(-2 * 3, 12);
    expect(at('T8')).toBeCloseTo(-2 * 3 / 2, 12);
    expect(at('B4')).toBe(0);
  });
  it("pitched, projection 'length': total = w × rafter length 2·√((L/2)² + h²) (geometry)", () => {
    const s = setUp('w-web', { span: 12, rise: 4, panels: 6 });
    addCaseLoads([{ case: 'D', kind: 'area', value: 0.5, spacing: 4, chord: 'top', projection: 'length' }], s.t, s.x, s.y, s.area, s.out);
    expect(sumFy(s.out)).toBeCloseTo(-0.5 * 4 * 2 * Math.hypot(6, 4), 9);
  });
  it('adds into out instead of overwriting it', () => {
    const s = setUp('howe', { panels: 4 });
    s.out.fill(1);
    addCaseLoads([{ case: 'L', kind: 'line', value: 1, chord: 'bottom' }], s.t, s.x, s.y, s.area, s.out);
    expect(sumFy(s.out)).toBeCloseTo(s.t.nodeIds.length - s.span, 9);
    expect(sumFx(s.out)).toBe(s.t.nodeIds.length);
  });
});

describe('self-weight and point loads', () => {
  it('pratt self-weight: 78.5 kN/m³ × A × (2L + (n+1)h + n·√(p² + h²)), half to each end (closed form)', () => {
    const s = setUp('pratt', { span: 24, depth: 2, panels: 6 });
    addCaseLoads([{ case: 'D', kind: 'self-weight' }], s.t, s.x, s.y, s.area, s.out);
    const length = 2 * 24 + 7 * 2 + 6 * Math.hypot(4, 2);
    expect(sumFy(s.out)).toBeCloseTo(-STEEL_UNIT_WEIGHT * 0.004 * length, 9);
    // B0 carries half of BC1 and of V1 (statics: each bar's weight split equally between its ends)
    const b0 = s.t.nodeIds.indexOf('B0');
    expect(s.out[2 * b0 + 1]).toBeCloseTo(-STEEL_UNIT_WEIGHT * 0.004 * (4 + 2) / 2, 12);
  });
  it('self-weight with a stated weight per length uses it for every member', () => {
    const s = setUp('king-post', { span: 8, rise: 3, panels: 2 });
    addCaseLoads([{ case: 'D', kind: 'self-weight', weight: 0.5 }], s.t, s.x, s.y, s.area, s.out);
    // tie 8 m, rafters 2 × 5 m, post 3 m
    expect(sumFy(s.out)).toBeCloseTo(-0.5 * (8 + 10 + 3), 12);
  });
  it('point loads land on the named joint with the model signs (+ right, + up)', () => {
    const s = setUp('cantilever', { panels: 3 });
    addCaseLoads([{ case: 'P', kind: 'point', joint: 'TIP', fy: -10, fx: 2 }], s.t, s.x, s.y, s.area, s.out);
    const tip = s.t.nodeIds.indexOf('TIP');
    expect([s.out[2 * tip], s.out[2 * tip + 1]]).toEqual([2, -10]);
    expect(sumFy(s.out)).toBe(-10);
  });
  it('unconverted quantities and unknown joints are refused; unknownJoints lists them', () => {
    const s = setUp('pratt', {});
    expect(() => addCaseLoads([{ case: 'S', kind: 'area', value: '0.8 kPa', spacing: 5, chord: 'top' }], s.t, s.x, s.y, s.area, s.out)).toThrow(RangeError);
    const loads: StudyLoad[] = [{ case: 'P', kind: 'point', joint: 'X9', fy: -1 }, { case: 'P', kind: 'point', joint: 'B1', fy: -1 }];
    expect(() => addCaseLoads(loads, s.t, s.x, s.y, s.area, s.out)).toThrow(/X9/);
    expect(unknownJoints(loads, s.t)).toEqual(['X9']);
  });
});

describe('loadedEntries: the only entries addCaseLoads writes', () => {
  it.each(families.map((f) => [f.id, f] as const))('%s: every nonzero joint load is listed, with the offset applied', (_id, f) => {
    const p = withDefaults(f, {});
    const topo = f.topology(p);
    const nJ = topo.nodeIds.length;
    const x = new Float64Array(nJ), y = new Float64Array(nJ);
    f.geometry(p, topo, x, y);
    const area = new Float64Array(topo.from.length).fill(0.004);
    const loads: StudyLoad[] = [
      { case: 'D', kind: 'area', value: 0.6, spacing: 6, chord: 'top' },
      { case: 'D', kind: 'line', value: 2, chord: 'bottom', projection: 'length' },
      { case: 'D', kind: 'self-weight' },
      { case: 'D', kind: 'point', joint: topo.nodeIds[Math.floor(nJ / 2)], fx: 3, fy: -5 },
    ];
    for (const subset of [loads, loads.slice(0, 1), loads.slice(2, 3), loads.slice(3)]) {
      const listed = new Set(loadedEntries(subset, topo));
      const out = new Float64Array(2 * nJ + 7);
      addCaseLoads(subset, topo, x, y, area, out, 7);
      out.forEach((v, i) => {
        if (i < 7) expect(v).toBe(0); // nothing before the offset
        else if (v !== 0) expect(listed.has(i - 7), `entry ${i - 7}`).toBe(true);
      });
      expect([...listed]).toEqual([...listed].sort((a, b) => a - b));
    }
  });
});
