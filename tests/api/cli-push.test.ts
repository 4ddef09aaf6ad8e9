/**
 * `panelpoint push` and `panelpoint login` against the app listening on a loopback port: the
 * CLI in this process (push) and as a real process (login, reading the password from stdin),
 * with a small proxy in front that answers 503 first or counts the requests.
 */
import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import http, { type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../cli/run-cli';
import { Run } from '../../server/db/models/run.model';
import { cleanRuns, ROOT, roofStudy, sweep, type SweptRun } from './support/run-fixtures';
import { startTestApp, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;
let app: Server;
let server: string;
let run: SweptRun;
const home = mkdtempSync(join(tmpdir(), 'pp-home-'));
const saved = { HOME: process.env.HOME, PANELPOINT_TOKEN: process.env.PANELPOINT_TOKEN, PANELPOINT_SERVER: process.env.PANELPOINT_SERVER };

const listen = (s: Server) => new Promise<string>((done) => s.listen(0, '127.0.0.1', () => done(`http://127.0.0.1:${(s.address() as AddressInfo).port}`)));
const close = (s: Server) => new Promise<void>((done) => s.close(() => done()));

/** A proxy to the app that answers 503 to the first `fail` requests, and counts them all. */
async function proxy(fail: number): Promise<{ url: string; requests: () => number; stop: () => Promise<void> }> {
  let n = 0;
  const target = new URL(server);
  const s = http.createServer((req, res) => {
    if (++n <= fail) {
      res.writeHead(503, { 'content-type': 'application/json' }).end(JSON.stringify({ error: { code: 'database-unavailable', message: 'The database is not reachable; try again shortly.', details: [] } }));
      return;
    }
    const up = http.request({ host: target.hostname, port: target.port, path: req.url, method: req.method, headers: req.headers }, (r) => {
      res.writeHead(r.statusCode ?? 502, r.headers);
      r.pipe(res);
    });
    req.pipe(up);
  });
  const url = await listen(s);
  return { url, requests: () => n, stop: () => close(s) };
}

beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
  app = http.createServer(t.app);
  server = await listen(app);
  run = sweep(roofStudy('cli push test', { depth: { from: 1, to: 3, count: 30 }, panels: [6, 8], supports: ['pin-roller', 'pin-pin', 'roller-roller'] }));
  process.env.HOME = home;
  delete process.env.PANELPOINT_SERVER;
}, 120_000);
afterEach(() => {
  delete process.env.PANELPOINT_TOKEN;
});
afterAll(async () => {
  for (const [k, v] of Object.entries(saved)) if (v === undefined) delete process.env[k]; else process.env[k] = v;
  cleanRuns();
  rmSync(home, { recursive: true, force: true });
  await close(app);
  await t.close();
});

const slug = () => w.project.slug;

describe('panelpoint push', () => {
  it('pushes a run folder in one streamed request, then finds it already there', async () => {
    process.env.PANELPOINT_TOKEN = w.tokens.engineer;
    const first = await runCli('push', run.dir, '--project', slug(), '--server', server);
    expect([first.code, first.err]).toEqual([0, expect.stringMatching(/push: 180 variants of 'cli push test' to .*\n.*MB of .*MB sent \(100 %\)/)]);
    expect(first.out).toBe(`pushed run ${run.manifest.runId} to ${slug()}: 180 variant(s) stored, new run; the run holds 180 variants (complete)\n`);
    expect((await Run.findOne({ where: { runId: run.manifest.runId } }))!.variantCount).toBe(180);
    const again = await runCli('push', run.dir, '--project', slug(), '--server', server, '--json', '-q');
    expect([again.code, JSON.parse(again.out)]).toEqual([0, expect.objectContaining({ unchanged: true, inserted: 0, variantCount: 180 })]);
    expect(again.err).toBe('');
  });

  it('retries a 503 after 1 s, and says so', async () => {
    process.env.PANELPOINT_TOKEN = w.tokens.engineer;
    const p = await proxy(1);
    try {
      const res = await runCli('push', run.dir, '--project', slug(), '--server', p.url);
      expect(res.code).toBe(0);
      expect(res.err).toContain('the server answered 503 (unavailable); retrying in 1 s (attempt 2 of 5)');
      expect(p.requests()).toBe(2);
    } finally {
      await p.stop();
    }
  });

  it('never retries a 4xx: prints the server message and its details paths, exit 2', async () => {
    process.env.PANELPOINT_TOKEN = w.tokens.engineer;
    const p = await proxy(0);
    try {
      const missing = await runCli('push', run.dir, '--project', 'no-such-project', '--server', p.url);
      expect([missing.code, p.requests()]).toEqual([2, 1]);
      expect(missing.err).toContain('push refused, nothing was stored: No such project. (HTTP 404 project-not-found)');

      const broken = sweep(roofStudy('cli push test, broken', { depth: [1, 2], panels: [6], supports: ['pin-roller'] }));
      const lines = readFileSync(join(broken.dir, 'variants.jsonl'), 'utf8').replace('"status":"determinate"', '"status":"wobbly"');
      writeFileSync(join(broken.dir, 'variants.jsonl'), lines);
      const bad = await runCli('push', broken.dir, '--project', slug(), '--server', p.url);
      expect([bad.code, p.requests()]).toEqual([2, 2]);
      expect(bad.err).toMatch(/holds variants that are not valid.*\(HTTP 422 invalid-variants\)\n {2}line 2 rows\[0\]\.status: must be one of/);
    } finally {
      await p.stop();
    }
  });

  it('without a token: exit 2 and how to sign in; a viewer token: 403, exit 2', async () => {
    const none = await runCli('push', run.dir, '--project', slug(), '--server', server);
    expect([none.code, none.err]).toEqual([2, `error: not signed in to ${server}: run panelpoint login --server ${server}, or set PANELPOINT_TOKEN\n`]);
    process.env.PANELPOINT_TOKEN = w.tokens.viewer;
    const viewer = await runCli('push', run.dir, '--project', slug(), '--server', server);
    expect([viewer.code, viewer.err]).toEqual([2, expect.stringContaining('You need the right runs:push in this project.')]);
  });
});

/** `panelpoint login ARGS` as a real process with HOME and stdin given. */
function login(args: string[], stdin: string): Promise<{ code: number | null; out: string; err: string }> {
  return new Promise((done) => {
    const env: NodeJS.ProcessEnv = { ...process.env, HOME: home };
    delete env.PANELPOINT_TOKEN;
    const p = spawn(process.execPath, ['cli/bin/panelpoint.mjs', 'login', ...args], { cwd: ROOT, env, stdio: ['pipe', 'pipe', 'pipe'] });
    let out = '';
    let err = '';
    p.stdout.on('data', (d: Buffer) => (out += d));
    p.stderr.on('data', (d: Buffer) => (err += d));
    p.on('close', (code) => done({ code, out, err }));
    p.stdin.end(stdin);
  });
}

describe('panelpoint login', () => {
  const file = join(home, '.config', 'panelpoint', 'credentials.json');

  it('refuses a wrong password and stores nothing', async () => {
    const r = await login(['--server', server, '--email', w.people.engineer.email], 'not-the-password\n');
    expect([r.code, r.err]).toEqual([2, expect.stringContaining('sign-in refused')]);
    expect(() => statSync(file)).toThrow();
  });

  it('signs in with the password from stdin, stores {server, token} with mode 0600, and push uses it', async () => {
    const r = await login(['--server', server, '--email', w.people.engineer.email], `${w.people.engineer.password}\n`);
    expect([r.code, r.out]).toEqual([0, `signed in to ${server} as engineer <${w.people.engineer.email}>; token stored in ${file}\n`]);
    expect(statSync(file).mode & 0o777).toBe(0o600);
    const stored = JSON.parse(readFileSync(file, 'utf8'));
    expect(Object.keys(stored).sort()).toEqual(['server', 'token']);
    expect(stored.server).toBe(server);
    const other = sweep(roofStudy('cli push test, via login', { depth: [1, 2], panels: [6], supports: ['pin-roller'] }));
    const res = await runCli('push', other.dir, '--project', slug());
    expect([res.code, res.out]).toEqual([0, expect.stringContaining('2 variant(s) stored, new run')]);
  });

  it('stores an API token given on stdin (--with-token), after checking it with the server', async () => {
    const token = (await w.as('engineer').post(`/api/projects/${slug()}/tokens`).send({ name: 'cli' }).expect(201)).body.token as string;
    const r = await login(['--server', server, '--with-token'], `${token}\n`);
    expect(r.code).toBe(0);
    expect(JSON.parse(readFileSync(file, 'utf8'))).toEqual({ server, token });
    const bad = await login(['--server', server, '--with-token'], 'pp_000000000000_nope\n');
    expect([bad.code, bad.err]).toEqual([2, expect.stringContaining('the server does not accept this token')]);
  });
});
