import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditLog } from '../../server/db/models/audit-log.model';
import { Project } from '../../server/db/models/project.model';
import { seedDemo, type DemoSeed } from '../../server/db/seed-demo';
import { api, startTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let seed: DemoSeed;
beforeAll(async () => {
  t = await startTestApp();
  seed = await seedDemo(t.sequelize, { bcryptRounds: 4 });
});
afterAll(() => t.close());

async function signInAs(role: string): Promise<string> {
  const a = seed.accounts.find((x) => x.role === role)!;
  return (await request(t.app).post('/api/auth/sign-in').send({ email: a.email, password: a.password }).expect(200)).body.token;
}

describe('demo seed', () => {
  it('creates one account per role with a generated password that signs in, and the two projects', async () => {
    expect(seed.created).toBe(true);
    expect(seed.accounts.map((a) => a.role)).toEqual(['admin', 'engineer', 'reviewer', 'viewer']);
    expect(new Set(seed.accounts.map((a) => a.password)).size).toBe(4);
    expect(seed.projects).toEqual(['harrow-lane-depot', 'kestrel-brook-footbridge']);
    expect((await Project.findAll()).map((p) => p.slug).sort()).toEqual(seed.projects);
    for (const role of ['admin', 'engineer', 'reviewer', 'viewer']) {
      const me = await api(t.app, await signInAs(role)).get('/api/auth/me').expect(200);
      expect(me.body.projects.map((p: { slug: string; role: string }) => [p.slug, p.role]).sort()).toEqual([
        ['harrow-lane-depot', role], ['kestrel-brook-footbridge', role],
      ]);
    }
  });

  it('does nothing the second time', async () => {
    expect(await seedDemo(t.sequelize)).toEqual({ created: false, accounts: [], projects: [] });
  });
});

describe('users (admin)', () => {
  it('create with a generated password shown once, change the role (audited), disable, delete', async () => {
    const admin = api(t.app, await signInAs('admin'));
    const created = await admin.post('/api/users').send({ email: 'New.Person@Test.example', name: 'New Person', role: 'viewer' }).expect(201);
    const { user, password } = created.body;
    expect(user).toMatchObject({ email: 'new.person@test.example', role: 'viewer', disabled: false });
    expect(password).toMatch(/^[A-Za-z0-9_-]{18}$/);
    await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password }).expect(200);

    const listed = await admin.get('/api/users').expect(200);
    expect(listed.body.users.map((u: { email: string }) => u.email)).toContain(user.email);
    expect(JSON.stringify(listed.body)).not.toMatch(/passwordHash|\$2[aby]\$/);

    await admin.patch(`/api/users/${user.id}`).send({ role: 'engineer' }).expect(200);
    const audit = await AuditLog.findOne({ where: { action: 'user.role', entityId: String(user.id) } });
    expect(audit!.details).toMatchObject({ role: { from: 'viewer', to: 'engineer' } });

    await admin.patch(`/api/users/${user.id}`).send({ disabled: true }).expect(200);
    await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password }).expect(403);

    await admin.patch(`/api/users/${user.id}`).send({ disabled: false, password: 'set-by-admin-pw' }).expect(200);
    await request(t.app).post('/api/auth/sign-in').send({ email: user.email, password: 'set-by-admin-pw' }).expect(200);
    expect(JSON.stringify(await AuditLog.findAll())).not.toContain('set-by-admin-pw');

    await admin.delete(`/api/users/${user.id}`).expect(204);
    await admin.get(`/api/users/${user.id}`).expect(404);
  });

  it('a disabled user loses their session at once', async () => {
    const admin = api(t.app, await signInAs('admin'));
    const viewerToken = await signInAs('viewer');
    const id = seed.accounts.findIndex((a) => a.role === 'viewer');
    const { body } = await api(t.app, viewerToken).get('/api/auth/me').expect(200);
    expect(body.user.email).toBe(seed.accounts[id].email);
    await admin.patch(`/api/users/${body.user.id}`).send({ disabled: true }).expect(200);
    await api(t.app, viewerToken).get('/api/auth/me').expect(401);
  });
});
