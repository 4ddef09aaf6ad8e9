import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditLog } from '../../server/db/models/audit-log.model';
import { api, makeUser, sessionToken, startTestApp, testConfig, type TestApp, type TestUser } from './support/test-app';

let t: TestApp;
let alice: TestUser;

beforeAll(async () => {
  t = await startTestApp();
  alice = await makeUser('engineer', { name: 'Alice' });
});
afterAll(() => t.close());

describe('sign-in', () => {
  it('sets an httpOnly SameSite=Lax cookie that authenticates the browser', async () => {
    const agent = request.agent(t.app);
    const res = await agent.post('/api/auth/sign-in').send({ email: alice.email, password: alice.password }).expect(200);
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/^pp_session=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(res.body.user).toMatchObject({ email: alice.email, role: 'engineer' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body).toMatchObject({ user: { email: alice.email }, via: 'cookie' });
  });

  it('returns the token in the body for the CLI, usable as a bearer', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: alice.email.toUpperCase(), password: alice.password }).expect(200);
    expect(typeof res.body.token).toBe('string');
    const me = await api(t.app, res.body.token).get('/api/auth/me').expect(200);
    expect(me.body).toMatchObject({ user: { id: alice.user.id }, via: 'bearer', projects: [] });
  });

  it('answers 401 with the same message for a wrong password and an unknown email', async () => {
    const wrong = await request(t.app).post('/api/auth/sign-in').send({ email: alice.email, password: 'not-it' }).expect(401);
    const unknown = await request(t.app).post('/api/auth/sign-in').send({ email: 'nobody@test.example', password: 'x' }).expect(401);
    expect(wrong.body.error).toEqual({ code: 'wrong-credentials', message: 'Wrong email or password.', details: [] });
    expect(unknown.body.error).toEqual(wrong.body.error);
    expect(wrong.headers['set-cookie']).toBeUndefined();
  });

  it('refuses a disabled account even with the right password', async () => {
    const bob = await makeUser('viewer');
    await bob.user.update({ disabled: true });
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: bob.email, password: bob.password }).expect(403);
    expect(res.body.error.code).toBe('account-disabled');
  });

  it('records sign-ins and failures in the audit log, never the password', async () => {
    const rows = await AuditLog.findAll({ where: { userId: alice.user.id } });
    const actions = rows.map((r) => r.action);
    expect(actions).toContain('auth.sign-in');
    expect(actions).toContain('auth.sign-in-failed');
    expect(JSON.stringify(rows)).not.toContain(alice.password);
    expect(t.logs.join('\n')).not.toContain(alice.password);
  });
});

describe('rate limit', () => {
  it('allows 10 failed attempts per minute per IP and email, then answers 429 even to the right password', async () => {
    const carol = await makeUser('viewer');
    for (let i = 0; i < 10; i++) {
      await request(t.app).post('/api/auth/sign-in').send({ email: carol.email, password: `guess-${i}` }).expect(401);
    }
    const blocked = await request(t.app).post('/api/auth/sign-in').send({ email: carol.email, password: carol.password }).expect(429);
    expect(blocked.body.error.code).toBe('too-many-attempts');
    // Another email from the same address still gets through.
    await request(t.app).post('/api/auth/sign-in').send({ email: alice.email, password: alice.password }).expect(200);
  });

  it('does not count successful sign-ins', async () => {
    const dan = await makeUser('viewer');
    for (let i = 0; i < 12; i++) {
      await request(t.app).post('/api/auth/sign-in').send({ email: dan.email, password: dan.password }).expect(200);
    }
  });
});

describe('me and sign-out', () => {
  it('answers 401 without credentials, with a tampered token, and with a malformed header', async () => {
    const none = await request(t.app).get('/api/auth/me').expect(401);
    expect(none.body.error.code).toBe('not-signed-in');
    const { body } = await request(t.app).post('/api/auth/sign-in').send({ email: alice.email, password: alice.password });
    const tampered = body.token.slice(0, -2) + (body.token.endsWith('AA') ? 'BB' : 'AA');
    expect((await api(t.app, tampered).get('/api/auth/me').expect(401)).body.error.code).toBe('session-invalid');
    await request(t.app).get('/api/auth/me').set('Authorization', 'Basic abc').expect(401);
  });

  it('refuses a session signed with another secret', async () => {
    const foreign = sessionToken(alice.user, testConfig());
    expect((await api(t.app, foreign).get('/api/auth/me').expect(401)).body.error.code).toBe('session-invalid');
    await api(t.app, sessionToken(alice.user, t.config)).get('/api/auth/me').expect(200);
  });

  it('sign-out clears the cookie, after which the browser is signed out', async () => {
    const agent = request.agent(t.app);
    await agent.post('/api/auth/sign-in').send({ email: alice.email, password: alice.password }).expect(200);
    await agent.get('/api/auth/me').expect(200);
    const out = await agent.post('/api/auth/sign-out').expect(204);
    expect(String(out.headers['set-cookie'])).toMatch(/pp_session=;.*Expires=Thu, 01 Jan 1970/);
    await agent.get('/api/auth/me').expect(401);
  });

  it('sets the usual helmet headers', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});
