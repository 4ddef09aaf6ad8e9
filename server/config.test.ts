import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from './config';

describe('loadConfig', () => {
  it('refuses to start in production without JWT_SECRET, or with a short one', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(ConfigError);
    expect(() => loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'short' })).toThrow(/32 characters/);
  });

  it('generates a secret in development, with a warning', () => {
    const a = loadConfig({});
    const b = loadConfig({});
    expect(a.server.jwtSecret.length).toBeGreaterThanOrEqual(32);
    expect(a.server.jwtSecret).not.toBe(b.server.jwtSecret);
    expect(a.warnings.join(' ')).toMatch(/JWT_SECRET is not set/);
  });

  it('reads the port, the database and production cookie settings', () => {
    const c = loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'x'.repeat(40), PORT: '9001', DB_HOST: 'db', DB_PORT: '3307', DB_NAME: 'pp', DB_USER: 'u', DB_PASSWORD: 'p' });
    expect(c.port).toBe(9001);
    expect(c.db).toEqual({ host: 'db', port: 3307, database: 'pp', user: 'u', password: 'p' });
    expect(c.server).toMatchObject({ production: true, cookieSecure: true, publicUrl: 'http://127.0.0.1:9001' });
    expect(c.warnings).toEqual([]);
  });

  it('rejects a port that is not a number', () => {
    expect(() => loadConfig({ PORT: 'eighty' })).toThrow(/PORT must be a whole number/);
  });
});
