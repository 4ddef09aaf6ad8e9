/**
 * `panelpoint check --push --project P` against a team server listening on 127.0.0.1:0 in this
 * test: the outcome is printed as before, the cases the server lacks are registered (model files
 * read in), the results recorded; the exit code stays the check's; a push that fails says why
 * and exits 1; a 503 is retried.
 */
import { mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { ROOT, runCli } from '../cli/run-cli';
import { startTestApp, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;
let server: Server;
let url: string;
let token: string;
const tmp = mkdtempSync(join(tmpdir(), 'pp-push-'));
const KEYS = ['PANELPOINT_SERVER', 'PANELPOINT_TOKEN', 'GITHUB_SHA', 'HOME'] as const;
const saved = Object.fromEntries(KEYS.map((k) => [k, process.env[k]]));

const listen = (s: Server) => new Promise<string>((done) => s.listen(0, '127.0.0.1', () => done(`http://127.0.0.1:${(s.address() as AddressInfo).port}`)));

beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
  server = createServer(t.app);
  url = await listen(server);
  token = (await w.as('engineer').post(`/api/projects/${w.project.slug}/tokens`).send({ name: 'ci', scopes: ['project:read', 'cases:freeze', 'checks:push'] }).expect(201)).body.token;
});
afterAll(async () => {
  await new Promise((r) => server.close(r));
  rmSync(tmp, { recursive: true, force: true });
  await t.close();
});
afterEach(() => {
  // Key by key: os.homedir() reads the real environment, which a replaced process.env object is not.
  for (const k of KEYS) {
    if (saved[k] === undefined) delete process.env[k];
    else process.env[k] = saved[k];
  }
});

const REF = `${ROOT}examples/reference`;
const useServer = (server: string, tok = token) => Object.assign(process.env, { PANELPOINT_SERVER: server, PANELPOINT_TOKEN: tok, GITHUB_SHA: 'f00dfeed' });
const history = async (name: string) => (await w.as('viewer').get(`/api/projects/${w.project.slug}/checks?case=${encodeURIComponent(name)}`).expect(200)).body.results as { status: string; gitCommit: string }[];

describe('panelpoint check --push', () => {
  it('prints the check, registers the cases (a { file } model read in), records the results; exit 0', async () => {
    useServer(url);
    const r = await runCli('check', `${REF}/pratt-six-panel.json`, `${REF}/two-bar-frame.json`, '--push', '--project', w.project.slug);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/reference cases: 2 passed/);
    expect(r.err).toMatch(new RegExp(`pushed 2 check result\\(s\\) to ${w.project.slug} on ${url}; registered 2 new case\\(s\\)`));
    const cases = (await w.as('viewer').get(`/api/projects/${w.project.slug}/cases`).expect(200)).body.cases as { id: number; name: string; latest: { status: string } }[];
    const pratt = cases.find((c) => c.name.startsWith('Pratt truss, 6 panels, pin and roller'))!;
    expect(pratt.latest.status).toBe('pass');
    const body = (await w.as('viewer').get(`/api/projects/${w.project.slug}/cases/${pratt.id}`).expect(200)).body.case.body;
    expect(body.model.nodes.length).toBeGreaterThan(0); // the model file, inline
    expect((await history(pratt.name))[0].gitCommit).toBe('f00dfeed');
  });

  it('a drifted case: exit 3 as without --push, the drift recorded, the engineers mailed', async () => {
    useServer(url);
    const good = JSON.parse(readFileSync(`${REF}/cantilever-wall-bracket.json`, 'utf8'));
    const file = join(tmp, 'bracket.json');
    writeFileSync(file, JSON.stringify(good));
    expect((await runCli('check', file, '--push', '--project', w.project.slug)).code).toBe(0);
    const forces = Object.values(good.expected.results as Record<string, { memberForces: Record<string, number> }>)[0].memberForces;
    const member = Object.keys(forces)[0];
    forces[member] += 10;
    writeFileSync(file, JSON.stringify(good));
    const before = t.mail.length;
    const r = await runCli('check', file, '--json', '--push', '--project', w.project.slug);
    expect(r.code).toBe(3);
    expect(JSON.parse(r.out).summary).toMatchObject({ drifted: 1 }); // stdout stays the JSON document
    expect(r.err).toMatch(/newly failing: .*\(2 engineer\(s\) mailed\)/);
    expect((await history(good.name)).map((h) => h.status)).toEqual(['drift', 'pass']);
    expect(t.mail.slice(before).map((m) => m.to).sort()).toEqual([w.people.engineer.email, w.people.promoted.email].sort());
    expect(t.mail.at(-1)!.text).toContain(`memberForces.${member}`);
  });

  it('an invalid case the server lacks is not pushed, and says so; the exit code stays 2', async () => {
    useServer(url);
    const file = join(tmp, 'broken.json');
    writeFileSync(file, JSON.stringify({ name: 'Broken case', expected: {}, tolerance: {} }));
    const r = await runCli('check', file, '--push', '--project', w.project.slug);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/not pushed: Broken case: the case is invalid and the server does not have it/);
  });

  it('a push that fails prints why and exits 1: no server, a bad token, an unknown project, no credentials', async () => {
    const dead = createServer();
    const deadUrl = await listen(dead);
    await new Promise((r) => dead.close(r));
    useServer(deadUrl);
    let r = await runCli('check', `${REF}/two-bar-frame.json`, '--push', '--project', w.project.slug);
    expect([r.code, r.out]).toEqual([1, expect.stringMatching(/1 passed/)]);
    expect(r.err).toMatch(/cannot reach .*ECONNREFUSED.*gave up after 4 attempts/);

    useServer(url, 'pp_nope_notatoken');
    r = await runCli('check', `${REF}/two-bar-frame.json`, '--push', '--project', w.project.slug);
    expect([r.code, r.err]).toEqual([1, expect.stringMatching(/does not accept the token \(401\)/)]);

    useServer(url);
    r = await runCli('check', `${REF}/two-bar-frame.json`, '--push', '--project', 'no-such-project');
    expect([r.code, r.err]).toEqual([1, expect.stringMatching(/not found \(404\)/)]);

    const home = join(tmp, 'home');
    mkdirSync(home, { recursive: true });
    delete process.env.PANELPOINT_SERVER;
    delete process.env.PANELPOINT_TOKEN;
    process.env.HOME = home;
    r = await runCli('check', `${REF}/two-bar-frame.json`, '--push', '--project', w.project.slug);
    expect([r.code, r.err]).toEqual([1, expect.stringMatching(/run panelpoint login, or set PANELPOINT_SERVER and PANELPOINT_TOKEN/)]);
  });

  it('reads ~/.config/panelpoint/credentials.json; retries a 503 and then succeeds', async () => {
    let refused = 0;
    const flaky = createServer((req, res) => {
      if (req.url?.endsWith('/checks') && refused < 2) {
        refused++;
        res.writeHead(503, { 'content-type': 'application/json', 'retry-after': '0' }).end(JSON.stringify({ error: { code: 'database-unavailable', message: 'try again' } }));
        return;
      }
      t.app(req, res);
    });
    const flakyUrl = await listen(flaky);
    const home = join(tmp, 'home2');
    mkdirSync(join(home, '.config', 'panelpoint'), { recursive: true });
    writeFileSync(join(home, '.config', 'panelpoint', 'credentials.json'), JSON.stringify({ server: flakyUrl, token }));
    delete process.env.PANELPOINT_SERVER;
    delete process.env.PANELPOINT_TOKEN;
    process.env.HOME = home;
    const r = await runCli('check', `${REF}/two-bar-frame.json`, '--push', '--project', w.project.slug);
    await new Promise((done) => flaky.close(done));
    expect(r.code, r.err).toBe(0);
    expect(refused).toBe(2);
    expect(r.err).toMatch(/pushed 1 check result/);
  });

  it('--push needs --project, and --project needs --push (exit 2)', async () => {
    expect((await runCli('check', `${REF}/two-bar-frame.json`, '--push')).code).toBe(2);
    expect((await runCli('check', `${REF}/two-bar-frame.json`, '--project', 'x')).code).toBe(2);
  });
});
