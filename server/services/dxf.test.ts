/**
 * Reading LINEs from ASCII DXF and turning them into joints and members. Coordinates are made up;
 * the expected joints follow from the tolerance rule itself (ends within the tolerance are one
 * joint), so each count below is checked against the geometry the test draws.
 */
import { describe, expect, it } from 'vitest';
import { toStructure } from '../../shared/engine/to-structure';
import { Model } from '../../shared/schemas/model';
import { compileSchema } from '../../shared/schemas/validate';
import { DxfError, readDxf } from './dxf';
import { modelFromDrawing } from './dxf-model';

type Seg = [number, number, number, number];
const line = ([x1, y1, x2, y2]: Seg, z = 0) => ['0', 'LINE', '8', 'TRUSS', '10', x1, '20', y1, '30', z, '11', x2, '21', y2, '31', z].map(String);
const dxf = (body: string[], insunits?: number) => [
  ...(insunits === undefined ? [] : ['0', 'SECTION', '2', 'HEADER', '9', '$INSUNITS', '70', String(insunits), '0', 'ENDSEC']),
  '0', 'SECTION', '2', 'ENTITIES', ...body, '0', 'ENDSEC', '0', 'EOF', '',
].join('\r\n');

describe('readDxf', () => {
  it('reads LINE coordinates, counts other entities, reads $INSUNITS', () => {
    const d = readDxf(dxf([...line([0, 0, 3000, 0]), '0', 'CIRCLE', '10', '5', '20', '5', '40', '2', '0', 'TEXT', '1', 'R3', '0', 'TEXT', '1', 'x'], 4));
    expect(d.lines).toEqual([{ x1: 0, y1: 0, x2: 3000, y2: 0, at: expect.any(Number) }]);
    expect(d.ignored).toEqual({ CIRCLE: 1, TEXT: 2 });
    expect(d.unit).toBe('mm');
  });

  it('skips LINEs without four finite coordinates and notes a z coordinate', () => {
    const d = readDxf(dxf([...line([0, 0, 1, 1], 5), '0', 'LINE', '10', '0', '20', '0', '11', '4', '0', 'LINE', '10', 'x', '20', '0', '11', '1', '21', '1']));
    expect(d.lines).toHaveLength(1);
    expect(d.withZ).toBe(1);
    expect(d.malformed).toBe(2);
  });

  it('refuses what is not a DXF drawing, with the line', () => {
    expect(() => readDxf('hello\nworld\n')).toThrow(DxfError);
    expect(() => readDxf('0\nSECTION\n2\nENTITIES\n')).toThrow(/not closed/);
    try {
      readDxf('0\nSECTION\n2\nENTITIES\nten\nLINE\n');
    } catch (e) {
      expect((e as DxfError).line).toBe(5);
    }
  });
});

describe('modelFromDrawing', () => {
  // A two-panel truss, 2 m panels, 1 m deep, drawn in mm with ends up to 0.6 mm apart.
  const segs: Seg[] = [
    [0, 0, 2000, 0], [2000.4, 0.3, 4000, 0], // bottom chord
    [0, 1000, 2000, 1000], [2000, 999.6, 4000, 1000], // top chord
    [0, 0, 0, 1000], [2000, 0, 2000, 1000.5], [4000, 0, 4000.2, 1000], // verticals
    [0, 0, 2000, 1000], [4000, 0, 2000.3, 1000], // diagonals
    [0, 0, 2000, 0], // the same bottom member drawn twice
    [3000, 500, 3000.2, 500.1], // shorter than the tolerance
  ];
  const d = readDxf(dxf(segs.flatMap((s) => line(s)), 4));
  const build = (mm: number) => modelFromDrawing(d, { name: 'R3', source: 'r3.dxf', unit: 'mm', tolerance: mm, toleranceMm: mm });

  it('merges ends within 1 mm: six truss joints (and one for the collapsed short line), nine members', () => {
    const { model, report } = build(1);
    expect(report).toMatchObject({ lines: 11, joints: 7, members: 9, duplicates: 1, zeroLength: 1 });
    // 6 truss joints plus the one the short line collapses to
    expect(model.nodes.filter((n) => n.x !== 3000.1)).toHaveLength(6);
    const near = (x: number, y: number) => model.nodes.find((n) => Math.hypot(n.x - x, n.y - y) < 1)!.id;
    const pairs = model.members.map((m) => [m.from, m.to].sort().join('-'));
    expect(pairs).toContain([near(2000, 0), near(4000, 0)].sort().join('-'));
    expect(pairs).toContain([near(4000, 0), near(2000, 1000)].sort().join('-'));
    expect(new Set(pairs).size).toBe(9);
  });

  it('a tolerance below the gaps keeps the ends apart', () => {
    expect(build(0.1).report.joints).toBeGreaterThan(7);
  });

  it('gives a model the Model schema accepts, with no supports (left for the user) and a note saying so', () => {
    const { model, report } = build(1);
    expect(compileSchema(Model)(model)).toEqual([]);
    expect(model.supports).toEqual([]);
    expect(toStructure(model).issues.map((i) => i.code)).toEqual(['no-supports']);
    expect(report.notes.join(' ')).toMatch(/Supports and loads are not part of a drawing/);
  });
});
