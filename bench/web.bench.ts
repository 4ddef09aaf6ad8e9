// Web bench: how long the design-space page of a 100,800-variant run takes to draw its first chart.
// A private MariaDB (scripts/db.sh on a free port in a temp folder), the demo seed, the server with
// the built web app (dist/web, or --web DIR) on a loopback port, the shipped benchmark study
// (bench/studies/sweep-bench.json) swept and pushed by `panelpoint push` (child processes), then
// Debian's Chromium signs in as the demo engineer and opens the run's page: once with an empty cache
// (the Plotly chunk comes over the wire) and --loads N−1 times more (cached assets, warm database).
// Time = the page's clock (ms since navigation start) at the first animation frame in which a chart
// has data, axes and painted cells or points; "all" = both charts of the page.
// Run: node --import tsx bench/web.bench.ts [--loads N] [--web DIR] [--keep]   (≈ 1 min; one JSON line last)
import { execFileSync, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import http from 'node:http';
import { createServer, type AddressInfo } from 'node:net';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Browser } from 'playwright-core';
import { createApp } from '../server/app';
import { serverConfig } from '../server/config';
import { migrateUp } from '../server/db/migrator';
import { seedDemo } from '../server/db/seed-demo';
import { createSequelize } from '../server/db/sequelize';
import { webAppBuilt } from '../server/http/static-web';
import { createLogger } from '../server/services/logger';
import { chromiumMissing, launchChromium, signIn } from '../tests/e2e/support/chromium';
import { cliPush, DEMO_PROJECT } from '../tests/e2e/support/cli-push';
import { waitForDrawnChart } from '../tests/e2e/support/plot';

const root = fileURLToPath(new URL('..', import.meta.url));
const arg = (name: string) => (process.argv.includes(name) ? process.argv[process.argv.indexOf(name) + 1] : undefined);
const LOADS = Math.max(1, Number(arg('--loads') ?? 5));
const WEB = resolve(root, arg('--web') ?? 'dist/web');
const keep = process.argv.includes('--keep');
/** The figure the page should reach on these machines, ms (a goal to read against, not a test). */
const TARGET_MS = 3000;
const log = (s: string) => console.log(s);
const scratch = mkdtempSync(join(tmpdir(), 'pp-web-bench-'));
const dbDir = join(scratch, 'db');
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const s = createServer().once('error', fail).listen(0, '127.0.0.1', () => {
      const { port } = s.address() as AddressInfo;
      s.close(() => done(port));
    });
  });
}

interface Load { firstMs: number; allMs: number; apiMs: number; api: string[]; transferKB: number }

// Browser code as text: this project type-checks without the DOM library. Each API call as
// "<last path segment>?<query> <start>+<duration> ms", in the order they started.
const RESOURCES = `(() => {
  const rs = performance.getEntriesByType('resource');
  const api = rs.filter((r) => new URL(r.name).pathname.startsWith('/api/'));
  const what = (r) => { const u = new URL(r.name); return decodeURIComponent(u.pathname.split('/').pop() + u.search); };
  return { apiMs: Math.max(0, ...api.map((r) => r.responseEnd)), api: api.map((r) => what(r) + ' ' + Math.round(r.startTime) + '+' + Math.round(r.duration) + ' ms'),
    transferKB: Math.round(rs.reduce((n, r) => n + r.transferSize, 0) / 1024) };
})()`;

async function loadPage(browser: Browser, base: string, email: string, password: string, runId: string): Promise<Load[]> {
  const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
  try {
    const page = await context.newPage();
    await signIn(page, base, email, password);
    const loads: Load[] = [];
    for (let i = 0; i < LOADS; i++) {
      await page.goto(`${base}/projects/${DEMO_PROJECT}/runs/${encodeURIComponent(runId)}`, { waitUntil: 'commit' });
      const firstMs = await waitForDrawnChart(page, { timeout: 120_000 });
      await page.getByTestId('plot').nth(1).waitFor({ timeout: 120_000 });
      const allMs = await waitForDrawnChart(page, { all: true, timeout: 120_000 });
      loads.push({ firstMs, allMs, ...((await page.evaluate(RESOURCES)) as Omit<Load, 'firstMs' | 'allMs'>) });
      log(`  load ${i + 1}${i === 0 ? ' (empty cache)' : ''}: first chart ${Math.round(firstMs)} ms, both charts ${Math.round(allMs)} ms; last API answer at ${Math.round(loads[i].apiMs)} ms; ${loads[i].transferKB} kB transferred`);
      if (i === 0) for (const a of loads[i].api) log(`    ${a}`);
    }
    return loads;
  } finally {
    await context.close();
  }
}

async function measure(): Promise<Record<string, unknown>> {
  const env = Object.fromEntries(readFileSync(join(dbDir, 'run/env'), 'utf8').trim().split('\n').map((l) => [l.slice(0, l.indexOf('=')), l.slice(l.indexOf('=') + 1)]));
  const sequelize = createSequelize({ host: env.DB_HOST, port: Number(env.DB_PORT), database: env.DB_NAME, user: env.DB_USER, password: env.DB_PASSWORD });
  const config = serverConfig({ jwtSecret: randomBytes(32).toString('hex'), bcryptRounds: 4 });
  const listener = http.createServer(createApp({ sequelize, config, logger: createLogger({ level: 'error', sink: () => undefined }) }, { webDir: WEB }));
  let browser: Browser | undefined;
  try {
    await migrateUp(sequelize);
    const { accounts } = await seedDemo(sequelize, { bcryptRounds: 4 });
    const engineer = accounts.find((a) => a.role === 'engineer')!;
    const base = await new Promise<string>((done) => listener.listen(0, '127.0.0.1', () => done(`http://127.0.0.1:${(listener.address() as AddressInfo).port}`)));

    const out = join(scratch, 'sweep');
    let t0 = performance.now();
    const sw = spawnSync(process.execPath, ['cli/bin/panelpoint.mjs', 'sweep', 'bench/studies/sweep-bench.json', '--out', out, '-q'], { cwd: root, encoding: 'utf8' });
    if (sw.status !== 0) throw new Error(`sweep failed: ${sw.stderr}`);
    const sweepSeconds = (performance.now() - t0) / 1000;
    const signedIn = await fetch(`${base}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: engineer.email, password: engineer.password }) });
    const { token } = (await signedIn.json()) as { token: string };
    t0 = performance.now();
    const pushed = await cliPush(out, base, token, scratch);
    const pushSeconds = (performance.now() - t0) / 1000;
    log(`  sweep-bench.json: ${pushed.variantCount.toLocaleString('en-US')} variants swept in ${sweepSeconds.toFixed(1)} s, pushed by the CLI in ${pushSeconds.toFixed(1)} s (run ${pushed.runId})`);

    browser = await launchChromium();
    log(`  Chromium ${browser.version()}, headless, no GPU; ${LOADS} load(s) of the run's design-space page as ${engineer.email}`);
    const loads = await loadPage(browser, base, engineer.email, engineer.password, pushed.runId);
    const [cold, ...warm] = loads;
    const warmFirst = warm.length ? Math.round(median(warm.map((l) => l.firstMs))) : null;
    log(`web bench: navigation → first drawn chart ${Math.round(cold.firstMs)} ms with an empty cache${warmFirst === null ? '' : `, median ${warmFirst} ms cached`} (goal < ${TARGET_MS} ms)`);
    return {
      bench: 'web', variants: pushed.variantCount, firstChartColdMs: Math.round(cold.firstMs), allChartsColdMs: Math.round(cold.allMs),
      firstChartWarmMedianMs: warmFirst, allChartsWarmMedianMs: warm.length ? Math.round(median(warm.map((l) => l.allMs))) : null,
      apiDoneColdMs: Math.round(cold.apiMs), transferColdKB: cold.transferKB, loads: LOADS, targetMs: TARGET_MS, underTarget: cold.firstMs < TARGET_MS,
      sweepSeconds: Number(sweepSeconds.toFixed(2)), pushSeconds: Number(pushSeconds.toFixed(2)), chromium: browser.version(), cores: cpus().length,
    };
  } finally {
    await browser?.close();
    await new Promise<void>((done) => {
      listener.close(() => done());
      listener.closeAllConnections();
    });
    await sequelize.close();
  }
}

async function main(): Promise<Record<string, unknown>> {
  const missing = chromiumMissing();
  if (missing) throw new Error(missing);
  if (!webAppBuilt(WEB)) throw new Error(`${WEB} holds no built web app: run \`npx vite build\` first`);
  log(`web bench: ${cpus().length} cores (${cpus()[0]?.model ?? '?'}), load ${loadavg().map((v) => v.toFixed(2)).join(' ')}; web app built ${new Date(statSync(join(WEB, 'index.html')).mtimeMs).toISOString()}`);
  const port = await freePort();
  try {
    execFileSync('bash', ['scripts/db.sh', 'start', dbDir, String(port), 'panelpoint_web_bench'], { cwd: root, stdio: ['ignore', 'ignore', 'inherit'] });
    return await measure();
  } finally {
    execFileSync('bash', ['scripts/db.sh', 'stop', dbDir], { cwd: root, stdio: 'ignore' });
    if (keep) log(`  kept ${scratch}`);
    else rmSync(scratch, { recursive: true, force: true });
  }
}

main().then((figures) => console.log(JSON.stringify(figures)), (e: unknown) => {
  console.error(e);
  process.exitCode = 1;
});
