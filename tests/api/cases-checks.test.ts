/**
 * Reference cases on the server and the check results pushed against them: create, list, get;
 * a batch of results and the history of a case; a mail to the project's engineers when a case
 * starts failing (after a pass, or as its first result), none when it keeps failing; and the
 * "run pushed" notice the runs feature sends.
 */
import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Run } from '../../server/db/models/run.model';
import { Study } from '../../server/db/models/study.model';
import { notifyRunPushed } from '../../server/services/notify';
import { startTestApp, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;
beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
});
afterAll(() => t.close());

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
const BRACKET = JSON.parse(readFileSync(new URL('../../examples/reference/cantilever-wall-bracket.json', import.meta.url), 'utf8')) as Json;
const caseNamed = (name: string, edit: (c: Json) => void = () => {}) => {
  const c = structuredClone(BRACKET);
  c.name = name;
  edit(c);
  return c;
};
const base = () => `/api/projects/${w.project.slug}`;
let serial = 0;
const fresh = async (label: string) => {
  const name = `${label} ${++serial}`;
  await w.as('engineer').post(`${base()}/cases`).send(caseNamed(name)).expect(201);
  return name;
};
const result = (caseName: string, status: string, extra: Json = {}) => ({ caseName, file: 'examples/reference/bracket.json', status, gitCommit: 'abc1234', ...extra });
const push = (items: Json[], actor: 'engineer' | 'promoted' = 'engineer') => w.as(actor).post(`${base()}/checks`).send(items);
/** Engineers of w.project: the engineer and the promoted viewer (engineer there); admin is no member. */
const ENGINEERS = () => [w.people.engineer.email, w.people.promoted.email].sort();
const newMail = (from: number) => t.mail.slice(from);

describe('reference cases', () => {
  it('create, list with the latest result, get with the body', async () => {
    const body = caseNamed('Bracket on the server');
    const created = (await w.as('engineer').post(`${base()}/cases`).send(body).expect(201)).body.case;
    expect(created).toMatchObject({ name: 'Bracket on the server', source: body.source, frozenBy: { id: w.people.engineer.user.id }, latest: null });
    const list = (await w.as('viewer').get(`${base()}/cases`).expect(200)).body.cases as Json[];
    expect(list.find((c) => c.id === created.id)).toMatchObject({ name: 'Bracket on the server', latest: null });
    expect(list.find((c) => c.id === created.id)!.body).toBeUndefined();
    const got = (await w.as('viewer').get(`${base()}/cases/${created.id}`).expect(200)).body.case;
    expect(got.body).toEqual(body);
    await w.as('viewer').get(`${base()}/cases/99999`).expect(404);
    expect((await w.as('engineer').post(`${base()}/cases`).send(body).expect(409)).body.error.code).toBe('case-exists');
  });

  it('a bad case is 422 with the paths; a { file } model cannot be kept on the server', async () => {
    const bad = await w.as('engineer').post(`${base()}/cases`).send(caseNamed('bad', (c) => {
      c.model.members[0].to = 'NOPE';
    })).expect(422);
    expect(bad.body.error.details).toContainEqual({ path: 'model.members[0].to', message: expect.stringContaining('NOPE') });
    const shell = await w.as('engineer').post(`${base()}/cases`).send(caseNamed('bad', (c) => {
      delete c.tolerance;
      c.source.kind = 'guess';
    })).expect(422);
    expect(shell.body.error.details.map((d: Json) => d.path).sort()).toEqual(['', 'source.kind']);
    const file = await w.as('engineer').post(`${base()}/cases`).send(caseNamed('by file', (c) => (c.model = { file: 'bracket.model.json' }))).expect(422);
    expect(file.body.error.details).toEqual([{ path: 'model.file', message: expect.stringMatching(/inline/) }]);
    await w.as('reviewer').post(`${base()}/cases`).send(caseNamed('no right')).expect(403);
  });
});

describe('check results', () => {
  it('a batch is recorded; the history of a case is newest first with file, commit, details and pusher', async () => {
    const a = await fresh('history');
    const b = await fresh('other');
    const res = (await push([result(a, 'pass', { details: { compared: 9 } }), result(b, 'pass'), result(a, 'pass', { gitCommit: 'def5678' })]).expect(201)).body;
    expect(res).toMatchObject({ recorded: 3, newlyFailing: [], notified: [] });
    const history = (await w.as('viewer').get(`${base()}/checks?case=${encodeURIComponent(a)}`).expect(200)).body.results as Json[];
    expect(history.map((h) => h.gitCommit)).toEqual(['def5678', 'abc1234']);
    expect(history[1]).toMatchObject({ caseName: a, status: 'pass', file: 'examples/reference/bracket.json', details: { compared: 9 }, pushedBy: { id: w.people.engineer.user.id } });
    const all = (await w.as('viewer').get(`${base()}/checks?limit=2`).expect(200)).body.results as Json[];
    expect(all).toHaveLength(2);
    const listed = (await w.as('viewer').get(`${base()}/cases`).expect(200)).body.cases as Json[];
    expect(listed.find((c) => c.name === a)!.latest).toMatchObject({ status: 'pass', gitCommit: 'def5678' });
    await w.as('viewer').get(`${base()}/checks?case=no-such-case`).expect(404);
  });

  it('pass → drift mails the engineers once with case, figures and commit; failing again mails nobody', async () => {
    const name = await fresh('drifting');
    await push([result(name, 'pass')]).expect(201);
    const before = t.mail.length;
    const details = { compared: 12, failures: [{ figure: 'results.D.memberForces.T1', kind: 'force', want: -12.5, got: -12.9, difference: 0.4, allowed: 0.01 }], units: { length: 'm', force: 'kN' } };
    const res = (await push([result(name, 'drift', { details, gitCommit: 'bad0001' })]).expect(201)).body;
    expect(res.newlyFailing).toEqual([name]);
    expect(res.notified.sort()).toEqual(ENGINEERS());
    const sent = newMail(before);
    expect(sent.map((m) => m.to).sort()).toEqual(ENGINEERS());
    expect(sent[0].subject).toBe(`Check failed in ${w.project.name}: ${name}`);
    expect(sent[0].text).toContain('results.D.memberForces.T1: want -12.5, got -12.9 (difference 0.4, allowed 0.01)');
    expect(sent[0].text).toContain('commit: bad0001');
    expect(sent[0].text).toMatch(/last passed .* at commit abc1234/);

    const again = t.mail.length;
    expect((await push([result(name, 'drift', { details })]).expect(201)).body.newlyFailing).toEqual([]);
    expect((await push([result(name, 'error', { details: { problems: 'boom' } })]).expect(201)).body.newlyFailing).toEqual([]);
    expect(t.mail.length).toBe(again);

    // Passing again re-arms the notice.
    await push([result(name, 'pass')]).expect(201);
    expect((await push([result(name, 'invalid', { details: { problems: 'model.nodes: missing' } })]).expect(201)).body.newlyFailing).toEqual([name]);
    expect(newMail(again).at(-1)!.text).toContain('model.nodes: missing');
    const history = (await w.as('viewer').get(`${base()}/checks?case=${encodeURIComponent(name)}`).expect(200)).body.results as Json[];
    expect(history.map((h) => h.status)).toEqual(['invalid', 'pass', 'error', 'drift', 'drift', 'pass']);
  });

  it('a first result that fails mails too; one mail per engineer for a batch with several new failures', async () => {
    const [a, b] = [await fresh('new-a'), await fresh('new-b')];
    const before = t.mail.length;
    const res = (await push([result(a, 'drift'), result(b, 'error', { details: { problems: 'singular' } }), result(a, 'drift')]).expect(201)).body;
    expect(res.newlyFailing).toEqual([a, b]);
    const sent = newMail(before);
    expect(sent).toHaveLength(2);
    expect(sent[0].subject).toBe(`Checks failed in ${w.project.name}: 2 reference cases`);
    expect(sent[0].text).toContain('no passing result recorded before');
  });

  it('names a case the project lacks: 422 at its index, nothing recorded; bad bodies 422', async () => {
    const a = await fresh('known');
    const res = await push([result(a, 'pass'), result('nobody knows', 'pass')]).expect(422);
    expect(res.body.error.details).toEqual([{ path: '[1].caseName', message: expect.stringContaining('nobody knows') }]);
    expect((await w.as('viewer').get(`${base()}/checks?case=${encodeURIComponent(a)}`).expect(200)).body.results).toEqual([]);
    expect((await push([result(a, 'fine')]).expect(422)).body.error.details[0].path).toBe('[0].status');
    await push([]).expect(422);
    await w.as('reviewer').post(`${base()}/checks`).send([result(a, 'pass')]).expect(403);
  });
});

describe('notifyRunPushed', () => {
  it("mails the project's engineers but not the pusher, with the study, count, commit and link", async () => {
    const study = await Study.create({ projectId: w.project.id, name: 'Depot roof, Pratt', family: 'pratt', hash: 'a'.repeat(64), body: {}, createdBy: w.people.engineer.user.id });
    const run = await Run.create({
      runId: randomUUID(), projectId: w.project.id, studyId: study.id, pushedBy: w.people.engineer.user.id, cliVersion: '0.1.0',
      gitCommit: 'cafe123', shards: [], status: 'complete', summary: null, variantCount: 976,
    });
    const before = t.mail.length;
    const out = await notifyRunPushed({ mailer: t.mailer, logger: t.app.locals.deps.logger, config: t.config }, run);
    expect(out).toEqual({ recipients: [w.people.promoted.email], failed: [] });
    const [m] = newMail(before);
    expect(m.subject).toBe(`New run in ${w.project.name}: Depot roof, Pratt`);
    expect(m.text).toContain('Variants: 976');
    expect(m.text).toContain('Commit: cafe123');
    expect(m.text).toContain(`http://app.test/projects/${w.project.slug}/runs/${run.runId}`);

    t.mailer.failing = true;
    try {
      expect(await notifyRunPushed({ mailer: t.mailer, logger: t.app.locals.deps.logger, config: t.config }, run)).toEqual({ recipients: [], failed: [w.people.promoted.email] });
    } finally {
      t.mailer.failing = false;
    }
  });
});
