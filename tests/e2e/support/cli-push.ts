/** `panelpoint push` as a child process, for the browser tests and bench:web (no vitest in here). */
import { spawn } from 'node:child_process';
import { resolve } from 'node:path';

const ROOT = resolve(import.meta.dirname, '../../..');

/** The demo project of server/db/seed-demo.ts that the runs are pushed to. */
export const DEMO_PROJECT = 'harrow-lane-depot';

export interface PushAnswer { runId: string; created: boolean; inserted: number; variantCount: number; status: string }

/** `panelpoint push DIR --project SLUG --json -q` as a child process: this process serves the request. */
export function cliPush(dir: string, server: string, token: string, home: string): Promise<PushAnswer> {
  const p = spawn(process.execPath, ['cli/bin/panelpoint.mjs', 'push', dir, '--project', DEMO_PROJECT, '--json', '-q'], {
    cwd: ROOT, env: { ...process.env, HOME: home, PANELPOINT_SERVER: server, PANELPOINT_TOKEN: token }, stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  let err = '';
  p.stdout.on('data', (d: Buffer) => (out += d));
  p.stderr.on('data', (d: Buffer) => (err += d));
  return new Promise((done, fail) => p.on('close', (code) => (code === 0 ? done(JSON.parse(out) as PushAnswer) : fail(new Error(`panelpoint push exited ${code}: ${err}`)))));
}

