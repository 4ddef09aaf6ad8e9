import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditLog } from '../../server/db/models/audit-log.model';
import { Invitation } from '../../server/db/models/invitation.model';
import { Membership } from '../../server/db/models/membership.model';
import { api, makeUser, startTestApp, uniqueEmail, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;
beforeAll(async () => {
  t = await startTestApp({ config: { invitationTtlDays: 3 } });
  w = await buildWorld(t);
});
afterAll(() => t.close());

function tokenMailedTo(to: string): string {
  const msg = t.mail.filter((m) => m.to === to).at(-1);
  const link = /http:\/\/app\.test\/invitations\/accept\?token=(\S+)/.exec(msg?.text ?? '');
  if (!link) throw new Error(`no invitation mailed to ${to}`);
  return decodeURIComponent(link[1]);
}

const invite = (actor: 'engineer' | 'admin' | 'promoted', email: string, role = 'reviewer') =>
  w.as(actor).post(`/api/projects/${w.project.slug}/invitations`).send({ email, role });

describe('invitations', () => {
  it('mail a link; accepting creates the account, joins the project with the role and signs in', async () => {
    const email = uniqueEmail('newcomer');
    const res = await invite('engineer', email).expect(201);
    expect(res.body.invitation).toMatchObject({ email, role: 'reviewer' });
    const msg = t.mail.at(-1)!;
    expect(msg.to).toBe(email);
    expect(msg.subject).toContain(w.project.name);
    expect(msg.text).toContain('within 3 days');

    const token = tokenMailedTo(email);
    const accepted = await request(t.app).post('/api/invitations/accept').send({ token, name: 'New Comer', password: 'newcomer-password' }).expect(201);
    expect(accepted.body).toMatchObject({ user: { email, name: 'New Comer', role: 'viewer' }, project: { slug: w.project.slug }, role: 'reviewer' });
    expect(String(accepted.headers['set-cookie'])).toMatch(/pp_session=/);
    const project = await api(t.app, accepted.body.token).get(`/api/projects/${w.project.slug}`).expect(200);
    expect(project.body.project.role).toBe('reviewer');
    await request(t.app).post('/api/auth/sign-in').send({ email, password: 'newcomer-password' }).expect(200);

    const reuse = await request(t.app).post('/api/invitations/accept').send({ token, name: 'X', password: 'another-password' }).expect(400);
    expect(reuse.body.error.code).toBe('link-invalid');
    const actions = (await AuditLog.findAll({ where: { projectId: w.project.id } })).map((r) => r.action);
    expect(actions).toEqual(expect.arrayContaining(['invitation.create', 'invitation.accept', 'member.add']));
  });

  it('for an existing account, adds the membership without asking for a password', async () => {
    const existing = await makeUser('viewer');
    await invite('admin', existing.email, 'engineer').expect(201);
    const res = await request(t.app).post('/api/invitations/accept').send({ token: tokenMailedTo(existing.email) }).expect(201);
    expect(res.body.user.id).toBe(existing.user.id);
    const m = await Membership.findOne({ where: { userId: existing.user.id, projectId: w.project.id } });
    expect(m!.role).toBe('engineer');
  });

  it('a new account needs a name and a password', async () => {
    const email = uniqueEmail();
    await invite('engineer', email).expect(201);
    const res = await request(t.app).post('/api/invitations/accept').send({ token: tokenMailedTo(email) }).expect(422);
    expect(res.body.error.details).toHaveLength(1);
    // The invitation is still good.
    await request(t.app).post('/api/invitations/accept').send({ token: tokenMailedTo(email), name: 'N', password: 'long-enough-pw' }).expect(201);
  });

  it('an engineer may not invite an admin; a project admin may', async () => {
    const res = await invite('engineer', uniqueEmail(), 'admin').expect(403);
    expect(res.body.error.code).toBe('role-not-allowed');
    await invite('admin', uniqueEmail(), 'admin').expect(201);
  });

  it('answers 409 for someone who is already a member', async () => {
    expect((await invite('engineer', w.people.viewer.email).expect(409)).body.error.code).toBe('already-member');
  });

  it('expire, and a withdrawn invitation no longer works', async () => {
    const late = uniqueEmail();
    await invite('engineer', late).expect(201);
    await Invitation.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { email: late } });
    await request(t.app).post('/api/invitations/accept').send({ token: tokenMailedTo(late), name: 'L', password: 'long-enough-pw' }).expect(400);

    const withdrawn = uniqueEmail();
    const { body } = await invite('engineer', withdrawn).expect(201);
    const pending = await w.as('engineer').get(`/api/projects/${w.project.slug}/invitations`).expect(200);
    expect(pending.body.invitations.map((i: { email: string }) => i.email)).toContain(withdrawn);
    expect(pending.body.invitations.map((i: { email: string }) => i.email)).not.toContain(late);
    await w.as('engineer').delete(`/api/projects/${w.project.slug}/invitations/${body.invitation.id}`).expect(204);
    await request(t.app).post('/api/invitations/accept').send({ token: tokenMailedTo(withdrawn), name: 'W', password: 'long-enough-pw' }).expect(400);
  });

  it('a second invitation to the same email replaces the first', async () => {
    const email = uniqueEmail();
    await invite('engineer', email).expect(201);
    const first = tokenMailedTo(email);
    await invite('engineer', email, 'viewer').expect(201);
    await request(t.app).post('/api/invitations/accept').send({ token: first, name: 'F', password: 'long-enough-pw' }).expect(400);
    const res = await request(t.app).post('/api/invitations/accept').send({ token: tokenMailedTo(email), name: 'F', password: 'long-enough-pw' }).expect(201);
    expect(res.body.role).toBe('viewer');
  });
});

describe('members', () => {
  it('add, change role and remove are audited with the old and new role', async () => {
    const u = await makeUser('viewer');
    const base = `/api/projects/${w.project.slug}/members`;
    await w.as('admin').post(base).send({ email: u.email, role: 'viewer' }).expect(201);
    await w.as('admin').post(base).send({ email: u.email, role: 'viewer' }).expect(409);
    const changed = await w.as('admin').patch(`${base}/${u.user.id}`).send({ role: 'engineer' }).expect(200);
    expect(changed.body.member).toMatchObject({ role: 'engineer', user: { id: u.user.id } });
    await w.as('admin').delete(`${base}/${u.user.id}`).expect(204);
    const rows = await AuditLog.findAll({ where: { projectId: w.project.id, entityId: String(u.user.id) }, order: [['id', 'ASC']] });
    expect(rows.map((r) => [r.action, r.details])).toEqual([
      ['member.add', { role: 'viewer' }],
      ['member.role', { from: 'viewer', to: 'engineer' }],
      ['member.remove', { role: 'engineer' }],
    ]);
    await w.as('admin').post(base).send({ email: 'nobody@test.example', role: 'viewer' }).expect(404);
  });

  it("keep the project's last admin member", async () => {
    const created = await w.as('engineer').post('/api/projects').send({ slug: 'solo-project', name: 'Solo' }).expect(201);
    expect(created.body.project.role).toBe('admin');
    const me = w.people.engineer.user.id;
    const res = await w.as('engineer').patch(`/api/projects/solo-project/members/${me}`).send({ role: 'viewer' }).expect(409);
    expect(res.body.error.code).toBe('last-project-admin');
    await w.as('engineer').delete(`/api/projects/solo-project/members/${me}`).expect(409);
  });
});
