// Push benchmark: a private MariaDB (scripts/db.sh on a free port in a temp folder), the team server
// on a loopback port, a real 200,000-variant sweep pushed by `panelpoint push` (a child process),
// row-by-row inserts of a 5,000-variant sample for the ratio, then four more pushes to hold
// 1,000,000 variants, and the time of a filtered sorted page and of a chart aggregate over them.
// Run: node --import tsx bench/push.bench.ts [--keep] [--buffer-pool-mb N]   (≈ 2 min; one JSON line last)
//   --buffer-pool-mb N  InnoDB buffer pool, MB (default 1024: the 1,000,000-variant table is ≈ 700 MB;
//                       0 keeps the 256 MB of scripts/db.sh)
import { execFileSync, spawn, spawnSync } from 'node:child_process';
import { randomBytes, randomUUID } from 'node:crypto';
import { cpSync, linkSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import http from 'node:http';
import { createServer, type AddressInfo } from 'node:net';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { createApp } from '../server/app';
import { issueSession } from '../server/auth/session';
import { serverConfig } from '../server/config';
import { migrateUp } from '../server/db/migrator';
import { Membership } from '../server/db/models/membership.model';
import { Project } from '../server/db/models/project.model';
import { Run } from '../server/db/models/run.model';
import { Variant } from '../server/db/models/variant.model';
import { createSequelize } from '../server/db/sequelize';
import { createLogger } from '../server/services/logger';
import { rowValues, variantInserter } from '../server/services/runs-insert';
import { rowsOfLine, type VariantRow } from '../server/services/runs-push-rows';
import { createAccount } from '../server/services/users.service';
import { filterConditions, orderSql, QueryReader, readSort } from '../server/services/variants-query';

const root = fileURLToPath(new URL('..', import.meta.url));
const keep = process.argv.includes('--keep');
const poolArg = process.argv.indexOf('--buffer-pool-mb');
/** InnoDB buffer pool for the run, MB (scripts/db.sh starts with 256; 0 keeps that). */
const POOL_MB = poolArg > 0 ? Number(process.argv[poolArg + 1]) : 1024;
const log = (s: string) => console.log(s);
const scratch = mkdtempSync(join(tmpdir(), 'pp-push-bench-'));
const dbDir = join(scratch, 'db');
const PAGE = 'status=determinate,indeterminate&f.depth.gte=2&sort=-peakCompression&pageSize=50&page=3';
const AGGREGATE = 'x=depth&y=peakCompression&bins=100';
const RUNS = 5;
const SAMPLE = 5000;
const int = (n: number) => Math.round(n).toLocaleString('en-US');

function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const s = createServer().once('error', fail).listen(0, '127.0.0.1', () => {
      const { port } = s.address() as AddressInfo;
      s.close(() => done(port));
    });
  });
}

/** `panelpoint push DIR` as a child process (async: this process serves the push). */
function push(dir: string, server: string, token: string, slug: string): Promise<{ seconds: number; answer: { inserted: number } }> {
  const t0 = performance.now();
  const p = spawn(process.execPath, ['cli/bin/panelpoint.mjs', 'push', dir, '--project', slug, '--server', server, '--json', '-q'], {
    cwd: root, env: { ...process.env, PANELPOINT_TOKEN: token, HOME: scratch }, stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  let err = '';
  p.stdout.on('data', (d: Buffer) => (out += d));
  p.stderr.on('data', (d: Buffer) => (err += d));
  return new Promise((done, fail) => p.on('close', (code) => (code === 0 ? done({ seconds: (performance.now() - t0) / 1000, answer: JSON.parse(out) }) : fail(new Error(`push exited ${code}: ${err}`)))));
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Seconds from spawn to exit of the CLI with `args`. */
function cliSeconds(args: string[]): number {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, ['cli/bin/panelpoint.mjs', ...args], { cwd: root, stdio: 'ignore' });
  if (r.status !== 0) throw new Error(`panelpoint ${args.join(' ')} exited ${r.status}`);
  return (performance.now() - t0) / 1000;
}

/** GET `path` `n` times: the first (cold) and the median of the others, ms. */
async function timeGet(url: string, token: string, n: number): Promise<{ coldMs: number; medianMs: number; bytes: number }> {
  const ms: number[] = [];
  let bytes = 0;
  for (let i = 0; i < n; i++) {
    const t0 = performance.now();
    const res = await fetch(url, { headers: { authorization: `Bearer ${token}` } });
    const body = await res.arrayBuffer();
    if (res.status !== 200) throw new Error(`GET ${url}: ${res.status} ${Buffer.from(body).toString()}`);
    ms.push(performance.now() - t0);
    bytes = body.byteLength;
  }
  const warm = ms.slice(1).sort((a, b) => a - b);
  return { coldMs: ms[0], medianMs: warm[Math.floor(warm.length / 2)], bytes };
}

/** Lines in a JSONL file, its size, and its first `n` lines (the rest is not kept). */
function jsonlHead(path: string, n: number): { variants: number; jsonl: string[]; bytes: number } {
  const raw = readFileSync(path);
  let variants = 0;
  let headEnd = 0;
  for (let at = raw.indexOf(10); at >= 0; at = raw.indexOf(10, at + 1)) if (++variants === n) headEnd = at;
  if (raw.length && raw[raw.length - 1] !== 10) variants++;
  const jsonl = raw.subarray(0, variants > n ? headEnd : raw.length).toString('utf8').split('\n').filter(Boolean);
  return { variants, jsonl, bytes: raw.length };
}

/** Seconds that `work` takes inside a transaction that is then rolled back. */
async function rolledBack(sequelize: Sequelize, work: (t: Transaction) => Promise<void>): Promise<number> {
  let seconds = 0;
  const undo = new Error('roll back');
  await sequelize.transaction(async (t) => {
    const t0 = performance.now();
    await work(t);
    seconds = (performance.now() - t0) / 1000;
    throw undo;
  }).catch((e: unknown) => {
    if (e !== undo) throw e;
  });
  return seconds;
}

/** Rows per second of `make(t)` given `rows` 2,000 at a time (row-by-row when `make` takes one). */
const rate = async (sequelize: Sequelize, rows: VariantRow[], make: (t: Transaction) => (rows: VariantRow[]) => Promise<unknown>, per = 2000) =>
  rows.length / (await rolledBack(sequelize, async (t) => {
    const insert = make(t);
    for (let i = 0; i < rows.length; i += per) await insert(rows.slice(i, i + per));
  }));

async function main(): Promise<Record<string, unknown>> {
  const port = await freePort();
  try {
    execFileSync('bash', ['scripts/db.sh', 'start', dbDir, String(port), 'panelpoint_bench'], { cwd: root, stdio: ['ignore', 'ignore', 'inherit'] });
    if (POOL_MB > 0) {
      const socket = readFileSync(join(dbDir, 'run/socket-path'), 'utf8').trim();
      execFileSync('mariadb', ['--no-defaults', `--socket=${socket}`, '-uroot', '-e', `SET GLOBAL innodb_buffer_pool_size = ${POOL_MB * 2 ** 20}`]);
    }
    return await measure(port);
  } finally {
    execFileSync('bash', ['scripts/db.sh', 'stop', dbDir], { cwd: root, stdio: 'ignore' });
    if (keep) log(`  kept ${scratch} (restart: bash scripts/db.sh start ${dbDir} ${port} panelpoint_bench)`);
    else rmSync(scratch, { recursive: true, force: true });
  }
}

async function measure(port: number): Promise<Record<string, unknown>> {
  const env = Object.fromEntries(readFileSync(join(dbDir, 'run/env'), 'utf8').trim().split('\n').map((l) => [l.slice(0, l.indexOf('=')), l.slice(l.indexOf('=') + 1)]));
  const sequelize = createSequelize({ host: env.DB_HOST, port: Number(env.DB_PORT), database: env.DB_NAME, user: env.DB_USER, password: env.DB_PASSWORD });
  const config = serverConfig({ jwtSecret: randomBytes(32).toString('hex'), bcryptRounds: 4 });
  const listener = http.createServer(createApp({ sequelize, config, logger: createLogger({ level: 'error', sink: () => undefined }) }));
  try {
    await migrateUp(sequelize);
    const [{ pool }] = await sequelize.query<{ pool: number }>('SELECT @@innodb_buffer_pool_size AS pool', { type: QueryTypes.SELECT });
    log(`push bench: ${cpus().length} cores (${cpus()[0]?.model ?? '?'}), load ${loadavg().map((v) => v.toFixed(2)).join(' ')}; MariaDB on :${port}, buffer pool ${Number(pool) / 2 ** 20} MB`);
    const server = await new Promise<string>((done) => listener.listen(0, '127.0.0.1', () => done(`http://127.0.0.1:${(listener.address() as AddressInfo).port}`)));
    const user = await createAccount({ email: 'bench@bench.example', name: 'Bench', role: 'engineer', password: 'bench-password-1' }, 4);
    const project = await Project.create({ slug: 'push-bench', name: 'Push bench', description: '' });
    await Membership.create({ userId: user.id, projectId: project.id, role: 'engineer' });
    const token = issueSession(user.id, config);

    // The benchmark study with 5 panel counts × 4 supports × 10,000 depths = 200,000 variants.
    const study = JSON.parse(readFileSync(join(root, 'bench/studies/sweep-bench.json'), 'utf8'));
    study.name = 'Push bench: flat Pratt, 200,000 variants';
    study.vary = { panels: [8, 10, 12, 14, 16], supports: study.vary.supports, depth: { ...study.vary.depth, count: 10_000 } };
    const studyFile = join(scratch, 'push-bench.json');
    writeFileSync(studyFile, JSON.stringify(study, null, 2));
    const first = join(scratch, 'run-1');
    const t0 = performance.now();
    const sw = spawnSync(process.execPath, ['cli/bin/panelpoint.mjs', 'sweep', studyFile, '--out', first, '-q', '--json'], { cwd: root, encoding: 'utf8', maxBuffer: 1 << 26 });
    if (sw.status !== 0) throw new Error(`sweep failed: ${sw.stderr}`);
    // Only the count and the sample's lines are kept: the server under test shares this process's
    // heap, and 100 MB of strings held here would tax its garbage collector during every push.
    const { variants, jsonl, bytes } = jsonlHead(join(first, 'variants.jsonl'), SAMPLE);
    log(`  sweep: ${int(variants)} variants in ${((performance.now() - t0) / 1000).toFixed(1)} s, variants.jsonl ${(bytes / 1e6).toFixed(0)} MB`);

    const load1 = loadavg()[0];
    const p1 = await push(first, server, token, project.slug);
    const pushRate = variants / p1.seconds;
    // What every CLI command pays before its own work (Node, the bundle check, loading the bundle).
    const cliStart = median([0, 1, 2].map(() => cliSeconds(['--version'])));
    log(`  push 1: ${int(p1.answer.inserted)} variants in ${p1.seconds.toFixed(2)} s (CLI start to exit) = ${int(pushRate)} variants/s; of which CLI start-up ≈ ${cliStart.toFixed(2)} s (panelpoint --version)`);

    // Row by row: the same rows, one INSERT each, in one transaction on a scratch run.
    const scratchRun = await Run.create({ runId: randomUUID(), projectId: project.id, studyId: (await Run.findOne())!.studyId, pushedBy: user.id, cliVersion: 'bench', gitCommit: null, shards: [], status: 'bench', summary: null, paramColumns: { depth: 'p2' } });
    const ctx = { runPk: scratchRun.id, paramColumns: scratchRun.paramColumns, range: { start: 0, end: variants }, lastIndex: -1 };
    const sample: VariantRow[] = [];
    for (let i = 0; i < SAMPLE; i += 2000) sample.push(...rowsOfLine({ kind: 'variants', rows: jsonl.slice(i, Math.min(i + 2000, SAMPLE)).map((l) => JSON.parse(l)) }, 1, ctx, -1).rows);
    const oneByOne = (t: Transaction) => ([r]: VariantRow[]) => Variant.create(r, { transaction: t });
    const bulkCreate = (t: Transaction) => (rows: VariantRow[]) => Variant.bulkCreate(rows, { transaction: t, validate: false, hooks: false });
    // The push's insert, from row objects (the push itself reads most lines straight into values).
    const pushInsert = (t: Transaction) => {
      const insert = variantInserter(t);
      return (rows: VariantRow[]) => insert(rows.map(rowValues));
    };
    // Warm-up (JIT, statement caches) of each way on a slice, untimed.
    for (const [make, per] of [[oneByOne, 1], [bulkCreate, 2000], [pushInsert, 2000]] as const) await rate(sequelize, sample.slice(0, 2000), make, per);
    const rowRate = await rate(sequelize, sample, oneByOne, 1);
    const t1 = performance.now();
    for (const r of sample) await Variant.create(r); // each committed on its own, as a plain loop would
    const autoRate = SAMPLE / ((performance.now() - t1) / 1000);
    await Variant.destroy({ where: { runPk: scratchRun.id } });
    const bulkRate = await rate(sequelize, sample, bulkCreate);
    const inserterRate = await rate(sequelize, sample, pushInsert);
    await scratchRun.destroy();
    log(`  row by row (the baseline): ${int(rowRate)} variants/s = Variant.create × ${int(SAMPLE)}, one single-row INSERT per variant of the same rows, same table and indexes, in one transaction; ${int(autoRate)} variants/s (each committed)`);
    log(`  the same ${int(SAMPLE)} in batches of 2,000: ${int(inserterRate)} variants/s (the push's insert), ${int(bulkRate)} variants/s (Variant.bulkCreate)`);
    log(`  ratio push (CLI start to exit) / row-by-row: ${(pushRate / rowRate).toFixed(1)}× (target ≥ 20×); push insert / row-by-row: ${(inserterRate / rowRate).toFixed(1)}×`);

    // Four more runs of the same sweep (new run ids) for 1,000,000 variants in the table.
    const more: number[] = [];
    for (let k = 2; k <= RUNS; k++) {
      const dir = join(scratch, `run-${k}`);
      mkdirSync(dir);
      linkSync(join(first, 'variants.jsonl'), join(dir, 'variants.jsonl'));
      cpSync(join(first, 'summary.json'), join(dir, 'summary.json'));
      const m = JSON.parse(readFileSync(join(first, 'run.json'), 'utf8'));
      writeFileSync(join(dir, 'run.json'), JSON.stringify({ ...m, runId: randomUUID() }));
      more.push((await push(dir, server, token, project.slug)).seconds);
    }
    const total = await Variant.count();
    const laterRate = variants / median(more);
    log(`  pushes 2..${RUNS} (the table growing to 1,000,000): ${more.map((s) => s.toFixed(2)).join(', ')} s, median ${int(laterRate)} variants/s = ${(laterRate / rowRate).toFixed(1)}× row by row; variants in the table: ${int(total)}`);

    const target = (await Run.findAll({ order: [['id', 'ASC']] }))[2];
    const runUrl = `${server}/api/projects/${project.slug}/runs/${target.runId}`;
    const r = new QueryReader(Object.fromEntries(new URLSearchParams(PAGE)), target.paramColumns);
    const where = filterConditions(r, target.id);
    const plan = await sequelize.query<{ key: string; rows: number; Extra: string }>(`EXPLAIN SELECT v.id FROM variants v WHERE ${where.sql} ORDER BY ${orderSql(readSort(r))} LIMIT 50 OFFSET 100`, { replacements: where.values, type: QueryTypes.SELECT });
    const page = await timeGet(`${runUrl}/variants?${PAGE}`, token, 9);
    const agg = await timeGet(`${runUrl}/aggregate?${AGGREGATE}`, token, 5);
    const points = await timeGet(`${runUrl}/points?x=depth&y=peakCompression&color=panels`, token, 3);
    log(`  page (${PAGE}) on run 3 of ${RUNS}: cold ${page.coldMs.toFixed(0)} ms, median ${page.medianMs.toFixed(0)} ms; plan: key ${plan[0]?.key}, ${plan[0]?.Extra ?? ''}`);
    log(`  aggregate (${AGGREGATE}): cold ${agg.coldMs.toFixed(0)} ms, median ${agg.medianMs.toFixed(0)} ms`);
    log(`  points (200,000 x, y, color): median ${points.medianMs.toFixed(0)} ms, ${(points.bytes / 1e6).toFixed(1)} MB`);
    return {
      bench: 'push', variants, pushSeconds: Number(p1.seconds.toFixed(3)), pushPerSecond: Math.round(pushRate), rowByRowPerSecond: Math.round(rowRate), rowByRowAutocommitPerSecond: Math.round(autoRate),
      insertBatchesPerSecond: Math.round(inserterRate), bulkCreatePerSecond: Math.round(bulkRate),
      ratioPushToRowByRow: Number((pushRate / rowRate).toFixed(1)), ratioInsertToRowByRow: Number((inserterRate / rowRate).toFixed(1)),
      morePushSeconds: more.map((s) => Number(s.toFixed(3))), laterPushPerSecond: Math.round(laterRate), ratioLaterPushToRowByRow: Number((laterRate / rowRate).toFixed(1)), tableVariants: total, pageColdMs: Math.round(page.coldMs), pageMedianMs: Math.round(page.medianMs),
      pageIndex: plan[0]?.key ?? null, aggregateColdMs: Math.round(agg.coldMs), aggregateMedianMs: Math.round(agg.medianMs), pointsMedianMs: Math.round(points.medianMs),
      bufferPoolMB: Number(pool) / 2 ** 20, cores: cpus().length, cliStartSeconds: Number(cliStart.toFixed(3)), loadAverageBeforePush: Number(load1.toFixed(2)),
    };
  } finally {
    await new Promise((done) => listener.close(done));
    await sequelize.close();
  }
}

main().then((figures) => console.log(JSON.stringify(figures)), (e: unknown) => {
  console.error(e);
  process.exitCode = 1;
});
