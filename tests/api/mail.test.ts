/**
 * Mail through the real path: nodemailer → the SMTP sink on loopback → captured_mails →
 * GET /api/admin/mail (admins only). Invitations and password resets arrive decoded; a dead
 * mail server makes the invitation answer 503.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bindCapturedMail, CapturedMail } from '../../server/services/smtp-sink-mail.model';
import { uniqueEmail } from './support/test-app';
import { startServicesApp, type ServicesApp } from './support/services-app';
import { buildWorld, type World } from './support/world';

let t: ServicesApp;
let w: World;
beforeAll(async () => {
  t = await startServicesApp();
  w = await buildWorld(t);
});
afterAll(() => t.close());

interface Listed { id: number; from: string; to: string[]; subject: string; text: string; receivedAt: string }

const mailTo = async (to: string): Promise<Listed[]> =>
  (await w.as('admin').get(`/api/admin/mail?to=${encodeURIComponent(to)}`).expect(200)).body.messages;

describe('mail captured by the sink', () => {
  it('an invitation arrives: GET /api/admin/mail lists it with to, subject, decoded text and time', async () => {
    const email = uniqueEmail('invitee');
    await w.as('engineer').post(`/api/projects/${w.project.slug}/invitations`).send({ email, role: 'viewer' }).expect(201);
    const [m] = await mailTo(email);
    expect(m).toMatchObject({ to: [email], from: 'noreply@panelpoint.test', subject: t.mail.at(-1)!.subject });
    expect(m.subject).toContain(w.project.name);
    // The link is long enough for quoted-printable soft breaks: the sink's text must be whole again.
    const link = /http:\/\/app\.test\/invitations\/accept\?token=(\S+)/.exec(m.text);
    expect(link?.[0]).toBe(/http:\/\/app\.test\/invitations\/accept\?token=(\S+)/.exec(t.mail.at(-1)!.text)?.[0]);
    expect(Date.now() - Date.parse(m.receivedAt)).toBeLessThan(60_000);
    // The mailed token works: the whole chain carried it intact.
    await request(t.app).post('/api/invitations/accept').send({ token: decodeURIComponent(link![1]), name: 'Invitee', password: 'invitee-password' }).expect(201);
  });

  it('one message in full: headers, and the same text', async () => {
    const email = uniqueEmail('reset');
    await request(t.app).post('/api/auth/password-reset').send({ email: w.people.viewer.email }).expect(202);
    const [m] = await mailTo(w.people.viewer.email);
    expect(m.subject).toBe('Reset your Panelpoint password');
    const full = (await w.as('admin').get(`/api/admin/mail/${m.id}`).expect(200)).body.message;
    expect(full.text).toBe(m.text);
    expect(full.text).toMatch(/within 60 minutes/);
    expect(full.headers).toContainEqual({ name: 'Subject', value: 'Reset your Panelpoint password' });
    expect(full.messageId).toMatch(/^<.+>$/);
    expect(await mailTo(email)).toEqual([]);
  });

  it('keeps non-ASCII subjects and bodies as written', async () => {
    await t.mailer.send({ to: 'zoë@test.example', subject: 'Überprüfung — Träger R3 ✓', text: 'Kräfte in kN: −50 (Druck)\n' });
    const [m] = await mailTo('zoë@test.example');
    expect(m.subject).toBe('Überprüfung — Träger R3 ✓');
    expect(m.text).toBe('Kräfte in kN: −50 (Druck)\n');
  });

  it('only admins read it: others 403, API tokens 403, nobody signed in 401', async () => {
    for (const who of ['engineer', 'reviewer', 'viewer', 'outsider', 'promoted'] as const) {
      const res = await w.as(who).get('/api/admin/mail').expect(403);
      expect(res.body.error.code).toBe('forbidden');
    }
    const token = (await w.as('admin').post(`/api/projects/${w.project.slug}/tokens`).send({ name: 'cli' }).expect(201)).body.token as string;
    await request(t.app).get('/api/admin/mail').set('Authorization', `Bearer ${token}`).expect(403);
    await request(t.app).get('/api/admin/mail').expect(401);
    await w.as('admin').get('/api/admin/mail/999999').expect(404);
    await w.as('admin').get('/api/admin/mail?limit=0').expect(422);
  });

  it('the model matches its table (migration 004)', async () => {
    bindCapturedMail(t.sequelize);
    const columns = await t.sequelize.getQueryInterface().describeTable('captured_mails');
    const attributes = Object.values(CapturedMail.getAttributes());
    expect(Object.keys(columns).sort()).toEqual(attributes.map((a) => a.field!).sort());
    for (const a of attributes) expect([a.field, columns[a.field!].allowNull]).toEqual([a.field, a.allowNull !== false && !a.primaryKey]);
  });

  it('with the mail server gone, an invitation answers 503 mail-unavailable', async () => {
    await t.stopSink();
    const res = await w.as('engineer').post(`/api/projects/${w.project.slug}/invitations`).send({ email: uniqueEmail('late'), role: 'viewer' }).expect(503);
    expect(res.body.error.code).toBe('mail-unavailable');
  });
});
