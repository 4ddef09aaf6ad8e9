/**
 * `panelpoint sweep` end to end on a small Pratt study (234 variants, 18 dropped by a filter):
 * the same files with 1 and 2 worker threads and from three merged shards, CSV and JSON Lines
 * that agree, a summary that counts what the JSON Lines hold and ranks truly best variants,
 * and statuses per support arrangement and compound linkage. Resume and Ctrl-C are in
 * sweep-resume.test.ts, bad input in sweep-bad-input.test.ts.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { shardRange } from '../../shared/sweep/shard';
import { runCli } from './run-cli';
import { cli, readCsv, readLines, readRunJson, study, summaryWithoutTiming, tempDir, writeStudy, type Line } from './sweep-helpers';

const tmp = tempDir('sweep');
afterAll(() => tmp.done());

const PANELS = [6, 8, 10];
const DEPTHS = Array.from({ length: 26 }, (_, k) => Number((1 + k * 0.1).toFixed(1)));
const SUPPORTS = ['pin-roller', 'pin-pin', 'roller-roller'];
const SPAN = 24;
const BASE = study({
  fixed: { span: SPAN },
  vary: { panels: PANELS, depth: { from: 1, to: 3.5, count: 26 }, supports: SUPPORTS },
  where: ['span / depth <= 20'],
});
const SIZE = PANELS.length * DEPTHS.length * SUPPORTS.length;
const KEPT = PANELS.length * DEPTHS.filter((d) => SPAN / d <= 20).length * SUPPORTS.length;

const out = (name: string) => join(tmp.path, name);
const bytes = (dir: string, file: string) => readFileSync(join(dir, file));
let lines: Line[];

beforeAll(async () => {
  const file = writeStudy(tmp.path, 'pratt.json', BASE);
  const runs = await Promise.all([
    cli('sweep', file, '--out', out('w1'), '--workers', '1', '-q'),
    cli('sweep', file, '--out', out('w2'), '--workers', '2', '--batch', '16', '-q'),
  ]);
  const shards = await Promise.all([1, 2, 3].map((i) => cli('sweep', file, '--shard', `${i}/3`, '--out', out(`s${i}`), '--workers', '1', '-q')));
  for (const r of [...runs, ...shards]) expect(r.code, r.err).toBe(0);
  lines = readLines(out('w1'));
}, 180_000);

describe('the same results however the work is split', () => {
  it('writes identical variants.jsonl and variants.csv with 1 and 2 workers', () => {
    expect(lines).toHaveLength(KEPT);
    expect(bytes(out('w2'), 'variants.jsonl').equals(bytes(out('w1'), 'variants.jsonl'))).toBe(true);
    expect(bytes(out('w2'), 'variants.csv').equals(bytes(out('w1'), 'variants.csv'))).toBe(true);
    expect(summaryWithoutTiming(out('w2'))).toEqual(summaryWithoutTiming(out('w1')));
  });

  it('runs each shard over its slice and merges shards 1/3, 2/3, 3/3 into the same files', async () => {
    for (const i of [1, 2, 3]) {
      const { start, end } = shardRange(SIZE, i, 3);
      const own = readLines(out(`s${i}`));
      expect(own.every((l) => l.index >= start && l.index < end)).toBe(true);
      expect(readRunJson(out(`s${i}`), 'run.json')).toMatchObject({ shard: { index: i, count: 3 }, range: { start, end }, status: 'complete' });
    }
    // given out of order: merge sorts by range
    const r = await runCli('merge', out('s3'), out('s1'), out('s2'), '--out', out('merged'));
    expect(r.code, r.err).toBe(0);
    expect(bytes(out('merged'), 'variants.jsonl').equals(bytes(out('w1'), 'variants.jsonl'))).toBe(true);
    expect(bytes(out('merged'), 'variants.csv').equals(bytes(out('w1'), 'variants.csv'))).toBe(true);
    expect(summaryWithoutTiming(out('merged'))).toEqual(summaryWithoutTiming(out('w1')));
    const run = readRunJson<{ shard: unknown; range: unknown; status: string; mergedFrom: { dir: string }[] }>(out('merged'), 'run.json');
    expect(run).toMatchObject({ shard: { index: 1, count: 1 }, range: { start: 0, end: SIZE }, status: 'complete' });
    expect(run.mergedFrom.map((m) => m.dir)).toEqual([out('s1'), out('s2'), out('s3')]);
  });
});

describe('what a run folder holds', () => {
  it('has CSV rows whose figures equal the JSON line of the same variant', () => {
    const { header, rows } = readCsv(out('w1'));
    expect(rows).toHaveLength(lines.length);
    const params = Object.keys(lines[0].params);
    expect(header).toEqual(['index', 'id', ...params, 'status', 'joints', 'members', 'reactions', 'k', 's', 'critical',
      'peakTension_kN', 'peakTensionMember', 'peakTensionCombination', 'peakCompression_kN', 'peakCompressionMember', 'peakCompressionCombination',
      'maxDisplacement_m', 'maxDisplacementNode', 'maxDisplacementCombination', 'spanOverDeflection', 'reason']);
    const numOrBlank = (v: number | null | undefined) => (v === null || v === undefined ? '' : v);
    rows.forEach((row, n) => {
      const l = lines[n];
      const cell = (name: string) => row[header.indexOf(name)];
      const asNumber = (name: string) => (cell(name) === '' ? '' : Number(cell(name)));
      expect(Number(cell('index'))).toBe(l.index);
      expect(cell('id')).toBe(l.id);
      for (const p of params) expect(typeof l.params[p] === 'number' ? Number(cell(p)) : cell(p)).toBe(l.params[p]);
      expect([cell('status'), Number(cell('joints')), Number(cell('members')), Number(cell('reactions')), Number(cell('k')), Number(cell('s')), cell('critical')])
        .toEqual([l.status, l.joints, l.members, l.reactions, l.k, l.s, String(l.critical)]);
      expect([asNumber('peakTension_kN'), cell('peakTensionMember'), cell('peakTensionCombination')])
        .toEqual([numOrBlank(l.peakTension?.value), l.peakTension?.member ?? '', l.peakTension?.combination ?? '']);
      expect([asNumber('peakCompression_kN'), cell('peakCompressionMember'), cell('peakCompressionCombination')])
        .toEqual([numOrBlank(l.peakCompression?.value), l.peakCompression?.member ?? '', l.peakCompression?.combination ?? '']);
      expect([asNumber('maxDisplacement_m'), cell('maxDisplacementNode'), cell('maxDisplacementCombination')])
        .toEqual([numOrBlank(l.maxDisplacement?.value), l.maxDisplacement?.node ?? '', l.maxDisplacement?.combination ?? '']);
      expect(asNumber('spanOverDeflection')).toBe(numOrBlank(l.spanOverDeflection));
      expect(cell('reason')).toBe(l.reason ?? '');
    });
  });

  it('counts in summary.json what variants.jsonl holds, and ranks the best stable variants by the objective', () => {
    const s = readRunJson<{
      evaluated: number; filtered: number; critical: number; byStatus: Record<string, number>;
      best: { index: number; value: number }[]; reasons: { status: string; count: number }[];
    }>(out('w1'), 'summary.json');
    const count = (st: string) => lines.filter((l) => l.status === st).length;
    expect(s.byStatus).toEqual({ determinate: count('determinate'), indeterminate: count('indeterminate'), unstable: count('unstable'), error: count('error') });
    expect(s.evaluated).toBe(lines.length);
    expect(s.filtered).toBe(SIZE - KEPT);
    expect(s.critical).toBe(lines.filter((l) => l.critical).length);
    expect(s.reasons.reduce((n, r) => n + r.count, 0)).toBe(count('unstable') + count('error'));
    // objective minimize maxAbsForce: the largest |member force| over all combinations
    const ranked = lines
      .filter((l) => l.status === 'determinate' || l.status === 'indeterminate')
      .map((l) => ({ index: l.index, value: Math.max(l.peakTension?.value ?? 0, -(l.peakCompression?.value ?? 0)) }))
      .sort((a, b) => a.value - b.value || a.index - b.index);
    expect(s.best.map((b) => ({ index: b.index, value: b.value }))).toEqual(ranked.slice(0, 10));
  });
});

describe('statuses through the sweep', () => {
  it('pin-roller is determinate, pin-pin indeterminate with s = 1, roller-roller unstable', () => {
    for (const l of lines) {
      const n = l.params.panels as number;
      // Pratt with verticals at every panel point: j = 2(n + 1), m = 4n + 1
      expect([l.joints, l.members]).toEqual([2 * (n + 1), 4 * n + 1]);
      // Calladine's extension of Maxwell's rule (Int. J. Solids Struct. 14, 1978): s − k = m + r − 2j
      expect(l.s - l.k).toBe(l.members + l.reactions - 2 * l.joints);
      const expected = {
        'pin-roller': { status: 'determinate', reactions: 3, k: 0, s: 0 },
        'pin-pin': { status: 'indeterminate', reactions: 4, k: 0, s: 1 },
        'roller-roller': { status: 'unstable', reactions: 2, k: 1, s: 0 },
      }[l.params.supports as string];
      expect({ status: l.status, reactions: l.reactions, k: l.k, s: l.s }, `#${l.index}`).toEqual(expected);
      if (l.status === 'unstable') {
        expect(l.reason).toMatch(/parallel/);
        expect([l.peakTension, l.peakCompression, l.maxDisplacement]).toEqual([null, null, null]);
      } else expect(l.reason).toBeNull();
    }
  });

  it.each([
    ['compound-link', ['sound', 'concurrent']],
    ['compound-three-bar', ['sound', 'concurrent', 'parallel']],
  ])('%s: a sound linkage is determinate, the others are critical forms (count met, k = 1)', async (family, linkages) => {
    const file = writeStudy(tmp.path, `${family}.json`, study({ family, vary: { panels: [5, 7], depth: [2, 3], linkage: linkages } }));
    const r = await runCli('sweep', file, '--out', out(family), '--workers', '1', '-q');
    expect(r.code, r.err).toBe(0);
    const got = readLines(out(family));
    expect(got).toHaveLength(4 * linkages.length);
    for (const l of got) {
      // m + r = 2j for every linkage: Maxwell's count is met, so an unstable one is a critical form
      expect(l.members + l.reactions).toBe(2 * l.joints);
      if (l.params.linkage === 'sound') expect({ status: l.status, k: l.k, s: l.s, critical: l.critical }).toEqual({ status: 'determinate', k: 0, s: 0, critical: false });
      else expect({ status: l.status, k: l.k, s: l.s, critical: l.critical }).toEqual({ status: 'unstable', k: 1, s: 1, critical: true });
    }
    expect(readRunJson<{ critical: number }>(out(family), 'summary.json').critical).toBe(4 * (linkages.length - 1));
  });

  it('records variants the family refuses (odd panels for a Pratt) as errors with a reason, goes on, and exits 3', async () => {
    const file = writeStudy(tmp.path, 'odd.json', study({ vary: { panels: [7, 8], depth: [2, 3] } }));
    const r = await runCli('sweep', file, '--out', out('odd'), '--workers', '2', '-q');
    expect(r.code).toBe(3);
    expect(r.err).toMatch(/2 variant\(s\) failed/);
    const got = readLines(out('odd'));
    expect(got.map((l) => [l.params.panels, l.status])).toEqual([[7, 'error'], [7, 'error'], [8, 'determinate'], [8, 'determinate']]);
    for (const l of got.filter((x) => x.status === 'error')) expect(l.reason).toMatch(/panels must be even.*7/);
    expect(readRunJson(out('odd'), 'run.json').status).toBe('complete');
    expect(readRunJson<{ byStatus: Record<string, number> }>(out('odd'), 'summary.json').byStatus.error).toBe(2);
  });
});
