/**
 * A sweep stopped part way, then finished with --resume, gives the files of an uninterrupted run:
 * after SIGKILL (with a torn last line added, as a write cut short would leave) and after Ctrl-C
 * (SIGINT: exit 130, status 'interrupted', only whole lines on disk). Real child processes, 6,000
 * variants in batches of 50 so the signal lands mid-run.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { appendFileSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { cli, readCsv, readLines, readRunJson, sizeOf, startCli, study, summaryWithoutTiming, tempDir, waitFor, writeStudy } from './sweep-helpers';

const tmp = tempDir('sweep-resume');
afterAll(() => tmp.done());

const DEPTH_COUNT = 250;
const PANELS = [6, 8, 10, 12, 14, 16, 18, 20];
const DEPTHS = Array.from({ length: DEPTH_COUNT }, (_, k) => 1 + (2.5 * k) / (DEPTH_COUNT - 1));
const KEPT = PANELS.length * DEPTHS.filter((d) => 24 / d <= 20).length * 3;

const out = (name: string) => join(tmp.path, name);
const bytes = (dir: string, file: string) => readFileSync(join(dir, file));
let file: string;

/** Start a sweep in batches of 50 and send `signal` once some variants are on disk. */
async function interrupt(dir: string, signal: NodeJS.Signals) {
  const c = startCli('sweep', file, '--out', dir, '--workers', '2', '--batch', '50', '-q');
  await waitFor(() => sizeOf(join(dir, 'variants.jsonl')) > 0 || c.proc.exitCode !== null, 60_000, 'the first results');
  c.proc.kill(signal);
  const exit = await c.exit;
  return { ...exit, err: c.err };
}

function expectSameAsReference(dir: string): void {
  for (const f of ['variants.jsonl', 'variants.csv']) expect(bytes(dir, f).equals(bytes(out('ref'), f)), f).toBe(true);
  expect(summaryWithoutTiming(dir)).toEqual(summaryWithoutTiming(out('ref')));
  expect(readRunJson(dir, 'run.json').status).toBe('complete');
}

beforeAll(async () => {
  file = writeStudy(tmp.path, 'roof.json', study({
    vary: { panels: PANELS, depth: { from: 1, to: 3.5, count: DEPTH_COUNT }, supports: ['pin-roller', 'pin-pin', 'roller-roller'] },
    where: ['span / depth <= 20'],
  }));
  const r = await cli('sweep', file, '--out', out('ref'), '--workers', '2', '-q');
  expect(r.code, r.err).toBe(0);
  expect(readLines(out('ref'))).toHaveLength(KEPT);
}, 120_000);

describe('resume', () => {
  it('finishes a run killed with SIGKILL (and a torn last line) into the files of an uninterrupted run', async () => {
    const dir = out('killed');
    const k = await interrupt(dir, 'SIGKILL');
    expect(k.signal, 'the run ended before the kill; make the study larger').toBe('SIGKILL');
    const before = readFileSync(join(dir, 'variants.jsonl'), 'utf8');
    const whole = before.slice(0, before.lastIndexOf('\n') + 1).split('\n').filter(Boolean).length;
    expect(whole).toBeLessThan(KEPT);
    appendFileSync(join(dir, 'variants.jsonl'), before.slice(0, 60)); // half a line, no newline
    const r = await cli('sweep', file, '--out', dir, '--workers', '2', '--resume', '-q');
    expect(r.code, r.err).toBe(0);
    expectSameAsReference(dir);
  });

  it('stops on Ctrl-C with exit 130, status interrupted and only whole lines, then --resume completes it', async () => {
    const dir = out('sigint');
    const s = await interrupt(dir, 'SIGINT');
    expect(s.code, s.err).toBe(130);
    expect(s.err).toMatch(/--resume/);
    const run = readRunJson<{ status: string; nextIndex: number; range: { end: number } }>(dir, 'run.json');
    expect(run.status).toBe('interrupted');
    expect(run.nextIndex).toBeLessThan(run.range.end);
    const lines = readLines(dir); // throws on a line that is not complete JSON
    expect(lines.length).toBeGreaterThan(0);
    expect(lines.length).toBeLessThan(KEPT);
    expect(lines.every((l, n) => n === 0 || l.index > lines[n - 1].index)).toBe(true);
    expect(lines.every((l) => l.index < run.nextIndex)).toBe(true);
    expect(readCsv(dir).rows).toHaveLength(lines.length);
    const r = await cli('sweep', file, '--out', dir, '--workers', '1', '--resume', '-q');
    expect(r.code, r.err).toBe(0);
    expectSameAsReference(dir);
  });

  it('resumes a run killed between its JSONL and CSV writes (CSV behind) into the same files', async () => {
    const dir = out('csv-behind');
    const r0 = await cli('sweep', file, '--out', dir, '--workers', '2', '-q');
    expect(r0.code, r0.err).toBe(0);
    // Keep the whole JSONL but only part of the CSV, and mark the run interrupted, as a kill between the writes leaves it.
    const csv = readFileSync(join(dir, 'variants.csv'), 'utf8').split('\n');
    writeFileSync(join(dir, 'variants.csv'), csv.slice(0, 1 + Math.floor(KEPT / 3)).join('\n') + '\n');
    const run = readRunJson<Record<string, unknown>>(dir, 'run.json');
    writeFileSync(join(dir, 'run.json'), JSON.stringify({ ...run, status: 'interrupted', nextIndex: 0 }));
    const r = await cli('sweep', file, '--out', dir, '--workers', '1', '--resume', '-q');
    expect(r.code, r.err).toBe(0);
    expectSameAsReference(dir);
  });

  it('refuses to resume a complete run, and a damaged line is an input error (exit 2)', async () => {
    const done = await cli('sweep', file, '--out', out('ref'), '--resume', '-q');
    expect(done.code).toBe(2);
    expect(done.err).toMatch(/nothing to resume/);
    const dir = out('damaged');
    const k = await interrupt(dir, 'SIGKILL');
    expect(k.signal).toBe('SIGKILL');
    const text = readFileSync(join(dir, 'variants.jsonl'), 'utf8');
    writeFileSync(join(dir, 'variants.jsonl'), text.replace('{"index":', '{"index";'));
    const r = await cli('sweep', file, '--out', dir, '--resume', '-q');
    expect(r.code, r.err).toBe(2);
    expect(r.err).toMatch(/not valid JSON/);
  });
});
