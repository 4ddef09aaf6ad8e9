import { describe, expect, it } from 'vitest';
import { Type } from '@sinclair/typebox';
import { compileSchema } from '../schemas/validate';
import { toStructure } from './to-structure';

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

/** A 4 m × 3 m triangle on a pin and a roller, two cases, two combinations, SI units. */
function base(): Json {
  return {
    name: 'Triangle',
    nodes: [{ id: 'A', x: 0, y: 0 }, { id: 'B', x: 4, y: 0 }, { id: 'C', x: 2, y: 3 }],
    members: [
      { id: 'AB', from: 'A', to: 'B' },
      { id: 'BC', from: 'B', to: 'C', section: 'S1' },
      { id: 'CA', from: 'C', to: 'A', section: 'S1' },
    ],
    sections: [{ id: 'S1', A: 0.002, E: 2.0e8 }],
    supports: [{ node: 'B', type: 'roller' }, { node: 'A', type: 'pin' }],
    loads: [
      { case: 'L', node: 'C', fx: 2, fy: -5 },
      { case: 'D', node: 'C', fy: -10 },
      { case: 'D', node: 'C', fy: -3 },
    ],
    combinations: [
      { id: 'c1', factors: { D: 1.2, L: 1.6 }, source: 'invented for the test' },
      { id: 'c2', factors: { D: 1.4 } },
    ],
  };
}

function check(edit: (m: Json) => void) {
  const m = base();
  edit(m);
  return toStructure(m);
}

/** [path, code] of every issue, for toContainEqual. */
const found = (edit: (m: Json) => void) => check(edit).issues.map((i) => [i.path, i.code]);

function expectClose(actual: ArrayLike<number>, expected: ArrayLike<number>, rel: number): void {
  expect(actual.length).toBe(expected.length);
  for (let i = 0; i < expected.length; i++)
    expect(Math.abs(actual[i] - expected[i])).toBeLessThanOrEqual(rel * Math.max(1, Math.abs(expected[i])));
}

describe('toStructure on a valid model', () => {
  const { structure: s, issues, units } = toStructure(base());

  it('has no issues and keeps ids, name and topology', () => {
    expect(issues).toEqual([]);
    expect(s!.name).toBe('Triangle');
    expect(s!.nodeIds).toEqual(['A', 'B', 'C']);
    expect(s!.memberIds).toEqual(['AB', 'BC', 'CA']);
    expect([...s!.from]).toEqual([0, 1, 2]);
    expect([...s!.to]).toEqual([1, 2, 0]);
    expect(s!.groups).toBeUndefined();
    expect(units).toEqual({ length: 'm', force: 'kN', lengthFactor: 1, forceFactor: 1 });
  });

  it('gives EA from the section, and 0.005 m² × 2.0e8 kN/m² without one', () => {
    expectClose(s!.EA, [0.005 * 2.0e8, 0.002 * 2.0e8, 0.002 * 2.0e8], 1e-15); // EA = E·A (definition)
  });

  it('orders cases by first appearance and sums loads per case and joint', () => {
    expect(s!.cases).toEqual(['L', 'D']);
    expectClose(s!.caseLoads[0], [0, 0, 0, 0, 2, -5], 1e-15); // one load, as given
    expectClose(s!.caseLoads[1], [0, 0, 0, 0, 0, -13], 1e-15); // -10 + -3 at C (statics: loads add)
  });

  it('lays out combination factors in case order, 0 for a missing case', () => {
    expect(s!.combinations.map((c) => c.id)).toEqual(['c1', 'c2']);
    expect([...s!.combinations[0].factors]).toEqual([1.6, 1.2]);
    expect([...s!.combinations[1].factors]).toEqual([0, 1.4]);
    expect(s!.combinations[0].source).toBe('invented for the test');
    expect(s!.combinations[1].source).toBeUndefined();
  });

  it('keeps supports in model order; roller default 90°, pin angle 0', () => {
    expect(s!.supports.map((p) => [p.node, p.kind])).toEqual([[1, 'roller'], [0, 'pin']]);
    expect(s!.supports[0].angle).toBeCloseTo(Math.PI / 2, 15); // 90° = π/2 rad (definition of the radian)
    expect(s!.supports[1].angle).toBe(0);
  });
});

describe('toStructure details', () => {
  it('converts an inclined roller angle from degrees to radians', () => {
    const s = check((m) => (m.supports[0].angle = 30)).structure!;
    expect(s.supports[0].angle).toBeCloseTo(Math.PI / 6, 15); // 30° = π/6 rad
    const t = check((m) => (m.supports[0].angle = 390)).structure!;
    expect(t.supports[0].angle).toBeCloseTo(Math.PI / 6, 12); // 390° is the same direction as 30°
  });

  it('ignores an angle on a pin', () => {
    expect(check((m) => (m.supports[1].angle = 45)).structure!.supports[1].angle).toBe(0);
  });

  it('fills groups when any member has one', () => {
    expect(check((m) => (m.members[1].group = 'diagonal')).structure!.groups).toEqual(['', 'diagonal', '']);
  });

  it('accepts a model without loads or combinations', () => {
    const s = check((m) => { delete m.loads; delete m.combinations; }).structure!;
    expect(s.cases).toEqual([]);
    expect(s.caseLoads).toEqual([]);
    expect(s.combinations).toEqual([]);
  });
});

describe('toStructure rejects', () => {
  it.each<[string, (m: Json) => void, string, string]>([
    ['no nodes', (m) => (m.nodes = []), 'nodes', 'model-empty'],
    ['no members', (m) => (m.members = []), 'members', 'model-empty'],
    ['a duplicate node id', (m) => m.nodes.push({ id: 'B', x: 9, y: 9 }), 'nodes[3].id', 'duplicate-id'],
    ['a duplicate member id', (m) => (m.members[2].id = 'AB'), 'members[2].id', 'duplicate-id'],
    ['a duplicate section id', (m) => m.sections.push({ id: 'S1', A: 1, E: 1 }), 'sections[1].id', 'duplicate-id'],
    ['a duplicate combination id', (m) => (m.combinations[1].id = 'c1'), 'combinations[1].id', 'duplicate-id'],
    ['a member to a missing node', (m) => (m.members[1].to = 'Z'), 'members[1].to', 'unknown-node'],
    ['a member from a missing node', (m) => (m.members[0].from = 'Z'), 'members[0].from', 'unknown-node'],
    ['a member from a node to itself', (m) => (m.members[0].to = 'A'), 'members[0].to', 'member-self'],
    ['an unknown section', (m) => (m.members[0].section = 'S9'), 'members[0].section', 'unknown-section'],
    ['a support on a missing node', (m) => (m.supports[0].node = 'Z'), 'supports[0].node', 'unknown-node'],
    ['two supports on one node', (m) => m.supports.push({ node: 'A', type: 'roller' }), 'supports[2].node', 'support-duplicate'],
    ['no supports', (m) => (m.supports = []), 'supports', 'no-supports'],
    ['a load on a missing node', (m) => (m.loads[2].node = 'Z'), 'loads[2].node', 'unknown-node'],
    ['a combination naming a case no load has', (m) => (m.combinations[1].factors.W = 1), 'combinations[1].factors.W', 'unknown-case'],
    ['an unknown length unit', (m) => (m.units = { length: 'xyz' }), 'units.length', 'unknown-unit'],
    ['a force unit that is a mass', (m) => (m.units = { force: 'kg' }), 'units.force', 'wrong-dimension'],
    ['an area unit that is a length', (m) => (m.units = { area: 'mm' }), 'units.area', 'wrong-dimension'],
    ['a modulus unit that is a force', (m) => (m.units = { modulus: 'kN' }), 'units.modulus', 'wrong-dimension'],
    ['an unknown key', (m) => (m.colour = 'red'), 'colour', 'schema-unknown-key'],
    ['an unknown nested key', (m) => (m.members[2].length = 3), 'members[2].length', 'schema-unknown-key'],
    ['a missing key', (m) => delete m.name, '', 'schema-missing-key'],
    ['a coordinate given as text', (m) => (m.nodes[1].x = '4'), 'nodes[1].x', 'schema-type'],
    ['an unknown support type', (m) => (m.supports[0].type = 'fixed'), 'supports[0].type', 'schema-one-of'],
    ['a zero area', (m) => (m.sections[0].A = 0), 'sections[0].A', 'schema-limit'],
    ['Infinity in a coordinate (1e999 in JSON)', (m) => (m.nodes[2].y = Infinity), 'nodes[2].y', 'schema-not-finite'],
    ['NaN in a load', (m) => (m.loads[0].fx = NaN), 'loads[0].fx', 'schema-not-finite'],
    ['Infinity in a modulus', (m) => (m.sections[0].E = Infinity), 'sections[0].E', 'schema-not-finite'],
    ['-Infinity in a factor', (m) => (m.combinations[0].factors.D = -Infinity), 'combinations[0].factors.D', 'schema-not-finite'],
    ['a roller angle that is not finite', (m) => (m.supports[0].angle = NaN), 'supports[0].angle', 'schema-not-finite'],
    ['a coordinate that overflows in metres', (m) => { m.units = { length: 'km' }; for (const n of m.nodes) [n.x, n.y] = [n.x * 1e306, n.y * 1e306]; }, 'nodes[1].x', 'out-of-range'],
  ])('%s', (_what, edit, path, code) => {
    const r = check(edit);
    expect(r.structure).toBeUndefined();
    expect(r.issues.map((i) => [i.path, i.code])).toContainEqual([path, code]);
    for (const i of r.issues) expect(i.message.length).toBeGreaterThan(0);
  });

  it('names the dimension in a unit message', () => {
    expect(check((m) => (m.units = { length: 'kg' })).issues[0].message).toBe("'kg' is not a length");
  });

  it('says which key is unknown or missing', () => {
    expect(check((m) => (m.colour = 'red')).issues[0].message).toBe('unknown key "colour"');
    expect(check((m) => delete m.members[0].to).issues).toContainEqual({ path: 'members[0]', code: 'schema-missing-key', message: 'missing key "to"' });
  });

  it('flags a zero-length member and its coincident joints', () => {
    const edit = (m: Json) => {
      m.nodes.push({ id: 'D', x: 4, y: 0 });
      m.members.push({ id: 'BD', from: 'B', to: 'D' });
    };
    expect(found(edit)).toContainEqual(['members[3]', 'member-zero-length']);
    expect(found(edit)).toContainEqual(['nodes[3]', 'coincident-nodes']);
  });

  it('treats joints within 1e-9 × model size as coincident, and not beyond', () => {
    // Model size 4 m (largest extent), so the tolerance is 4e-9 m.
    expect(found((m) => m.nodes.push({ id: 'D', x: 2, y: 3 + 1e-9 }))).toContainEqual(['nodes[3]', 'coincident-nodes']);
    expect(found((m) => m.nodes.push({ id: 'D', x: 2, y: 3 + 1e-8 }))).not.toContainEqual(['nodes[3]', 'coincident-nodes']);
  });

  it('reports input that is not an object', () => {
    expect(toStructure(null).issues[0].code).toBe('schema-type');
    expect(toStructure([]).issues[0].path).toBe('');
  });

  it('reports a unit problem together with the semantic ones', () => {
    const codes = found((m) => { m.units = { length: 'xyz' }; m.members[0].to = 'Z'; }).map((p) => p[1]);
    expect(codes).toEqual(expect.arrayContaining(['unknown-unit', 'unknown-node']));
  });
});

describe('toStructure converts units to SI', () => {
  const si = toStructure(base()).structure!;

  /** The base model written in other units: scale every quantity by 1 / (unit in SI). */
  function rewritten(units: Json, perM: number, perKN: number, perM2: number, perKNm2: number): Json {
    const m = base();
    m.units = units;
    for (const n of m.nodes) [n.x, n.y] = [n.x * perM, n.y * perM];
    for (const s of m.sections) [s.A, s.E] = [s.A * perM2, s.E * perKNm2];
    for (const l of m.loads) for (const k of ['fx', 'fy']) if (l[k] !== undefined) l[k] *= perKN;
    return m;
  }

  function expectSame(m: Json, rel: number): void {
    const { structure: s, issues } = toStructure(m);
    expect(issues).toEqual([]);
    expectClose(s!.x, si.x, rel);
    expectClose(s!.y, si.y, rel);
    expectClose(s!.EA.subarray(1), si.EA.subarray(1), rel); // member 0 has the default section, in SI whatever the units
    expect(s!.EA[0]).toBe(0.005 * 2.0e8);
    s!.caseLoads.forEach((row, c) => expectClose(row, si.caseLoads[c], rel));
  }

  it('mm / N / mm² / MPa gives the SI structure', () => {
    // 1 mm = 1e-3 m, 1 N = 1e-3 kN, 1 mm² = 1e-6 m², 1 MPa = 1 N/mm² = 1000 kN/m² (SI prefixes).
    expectSame(rewritten({ length: 'mm', force: 'N', area: 'mm^2', modulus: 'MPa' }, 1e3, 1e3, 1e6, 1e-3), 1e-12);
  });

  it('mm / N with area and modulus left to their defaults (mm², N/mm²)', () => {
    expectSame(rewritten({ length: 'mm', force: 'N' }, 1e3, 1e3, 1e6, 1e-3), 1e-12);
  });

  it('GPa and cm² are accepted too', () => {
    // 1 GPa = 1e6 kN/m², 1 cm² = 1e-4 m² (SI prefixes).
    expectSame(rewritten({ area: 'cm^2', modulus: 'GPa' }, 1, 1, 1e4, 1e-6), 1e-12);
  });

  it('ft / kip / in² / ksi gives the SI structure', () => {
    // NIST SP 811 Appendix B: ft = 0.3048 m and in = 0.0254 m exactly; kip = 4.448222 E+03 N;
    // ksi = 6.894757 E+06 Pa. NIST rounds kip and ksi to 7 digits, hence rel 1e-6.
    const m = rewritten({ length: 'ft', force: 'kip', area: 'in^2', modulus: 'ksi' }, 1 / 0.3048, 1 / 4.448222, 1 / 0.0254 ** 2, 1 / 6.894757e3);
    expectSame(m, 1e-6);
    expect(toStructure(m).units).toEqual({ length: 'ft', force: 'kip', lengthFactor: 0.3048, forceFactor: expect.closeTo(4.448222, 6) });
  });

  it('in / lbf with defaults (in², psi)', () => {
    // NIST SP 811 Appendix B: lbf = 4.448222 E+00 N, psi = 6.894757 E+03 Pa.
    expectSame(rewritten({ length: 'in', force: 'lbf' }, 1 / 0.0254, 1 / 4.448222e-3, 1 / 0.0254 ** 2, 1 / 6.894757), 1e-6);
  });
});

describe('schema messages for unions (the shape study files use)', () => {
  const Tagged = (kind: string, extra: Record<string, ReturnType<typeof Type.Number>>) =>
    Type.Object({ kind: Type.Literal(kind), ...extra }, { additionalProperties: false });
  const validate = compileSchema(Type.Array(Type.Union([Tagged('point', { fx: Type.Number() }), Tagged('line', { w: Type.Number() })])));

  it('reports the branch its tag names', () => {
    expect(validate([{ kind: 'line', w: 'x' }])).toEqual([{ path: '[0].w', code: 'schema-type', message: 'must be a number, not the text "x"' }]);
  });

  it('reports an unknown or missing tag once', () => {
    expect(validate([{ kind: 'area' }])).toEqual([{ path: '[0].kind', code: 'schema-one-of', message: 'must be one of "point", "line"' }]);
    expect(validate([{ w: 1 }])).toEqual([{ path: '[0]', code: 'schema-missing-key', message: 'missing key "kind"' }]);
  });

  it('names every type of a union of types', () => {
    expect(compileSchema(Type.Union([Type.Number(), Type.String()]))(true)[0].message).toBe('must be a number or a string, not true');
  });
});
