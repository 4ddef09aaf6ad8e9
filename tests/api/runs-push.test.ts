/**
 * POST /projects/:slug/runs: a real sweep pushed as NDJSON; idempotent on the run; shards of one
 * study merging into one run with summed counts; one transaction, so a failure anywhere leaves
 * nothing behind.
 */
import { randomUUID } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addToSummary, emptySummary, summaryInputFromJson, type SweepSummary } from '../../shared/sweep/summary';
import { studyHash } from '../../shared/sweep/variant-id';
import type { Study as StudyFile } from '../../shared/schemas/study';
import { AuditLog } from '../../server/db/models/audit-log.model';
import { Run } from '../../server/db/models/run.model';
import { Study } from '../../server/db/models/study.model';
import { Variant } from '../../server/db/models/variant.model';
import { cleanRuns, pushBody, roofStudy, runLine, sweep, type SweptRun } from './support/run-fixtures';
import { startTestApp, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;
let big: SweptRun;
const BIG = roofStudy('push test, 3,600 variants', { panels: [8, 10, 12], supports: ['pin-roller', 'pin-pin', 'roller-pin', 'roller-roller'], depth: { from: 0.8, to: 4, count: 300 } });

beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
  big = sweep(BIG);
}, 120_000);
afterAll(async () => {
  cleanRuns();
  await t.close();
});

const url = () => `/api/projects/${w.project.slug}/runs`;
const push = (body: Buffer, actor: 'engineer' | 'outsider' = 'engineer', slug = w.project.slug) =>
  w.as(actor).post(`/api/projects/${slug}/runs`).set('Content-Type', 'application/x-ndjson').send(body);

/** The run line of `run` as if its study had another name (another hash) and the run another id. */
function fresh(run: SweptRun, name: string, over: { summary?: unknown; status?: string } = {}): Record<string, unknown> {
  const body = { ...run.study, name };
  const hash = studyHash(body as StudyFile);
  const manifest = { ...run.manifest, runId: randomUUID(), study: { ...(run.manifest.study as object), name, hash }, ...(over.status ? { status: over.status } : {}) };
  return runLine(run, { manifest, study: { name, family: 'pratt', hash, body }, ...(over.summary ? { summary: over.summary } : {}) });
}

const summaryOf = (lines: string[], objective: SweptRun['summary']['objective']): SweepSummary => {
  const s = emptySummary(objective as SweepSummary['objective']);
  for (const l of lines) addToSummary(s, summaryInputFromJson(JSON.parse(l)));
  return JSON.parse(JSON.stringify(s)) as SweepSummary; // NaN → null, as summary.json holds them
};

describe('push', () => {
  it('stores a run: its study (body, hash), every variant with p-columns, summary and audit', async () => {
    const res = await push(pushBody(big)).expect(201);
    expect(res.body).toMatchObject({ runId: big.manifest.runId, created: true, unchanged: false, inserted: 3600, variantCount: 3600, status: 'complete' });
    const run = (await Run.findOne({ where: { runId: big.manifest.runId } }))!;
    expect(run.paramColumns).toEqual({ span: 'p1', depth: 'p2', panels: 'p3', rollerAngle: 'p4' });
    expect(await Variant.count({ where: { runPk: run.id } })).toBe(3600);
    const study = (await Study.findByPk(run.studyId))!;
    expect([study.hash.trim(), study.body]).toEqual([studyHash(BIG as StudyFile), BIG]);
    const v = (await Variant.findOne({ where: { runPk: run.id, index: 1234 } }))!;
    const rec = big.records[1234];
    expect([v.variantId, v.p2, v.p3, v.status, v.peakCompression, v.peakTensionMember]).toEqual([rec.id, rec.params.depth, rec.params.panels, rec.status, rec.peakCompression?.value ?? null, rec.peakTension?.member ?? null]);
    expect((run.summary as SweepSummary).byStatus).toEqual(big.summary.byStatus);
    expect(await AuditLog.count({ where: { action: 'run.push', entityId: run.runId } })).toBe(1);
  });

  it('stores the same rows from lines in another layout (read by JSON.parse and the schema), alone or mixed with the CLI layout in one push', async () => {
    // White space after every colon: valid NDJSON that the byte reader of the CLI layout hands on.
    const spaced = (l: string) => JSON.stringify(JSON.parse(l), null, 1).replace(/\n */g, ' ');
    const stored = async (runId: string) => {
      const run = (await Run.findOne({ where: { runId } }))!;
      const rows = await Variant.findAll({ where: { runPk: run.id }, order: [['index', 'ASC']], raw: true });
      return rows.map(({ id: _id, runPk: _run, ...rest }) => rest);
    };
    const want = await stored(big.manifest.runId);
    expect(want).toHaveLength(3600);
    for (const lines of [big.lines.map(spaced), big.lines.map((l, i) => (i >= 2500 ? spaced(l) : l))]) {
      const header = fresh(big, `push test, layout ${randomUUID()}`);
      await push(pushBody(big, { header, lines })).expect(201);
      expect(await stored((header.manifest as { runId: string }).runId)).toEqual(want);
    }
  });

  it('the variants table has no CHECK but json_valid(params), the one the bulk insert may skip (runs-insert.ts)', async () => {
    const checks = await Run.sequelize!.query<{ clause: string }>(
      "SELECT CHECK_CLAUSE AS clause FROM information_schema.CHECK_CONSTRAINTS WHERE CONSTRAINT_SCHEMA = DATABASE() AND TABLE_NAME = 'variants'",
      { type: QueryTypes.SELECT },
    );
    expect(checks.map((c) => c.clause)).toEqual(['json_valid(`params`)']);
  });

  it('is idempotent: the same run again changes nothing', async () => {
    const before = (await Run.findOne({ where: { runId: big.manifest.runId } }))!;
    const res = await push(pushBody(big)).expect(200);
    expect(res.body).toMatchObject({ runId: big.manifest.runId, unchanged: true, inserted: 0, variantCount: 3600 });
    const after = (await Run.findByPk(before.id))!;
    expect([after.variantCount, after.updatedAt.getTime(), await Variant.count({ where: { runPk: before.id } })]).toEqual([3600, before.updatedAt.getTime(), 3600]);
    expect(await AuditLog.count({ where: { action: 'run.push', entityId: before.runId } })).toBe(1);
  });

  it('merges the shards of one study into one run; counts and summary add up to the unsharded sweep', async () => {
    const study = roofStudy('push test, shards', { depth: { from: 1, to: 3, count: 25 }, panels: [6, 8], supports: ['pin-roller', 'pin-pin', 'roller-roller'] });
    const whole = sweep(study);
    const shards = ['2/3', '1/3', '3/3'].map((s) => sweep(study, s));
    const key = `${studyHash(study as StudyFile)}/3`;
    const statuses: unknown[] = [];
    for (const s of shards) statuses.push((await push(pushBody(s, { per: 7 }))).body);
    expect(statuses.map((b) => (b as { status: string }).status)).toEqual(['partial', 'partial', 'complete']);
    expect(statuses.map((b) => (b as { created: boolean }).created)).toEqual([true, false, false]);
    const run = (await Run.findOne({ where: { runId: key } }))!;
    expect(run.variantCount).toBe(whole.records.length);
    expect(run.variantCount).toBe(shards.reduce((n, s) => n + s.records.length, 0));
    expect(await Variant.count({ where: { runPk: run.id } })).toBe(150);
    const summary = run.summary as SweepSummary;
    expect([summary.evaluated, summary.byStatus, summary.critical]).toEqual([whole.summary.evaluated, whole.summary.byStatus, whole.summary.critical]);
    expect(summary.best.map((b) => b.index)).toEqual((whole.summary.best as { index: number }[]).map((b) => b.index));
    expect((run.shards as { index: number }[]).map((s) => s.index)).toEqual([1, 2, 3]);
    const again = await push(pushBody(shards[0])).expect(200);
    expect(again.body).toMatchObject({ unchanged: true, variantCount: 150 });
    // The key holds a slash: encoded in the URL, it reads back like any run.
    const detail = await w.as('viewer').get(`${url()}/${encodeURIComponent(key)}`).expect(200);
    expect([detail.body.runId, detail.body.status, detail.body.shards.map((s: { variants: number }) => s.variants)]).toEqual([key, 'complete', shards.slice().sort((a, b) => a.manifest.shard.index - b.manifest.shard.index).map((s) => s.records.length)]);
    const page = await w.as('viewer').get(`${url()}/${encodeURIComponent(key)}/variants?pageSize=500`).expect(200);
    expect(page.body.items.map((i: { index: number }) => i.index)).toEqual(whole.records.map((r) => r.index));
  });

  it('adds only what follows when an interrupted run is pushed again complete', async () => {
    const header = fresh(big, 'push test, resumed', { status: 'interrupted', summary: summaryOf(big.lines.slice(0, 1000), big.summary.objective) });
    const first = await push(pushBody(big, { header, lines: big.lines.slice(0, 1000) })).expect(201);
    expect(first.body).toMatchObject({ status: 'interrupted', inserted: 1000, variantCount: 1000 });
    const done = { ...header, manifest: { ...(header.manifest as object), status: 'complete' }, summary: big.summary };
    const second = await push(pushBody(big, { header: done })).expect(200);
    expect(second.body).toMatchObject({ created: false, status: 'complete', inserted: 2600, variantCount: 3600 });
  });
});

describe('push failures store nothing', () => {
  const counts = async () => [await Run.count(), await Study.count(), await Variant.count(), await AuditLog.count({ where: { action: 'run.push' } })];

  it('a malformed line in the middle (row 3,001): 400, rolled back', async () => {
    const before = await counts();
    const lines = [...big.lines];
    lines[3000] = lines[3000].slice(0, 40);
    const header = fresh(big, 'push test, broken line');
    const res = await push(pushBody(big, { header, lines })).expect(400);
    expect(res.body.error).toMatchObject({ code: 'invalid-ndjson', details: [{ path: 'line 3' }] });
    expect(await counts()).toEqual(before);
  });

  it('an invalid record at row 3,001: 422 with its path, rolled back', async () => {
    const before = await counts();
    const lines = [...big.lines];
    lines[3000] = lines[3000].replace(/"status":"\w+"/, '"status":"wobbly"');
    const res = await push(pushBody(big, { header: fresh(big, 'push test, bad record'), lines })).expect(422);
    expect(res.body.error.code).toBe('invalid-variants');
    expect(res.body.error.details[0].path).toBe('line 3 rows[1000].status');
    expect(await counts()).toEqual(before);
  });

  it('fewer variants than the summary counts (a cut body): 422, rolled back', async () => {
    const before = await counts();
    const res = await push(pushBody(big, { header: fresh(big, 'push test, cut'), lines: big.lines.slice(0, 2500) })).expect(422);
    expect(res.body.error).toMatchObject({ code: 'push-incomplete', details: [{ path: 'summary.evaluated' }] });
    expect(await counts()).toEqual(before);
  });

  it('a variant the run already holds (a shard claiming the range of another): 409, rolled back', async () => {
    const study = roofStudy('push test, overlapping shards', { depth: { from: 1, to: 3, count: 10 }, panels: [6, 8], supports: ['pin-roller'] });
    const [one, two] = ['1/2', '2/2'].map((s) => sweep(study, s));
    await push(pushBody(one)).expect(201);
    const before = await counts();
    const header = runLine(two, { manifest: { ...two.manifest, range: one.manifest.range }, summary: one.summary });
    const res = await push(pushBody(two, { header, lines: one.lines })).expect(409);
    expect(res.body.error.code).toBe('variant-exists');
    expect(await counts()).toEqual(before);
  });

  it('rows out of index order, or outside the range: 422', async () => {
    const lines = [big.lines[1], big.lines[0], ...big.lines.slice(2)];
    const res = await push(pushBody(big, { header: fresh(big, 'push test, order'), lines })).expect(422);
    expect(res.body.error.details[0].path).toBe('line 2 rows[1].index');
  });

  it('a run line that does not validate or hold together: 422 with paths', async () => {
    const bad = runLine(big, { manifest: { ...big.manifest, runId: 'not-a-uuid' } });
    const res = await push(pushBody(big, { header: bad })).expect(422);
    expect(res.body.error.details.map((d: { path: string }) => d.path)).toContain('line 1 manifest.runId');
    const edited = runLine(big, { study: { ...(runLine(big).study as object), body: { ...big.study, name: 'edited' } } });
    const res2 = await push(pushBody(big, { header: edited })).expect(422);
    expect(res2.body.error.details.map((d: { path: string }) => d.path)).toContain('line 1 study.hash');
  });

  it('not NDJSON: 415; empty: 400', async () => {
    await w.as('engineer').post(url()).send({ kind: 'run' }).expect(415);
    const res = await push(Buffer.alloc(0)).expect(400);
    expect(res.body.error.code).toBe('empty-push');
  });

  it('a push cut off mid-stream (the client goes away) leaves nothing, and the run can be pushed again', async () => {
    const header = fresh(big, 'push test, cut off');
    const body = pushBody(big, { header });
    const server = http.createServer(t.app);
    await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
    try {
      const { port } = server.address() as AddressInfo;
      const req = http.request({ host: '127.0.0.1', port, method: 'POST', path: url(), headers: { 'content-type': 'application/x-ndjson', authorization: `Bearer ${w.tokens.engineer}` } });
      req.on('error', () => undefined);
      req.write(body.subarray(0, Math.floor(body.length / 2)));
      await new Promise((r) => setTimeout(r, 300));
      req.destroy();
      const runId = (header.manifest as { runId: string }).runId;
      await new Promise((r) => setTimeout(r, 500));
      expect(await Run.count({ where: { runId } })).toBe(0);
      expect(t.logs.filter((l) => l.includes('"level":"error"') || l.includes('database-unavailable'))).toEqual([]);
      const again = await push(body).expect(201);
      expect(again.body).toMatchObject({ runId, inserted: 3600 });
    } finally {
      await new Promise((done) => server.close(done));
    }
  });

  it('a refusal at the first line still lets a large upload through, and answers it', async () => {
    const bad = runLine(big, { manifest: { ...big.manifest, runId: 'not-a-uuid' } });
    const body = pushBody(big, { header: bad });
    const server = http.createServer(t.app);
    await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
    try {
      const { port } = server.address() as AddressInfo;
      const req = http.request({ host: '127.0.0.1', port, method: 'POST', path: url(), headers: { 'content-type': 'application/x-ndjson', authorization: `Bearer ${w.tokens.engineer}` } });
      const answered = new Promise<number>((done, fail) => {
        req.on('response', (res) => res.resume().on('end', () => done(res.statusCode ?? 0)));
        req.on('error', fail);
      });
      for (let i = 0; i < 8; i++) req.write(body); // ≈ 14 MB: more than the socket buffers hold
      const uploaded = new Promise<boolean>((done) => req.end(() => done(true)));
      const answer = { status: await answered, uploaded: await uploaded }; // hangs if the server stopped reading
      expect(answer).toEqual({ status: 422, uploaded: true });
    } finally {
      await new Promise((done) => server.close(done));
    }
  });

  it('a run already in another project: 409', async () => {
    const res = await push(pushBody(big), 'outsider', w.other.slug).expect(409);
    expect(res.body.error.code).toBe('run-in-other-project');
  });
});
