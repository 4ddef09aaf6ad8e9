/**
 * DXF import end to end: the test draws a three-panel Pratt-like truss as ASCII DXF LINEs (in m,
 * with ends a fraction of a millimetre apart, as CAD leaves them), uploads it, imports it, and
 * checks the model: the joints are where the panel points are (3 m panels, 1.5 m deep), each LINE
 * one member, ends merged within the tolerance, the other entities counted, and the model stored
 * as an upload of kind model that the Model schema accepts.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { toStructure } from '../../shared/engine/to-structure';
import { Model } from '../../shared/schemas/model';
import { compileSchema } from '../../shared/schemas/validate';
import { startServicesApp, type ServicesApp } from './support/services-app';
import { buildWorld, type World } from './support/world';

let t: ServicesApp;
let w: World;
beforeAll(async () => {
  t = await startServicesApp();
  w = await buildWorld(t);
});
afterAll(() => t.close());

type Seg = [number, number, number, number];
const PANEL = 3;
const DEPTH = 1.5;
const jitter = 0.0003; // 0.3 mm, in metres
const B = (i: number) => [i * PANEL, 0] as const;
const T = (i: number) => [i * PANEL, DEPTH] as const;
const seg = (a: readonly [number, number], b: readonly [number, number], da = 0, db = 0): Seg => [a[0] + da, a[1], b[0], b[1] + db];
const SEGMENTS: Seg[] = [
  seg(B(0), B(1)), seg(B(1), B(2), jitter), seg(B(2), B(3), -jitter),
  seg(T(0), T(1)), seg(T(1), T(2), 0, jitter), seg(T(2), T(3)),
  seg(B(0), T(0)), seg(B(1), T(1), jitter), seg(B(2), T(2)), seg(B(3), T(3), 0, -jitter),
  seg(B(0), T(1)), seg(T(2), B(3), jitter),
];
const entity = (s: Seg) => ['0', 'LINE', '8', 'TRUSS', '10', s[0], '20', s[1], '30', 0, '11', s[2], '21', s[3], '31', 0].map(String);
const drawing = (segments: Seg[], extra: string[] = [], insunits = 6) => [
  '999', 'drawn by the test',
  '0', 'SECTION', '2', 'HEADER', '9', '$ACADVER', '1', 'AC1015', '9', '$INSUNITS', '70', String(insunits), '0', 'ENDSEC',
  '0', 'SECTION', '2', 'ENTITIES', ...segments.flatMap(entity), ...extra, '0', 'ENDSEC', '0', 'EOF', '',
].join('\n');
const OTHERS = ['0', 'TEXT', '8', 'NOTES', '10', '0', '20', '0', '1', 'R3', '0', 'CIRCLE', '10', '1', '20', '1', '40', '0.1', '0', 'DIMENSION', '8', 'DIMS'];

const url = () => `/api/projects/${w.project.slug}/uploads`;
const uploadDxf = async (text: string, name = 'r3-truss.dxf') =>
  (await w.as('engineer').post(url()).field('kind', 'dxf').attach('file', Buffer.from(text), { filename: name, contentType: 'image/vnd.dxf' }).expect(201)).body;

describe('DXF import', () => {
  it('makes the joints and members of the drawing, merging ends within 1 mm', async () => {
    const up = await uploadDxf(drawing(SEGMENTS, OTHERS));
    expect(up.summary).toEqual({ lines: 12, ignored: 3, unit: 'm' });
    const res = (await w.as('engineer').post(`${url()}/${up.upload.id}/import`).expect(201)).body;
    const model = res.model as Model;
    expect(res.report).toMatchObject({ lines: 12, members: 12, joints: 8, mergedEnds: 24 - 8, unit: 'm', tolerance: { mm: 1 }, ignored: { total: 3, byType: { TEXT: 1, CIRCLE: 1, DIMENSION: 1 } } });
    // Each panel point of the drawing is one joint, within the 0.3 mm the test moved ends by.
    for (let i = 0; i <= 3; i++) {
      for (const [x, y] of [B(i), T(i)]) expect(model.nodes.some((n) => Math.hypot(n.x - x, n.y - y) < 0.0005), `joint at ${x}, ${y}`).toBe(true);
    }
    const at = (p: readonly [number, number]) => model.nodes.find((n) => Math.hypot(n.x - p[0], n.y - p[1]) < 0.0005)!.id;
    const members = new Set(model.members.map((m) => [m.from, m.to].sort().join('-')));
    for (const [a, b] of [[B(1), B(2)], [T(1), T(2)], [B(3), T(3)], [T(2), B(3)], [B(0), T(1)]] as const) expect(members.has([at(a), at(b)].sort().join('-'))).toBe(true);
    expect(model.units).toEqual({ length: 'm', force: 'kN' });
    expect(compileSchema(Model)(model)).toEqual([]);
    expect(model.supports).toEqual([]);
    expect(toStructure(model).issues.map((i) => i.code)).toEqual(['no-supports']);
    expect(res.report.notes.join('\n')).toMatch(/Supports and loads are not part of a drawing/);
    expect(res.report.notes.join('\n')).toMatch(/3 entities other than LINE ignored \(TEXT 1, CIRCLE 1, DIMENSION 1\)/);

    // Stored as an upload of kind model whose bytes are the model.
    expect(res.upload).toMatchObject({ kind: 'model', name: 'r3-truss.model.json', contentType: 'application/json' });
    const stored = await w.as('viewer').get(`${url()}/${res.upload.id}`).expect(200);
    expect(JSON.parse(stored.text)).toEqual(model);
  });

  it('a tolerance below the gaps keeps the moved ends apart; the unit can be given', async () => {
    const up = await uploadDxf(drawing(SEGMENTS, [], 0));
    const fine = (await w.as('engineer').post(`${url()}/${up.upload.id}/import?tolerance=0.1&units=m`).expect(201)).body;
    // Six ends were moved by 0.3 mm, to five places (both moved ends at B1 went to the same one):
    // each place stays a joint of its own.
    expect(fine.report).toMatchObject({ joints: 8 + 5, tolerance: { mm: 0.1 } });
    const guessed = (await w.as('engineer').post(`${url()}/${up.upload.id}/import?tolerance=0.5 mm`).expect(201)).body;
    expect(guessed.report.unit).toBe('mm');
    expect(guessed.report.notes[0]).toMatch(/does not state its unit.*mm assumed/);
    // In mm the 0.3 mm gaps are 0.0003 mm: far below the tolerance, all merge.
    expect(guessed.report.joints).toBe(8);
  });

  it('bad queries and non-drawings are refused', async () => {
    const up = await uploadDxf(drawing(SEGMENTS));
    expect((await w.as('engineer').post(`${url()}/${up.upload.id}/import?tolerance=lots`).expect(422)).body.error.details[0].path).toBe('tolerance');
    expect((await w.as('engineer').post(`${url()}/${up.upload.id}/import?units=kN`).expect(422)).body.error.details[0].path).toBe('units');
    const empty = await uploadDxf(drawing([], OTHERS));
    expect(empty.warnings[0].message).toMatch(/no LINE entities/);
    expect((await w.as('engineer').post(`${url()}/${empty.upload.id}/import`).expect(422)).body.error.code).toBe('no-lines');
    const model = (await w.as('engineer').post(`${url()}/${up.upload.id}/import`).expect(201)).body.upload.id;
    expect((await w.as('engineer').post(`${url()}/${model}/import`).expect(422)).body.error.code).toBe('not-a-drawing');
    const res = await w.as('engineer').post(url()).field('kind', 'dxf').attach('file', Buffer.from('0\nSECTION\n2\nENTITIES\nabc\nLINE\n'), 'x.dxf').expect(422);
    expect(res.body.error.details[0]).toEqual({ path: 'line 5', message: expect.stringMatching(/group code/) });
    await w.as('viewer').post(`${url()}/${up.upload.id}/import`).expect(403);
  });
});
