/** No reads across projects: a project the caller is not in looks exactly like one that does not exist. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiToken } from '../../server/db/models/api-token.model';
import { newApiToken } from '../../server/auth/secrets';
import { startTestApp, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;

beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
});
afterAll(() => t.close());

describe('project isolation', () => {
  it('lists only the projects one belongs to; the admin sees all', async () => {
    const slugs = async (actor: 'engineer' | 'outsider' | 'admin') =>
      (await w.as(actor).get('/api/projects').expect(200)).body.projects.map((p: { slug: string }) => p.slug).sort();
    expect(await slugs('engineer')).toEqual([w.project.slug]);
    expect(await slugs('outsider')).toEqual([w.other.slug]);
    expect(await slugs('admin')).toEqual([w.project.slug, w.other.slug].sort());
  });

  it('answers a non-member the same 404 as a missing project, on every project route', async () => {
    const paths = ['', '/members', '/tokens', '/invitations'];
    for (const p of paths) {
      const hidden = await w.as('outsider').get(`/api/projects/${w.project.slug}${p}`);
      const missing = await w.as('outsider').get(`/api/projects/no-such-project${p}`);
      expect([p, hidden.status, hidden.body]).toEqual([p, 404, missing.body]);
    }
  });

  it("does not reveal another project's member list, tokens or invitations through ids", async () => {
    const { prefix, hash } = newApiToken();
    const foreign = await ApiToken.create({
      userId: w.people.outsider.user.id, projectId: w.other.id, name: 'beta cli', tokenHash: hash, prefix, scopes: ['project:read'], lastUsedAt: null, revokedAt: null,
    });
    // The admin of alpha cannot revoke beta's token through alpha's path.
    await w.as('admin').delete(`/api/projects/${w.project.slug}/tokens/${foreign.id}`).expect(404);
    expect((await foreign.reload()).revokedAt).toBeNull();
    await w.as('admin').patch(`/api/projects/${w.project.slug}/members/${w.people.outsider.user.id}`).send({ role: 'viewer' }).expect(404);
    await w.as('admin').delete(`/api/projects/${w.project.slug}/members/${w.people.outsider.user.id}`).expect(404);
  });

  it('does not leak project names through the members of another project', async () => {
    const res = await w.as('engineer').get(`/api/projects/${w.project.slug}/members`).expect(200);
    expect(JSON.stringify(res.body)).not.toContain(w.other.slug);
  });
});
