/**
 * Reading a pushed run: studies and runs, pages with filters and sorts, and CSV. Every
 * expectation is computed here from the sweep's own JSONL (charts: runs-charts.test.ts).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cleanRuns, figure, pushBody, roofStudy, sweep, type Rec, type SweptRun } from './support/run-fixtures';
import { startTestApp, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;
let run: SweptRun;
// 500 depths × 3 panel counts × 4 supports: determinate, indeterminate and unstable variants.
const STUDY = roofStudy('query test, 6,000 variants', { panels: [8, 10, 12], supports: ['pin-roller', 'pin-pin', 'roller-pin', 'roller-roller'], depth: { from: 0.8, to: 4, count: 500 } });

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

/** MariaDB's order: NULL below every number; ties by row id, which follows the index here. */
function sorted(records: Rec[], field: string, desc: boolean): Rec[] {
  const key = (r: Rec) => figure(r, field);
  return [...records].sort((a, b) => {
    const x = key(a), y = key(b);
    const c = x === y ? a.index - b.index : x === null ? -1 : y === null ? 1 : x - y;
    return desc ? -c : c;
  });
}

describe('studies and runs', () => {
  it('lists the study with its run count, and gives its body', async () => {
    const list = (await get(`/api/projects/${w.project.slug}/studies`).expect(200)).body as { id: number; name: string; runCount: number }[];
    const s = list.find((x) => x.name === STUDY.name)!;
    expect(s).toMatchObject({ family: 'pratt', runCount: 1 });
    expect((await get(`/api/projects/${w.project.slug}/studies/${s.id}`).expect(200)).body.body).toEqual(STUDY);
    await get(`/api/projects/${w.project.slug}/studies/999999`).expect(404);
  });

  it('lists runs (all, and of one study) and gives one in detail', async () => {
    const studyId = (await get(`/api/projects/${w.project.slug}/studies`)).body[0].id;
    const runs = (await get(`/api/projects/${w.project.slug}/runs?study=${studyId}`).expect(200)).body;
    expect(runs).toHaveLength(1);
    expect(runs[0]).toMatchObject({
      runId: run.manifest.runId, study: { id: studyId, name: STUDY.name, family: 'pratt' }, pushedBy: { id: w.people.engineer.user.id },
      cliVersion: '0.1.0-test', gitCommit: null, status: 'complete', variantCount: 6000, byStatus: run.summary.byStatus, shards: [{ index: 1, count: 1, variants: 6000 }],
    });
    expect((await get(`/api/projects/${w.project.slug}/runs?study=x`).expect(422)).body.error.details[0].path).toBe('study');
    const detail = (await get(base()).expect(200)).body;
    expect(detail).toMatchObject({ paramNames: run.manifest.paramNames, paramColumns: { span: 'p1', depth: 'p2', panels: 'p3', rollerAngle: 'p4' }, spaceSize: 6000 });
    expect(detail.combinations).toEqual(run.manifest.combinations);
    expect(detail.summary.best).toEqual(run.summary.best);
    await get(`/api/projects/${w.project.slug}/runs/00000000-0000-4000-8000-000000000000`).expect(404);
  });
});

describe('variant pages', () => {
  const indices = (body: { items: { index: number }[] }) => body.items.map((i) => i.index);

  it('default: by index, 50 a page, with the stored figures', async () => {
    const body = (await get(`${base()}/variants?page=3`).expect(200)).body;
    expect([body.total, body.page, body.pageSize]).toEqual([6000, 3, 50]);
    expect(indices(body)).toEqual(run.records.slice(100, 150).map((r) => r.index));
    const r = run.records[120];
    expect(body.items[20]).toMatchObject({
      variantId: r.id, params: r.params, status: r.status, k: r.k, s: r.s, critical: r.critical, reason: r.reason,
      peakTension: figure(r, 'peakTension'), peakCompression: figure(r, 'peakCompression'), maxDisplacement: figure(r, 'maxDisplacement'),
      peakTensionMember: r.peakTension?.member ?? null, weight: null, maxUtilisation: null, marks: [],
    });
  });

  it('filters and sorts as the same figures computed from the JSONL', async () => {
    const cases: [string, (r: Rec) => boolean, string, boolean][] = [
      ['status=determinate,indeterminate&f.depth.gte=2&sort=-peakCompression', (r) => r.status !== 'unstable' && r.params.depth as number >= 2, 'peakCompression', true],
      ['sort=spanOverDeflection&f.panels.lte=10', (r) => (r.params.panels as number) <= 10, 'spanOverDeflection', false],
      ['critical=false&status=unstable&sort=-index', (r) => !r.critical && r.status === 'unstable', 'index', true],
      ['f.peakTension.gte=100&f.peakTension.lte=300&sort=depth', (r) => r.peakTension !== null && r.peakTension.value >= 100 && r.peakTension.value <= 300, 'depth', false],
      ['ids=5,17,4000,5999&sort=-maxDisplacement', (r) => [5, 17, 4000, 5999].includes(r.index), 'maxDisplacement', true],
    ];
    for (const [q, keep, field, desc] of cases) {
      const want = sorted(run.records.filter(keep), field, desc);
      for (const page of [1, 2]) {
        const body = (await get(`${base()}/variants?${q}&pageSize=40&page=${page}`).expect(200)).body;
        expect([q, body.total]).toEqual([q, want.length]);
        expect([q, page, indices(body)]).toEqual([q, page, want.slice(40 * (page - 1), 40 * page).map((r) => r.index)]);
      }
    }
  });

  it('refuses what it does not know, with the key as the path', async () => {
    for (const [q, path] of [['sort=bogus', 'sort'], ['f.bogus.gte=1', 'f.bogus.gte'], ['f.status.gte=1', 'f.status.gte'], ['f.depth.gte=abc', 'f.depth.gte'],
      ['pageSize=501', 'pageSize'], ['page=0', 'page'], ['status=wobbly', 'status'], ['marked=maybe', 'marked'], ['ids=1,x', 'ids'], ['colour=red', 'colour'], ['sort=index&sort=k', 'sort']]) {
      const res = await get(`${base()}/variants?${q}`).expect(422);
      expect([q, res.body.error.code, res.body.error.details.map((d: { path: string }) => d.path)]).toEqual([q, 'invalid-query', [path]]);
    }
  });
});

describe('CSV', () => {
  const parse = (text: string) => text.trimEnd().split('\n').map((l) => l.split(','));

  it('streams every variant of the query in its order, across chunks, nulls where they sort', async () => {
    for (const [sort, field, desc] of [['-peakCompression', 'peakCompression', true], ['spanOverDeflection', 'spanOverDeflection', false]] as const) {
      const res = await get(`${base()}/variants.csv?sort=${sort}`).expect(200).expect('Content-Type', /text\/csv/);
      const rows = parse(res.text);
      expect(rows[0].slice(0, 8)).toEqual(['index', 'id', ...run.manifest.paramNames, 'status']);
      expect(rows.slice(1).map((r) => Number(r[0]))).toEqual(sorted(run.records, field, desc).map((r) => r.index));
    }
  });

  it('holds the figures of the filtered page query', async () => {
    const res = await get(`${base()}/variants.csv?status=determinate&f.depth.lte=1`).expect(200);
    const rows = parse(res.text);
    const want = run.records.filter((r) => r.status === 'determinate' && (r.params.depth as number) <= 1);
    expect(rows.length - 1).toBe(want.length);
    const col = (name: string) => rows[0].indexOf(name);
    const r = want[3];
    expect([rows[4][col('id')], Number(rows[4][col('depth')]), Number(rows[4][col('peakCompression_kN')]), rows[4][col('peakTensionMember')]])
      .toEqual([r.id, r.params.depth, r.peakCompression!.value, r.peakTension!.member]);
    expect(res.headers['content-disposition']).toContain(`run-${run.manifest.runId}-variants.csv`);
  });
});
