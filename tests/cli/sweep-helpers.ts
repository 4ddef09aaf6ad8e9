// Helpers of the sweep tests: small studies written to temp folders, the CLI as a child process
// that can be signalled, and readers of a run folder's JSON Lines, CSV and summary.
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ROOT } from './run-cli';

/** A temp folder, removed by `done()`. */
export function tempDir(label: string): { path: string; done(): void } {
  const path = mkdtempSync(join(tmpdir(), `panelpoint-${label}-`));
  return { path, done: () => rmSync(path, { recursive: true, force: true }) };
}

/** Roof loads of the example study: dead, snow and wind on the top chord at 6 m centres. */
export const ROOF_LOADS = [
  { case: 'D', kind: 'area', value: '0.45 kPa', spacing: 6, chord: 'top', projection: 'length' },
  { case: 'D', kind: 'self-weight' },
  { case: 'S', kind: 'area', value: '0.75 kPa', spacing: 6, chord: 'top' },
  { case: 'W', kind: 'area', value: '-0.5 kPa', spacing: 6, chord: 'top' },
];

/** A study object with the roof loads and the ASCE 7 preset; `over` replaces keys. */
export function study(over: Record<string, unknown>): Record<string, unknown> {
  return { name: 'test study', family: 'pratt', fixed: { span: 24 }, loads: ROOF_LOADS, combinations: { preset: 'asce7-lrfd' }, objective: { minimize: 'maxAbsForce' }, ...over };
}

/** Write a study file; @returns its path */
export function writeStudy(dir: string, name: string, data: unknown): string {
  const path = join(dir, name);
  writeFileSync(path, typeof data === 'string' ? data : JSON.stringify(data, null, 2) + '\n');
  return path;
}

/** A CLI child process and what it printed so far. */
export interface Child { proc: ChildProcess; out: string; err: string; exit: Promise<{ code: number | null; signal: NodeJS.Signals | null }> }

/** Start `node cli/bin/panelpoint.mjs ARGS` from the project folder without waiting for it. */
export function startCli(...args: string[]): Child {
  const proc = spawn(process.execPath, ['cli/bin/panelpoint.mjs', ...args], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'] });
  const child: Child = { proc, out: '', err: '', exit: undefined as never };
  proc.stdout!.on('data', (d: Buffer) => { child.out += d.toString(); });
  proc.stderr!.on('data', (d: Buffer) => { child.err += d.toString(); });
  child.exit = new Promise((resolve) => proc.on('close', (code, signal) => resolve({ code, signal })));
  return child;
}

/** Run the CLI as a child process to the end. */
export async function cli(...args: string[]): Promise<{ code: number | null; out: string; err: string }> {
  const c = startCli(...args);
  const { code } = await c.exit;
  return { code, out: c.out, err: c.err };
}

/** Poll until `test()` holds (every 5 ms), or fail after `ms`. */
export async function waitFor(test: () => boolean, ms: number, what: string): Promise<void> {
  const t0 = Date.now();
  while (!test()) {
    if (Date.now() - t0 > ms) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 5));
  }
}

/** Size of a file in bytes, 0 when it does not exist. */
export const sizeOf = (path: string): number => (existsSync(path) ? statSync(path).size : 0);

/** A variant as `variants.jsonl` holds it. */
export interface Line {
  index: number; id: string; params: Record<string, number | string>; status: string;
  joints: number; members: number; reactions: number; k: number; s: number; critical: boolean;
  peakTension: { value: number; member: string; combination: string } | null;
  peakCompression: { value: number; member: string; combination: string } | null;
  maxDisplacement: { value: number; node: string; combination: string } | null;
  spanOverDeflection: number | null; reason: string | null;
}

/** Every line of a run's variants.jsonl, parsed (each must be complete JSON). */
export function readLines(dir: string): Line[] {
  const text = readFileSync(join(dir, 'variants.jsonl'), 'utf8');
  if (text && !text.endsWith('\n')) throw new Error(`${dir}/variants.jsonl ends in an unfinished line`);
  return text.split('\n').filter(Boolean).map((l) => JSON.parse(l) as Line);
}

/** Split CSV text into rows of cells (RFC 4180 quoting: "" inside quotes is one "). */
export function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') { cell += '"'; i++; }
      else if (ch === '"') quoted = false;
      else cell += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') { row.push(cell); cell = ''; }
    else if (ch === '\n') { row.push(cell); rows.push(row); row = []; cell = ''; }
    else cell += ch;
  }
  if (cell || row.length) throw new Error('CSV ends in an unfinished row');
  return rows;
}

/** A run's variants.csv as header and rows. */
export function readCsv(dir: string): { header: string[]; rows: string[][] } {
  const [header, ...rows] = parseCsv(readFileSync(join(dir, 'variants.csv'), 'utf8'));
  return { header, rows };
}

/** Read a JSON file of a run folder. */
export const readRunJson = <T = Record<string, unknown>>(dir: string, file: 'run.json' | 'summary.json'): T =>
  JSON.parse(readFileSync(join(dir, file), 'utf8')) as T;

/** summary.json without the fields that differ between two runs of the same work (run id, timing, worker count). */
export function summaryWithoutTiming(dir: string): Record<string, unknown> {
  const { runId: _runId, seconds: _seconds, startupSeconds: _startup, workers: _workers, ...rest } = readRunJson(dir, 'summary.json');
  return rest;
}

/** Names and bytes of every file in a folder (to show that it did not change). */
export function snapshot(dir: string): Record<string, string> {
  return Object.fromEntries(readdirSync(dir).sort().map((f) => [f, readFileSync(join(dir, f), 'latin1')]));
}
