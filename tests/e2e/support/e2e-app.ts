/**
 * The whole product for a browser test file: a throwaway database (tests/api/support), the demo
 * seed (one account per role, the two invented projects), the app listening on 127.0.0.1:0 with
 * the built web app (dist/web) beside /api, and a real sweep of a few thousand variants pushed by
 * `panelpoint push` (a child process, signed in with the engineer's session token).
 */
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync } from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { Role } from '../../../server/auth/rights';
import { createApp } from '../../../server/app';
import { seedDemo, type DemoAccount } from '../../../server/db/seed-demo';
import { webAppBuilt } from '../../../server/http/static-web';
import { createLogger } from '../../../server/services/logger';
import { cleanRuns, ROOT, sweep, type SweptRun } from '../../api/support/run-fixtures';
import { startTestApp } from '../../api/support/test-app';
import { cliPush, type PushAnswer } from './cli-push';

/** The built web app: dist/web, or E2E_WEB_DIR (a build elsewhere: `npx vite build --outDir DIR`). */
export const WEB_DIR = resolve(ROOT, process.env.E2E_WEB_DIR ?? 'dist/web');

/** The demo study with finer depth steps: 4 panel counts × 250 depths × 3 support cases = 3,000 variants. */
export function e2eStudy(): Record<string, unknown> {
  const base = JSON.parse(readFileSync(join(ROOT, 'examples/studies/depot-roof-pratt.json'), 'utf8')) as Record<string, unknown> & { vary: Record<string, unknown> };
  delete base.$schema;
  return {
    ...base,
    name: 'Harrow Lane depot roof, Pratt trusses, fine depth steps',
    description: 'Invented demo study: the fictional Harrow Lane depot roof (24 m span, trusses at 6 m centres) with 250 depths from 1.2 to 3.6 m.',
    vary: { ...base.vary, depth: { from: 1.2, to: 3.6, count: 250 } },
  };
}

export interface E2eApp {
  /** http://127.0.0.1:PORT */
  base: string;
  accounts: Record<Role, DemoAccount>;
  /** The engineer's session token (the CLI pushed with it). */
  engineerToken: string;
  run: SweptRun;
  pushed: PushAnswer;
  /** Log lines of the app (warnings and errors). */
  logs: string[];
  close(): Promise<void>;
}

/** The first file under `paths` (from the root) changed after `ms`, if any. */
function newerThan(ms: number, paths: string[]): string | undefined {
  for (const p of paths) {
    const full = join(ROOT, p);
    const files = statSync(full).isDirectory() ? readdirSync(full, { recursive: true, encoding: 'utf8' }).map((f) => join(full, f)) : [full];
    const hit = files.find((f) => statSync(f).mtimeMs > ms);
    if (hit) return hit.slice(ROOT.length + 1);
  }
  return undefined;
}

async function signInToken(base: string, a: DemoAccount): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: a.email, password: a.password }) });
  if (res.status !== 200) throw new Error(`sign-in of ${a.email}: HTTP ${res.status} ${await res.text()}`);
  return ((await res.json()) as { token: string }).token;
}

export async function startE2eApp(): Promise<E2eApp> {
  if (!webAppBuilt(WEB_DIR)) throw new Error(`${WEB_DIR} holds no built web app: run \`npx vite build\` first (scripts/test.sh does when it is stale)`);
  const stale = newerThan(statSync(join(WEB_DIR, 'index.html')).mtimeMs, ['src', 'index.html', 'vite.config.ts']);
  if (stale) console.warn(`e2e: ${WEB_DIR} is older than ${stale}: the pages tested are not the current source (npx vite build)`);
  const t = await startTestApp();
  const home = mkdtempSync(join(tmpdir(), 'pp-e2e-home-'));
  const logs: string[] = [];
  const logger = createLogger({ level: 'warn', sink: (line) => logs.push(line) });
  const listener = http.createServer(createApp({ sequelize: t.sequelize, config: t.config, mailer: t.mailer, logger }, { webDir: WEB_DIR }));
  const close = async () => {
    await new Promise<void>((done) => {
      listener.close(() => done());
      listener.closeAllConnections();
    });
    cleanRuns();
    rmSync(home, { recursive: true, force: true });
    await t.close();
  };
  try {
    const seed = await seedDemo(t.sequelize, { bcryptRounds: 4 });
    const accounts = Object.fromEntries(seed.accounts.map((a) => [a.role, a])) as Record<Role, DemoAccount>;
    const base = await new Promise<string>((done) => listener.listen(0, '127.0.0.1', () => done(`http://127.0.0.1:${(listener.address() as AddressInfo).port}`)));
    const run = sweep(e2eStudy());
    const engineerToken = await signInToken(base, accounts.engineer);
    const pushed = await cliPush(run.dir, base, engineerToken, home);
    return { base, accounts, engineerToken, run, pushed, logs, close };
  } catch (err) {
    await close();
    throw err;
  }
}
