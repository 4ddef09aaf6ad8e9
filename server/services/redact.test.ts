import { describe, expect, it } from 'vitest';
import { createLogger } from './logger';
import { redact, redactText } from './redact';

describe('redact', () => {
  it('hides values under secret-looking keys, at any depth', () => {
    const out = redact({ email: 'a@b.example', password: 'hunter22', nested: { apiToken: 'x', list: [{ Authorization: 'Bearer y' }] }, passwordHash: '$2a$' });
    expect(out).toEqual({ email: 'a@b.example', password: '[redacted]', nested: { apiToken: '[redacted]', list: [{ Authorization: '[redacted]' }] }, passwordHash: '[redacted]' });
  });

  it('scrubs API tokens, JWTs and token query values inside text', () => {
    const text = 'used pp_0123456789ab_AbCdEfGhIjKlMnOpQrStUvWxYz0123456789-_ then eyJhbGciOi.eyJzdWIiOiIx.c2lnbmF0dXJl and /reset?token=abc123&x=1';
    const out = redactText(text);
    expect(out).not.toMatch(/AbCdEf|eyJhbGciOi|abc123/);
    expect(out).toContain('&x=1');
  });

  it('keeps errors readable without their secrets', () => {
    const out = redact(new Error('bad token pp_0123456789ab_AbCdEfGhIjKlMnOpQrStUvWxYz0123456789')) as { name: string; message: string };
    expect(out.name).toBe('Error');
    expect(out.message).toBe('bad token pp_[redacted]');
  });

  it('the logger writes redacted JSON lines and respects the level', () => {
    const lines: string[] = [];
    const log = createLogger({ level: 'info', sink: (l) => lines.push(l) });
    log.debug('hidden');
    log.info('sign-in', { body: { email: 'a@b.example', password: 'hunter22' } });
    expect(lines).toHaveLength(1);
    const entry = JSON.parse(lines[0]);
    expect(entry).toMatchObject({ level: 'info', msg: 'sign-in', body: { email: 'a@b.example', password: '[redacted]' } });
  });
});
