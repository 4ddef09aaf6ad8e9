/**
 * A sized sweep (a study with `design`) keeps its design figures through a push: weight and largest
 * utilisation are stored per variant and can be sorted and charted on the server.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cleanRuns, pushBody, roofStudy, sweep, type SweptRun } from './support/run-fixtures';
import { startTestApp, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';
import { Run } from '../../server/db/models/run.model';
import { Variant } from '../../server/db/models/variant.model';

let t: TestApp;
let w: World;
let run: SweptRun;
const STUDY = roofStudy('sized push test', { panels: [6, 8], supports: ['pin-roller', 'roller-roller'], depth: { from: 1.5, to: 3, count: 6 } }, {
  design: { code: 'aisc360-16-lrfd', material: 'a500-c-round', catalogue: 'chs' },
});

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

describe('a pushed sized run', () => {
  it('stores each stable variant’s weight and utilisation as the JSONL has them; unstable ones have none', async () => {
    const res = await w.as('viewer').get(`/api/projects/${w.project.slug}/runs/${run.manifest.runId}/variants?pageSize=500&sort=weight`).expect(200);
    const byIndex = new Map(run.records.map((r) => [r.index, r as unknown as { status: string; design: { weight: number; maxUtilisation: number } | null }]));
    expect(res.body.items).toHaveLength(run.records.length);
    for (const v of res.body.items as { index: number; status: string; weight: number | null; maxUtilisation: number | null }[]) {
      const rec = byIndex.get(v.index)!;
      if (rec.status === 'unstable') expect(v.weight).toBeNull();
      else {
        expect(v.weight).toBeCloseTo(rec.design!.weight, 6);
        expect(v.maxUtilisation).toBeCloseTo(rec.design!.maxUtilisation, 6);
      }
    }
    const weights = (res.body.items as { weight: number | null }[]).map((v) => v.weight).filter((x): x is number => x !== null);
    expect(weights).toEqual([...weights].sort((a, b) => a - b));
  });

  it('the server re-sizes a variant to check its pushed figures, and says where one differs', async () => {
    const base = `/api/projects/${w.project.slug}/runs/${run.manifest.runId}/variants`;
    for (const status of ['determinate', 'unstable']) {
      const r = run.records.find((x) => x.status === status)!;
      const body = (await w.as('viewer').get(`${base}/${r.index}`).expect(200)).body;
      expect([status, body.check]).toEqual([status, { matches: true, differences: [], note: expect.stringContaining('not the sized sections') }]);
    }
    const r = run.records.find((x) => x.status === 'determinate')!;
    const dbRun = (await Run.findOne({ where: { runId: run.manifest.runId } }))!;
    await Variant.update({ maxDisplacement: r.maxDisplacement!.value * 2 }, { where: { runPk: dbRun.id, index: r.index } });
    try {
      const body = (await w.as('viewer').get(`${base}/${r.index}`).expect(200)).body;
      expect(body.check.differences).toEqual([{ field: 'maxDisplacement', stored: r.maxDisplacement!.value * 2, recomputed: expect.closeTo(r.maxDisplacement!.value, 8) }]);
    } finally {
      await Variant.update({ maxDisplacement: r.maxDisplacement!.value }, { where: { runPk: dbRun.id, index: r.index } });
    }
  });
});
