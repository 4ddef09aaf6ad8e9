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
  /** Largest uploaded file (study, model, DXF), bytes. */
  uploadLimitBytes: number;
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
    uploadLimitBytes: 20 * 1024 * 1024,
    ...overrides,
  };
}

/**
 * Where uploads live: an S3 bucket at `endpoint`; without an endpoint, main.ts starts a fake S3
 * (s3rver) on loopback in development and refuses to start in production.
 */
export interface StorageSettings {
  endpoint?: string;
  bucket: string;
  region: string;
  /** Absent: the SDK's own credential chain (environment, instance role). */
  accessKey?: string;
  secretKey?: string;
}

/**
 * Outgoing mail: an SMTP host; without a host, main.ts starts a capture sink on loopback in
 * development (GET /api/admin/mail shows what it caught) and only logs mail in production.
 */
export interface MailSettings {
  host?: string;
  port: number;
  /** TLS from the first byte (port 465); otherwise STARTTLS when the server offers it. */
  secure: boolean;
  user?: string;
  pass?: string;
  /** The From of every message, e.g. `Panelpoint <noreply@example.com>`. */
  from: string;
}

export class ConfigError extends Error {
  override readonly name = 'ConfigError';
}

export interface LoadedConfig {
  server: ServerConfig;
  db: DbConfig;
  port: number;
  storage: StorageSettings;
  mail: MailSettings;
  /** Folder for development data (fake S3 objects): DATA_DIR, default `.data`. */
  dataDir: string;
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

const text = (env: NodeJS.ProcessEnv, key: string): string | undefined => (env[key] ? env[key] : undefined);

/** S3_ENDPOINT, S3_BUCKET, S3_REGION, S3_ACCESS_KEY, S3_SECRET_KEY. */
function storageSettings(env: NodeJS.ProcessEnv): StorageSettings {
  return {
    endpoint: text(env, 'S3_ENDPOINT'),
    bucket: text(env, 'S3_BUCKET') ?? 'panelpoint',
    region: text(env, 'S3_REGION') ?? 'us-east-1',
    accessKey: text(env, 'S3_ACCESS_KEY'),
    secretKey: text(env, 'S3_SECRET_KEY'),
  };
}

/** SMTP_HOST, SMTP_PORT, SMTP_SECURE, SMTP_USER, SMTP_PASS, MAIL_FROM. */
function mailSettings(env: NodeJS.ProcessEnv): MailSettings {
  const secure = env.SMTP_SECURE === 'true' || env.SMTP_SECURE === '1';
  return {
    host: text(env, 'SMTP_HOST'),
    port: int(env, 'SMTP_PORT', secure ? 465 : 587),
    secure,
    user: text(env, 'SMTP_USER'),
    pass: text(env, 'SMTP_PASS'),
    from: text(env, 'MAIL_FROM') ?? 'Panelpoint <noreply@panelpoint.invalid>',
  };
}

/** Read PORT, DB_*, JWT_SECRET, PUBLIC_URL, NODE_ENV, TRUST_PROXY, BCRYPT_ROUNDS, UPLOAD_LIMIT_MB, S3_*, SMTP_*, MAIL_FROM, DATA_DIR. */
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
    uploadLimitBytes: int(env, 'UPLOAD_LIMIT_MB', 20) * 1024 * 1024,
  });
  const db: DbConfig = {
    host: env.DB_HOST || '127.0.0.1',
    port: int(env, 'DB_PORT', 3407),
    database: env.DB_NAME || 'panelpoint',
    user: env.DB_USER || 'panelpoint',
    password: env.DB_PASSWORD ?? '',
  };
  return { server, db, port, storage: storageSettings(env), mail: mailSettings(env), dataDir: env.DATA_DIR || '.data', warnings };
}
