/**
 * vitest globalSetup for the API tests: a throwaway MariaDB (scripts/db.sh) in a temporary
 * folder on a free loopback port, migrated once, stopped at the end (also when a test or this
 * setup fails, and when the process exits). Test files read the settings with
 * `inject('mariadb')` and create their own database (tests/api/support/test-db.ts): the app
 * user may create databases named `pp_t_*`.
 */
import { execFile, execFileSync } from 'node:child_process';
import { rmSync } from 'node:fs';
import { mkdtemp, readFile } from 'node:fs/promises';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { promisify } from 'node:util';
import type { TestProject } from 'vitest/node';
import { migrateUp } from '../../server/db/migrator';
import { createSequelize } from '../../server/db/sequelize';

export interface MariaDbSettings {
  host: string;
  port: number;
  user: string;
  password: string;
  /** The migrated database of this run; each test file makes its own beside it. */
  database: string;
}

declare module 'vitest' {
  export interface ProvidedContext {
    mariadb: MariaDbSettings;
  }
}

const run = promisify(execFile);
const DB_SH = resolve(import.meta.dirname, '../../scripts/db.sh');

function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const srv = createServer();
    srv.once('error', fail);
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      srv.close(() => (typeof address === 'object' && address ? done(address.port) : fail(new Error('no port'))));
    });
  });
}

function parseEnv(text: string): Record<string, string> {
  return Object.fromEntries(text.split('\n').filter((l) => l.includes('=')).map((l) => [l.slice(0, l.indexOf('=')), l.slice(l.indexOf('=') + 1)]));
}

export default async function setup(project: TestProject): Promise<() => void> {
  const dir = await mkdtemp(join(tmpdir(), 'ppdb-'));
  let stopped = false;
  const stop = () => {
    if (stopped) return;
    stopped = true;
    try {
      execFileSync('bash', [DB_SH, 'stop', dir], { stdio: 'ignore', timeout: 30_000 });
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  };
  process.once('exit', stop);
  try {
    const port = await freePort();
    await run('bash', [DB_SH, 'start', dir, String(port), 'panelpoint_test'], { timeout: 60_000 });
    const env = parseEnv(await readFile(join(dir, 'run/env'), 'utf8'));
    const socket = (await readFile(join(dir, 'run/socket-path'), 'utf8')).trim();
    const grant = ['127.0.0.1', 'localhost'].map((h) => `GRANT ALL PRIVILEGES ON \`pp\\_t\\_%\`.* TO 'panelpoint'@'${h}';`).join(' ');
    await run('mariadb', ['--no-defaults', `--socket=${socket}`, '-uroot', '-e', grant]);
    const settings: MariaDbSettings = {
      host: env.DB_HOST, port: Number(env.DB_PORT), user: env.DB_USER, password: env.DB_PASSWORD, database: env.DB_NAME,
    };
    const sequelize = createSequelize(settings);
    try {
      await migrateUp(sequelize);
    } finally {
      await sequelize.close();
    }
    project.provide('mariadb', settings);
  } catch (err) {
    stop();
    throw err;
  }
  return stop;
}
