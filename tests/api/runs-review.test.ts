/** Marks and comments on variants: who may do what, one mark per person, and the `marked` filter. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Mark } from '../../server/db/models/mark.model';
import { api, startTestApp, type TestApp } from './support/test-app';
import { cleanRuns, pushBody, roofStudy, sweep } from './support/run-fixtures';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;
let runId: string;

beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
  const run = sweep(roofStudy('review test', { depth: { from: 1, to: 3, count: 10 }, panels: [6, 8], supports: ['pin-roller', 'pin-pin'] }));
  runId = (await w.as('engineer').post(`/api/projects/${w.project.slug}/runs`).set('Content-Type', 'application/x-ndjson').send(pushBody(run)).expect(201)).body.runId;
}, 120_000);
afterAll(async () => {
  cleanRuns();
  await t.close();
});

const variant = (i: number) => `/api/projects/${w.project.slug}/runs/${runId}/variants/${i}`;
const mark = (i: number) => `${variant(i)}/marks/me`;

describe('marks', () => {
  it('a reviewer may mark candidates but not reject; an engineer may do both', async () => {
    const res = await w.as('reviewer').put(mark(3)).send({ kind: 'candidate' }).expect(200);
    expect(res.body).toMatchObject({ kind: 'candidate', user: { id: w.people.reviewer.user.id, name: 'reviewer' } });
    const refused = await w.as('reviewer').put(mark(4)).send({ kind: 'rejected' }).expect(403);
    expect(refused.body.error.message).toContain('variants:reject');
    await w.as('engineer').put(mark(4)).send({ kind: 'rejected' }).expect(200);
    await w.as('viewer').put(mark(5)).send({ kind: 'candidate' }).expect(403);
  });

  it('one mark per person per variant: marking again replaces it', async () => {
    await w.as('engineer').put(mark(7)).send({ kind: 'candidate' }).expect(200);
    await w.as('engineer').put(mark(7)).send({ kind: 'rejected' }).expect(200);
    const body = (await w.as('viewer').get(variant(7)).expect(200)).body;
    expect(body.variant.marks).toEqual([{ kind: 'rejected', user: { id: w.people.engineer.user.id, name: 'engineer' }, updatedAt: expect.any(String) }]);
    expect(await Mark.count({ where: { userId: w.people.engineer.user.id } })).toBe(2); // variants 4 and 7
  });

  it('the marked filter finds the marked variants, with their marks', async () => {
    const base = `/api/projects/${w.project.slug}/runs/${runId}`;
    const cand = (await w.as('viewer').get(`${base}/variants?marked=candidate`).expect(200)).body;
    expect(cand.items.map((i: { index: number }) => i.index)).toEqual([3]);
    expect(cand.items[0].marks).toMatchObject([{ kind: 'candidate', user: { name: 'reviewer' } }]);
    const both = (await w.as('viewer').get(`${base}/variants?marked=candidate,rejected`).expect(200)).body;
    expect([both.total, both.items.map((i: { index: number }) => i.index)]).toEqual([3, [3, 4, 7]]);
    const csv = (await w.as('viewer').get(`${base}/variants.csv?marked=rejected`).expect(200)).text.trimEnd().split('\n');
    expect(csv.slice(1).map((l) => Number(l.split(',')[0]))).toEqual([4, 7]);
  });

  it('removing needs the right of the mark: a token scoped to variants:mark cannot lift a rejection', async () => {
    const tok = (await w.as('engineer').post(`/api/projects/${w.project.slug}/tokens`).send({ name: 'marks only', scopes: ['project:read', 'variants:mark'] }).expect(201)).body.token;
    await api(t.app, tok).delete(mark(4)).expect(403);
    await w.as('engineer').delete(mark(4)).expect(204);
    await w.as('engineer').delete(mark(4)).expect(204); // nothing left: still fine
    expect(await Mark.count({ where: { userId: w.people.engineer.user.id } })).toBe(1);
    await w.as('viewer').delete(mark(4)).expect(403);
  });

  it('checks the body and the variant', async () => {
    const res = await w.as('engineer').put(mark(1)).send({ kind: 'maybe' }).expect(422);
    expect(res.body.error.details[0].path).toBe('kind');
    await w.as('engineer').put(mark(999)).send({ kind: 'candidate' }).expect(404);
  });
});

describe('comments', () => {
  it('anyone in the project reads them; comments:write adds one; oldest first', async () => {
    const first = await w.as('reviewer').post(`${variant(2)}/comments`).send({ body: 'Diagonal D3 looks slender.' }).expect(201);
    expect(first.body).toMatchObject({ body: 'Diagonal D3 looks slender.', author: { id: w.people.reviewer.user.id, name: 'reviewer' } });
    await w.as('engineer').post(`${variant(2)}/comments`).send({ body: '  Agreed; try 3.2 m.  ' }).expect(201);
    await w.as('viewer').post(`${variant(2)}/comments`).send({ body: 'me too' }).expect(403);
    const list = (await w.as('viewer').get(`${variant(2)}/comments`).expect(200)).body;
    expect(list.map((c: { body: string; author: { name: string } }) => [c.author.name, c.body])).toEqual([['reviewer', 'Diagonal D3 looks slender.'], ['engineer', 'Agreed; try 3.2 m.']]);
    expect((await w.as('viewer').get(`${variant(3)}/comments`).expect(200)).body).toEqual([]);
  });

  it('refuses an empty comment and an unknown variant', async () => {
    for (const body of ['', '   ']) await w.as('engineer').post(`${variant(2)}/comments`).send({ body }).expect(422);
    await w.as('engineer').get(`${variant(999)}/comments`).expect(404);
  });
});
