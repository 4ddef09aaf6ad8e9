import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiToken } from '../../server/db/models/api-token.model';
import { AuditLog } from '../../server/db/models/audit-log.model';
import { Membership } from '../../server/db/models/membership.model';
import { sha256Hex } from '../../server/auth/secrets';
import { api, startTestApp, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;

beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
});
afterAll(() => t.close());

async function newToken(body: Record<string, unknown> = { name: 'laptop CLI' }, actor: 'engineer' | 'promoted' | 'admin' = 'engineer') {
  const res = await w.as(actor).post(`/api/projects/${w.project.slug}/tokens`).send(body).expect(201);
  return res.body as { id: number; token: string; prefix: string; scopes: string[] };
}

describe('API tokens', () => {
  it('are shown once, stored only as a sha256, and listed without the secret', async () => {
    const created = await newToken();
    expect(created.token).toMatch(/^pp_[0-9a-f]{12}_[A-Za-z0-9_-]{32,}$/);
    expect(created.token.startsWith(`pp_${created.prefix}_`)).toBe(true);
    // Default scopes: every token scope the engineer holds in the project.
    expect(created.scopes.sort()).toEqual(['cases:freeze', 'checks:push', 'comments:write', 'project:read', 'runs:push', 'uploads:write', 'variants:mark', 'variants:reject']);
    const row = await ApiToken.findByPk(created.id);
    expect(row!.tokenHash).toBe(sha256Hex(created.token));
    expect(JSON.stringify(row!.toJSON())).not.toContain(created.token.slice(16));
    const list = await w.as('engineer').get(`/api/projects/${w.project.slug}/tokens`).expect(200);
    expect(list.body.tokens.map((x: { id: number }) => x.id)).toContain(created.id);
    expect(JSON.stringify(list.body)).not.toContain(created.token);
    expect(await AuditLog.count({ where: { action: 'token.create', entityId: String(created.id) } })).toBe(1);
  });

  it('authenticate as their user inside their project', async () => {
    const { token } = await newToken();
    const me = await api(t.app, token).get('/api/auth/me').expect(200);
    expect(me.body).toMatchObject({ via: 'api-token', user: { id: w.people.engineer.user.id }, token: { name: 'laptop CLI' } });
    expect(me.body.projects.map((p: { slug: string }) => p.slug)).toEqual([w.project.slug]);
    const project = await api(t.app, token).get(`/api/projects/${w.project.slug}`).expect(200);
    expect(project.body.project.rights).not.toContain('tokens:manage');
    expect(await ApiToken.findOne({ where: { prefix: token.slice(3, 15) } }).then((r) => r!.lastUsedAt)).not.toBeNull();
  });

  it('are confined to their project: another project is 404 even when the user is a member there', async () => {
    await Membership.create({ userId: w.people.engineer.user.id, projectId: w.other.id, role: 'engineer' });
    try {
      const { token } = await newToken();
      await w.as('engineer').get(`/api/projects/${w.other.slug}`).expect(200);
      const res = await api(t.app, token).get(`/api/projects/${w.other.slug}`).expect(404);
      expect(res.body.error.code).toBe('project-not-found');
      await api(t.app, token).get(`/api/projects/${w.other.slug}/members`).expect(404);
    } finally {
      await Membership.destroy({ where: { userId: w.people.engineer.user.id, projectId: w.other.id } });
    }
  });

  it('carry no global rights, and cannot manage tokens', async () => {
    const { token } = await newToken({ name: 'admin CLI' }, 'admin');
    await api(t.app, token).get('/api/users').expect(403);
    await api(t.app, token).post('/api/projects').send({ slug: 'from-a-token', name: 'x' }).expect(403);
    await api(t.app, token).post(`/api/projects/${w.project.slug}/tokens`).send({ name: 'again' }).expect(403);
  });

  it('are limited to their scopes', async () => {
    const { token, scopes } = await newToken({ name: 'read only', scopes: ['project:read'] });
    expect(scopes).toEqual(['project:read']);
    const res = await api(t.app, token).get(`/api/projects/${w.project.slug}`).expect(200);
    expect(res.body.project.rights).toEqual(['project:read']);
    await api(t.app, token).patch(`/api/projects/${w.project.slug}`).send({ name: 'renamed' }).expect(403);
  });

  it('cannot carry rights the creator does not hold', async () => {
    const res = await w.as('promoted').post(`/api/projects/${w.project.slug}/tokens`).send({ name: 'x', scopes: ['runs:push'] }).expect(201);
    expect(res.body.scopes).toEqual(['runs:push']);
    // A scope outside TOKEN_SCOPES is a validation error with its path.
    const bad = await w.as('engineer').post(`/api/projects/${w.project.slug}/tokens`).send({ name: 'x', scopes: ['users:admin'] }).expect(422);
    expect(bad.body.error.details[0].path).toBe('scopes[0]');
  });

  it('lose the rights their user loses', async () => {
    const { token } = await newToken({ name: 'promoted CLI' }, 'promoted');
    await api(t.app, token).get(`/api/projects/${w.project.slug}`).expect(200);
    await Membership.update({ role: 'viewer' }, { where: { userId: w.people.promoted.user.id, projectId: w.project.id } });
    try {
      const res = await api(t.app, token).get(`/api/projects/${w.project.slug}`).expect(200);
      expect(res.body.project.rights).toEqual(['project:read']);
    } finally {
      await Membership.update({ role: 'engineer' }, { where: { userId: w.people.promoted.user.id, projectId: w.project.id } });
    }
  });

  it('answer 401 once revoked, and revoking is audited', async () => {
    const { id, token } = await newToken();
    await api(t.app, token).get(`/api/projects/${w.project.slug}`).expect(200);
    await w.as('engineer').delete(`/api/projects/${w.project.slug}/tokens/${id}`).expect(204);
    const res = await api(t.app, token).get(`/api/projects/${w.project.slug}`).expect(401);
    expect(res.body.error.code).toBe('invalid-token');
    await w.as('engineer').delete(`/api/projects/${w.project.slug}/tokens/${id}`).expect(204);
    expect(await AuditLog.count({ where: { action: 'token.revoke', entityId: String(id) } })).toBe(1);
  });

  it('answer 401 when forged: right prefix, wrong secret; unknown prefix; malformed', async () => {
    const { token } = await newToken();
    const forged = token.slice(0, 16) + 'A'.repeat(token.length - 16);
    for (const bad of [forged, 'pp_000000000000_' + 'B'.repeat(43), 'pp_short']) {
      expect((await api(t.app, bad).get('/api/auth/me').expect(401)).body.error.code).toBe('invalid-token');
    }
  });

  it("are revocable by a project admin but not by another engineer", async () => {
    const { id } = await newToken();
    await w.as('promoted').delete(`/api/projects/${w.project.slug}/tokens/${id}`).expect(404);
    await w.as('admin').delete(`/api/projects/${w.project.slug}/tokens/${id}`).expect(204);
    const list = await w.as('promoted').get(`/api/projects/${w.project.slug}/tokens`).expect(200);
    expect(list.body.tokens.every((x: { owner: { id: number } }) => x.owner.id === w.people.promoted.user.id)).toBe(true);
  });
});
