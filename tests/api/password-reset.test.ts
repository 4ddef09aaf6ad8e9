import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sha256Hex } from '../../server/auth/secrets';
import { AuditLog } from '../../server/db/models/audit-log.model';
import { PasswordReset } from '../../server/db/models/password-reset.model';
import { makeUser, startTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({ config: { passwordResetTtlMinutes: 30 } });
});
afterAll(() => t.close());

/** The token in the link of the last mail to `to`. */
function tokenMailedTo(to: string): string {
  const msg = t.mail.filter((m) => m.to === to).at(-1);
  const link = /http:\/\/app\.test\/reset-password\?token=(\S+)/.exec(msg?.text ?? '');
  if (!link) throw new Error(`no reset link mailed to ${to}`);
  return decodeURIComponent(link[1]);
}

const signIn = (email: string, password: string) => request(t.app).post('/api/auth/sign-in').send({ email, password });

describe('password reset', () => {
  it('mails a link whose token sets a new password once', async () => {
    const u = await makeUser('engineer');
    await request(t.app).post('/api/auth/password-reset').send({ email: u.email.toUpperCase() }).expect(202);
    const msg = t.mail.at(-1)!;
    expect(msg).toMatchObject({ to: u.email, subject: 'Reset your Panelpoint password' });
    expect(msg.text).toContain('within 30 minutes');
    const token = tokenMailedTo(u.email);
    const row = await PasswordReset.findOne({ where: { userId: u.user.id } });
    expect(row!.tokenHash).toBe(sha256Hex(token));
    expect(row!.expiresAt.getTime() - Date.now()).toBeGreaterThan(29 * 60_000);

    await request(t.app).post('/api/auth/password-reset/confirm').send({ token, password: 'brand-new-password' }).expect(204);
    await signIn(u.email, u.password).expect(401);
    await signIn(u.email, 'brand-new-password').expect(200);
    const again = await request(t.app).post('/api/auth/password-reset/confirm').send({ token, password: 'another-password' }).expect(400);
    expect(again.body.error.code).toBe('link-invalid');
    expect(await AuditLog.count({ where: { userId: u.user.id, action: 'user.password-reset' } })).toBe(1);
    expect(t.logs.join('\n')).not.toContain(token);
  });

  it('answers the same for an unknown email and sends nothing', async () => {
    const before = t.mail.length;
    const res = await request(t.app).post('/api/auth/password-reset').send({ email: 'nobody@test.example' }).expect(202);
    expect(res.body.message).toMatch(/If an account has this email/);
    expect(t.mail.length).toBe(before);
  });

  it('refuses an expired token and a made-up one', async () => {
    const u = await makeUser('viewer');
    await request(t.app).post('/api/auth/password-reset').send({ email: u.email }).expect(202);
    const token = tokenMailedTo(u.email);
    await PasswordReset.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: u.user.id } });
    await request(t.app).post('/api/auth/password-reset/confirm').send({ token, password: 'brand-new-password' }).expect(400);
    await request(t.app).post('/api/auth/password-reset/confirm').send({ token: 'x'.repeat(43), password: 'brand-new-password' }).expect(400);
    await signIn(u.email, u.password).expect(200);
  });

  it('spends every outstanding link once one is used', async () => {
    const u = await makeUser('viewer');
    await request(t.app).post('/api/auth/password-reset').send({ email: u.email }).expect(202);
    const first = tokenMailedTo(u.email);
    await request(t.app).post('/api/auth/password-reset').send({ email: u.email }).expect(202);
    const second = tokenMailedTo(u.email);
    expect(second).not.toBe(first);
    await request(t.app).post('/api/auth/password-reset/confirm').send({ token: second, password: 'brand-new-password' }).expect(204);
    await request(t.app).post('/api/auth/password-reset/confirm').send({ token: first, password: 'other-new-password' }).expect(400);
  });

  it('rejects a short new password with its path', async () => {
    const res = await request(t.app).post('/api/auth/password-reset/confirm').send({ token: 'y'.repeat(43), password: 'short' }).expect(422);
    expect(res.body.error.details).toEqual([{ path: 'password', message: 'must be at least 10 characters long' }]);
  });
});

describe('mailer failure', () => {
  it('answers 503 mail-unavailable when the transport throws, and logs it', async () => {
    const u = await makeUser('viewer');
    t.mailer.failing = true;
    try {
      const res = await request(t.app).post('/api/auth/password-reset').send({ email: u.email }).expect(503);
      expect(res.body.error.code).toBe('mail-unavailable');
      expect(t.logs.some((l) => l.includes('mail could not be sent'))).toBe(true);
    } finally {
      t.mailer.failing = false;
    }
  });
});
