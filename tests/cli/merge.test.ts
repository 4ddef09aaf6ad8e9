/**
 * `panelpoint merge`: what it refuses (exit 2, naming the folder, nothing written) and a merge
 * with a shard missing (status 'partial', exit 3). That merged shards equal an unsharded run is
 * checked in sweep.test.ts.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cpSync, existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { shardRange } from '../../shared/sweep/shard';
import { runCli } from './run-cli';
import { readLines, readRunJson, snapshot, study, tempDir, writeStudy } from './sweep-helpers';

const tmp = tempDir('merge');
afterAll(() => tmp.done());

const VARY = { panels: [6, 8], depth: [2, 2.5, 3], supports: ['pin-roller', 'pin-pin'] };
const SIZE = 12;
const at = (name: string) => join(tmp.path, name);

async function sweep(file: string, out: string, shard: string): Promise<void> {
  const r = await runCli('sweep', file, '--out', out, '--shard', shard, '--workers', '1', '-q');
  expect(r.code, r.err).toBe(0);
}

/** Merge and expect a refusal naming `culprit`, with --out not created and no temporary folder left. */
async function refused(culprit: string, pattern: RegExp, ...dirs: string[]): Promise<void> {
  const out = at(`refused-${Math.random().toString(36).slice(2)}`);
  const before = readdirSync(tmp.path).sort();
  const r = await runCli('merge', ...dirs, '--out', out);
  expect(r.code, r.err).toBe(2);
  expect(r.err).toContain(culprit);
  expect(r.err).toMatch(pattern);
  expect(existsSync(out)).toBe(false);
  expect(readdirSync(tmp.path).sort()).toEqual(before);
}

beforeAll(async () => {
  const file = writeStudy(tmp.path, 'a.json', study({ vary: VARY }));
  const other = writeStudy(tmp.path, 'b.json', study({ vary: { ...VARY, depth: [2, 2.5, 3.5] } }));
  await sweep(file, at('a1'), '1/2');
  await sweep(file, at('a2'), '2/2');
  await sweep(file, at('a1of3'), '1/3');
  await sweep(other, at('b2'), '2/2');
  cpSync(at('a2'), at('a2-interrupted'), { recursive: true });
  const run = readRunJson(at('a2-interrupted'), 'run.json');
  writeFileSync(join(at('a2-interrupted'), 'run.json'), JSON.stringify({ ...run, status: 'interrupted' }));
}, 120_000);

describe('merge refuses, exit 2, and writes nothing', () => {
  it('shards of different studies', () => refused(at('b2'), /another study/, at('a1'), at('b2')));
  it('different shard counts', () => refused(at('a1of3'), /1\/3.*one of 2 shards/, at('a1'), at('a2'), at('a1of3')));
  it('the same shard twice', () => refused(at('a1'), /holds shard 1\/2, as does/, at('a1'), at('a2'), at('a1')));
  it('a shard that is not complete', () => refused(at('a2-interrupted'), /'interrupted', not 'complete'/, at('a1'), at('a2-interrupted')));
  it('a folder that is not a run', () => refused(at('nowhere'), /no such run folder/, at('a1'), at('nowhere')));

  it('an existing, non-empty --out: left unchanged', async () => {
    const out = at('busy');
    mkdirSync(out);
    writeFileSync(join(out, 'notes.txt'), 'keep me\n');
    const r = await runCli('merge', at('a1'), at('a2'), '--out', out);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/not empty/);
    expect(snapshot(out)).toEqual({ 'notes.txt': 'keep me\n' });
  });

  it('a damaged shard found part way through: no --out, no temporary folder, no parent folders made for it', async () => {
    cpSync(at('a2'), at('a2-damaged'), { recursive: true });
    const csv = join(at('a2-damaged'), 'variants.csv');
    const text = readFileSync(csv, 'utf8');
    writeFileSync(csv, text.slice(0, text.lastIndexOf('\n', text.length - 2) + 1)); // one row short
    const before = readdirSync(tmp.path).sort();
    const r = await runCli('merge', at('a1'), at('a2-damaged'), '--out', join(at('new-parent'), 'deeper', 'merged'));
    expect(r.code).toBe(2);
    expect(r.err).toContain(at('a2-damaged'));
    expect(r.err).toMatch(/rows, where variants\.jsonl has/);
    expect(readdirSync(tmp.path).sort()).toEqual(before);
  });
});

describe('merge with a shard missing', () => {
  it('writes a partial run of the shards it has, says which are missing, and exits 3', async () => {
    const out = at('partial');
    mkdirSync(out); // an empty --out is fine
    const r = await runCli('merge', at('a2'), '--out', out);
    expect(r.code).toBe(3);
    const missing = shardRange(SIZE, 1, 2);
    expect(r.err).toContain(`1/2 (variants ${missing.start}..${missing.end - 1})`);
    const run = readRunJson<{ status: string; shard: unknown; missing: unknown[]; mergedFrom: { dir: string }[] }>(out, 'run.json');
    expect(run.status).toBe('partial');
    expect(run.shard).toEqual({ index: 1, count: 1 });
    expect(run.missing).toEqual([{ shard: 1, ...missing }]);
    expect(run.mergedFrom.map((m) => m.dir)).toEqual([at('a2')]);
    expect(readLines(out)).toEqual(readLines(at('a2')));
    expect(readRunJson(out, 'summary.json')).toMatchObject({ status: 'partial', evaluated: readLines(at('a2')).length });
  });
});
