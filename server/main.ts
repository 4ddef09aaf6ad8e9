/**
 * Start the team server: read the environment, migrate the database, plug in file storage and
 * mail, serve /api and the built web app on 127.0.0.1, stop cleanly on Ctrl-C (SIGINT) or SIGTERM.
 *   PORT (8080), DB_HOST, DB_PORT, DB_NAME, DB_USER, DB_PASSWORD, JWT_SECRET, PUBLIC_URL, NODE_ENV
 *   S3_ENDPOINT, S3_BUCKET, S3_REGION, S3_ACCESS_KEY, S3_SECRET_KEY: the bucket for uploads. Without
 *     S3_ENDPOINT, development starts a fake S3 (s3rver) on loopback with its data in DATA_DIR/s3
 *     (default .data/s3); production refuses to start.
 *   SMTP_HOST, SMTP_PORT, SMTP_SECURE, SMTP_USER, SMTP_PASS, MAIL_FROM: outgoing mail. Without
 *     SMTP_HOST, development starts an SMTP sink on loopback that keeps every message in the
 *     database (GET /api/admin/mail); production only logs that mail was not sent.
 *   WEB_DIR (dist/web): the built web app, served when present. LOG_LEVEL: debug (default in
 *     development), info (default in production; one line per request), warn, error.
 *   DEMO_USERS_FILE: seed the demo on first start and write its accounts and passwords there.
 */
import { existsSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Sequelize } from 'sequelize';
import { createApp } from './app';
import { ConfigError, loadConfig, type LoadedConfig } from './config';
import { migrateUp } from './db/migrator';
import { seedDemo, type DemoAccount } from './db/seed-demo';
import { seedDemoRuns } from './db/seed-demo-runs';
import { createSequelize } from './db/sequelize';
import { webAppBuilt } from './http/static-web';
import { createLogger, type Logger, type LogLevel } from './services/logger';
import type { Mailer } from './services/mailer';
import { nodemailerMailer } from './services/nodemailer-mailer';
import { ObjectStore } from './services/object-store';
import { FAKE_S3_CREDENTIALS, startFakeS3 } from './services/object-store-fake';
import { startSmtpSink } from './services/smtp-sink';

const HOST = '127.0.0.1';
// @aws-sdk/client-s3 is pinned (RECIPES.md): its notice about releases after early 2027 needing Node 22 is known.
process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

/** Things to close on stop, closed in reverse order of starting (the database last). */
type Closer = () => Promise<void> | void;

function loud(message: string): void {
  const bar = '!'.repeat(Math.min(100, message.length + 4));
  process.stderr.write(`\n${bar}\n! ${message}\n${bar}\n\n`);
}

async function startStorage(c: LoadedConfig, logger: Logger, closers: Closer[]): Promise<ObjectStore> {
  let settings = { ...c.storage, endpoint: c.storage.endpoint ?? '' };
  if (!c.storage.endpoint) {
    if (c.server.production) throw new ConfigError('S3_ENDPOINT is not set: refusing to keep uploads in the development fake S3 in production.');
    const fake = await startFakeS3({ directory: resolve(c.dataDir, 's3') });
    closers.push(() => fake.close());
    settings = { ...settings, endpoint: fake.endpoint, ...FAKE_S3_CREDENTIALS };
    logger.info('fake S3 (s3rver) started', { endpoint: fake.endpoint, directory: resolve(c.dataDir, 's3') });
  }
  const store = new ObjectStore(settings);
  closers.push(() => store.close());
  await store.ensureBucket();
  return store;
}

async function startMail(c: LoadedConfig, sequelize: Sequelize, logger: Logger, closers: Closer[]): Promise<Mailer | undefined> {
  if (c.mail.host) {
    const mailer = nodemailerMailer({ ...c.mail, host: c.mail.host });
    closers.push(() => mailer.close());
    return mailer;
  }
  if (c.server.production) {
    loud('SMTP_HOST is not set: mail (invitations, password resets, notices) is logged, not sent.');
    return undefined;
  }
  const sink = await startSmtpSink(sequelize, { logger });
  closers.push(() => sink.close());
  const mailer = nodemailerMailer({ ...c.mail, host: HOST, port: sink.port, secure: false, user: undefined, pass: undefined });
  closers.push(() => mailer.close());
  logger.info('mail sink started: messages are kept, not delivered (GET /api/admin/mail)', { port: sink.port });
  return mailer;
}

const accountLines = (accounts: readonly DemoAccount[]) =>
  accounts.map((a) => `  ${a.role.padEnd(9)} ${a.email.padEnd(30)} ${a.password}`).join('\n');

/** Seed the demo once; print and keep its accounts (only their hashes are in the database). */
async function seedOnFirstStart(sequelize: Sequelize, file: string, bcryptRounds: number): Promise<string> {
  const seed = await seedDemo(sequelize, { bcryptRounds });
  if (!seed.created) return existsSync(file) ? `Demo accounts and passwords: ${file}` : '';
  await seedDemoRuns(sequelize, seed, { examplesDir: resolve('examples') });
  const text = `Panelpoint demo accounts (role, email, password), made on first start:\n${accountLines(seed.accounts)}\n`;
  writeFileSync(file, text, { mode: 0o600 });
  return `${text}(kept in ${file})`;
}

async function main(): Promise<void> {
  const loaded = loadConfig(process.env);
  const { server: config, db, port, warnings } = loaded;
  warnings.forEach(loud);
  const level = ['debug', 'info', 'warn', 'error'].find((l) => l === process.env.LOG_LEVEL) as LogLevel | undefined;
  const logger = createLogger({ level: level ?? (config.production ? 'info' : 'debug') });
  const closers: Closer[] = [];
  const sequelize = createSequelize(db);
  closers.push(() => sequelize.close());
  const applied = await migrateUp(sequelize);
  if (applied.length) logger.info('migrations applied', { applied });
  const storage = await startStorage(loaded, logger, closers);
  const mailer = await startMail(loaded, sequelize, logger, closers);
  const demo = process.env.DEMO_USERS_FILE ? await seedOnFirstStart(sequelize, process.env.DEMO_USERS_FILE, config.bcryptRounds) : '';
  const webDir = resolve(process.env.WEB_DIR || join('dist', 'web'));
  const web = webAppBuilt(webDir);
  if (!web) logger.warn('web app not built: serving the API only (npx vite build)', { webDir });
  const app = createApp({ sequelize, config, logger, storage, ...(mailer ? { mailer } : {}) }, web ? { webDir } : {});
  const listener = app.listen(port, HOST, () => {
    logger.info('listening', { url: `http://${HOST}:${port}` });
    process.stderr.write(`\n${demo ? `${demo}\n\n` : ''}Panelpoint is running at http://${HOST}:${port}/ ${web ? '' : '(API only) '}— Ctrl-C stops it.\n\n`);
  });
  listener.on('error', (err) => {
    process.stderr.write(`panelpoint server: cannot listen on ${HOST}:${port}: ${err.message}\n`);
    process.exit(1);
  });
  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info('stopping', { signal });
    setTimeout(() => process.exit(0), 5000).unref();
    listener.close(() => {
      void [...closers].reverse().reduce((p, close) => p.then(close).catch(() => undefined), Promise.resolve()).then(() => process.exit(0));
    });
    listener.closeIdleConnections();
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
}

main().catch((err: unknown) => {
  if (err instanceof ConfigError) loud(err.message);
  else process.stderr.write(`panelpoint server: ${err instanceof Error ? err.stack : String(err)}\n`);
  process.exit(1);
});
