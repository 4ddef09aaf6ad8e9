/**
 * Chart data and single variants of a pushed run: columnar points, 2-D bins with min/max (and the
 * mean of z), and one variant rebuilt and analysed again. Expectations come from the sweep's JSONL.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Run } from '../../server/db/models/run.model';
import { Variant } from '../../server/db/models/variant.model';
import { cleanRuns, figure, pushBody, roofStudy, sweep, type Rec, type SweptRun } from './support/run-fixtures';
import { startTestApp, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;
let run: SweptRun;
// 250 depths × 3 panel counts × 4 supports: determinate, indeterminate and unstable variants.
const STUDY = roofStudy('chart test, 3,000 variants', { panels: [8, 10, 12], supports: ['pin-roller', 'pin-pin', 'roller-pin', 'roller-roller'], depth: { from: 0.8, to: 4, count: 250 } });

beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
  run = sweep(STUDY);
  await w.as('engineer').post(`/api/projects/${w.project.slug}/runs`).set('Content-Type', 'application/x-ndjson').send(pushBody(run)).expect(201);
}, 120_000);
afterAll(async () => {
  cleanRuns();
  await t.close();
});

const base = () => `/api/projects/${w.project.slug}/runs/${run.manifest.runId}`;
const get = (path: string) => w.as('viewer').get(path);

describe('chart data', () => {
  it('points: columnar x, y, color in index order; nulls for unstable; limit truncates', async () => {
    const body = (await get(`${base()}/points?x=depth&y=peakCompression&color=panels`).expect(200)).body;
    expect([body.count, body.truncated]).toEqual([3000, false]);
    expect(body.index).toEqual(run.records.map((r) => r.index));
    expect(body.x).toEqual(run.records.map((r) => r.params.depth));
    expect(body.y).toEqual(run.records.map((r) => figure(r, 'peakCompression')));
    expect(body.color).toEqual(run.records.map((r) => r.params.panels));
    expect(body.status).toEqual(run.records.map((r) => r.status));
    const cut = (await get(`${base()}/points?x=depth&y=weight&limit=100&status=unstable`).expect(200)).body;
    expect([cut.count, cut.truncated, cut.color]).toEqual([100, true, undefined]);
    expect(cut.index).toEqual(run.records.filter((r) => r.status === 'unstable').slice(0, 100).map((r) => r.index));
    await get(`${base()}/points?x=status&y=k`).expect(422);
    await get(`${base()}/points?y=k`).expect(422);
  });

  /** Bins as the API defines them: FLOOR((v − lo) / w + 1e-9), the top edge in the last bin. */
  function bins(records: Rec[], x: string, y: string, z: string | undefined, n: number) {
    const pts = records.map((r) => [figure(r, x), figure(r, y), z ? figure(r, z) : null]).filter(([a, b]) => a !== null && b !== null) as [number, number, number | null][];
    const axis = (vals: number[]) => {
      const lo = Math.min(...vals), hi = Math.max(...vals);
      const k = hi > lo ? n : 1, w = hi > lo ? (hi - lo) / k : 1;
      return { k, edges: [...Array.from({ length: k }, (_, i) => lo + i * w), hi], at: (v: number) => Math.min(Math.floor((v - lo) / w + 1e-9), k - 1) };
    };
    const ax = axis(pts.map((p) => p[0])), ay = axis(pts.map((p) => p[1]));
    const cells = new Map<string, { n: number; vals: number[] }>();
    for (const [a, b, c] of pts) {
      const key = `${ax.at(a)},${ay.at(b)}`;
      const cell = cells.get(key) ?? { n: 0, vals: [] };
      cell.n++;
      const v = z ? c : b;
      if (v !== null) cell.vals.push(v);
      cells.set(key, cell);
    }
    return { ax, ay, pts, cell: (i: number, j: number) => cells.get(`${i},${j}`) ?? { n: 0, vals: [] } };
  }

  it('aggregate: counts and min/max of y per x × y cell match the JSONL', async () => {
    const body = (await get(`${base()}/aggregate?x=depth&y=peakCompression&bins=12`).expect(200)).body;
    const want = bins(run.records, 'depth', 'peakCompression', undefined, 12);
    expect(body.xEdges).toEqual(want.ax.edges);
    expect(body.yEdges).toEqual(want.ay.edges);
    expect(body.mean).toBeUndefined();
    let total = 0;
    for (let i = 0; i < 12; i++) for (let j = 0; j < 12; j++) {
      const { n, vals } = want.cell(i, j);
      total += body.count[i][j];
      expect([i, j, body.count[i][j]]).toEqual([i, j, n]);
      expect([i, j, body.min[i][j], body.max[i][j]]).toEqual([i, j, vals.length ? Math.min(...vals) : null, vals.length ? Math.max(...vals) : null]);
    }
    expect(total).toBe(want.pts.length);
  });

  it('aggregate with z: a heatmap of z over two parameters, with its mean', async () => {
    const body = (await get(`${base()}/aggregate?x=depth&y=panels&z=peakTension&bins=20&status=determinate`).expect(200)).body;
    const want = bins(run.records.filter((r) => r.status === 'determinate'), 'depth', 'panels', 'peakTension', 20);
    expect(body.yEdges).toEqual(want.ay.edges);
    for (let i = 0; i < 20; i++) for (let j = 0; j < 20; j++) {
      const { n, vals } = want.cell(i, j);
      expect([i, j, body.count[i][j]]).toEqual([i, j, n]);
      if (!vals.length) continue;
      const mean = vals.reduce((s, v) => s + v, 0) / vals.length;
      expect(Math.abs(body.mean[i][j] - mean)).toBeLessThanOrEqual(1e-9 * Math.abs(mean)); // mean in SQL: same sum, another order
      expect([body.min[i][j], body.max[i][j]]).toEqual([Math.min(...vals), Math.max(...vals)]);
    }
    await get(`${base()}/aggregate?x=depth&y=panels&bins=201`).expect(422);
  });
});

describe('one variant', () => {
  it('rebuilds the model from the stored study and finds the pushed figures again', async () => {
    for (const status of ['determinate', 'indeterminate', 'unstable']) {
      const r = run.records.find((x) => x.status === status && x.index > 100)!;
      const body = (await get(`${base()}/variants/${r.index}`).expect(200)).body;
      expect([status, body.check]).toEqual([status, { matches: true, differences: [] }]);
      expect(body.variant).toMatchObject({ index: r.index, variantId: r.id, marks: [] });
      expect(body.analysis.classification).toMatchObject({ status, mechanisms: r.k, selfStress: r.s, joints: r.joints, members: r.members });
      expect(body.model.members).toHaveLength(r.members);
    }
  });

  it('says where a stored figure differs from the recomputed one', async () => {
    const r = run.records.find((x) => x.status === 'determinate')!;
    const dbRun = (await Run.findOne({ where: { runId: run.manifest.runId } }))!;
    await Variant.update({ peakTension: r.peakTension!.value + 0.5 }, { where: { runPk: dbRun.id, index: r.index } });
    try {
      const body = (await get(`${base()}/variants/${r.index}`).expect(200)).body;
      expect(body.check.matches).toBe(false);
      expect(body.check.differences).toEqual([{ field: 'peakTension', stored: r.peakTension!.value + 0.5, recomputed: expect.closeTo(r.peakTension!.value, 5) }]);
    } finally {
      await Variant.update({ peakTension: r.peakTension!.value }, { where: { runPk: dbRun.id, index: r.index } });
    }
  });

  it('404 for an index the run does not hold', async () => {
    await get(`${base()}/variants/3000`).expect(404);
    await get(`${base()}/variants/abc`).expect(404);
  });
});
