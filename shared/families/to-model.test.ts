/**
 * Model files built from family variants: valid against the model schema, consistent ids, loads
 * per case whose totals match statics.
 */
import { Value } from '@sinclair/typebox/value';
import { describe, expect, it } from 'vitest';
import { Model } from '../schemas/model';
import { getFamily, families } from './registry';
import { buildModel } from './to-model';

describe('buildModel', () => {
  for (const f of families) {
    it(`${f.id}: default variant is a valid model file with consistent ids`, () => {
      const m = buildModel(f, {}, { loads: [{ case: 'D', kind: 'self-weight' }] });
      expect(Value.Check(Model, m)).toBe(true);
      const nodes = new Set(m.nodes.map((n) => n.id));
      expect(nodes.size).toBe(m.nodes.length);
      expect(new Set(m.members.map((e) => e.id)).size).toBe(m.members.length);
      for (const e of m.members) expect(nodes.has(e.from) && nodes.has(e.to) && e.from !== e.to).toBe(true);
      for (const s of m.supports) expect(nodes.has(s.node)).toBe(true);
      for (const l of m.loads ?? []) expect(nodes.has(l.node)).toBe(true);
    });
  }

  it('loads per case: snow on the top chord totals value × spacing × span, dead load is the self-weight (statics)', () => {
    const f = getFamily('howe-roof')!;
    const m = buildModel(f, { span: 15, rise: 3, panels: 6 }, {
      loads: [
        { case: 'S', kind: 'area', value: 1.2, spacing: 6, chord: 'top' },
        { case: 'D', kind: 'self-weight', weight: 0.3 },
      ],
      combinations: [{ id: 'C1', factors: { D: 1.2, S: 1.6 }, source: 'ASCE/SEI 7-16 §2.3.1 combination 3 (from memory)' }],
      name: 'Shed roof',
    });
    expect(m.name).toBe('Shed roof');
    const total = (c: string) => (m.loads ?? []).filter((l) => l.case === c).reduce((s, l) => s + (l.fy ?? 0), 0);
    expect(total('S')).toBeCloseTo(-1.2 * 6 * 15, 6);
    const length = m.members.reduce((s, e) => {
      const a = m.nodes.find((n) => n.id === e.from)!;
      const b = m.nodes.find((n) => n.id === e.to)!;
      return s + Math.hypot(b.x - a.x, b.y - a.y);
    }, 0);
    expect(total('D')).toBeCloseTo(-0.3 * length, 6);
    expect(m.combinations).toEqual([{ id: 'C1', factors: { D: 1.2, S: 1.6 }, source: 'ASCE/SEI 7-16 §2.3.1 combination 3 (from memory)' }]);
    expect(Value.Check(Model, m)).toBe(true);
  });

  it('supports and section: the inclined roller angle in degrees, the stated section on every member', () => {
    const m = buildModel(getFamily('pratt')!, { supports: 'pin-inclined', rollerAngle: 60 }, { loads: [], section: { A: 0.003, E: 2.1e8 } });
    expect(m.supports).toEqual([{ node: 'B0', type: 'pin' }, { node: 'B8', type: 'roller', angle: 60 }]);
    expect(m.sections).toEqual([{ id: 'S1', A: 0.003, E: 2.1e8 }]);
    expect(m.members.every((e) => e.section === 'S1')).toBe(true);
    expect(m.units).toEqual({ length: 'm', force: 'kN', area: 'm^2', modulus: 'kN/m^2' });
  });

  it('refuses parameters that fail the family check', () => {
    expect(() => buildModel(getFamily('pratt')!, { panels: 7 }, { loads: [] })).toThrow(/panels/);
  });
});
