/**
 * Every route × every actor → expected status (see support/world.ts for the cast). Each cell
 * prepares what it acts on, so cells do not depend on each other. Columns:
 *   anonymous admin engineer reviewer viewer outsider promoted
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { randomUUID } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { newSecret } from '../../server/auth/secrets';
import { ApiToken } from '../../server/db/models/api-token.model';
import { Invitation } from '../../server/db/models/invitation.model';
import { Membership } from '../../server/db/models/membership.model';
import { PasswordReset } from '../../server/db/models/password-reset.model';
import { Run } from '../../server/db/models/run.model';
import { bindCapturedMail, CapturedMail } from '../../server/services/smtp-sink-mail.model';
import { addMember, makeProject, makeUser, startTestApp, uniqueEmail, uniqueSlug, type TestApp } from './support/test-app';
import { cleanRuns, pushBody, roofStudy, runLine, sweep, type SweptRun } from './support/run-fixtures';
import { ACTORS, buildWorld, type Actor, type World } from './support/world';

let t: TestApp;
let w: World;

beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
});
afterAll(async () => {
  cleanRuns();
  await t.close();
});

interface Cell {
  path: string;
  body?: Record<string, unknown>;
  /** A body sent as it is, with its content type (the NDJSON push). */
  raw?: { type: string; data: Buffer };
}
type Prepare = (actor: Actor) => Promise<Cell> | Cell;

interface Row {
  route: string;
  statuses: Record<Actor, number>;
  prepare: Prepare;
}

const rows: Row[] = [];
function row(route: string, statuses: string, prepare: Prepare): void {
  const list = statuses.trim().split(/\s+/).map(Number);
  rows.push({ route, statuses: Object.fromEntries(ACTORS.map((a, i) => [a, list[i]])) as Record<Actor, number>, prepare });
}

const slug = () => w.project.slug;
const freshMember = async () => {
  const m = await makeUser('viewer');
  await addMember(m.user, w.project, 'viewer');
  return m.user.id;
};
/** A project with the same cast as w.project, to delete. */
const freshProject = async () => {
  const p = await makeProject();
  for (const m of await Membership.findAll({ where: { projectId: w.project.id } })) await Membership.create({ userId: m.userId, projectId: p.id, role: m.role });
  return p.slug;
};
const invitation = async () => {
  const { secret, hash } = newSecret();
  const inv = await Invitation.create({ projectId: w.project.id, email: uniqueEmail('invited'), role: 'viewer', tokenHash: hash, invitedBy: null, expiresAt: new Date(Date.now() + 3.6e6), usedAt: null });
  return { id: inv.id, secret };
};
const engineerToken = async () => {
  const { hash } = newSecret();
  const tok = await ApiToken.create({ userId: w.people.engineer.user.id, projectId: w.project.id, name: 'x', tokenHash: hash, prefix: newSecret(6).hash.slice(0, 12), scopes: ['project:read'], lastUsedAt: null, revokedAt: null });
  return tok.id;
};

//   route                                         anon adm eng rev view out prom
row('GET /health',                               '200 200 200 200 200 200 200', () => ({ path: '/api/health' }));
row('GET /docs',                                 '200 200 200 200 200 200 200', () => ({ path: '/api/docs' }));
row('POST /auth/sign-in',                        '200 200 200 200 200 200 200', () => ({ path: '/api/auth/sign-in', body: { email: w.people.viewer.email, password: w.people.viewer.password } }));
row('POST /auth/sign-out',                       '204 204 204 204 204 204 204', () => ({ path: '/api/auth/sign-out' }));
row('GET /auth/me',                              '401 200 200 200 200 200 200', () => ({ path: '/api/auth/me' }));
row('POST /auth/password-reset',                 '202 202 202 202 202 202 202', () => ({ path: '/api/auth/password-reset', body: { email: uniqueEmail('nobody') } }));
row('POST /auth/password-reset/confirm',         '204 204 204 204 204 204 204', async () => {
  const u = await makeUser('viewer');
  const { secret, hash } = newSecret();
  await PasswordReset.create({ userId: u.user.id, email: u.email, tokenHash: hash, expiresAt: new Date(Date.now() + 3.6e6), usedAt: null });
  return { path: '/api/auth/password-reset/confirm', body: { token: secret, password: 'a-new-password-1' } };
});
row('GET /users',                                '401 200 403 403 403 403 403', () => ({ path: '/api/users' }));
row('POST /users',                               '401 201 403 403 403 403 403', () => ({ path: '/api/users', body: { email: uniqueEmail(), name: 'New', role: 'viewer' } }));
row('GET /users/:id',                            '401 200 403 403 403 403 403', () => ({ path: `/api/users/${w.people.viewer.user.id}` }));
row('PATCH /users/:id',                          '401 200 403 403 403 403 403', async () => ({ path: `/api/users/${(await makeUser('viewer')).user.id}`, body: { name: 'Renamed' } }));
row('DELETE /users/:id',                         '401 204 403 403 403 403 403', async () => ({ path: `/api/users/${(await makeUser('viewer')).user.id}` }));
row('GET /projects',                             '401 200 200 200 200 200 200', () => ({ path: '/api/projects' }));
row('POST /projects',                            '401 201 201 403 403 201 403', () => ({ path: '/api/projects', body: { slug: uniqueSlug(), name: 'New' } }));
row('GET /projects/:slug',                       '401 200 200 200 200 404 200', () => ({ path: `/api/projects/${slug()}` }));
row('PATCH /projects/:slug',                     '401 200 403 403 403 404 403', () => ({ path: `/api/projects/${slug()}`, body: { description: 'Edited' } }));
row('DELETE /projects/:slug',                    '401 204 403 403 403 404 403', async () => ({ path: `/api/projects/${await freshProject()}` }));
row('GET /projects/:slug/members',               '401 200 200 200 200 404 200', () => ({ path: `/api/projects/${slug()}/members` }));
row('POST /projects/:slug/members',              '401 201 403 403 403 404 403', async () => ({ path: `/api/projects/${slug()}/members`, body: { email: (await makeUser('viewer')).email, role: 'viewer' } }));
row('PATCH /projects/:slug/members/:userId',     '401 200 403 403 403 404 403', async () => ({ path: `/api/projects/${slug()}/members/${await freshMember()}`, body: { role: 'reviewer' } }));
row('DELETE /projects/:slug/members/:userId',    '401 204 403 403 403 404 403', async () => ({ path: `/api/projects/${slug()}/members/${await freshMember()}` }));
row('POST /projects/:slug/invitations',          '401 201 201 403 403 404 201', () => ({ path: `/api/projects/${slug()}/invitations`, body: { email: uniqueEmail('invitee'), role: 'viewer' } }));
row('GET /projects/:slug/invitations',           '401 200 200 403 403 404 200', () => ({ path: `/api/projects/${slug()}/invitations` }));
row('DELETE /projects/:slug/invitations/:id',    '401 204 204 403 403 404 204', async () => ({ path: `/api/projects/${slug()}/invitations/${(await invitation()).id}` }));
row('POST /invitations/accept',                  '201 201 201 201 201 201 201', async () => ({ path: '/api/invitations/accept', body: { token: (await invitation()).secret, name: 'Invitee', password: 'a-long-password' } }));
row('POST /projects/:slug/tokens',               '401 201 201 403 403 404 201', () => ({ path: `/api/projects/${slug()}/tokens`, body: { name: 'cli' } }));
row('GET /projects/:slug/tokens',                '401 200 200 403 403 404 200', () => ({ path: `/api/projects/${slug()}/tokens` }));
// The token belongs to the engineer: a project admin may revoke it, another engineer may not see it.
row('DELETE /projects/:slug/tokens/:id',         '401 204 204 403 403 404 404', async () => ({ path: `/api/projects/${slug()}/tokens/${await engineerToken()}` }));

// Runs: one tiny sweep, pushed once by the engineer for the read rows; each push cell sends a new run id.
let tiny: SweptRun | undefined;
let matrixRun: string | undefined;
const tinySweep = () => (tiny ??= sweep(roofStudy('rights matrix', { depth: [1.5, 2], panels: [6], supports: ['pin-roller', 'roller-roller'] })));
const tinyPush = () => ({ type: 'application/x-ndjson', data: pushBody(tinySweep(), { header: runLine(tinySweep(), { manifest: { ...tinySweep().manifest, runId: randomUUID() } }) }) });
const runPath = async () => {
  if (!matrixRun) {
    const res = await w.as('engineer').post(`/api/projects/${slug()}/runs`).set('Content-Type', 'application/x-ndjson').send(tinyPush().data);
    matrixRun = res.body.runId as string;
  }
  return `/api/projects/${slug()}/runs/${matrixRun}`;
};
const studyId = async () => (await Run.findOne({ where: { runId: (await runPath()).split('/').pop()! } }))!.studyId;
row('GET /projects/:slug/studies',               '401 200 200 200 200 404 200', () => ({ path: `/api/projects/${slug()}/studies` }));
row('GET /projects/:slug/studies/:id',           '401 200 200 200 200 404 200', async () => ({ path: `/api/projects/${slug()}/studies/${await studyId()}` }));
row('POST /projects/:slug/runs',                 '401 201 201 403 403 404 201', () => ({ path: `/api/projects/${slug()}/runs`, raw: tinyPush() }));
row('GET /projects/:slug/runs',                  '401 200 200 200 200 404 200', () => ({ path: `/api/projects/${slug()}/runs` }));
row('GET /projects/:slug/runs/:runId',           '401 200 200 200 200 404 200', async () => ({ path: await runPath() }));
row('GET /projects/:slug/runs/:runId/variants',  '401 200 200 200 200 404 200', async () => ({ path: `${await runPath()}/variants` }));
row('GET /projects/:slug/runs/:runId/variants.csv', '401 200 200 200 200 404 200', async () => ({ path: `${await runPath()}/variants.csv` }));
row('GET /projects/:slug/runs/:runId/points',    '401 200 200 200 200 404 200', async () => ({ path: `${await runPath()}/points?x=depth&y=peakTension` }));
row('GET /projects/:slug/runs/:runId/aggregate', '401 200 200 200 200 404 200', async () => ({ path: `${await runPath()}/aggregate?x=depth&y=peakTension` }));
row('GET /projects/:slug/runs/:runId/variants/:index', '401 200 200 200 200 404 200', async () => ({ path: `${await runPath()}/variants/0` }));
row('PUT /projects/:slug/runs/:runId/variants/:index/marks/me', '401 200 200 200 403 404 200', async () => ({ path: `${await runPath()}/variants/0/marks/me`, body: { kind: 'candidate' } }));
row('DELETE /projects/:slug/runs/:runId/variants/:index/marks/me', '401 204 204 204 403 404 204', async () => ({ path: `${await runPath()}/variants/0/marks/me` }));
row('GET /projects/:slug/runs/:runId/variants/:index/comments', '401 200 200 200 200 404 200', async () => ({ path: `${await runPath()}/variants/1/comments` }));
row('POST /projects/:slug/runs/:runId/variants/:index/comments', '401 201 201 201 403 404 201', async () => ({ path: `${await runPath()}/variants/1/comments`, body: { body: 'Looks light at midspan.' } }));

// Files, reference cases, check results, captured mail. Uploads go as multipart bodies; each cell that
// deletes or creates makes its own upload or case name.
const multipart = (kind: string, name: string, text: string) => {
  const b = `pp-${randomUUID()}`;
  const part = (head: string, body: string) => `--${b}\r\nContent-Disposition: form-data; ${head}\r\n\r\n${body}\r\n`;
  return { type: `multipart/form-data; boundary=${b}`, data: Buffer.from(`${part('name="kind"', kind)}${part(`name="file"; filename="${name}"`, text)}--${b}--\r\n`) };
};
const MATRIX_MODEL = JSON.stringify({ name: 'm', nodes: [{ id: 'A', x: 0, y: 0 }, { id: 'B', x: 1, y: 1 }], members: [{ id: 'AB', from: 'A', to: 'B' }], supports: [{ node: 'A', type: 'pin' }, { node: 'B', type: 'pin' }] });
const MATRIX_DXF = ['0', 'SECTION', '2', 'ENTITIES', '0', 'LINE', '10', '0', '20', '0', '11', '1000', '21', '500', '0', 'ENDSEC', '0', 'EOF', ''].join('\n');
const uploaded = async (kind: string, name: string, text: string) => {
  const m = multipart(kind, name, text);
  return (await w.as('engineer').post(`/api/projects/${slug()}/uploads`).set('Content-Type', m.type).send(m.data)).body.upload.id as number;
};
const TWO_BAR = JSON.parse(readFileSync(new URL('../../examples/reference/two-bar-frame.json', import.meta.url), 'utf8')) as Record<string, unknown>;
const matrixCase = () => ({ ...TWO_BAR, name: `matrix case ${randomUUID()}` });
let caseRow: { id: number; name: string } | undefined;
const knownCase = async () => (caseRow ??= (await w.as('engineer').post(`/api/projects/${slug()}/cases`).send(matrixCase())).body.case as { id: number; name: string });
const capturedMail = async () => {
  bindCapturedMail(t.sequelize);
  return (await CapturedMail.create({ messageId: null, sender: 'a@test.example', recipients: ['b@test.example'], toHeader: null, subject: 'hi', text: 'hi\n', html: null, raw: Buffer.from('Subject: hi\r\n\r\nhi\r\n'), receivedAt: new Date() })).id;
};
row('POST /projects/:slug/uploads',              '401 201 201 403 403 404 201', () => ({ path: `/api/projects/${slug()}/uploads`, raw: multipart('model', 'm.json', MATRIX_MODEL) }));
row('GET /projects/:slug/uploads',               '401 200 200 200 200 404 200', () => ({ path: `/api/projects/${slug()}/uploads` }));
row('GET /projects/:slug/uploads/:id',           '401 200 200 200 200 404 200', async () => ({ path: `/api/projects/${slug()}/uploads/${await uploaded('model', 'm.json', MATRIX_MODEL)}` }));
// The upload is the engineer's: a project admin may delete it, another engineer (promoted) may not.
row('DELETE /projects/:slug/uploads/:id',        '401 204 204 403 403 404 403', async () => ({ path: `/api/projects/${slug()}/uploads/${await uploaded('model', 'm.json', MATRIX_MODEL)}` }));
row('POST /projects/:slug/uploads/:id/import',   '401 201 201 403 403 404 201', async () => ({ path: `/api/projects/${slug()}/uploads/${await uploaded('dxf', 'm.dxf', MATRIX_DXF)}/import` }));
row('GET /projects/:slug/cases',                 '401 200 200 200 200 404 200', () => ({ path: `/api/projects/${slug()}/cases` }));
row('POST /projects/:slug/cases',                '401 201 201 403 403 404 201', () => ({ path: `/api/projects/${slug()}/cases`, body: matrixCase() }));
row('GET /projects/:slug/cases/:id',             '401 200 200 200 200 404 200', async () => ({ path: `/api/projects/${slug()}/cases/${(await knownCase()).id}` }));
// The body of a check push is a list (Cell.body is typed for objects).
row('POST /projects/:slug/checks',               '401 201 201 403 403 404 201', async () => ({ path: `/api/projects/${slug()}/checks`, body: [{ caseName: (await knownCase()).name, file: 'c.json', status: 'pass' }] as unknown as Record<string, unknown> }));
row('GET /projects/:slug/checks',                '401 200 200 200 200 404 200', () => ({ path: `/api/projects/${slug()}/checks` }));
row('GET /admin/mail',                           '401 200 403 403 403 403 403', () => ({ path: '/api/admin/mail' }));
row('GET /admin/mail/:id',                       '401 200 403 403 403 403 403', async () => ({ path: `/api/admin/mail/${await capturedMail()}` }));

function send(actor: Actor, route: string, cell: Cell) {
  const method = route.split(' ')[0].toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  const req = w.as(actor)[method](cell.path);
  if (cell.raw) return req.set('Content-Type', cell.raw.type).send(cell.raw.data);
  return cell.body ? req.send(cell.body) : req;
}

describe('rights matrix', () => {
  it('has a row for every route of the app', async () => {
    const docs = (await w.as('anonymous').get('/api/docs').expect(200)).body as { paths: Record<string, Record<string, unknown>> };
    const routes = Object.entries(docs.paths).flatMap(([p, ops]) =>
      Object.keys(ops).map((m) => `${m.toUpperCase()} ${p.replace(/^\/api/, '').replace(/\{(\w+)\}/g, ':$1')}`));
    expect(rows.map((r) => r.route).sort()).toEqual(routes.sort());
  });

  for (const r of rows) {
    it(r.route, async () => {
      const got: Record<string, number> = {};
      for (const actor of ACTORS) {
        const res = await send(actor, r.route, await r.prepare(actor));
        got[actor] = res.status;
        if (res.status >= 400) expect(res.body.error, `${actor}: error body`).toMatchObject({ code: expect.any(String), message: expect.any(String) });
      }
      expect(got).toEqual(r.statuses);
    });
  }

  it('a project that does not exist is 404 for everyone signed in, admin included', async () => {
    for (const r of rows.filter((x) => x.route.includes(':slug'))) {
      const cell = await r.prepare('admin');
      const path = cell.path.replace(/^\/api\/projects\/[^/]+/, '/api/projects/no-such-project');
      const res = await send('admin', r.route, { ...cell, path });
      expect([r.route, res.status, res.body.error.code]).toEqual([r.route, 404, 'project-not-found']);
    }
  });
});
