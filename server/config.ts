/**
 * Server settings. `loadConfig(env)` reads them from the environment for server/main.ts;
 * tests build them with `serverConfig({...})`.
 */
import { randomBytes } from 'node:crypto';

export interface ServerConfig {
  production: boolean;
  /** HS256 secret for session JWTs. */
  jwtSecret: string;
  /** Lifetime of a session JWT (cookie and bearer), seconds. */
  sessionTtlSeconds: number;
  /** Mark the session cookie Secure (HTTPS only). */
  cookieSecure: boolean;
  /** Base URL of the web app, for links in mail (reset, invitation). */
  publicUrl: string;
  bcryptRounds: number;
  /** Sign-in and reset-request attempts per window per IP and email. */
  signInLimit: { windowMs: number; max: number };
  /** Express "trust proxy": false when the server is reached directly. */
  trustProxy: boolean | number | string;
  /** Largest JSON body, as body-parser reads it ('2mb'). */
  jsonLimit: string;
  passwordResetTtlMinutes: number;
  invitationTtlDays: number;
}

export interface DbConfig {
  host: string;
  port: number;
  database: string;
  user: string;
  password: string;
  poolMax?: number;
}

/** Settings with defaults for everything but the secret. */
export function serverConfig(overrides: Partial<ServerConfig> & { jwtSecret: string }): ServerConfig {
  const production = overrides.production ?? false;
  return {
    production,
    sessionTtlSeconds: 12 * 3600,
    cookieSecure: production,
    publicUrl: 'http://127.0.0.1:8080',
    bcryptRounds: 10,
    signInLimit: { windowMs: 60_000, max: 10 },
    trustProxy: false,
    jsonLimit: '2mb',
    passwordResetTtlMinutes: 60,
    invitationTtlDays: 7,
    ...overrides,
  };
}

export class ConfigError extends Error {
  override readonly name = 'ConfigError';
}

export interface LoadedConfig {
  server: ServerConfig;
  db: DbConfig;
  port: number;
  /** Things the operator must hear about (printed loudly by main.ts). */
  warnings: string[];
}

function int(env: NodeJS.ProcessEnv, key: string, fallback: number): number {
  const raw = env[key];
  if (raw === undefined || raw === '') return fallback;
  const n = Number(raw);
  if (!Number.isInteger(n) || n < 0) throw new ConfigError(`${key} must be a whole number, not ${JSON.stringify(raw)}`);
  return n;
}

/** Read PORT, DB_*, JWT_SECRET, PUBLIC_URL, NODE_ENV, TRUST_PROXY, BCRYPT_ROUNDS. */
export function loadConfig(env: NodeJS.ProcessEnv): LoadedConfig {
  const production = env.NODE_ENV === 'production';
  const warnings: string[] = [];
  let jwtSecret = env.JWT_SECRET ?? '';
  if (!jwtSecret) {
    if (production) throw new ConfigError('JWT_SECRET is not set: refusing to start in production without it.');
    jwtSecret = randomBytes(32).toString('base64url');
    warnings.push('JWT_SECRET is not set: using a random secret for this process only; every session ends when the server stops. Set JWT_SECRET (32+ characters).');
  } else if (jwtSecret.length < 32) {
    if (production) throw new ConfigError('JWT_SECRET is shorter than 32 characters: refusing to start in production.');
    warnings.push('JWT_SECRET is shorter than 32 characters.');
  }
  const port = int(env, 'PORT', 8080);
  const trust = env.TRUST_PROXY;
  const server = serverConfig({
    production,
    jwtSecret,
    publicUrl: env.PUBLIC_URL || `http://127.0.0.1:${port}`,
    bcryptRounds: int(env, 'BCRYPT_ROUNDS', 10),
    trustProxy: trust === undefined || trust === '' ? false : /^\d+$/.test(trust) ? Number(trust) : trust,
  });
  const db: DbConfig = {
    host: env.DB_HOST || '127.0.0.1',
    port: int(env, 'DB_PORT', 3407),
    database: env.DB_NAME || 'panelpoint',
    user: env.DB_USER || 'panelpoint',
    password: env.DB_PASSWORD ?? '',
  };
  return { server, db, port, warnings };
}
