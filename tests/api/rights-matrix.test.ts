/**
 * Every route × every actor → expected status (see support/world.ts for the cast). Each cell
 * prepares what it acts on, so cells do not depend on each other. Columns:
 *   anonymous admin engineer reviewer viewer outsider promoted
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { newSecret } from '../../server/auth/secrets';
import { ApiToken } from '../../server/db/models/api-token.model';
import { Invitation } from '../../server/db/models/invitation.model';
import { Membership } from '../../server/db/models/membership.model';
import { PasswordReset } from '../../server/db/models/password-reset.model';
import { addMember, makeProject, makeUser, startTestApp, uniqueEmail, uniqueSlug, type TestApp } from './support/test-app';
import { ACTORS, buildWorld, type Actor, type World } from './support/world';

let t: TestApp;
let w: World;

beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
});
afterAll(() => t.close());

interface Cell {
  path: string;
  body?: Record<string, unknown>;
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

function send(actor: Actor, route: string, cell: Cell) {
  const method = route.split(' ')[0].toLowerCase() as 'get' | 'post' | 'patch' | 'delete';
  const req = w.as(actor)[method](cell.path);
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
