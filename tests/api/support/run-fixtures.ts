/**
 * Real sweep output for the runs tests: a study written to a temp folder and swept by the CLI (as
 * a child process), read back line by line; and push bodies (NDJSON) built from such a folder the
 * way the API describes them, independently of the CLI's own push code.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { studyHash } from '../../../shared/sweep/variant-id';
import type { Study } from '../../../shared/schemas/study';

export const ROOT = resolve(import.meta.dirname, '../../..');

/** Roof loads and combinations as in the example study (kPa on the top chord at 6 m centres). */
export function roofStudy(name: string, vary: Record<string, unknown>, extra: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    name, family: 'pratt', fixed: { span: 24 }, vary,
    loads: [
      { case: 'D', kind: 'area', value: '0.45 kPa', spacing: 6, chord: 'top', projection: 'length' },
      { case: 'D', kind: 'self-weight' },
      { case: 'S', kind: 'area', value: '0.75 kPa', spacing: 6, chord: 'top' },
      { case: 'W', kind: 'area', value: '-0.5 kPa', spacing: 6, chord: 'top' },
    ],
    combinations: { preset: 'asce7-lrfd' }, objective: { minimize: 'maxAbsForce' }, ...extra,
  };
}

/** One JSONL record as the sweep writes it. */
export interface Rec {
  index: number; id: string; params: Record<string, number | string>; status: string; joints: number; members: number; reactions: number;
  k: number; s: number; critical: boolean; reason: string | null; spanOverDeflection: number | null;
  peakTension: { value: number; member: string } | null; peakCompression: { value: number; member: string } | null;
  maxDisplacement: { value: number; node: string } | null;
}

export interface SweptRun {
  dir: string;
  studyFile: string;
  study: Record<string, unknown>;
  manifest: Record<string, unknown> & { runId: string; paramNames: string[]; shard: { index: number; count: number }; study: { name: string; family: string; hash: string } };
  summary: Record<string, unknown> & { evaluated: number };
  lines: string[];
  records: Rec[];
}

const scratch: string[] = [];
/** Remove every folder made here. */
export const cleanRuns = () => scratch.splice(0).forEach((d) => rmSync(d, { recursive: true, force: true }));

/** Sweep `study` (optionally one shard) with the CLI and read the folder back. */
export function sweep(study: Record<string, unknown>, shard?: string, base?: string): SweptRun {
  const root = base ?? mkdtempSync(join(tmpdir(), 'pp-runs-'));
  if (!base) scratch.push(root);
  const studyFile = join(root, 'study.json');
  writeFileSync(studyFile, JSON.stringify(study, null, 2));
  const dir = join(root, shard ? `out-${shard.replace('/', '-')}` : 'out');
  const args = ['cli/bin/panelpoint.mjs', 'sweep', studyFile, '--out', dir, '-q', '--workers', '1', ...(shard ? ['--shard', shard] : [])];
  const r = spawnSync(process.execPath, args, { cwd: ROOT, encoding: 'utf8', timeout: 120_000 });
  if (r.status !== 0) throw new Error(`sweep failed (${r.status}): ${r.stderr}`);
  return readRun(dir, studyFile, study);
}

export function readRun(dir: string, studyFile: string, study: Record<string, unknown>): SweptRun {
  const lines = readFileSync(join(dir, 'variants.jsonl'), 'utf8').split('\n').filter(Boolean);
  return {
    dir, studyFile, study,
    manifest: JSON.parse(readFileSync(join(dir, 'run.json'), 'utf8')),
    summary: JSON.parse(readFileSync(join(dir, 'summary.json'), 'utf8')),
    lines, records: lines.map((l) => JSON.parse(l) as Rec),
  };
}

/** The run line of a push of `run`. */
export function runLine(run: SweptRun, over: Record<string, unknown> = {}): Record<string, unknown> {
  const m = run.manifest;
  return {
    kind: 'run', manifest: run.manifest, summary: run.summary,
    study: { name: m.study.name, family: m.study.family, hash: studyHash(run.study as Study), body: run.study },
    cliVersion: '0.1.0-test', gitCommit: null, ...over,
  };
}

/** A push body: the run line, then the JSONL lines `per` at a time. `lines` replaces the records sent. */
export function pushBody(run: SweptRun, options: { per?: number; lines?: string[]; header?: Record<string, unknown> } = {}): Buffer {
  const per = options.per ?? 2000;
  const lines = options.lines ?? run.lines;
  const out = [JSON.stringify(options.header ?? runLine(run))];
  for (let i = 0; i < lines.length; i += per) out.push(`{"kind":"variants","rows":[${lines.slice(i, i + per).join(',')}]}`);
  return Buffer.from(out.join('\n') + '\n');
}

/** The value of a figure of a record as the API names it (null when absent). */
export function figure(r: Rec, field: string): number | null {
  switch (field) {
    case 'peakTension': return r.peakTension?.value ?? null;
    case 'peakCompression': return r.peakCompression?.value ?? null;
    case 'maxDisplacement': return r.maxDisplacement?.value ?? null;
    case 'spanOverDeflection': return r.spanOverDeflection;
    case 'index': return r.index;
    case 'k': return r.k;
    case 's': return r.s;
    default: {
      const v = r.params[field];
      return typeof v === 'number' ? v : null;
    }
  }
}
