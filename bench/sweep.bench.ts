// Sweep benchmark: `panelpoint sweep` on bench/studies/sweep-bench-million.json (1,008,000 variants) as
// a child process with 1 and 2 workers, the same on bench/studies/sweep-bench.json (100,800: the short
// run, where start-up and warm-up weigh more), then the NumPy peer (bench/peer/pratt_sweep.py) on an
// evenly spread sample of the million, and the agreement of their peak forces.
// Run: node --import tsx bench/sweep.bench.ts [--sample N] [--keep] [--sized]
//   --sample N  variants for the peer (default 2000: every ⌊variants/N⌋-th index)
//   --keep      keep the output folders (printed) instead of deleting them
//   --sized     also sweep the short study with member sizing on (a design block added) with 2 workers, and
//               print its rate against the unsized short run (or PANELPOINT_BENCH_SIZED=1)
// The last line printed is one line of JSON with the figures (see bench/README.md).
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { cpus, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { resolveStudy } from '../shared/sweep/resolve-study';
import { VariantEvaluator } from '../shared/sweep/evaluate';
import { measureChild, type ChildRun } from './lib/measure-child';
import { ensureNumpy, runPeer } from './lib/numpy-peer';
import { comparePeaks, readPeakCsv, type Agreement, type PeakRow } from './lib/peak-compare';
import { argValue, sig } from './lib/time-loop';

const root = fileURLToPath(new URL('..', import.meta.url));
const STUDY = 'bench/studies/sweep-bench-million.json';
const SHORT_STUDY = 'bench/studies/sweep-bench.json';
const CLI = 'cli/bin/panelpoint.mjs';
const argv = process.argv.slice(2);
const sized = argv.includes('--sized') || process.env.PANELPOINT_BENCH_SIZED === '1';
const sample = Number(argValue(argv, '--sample') ?? 2000);
const keep = argv.includes('--keep');
const REL_TOL = 1e-9;
const CSV_ROUNDING = 5e-7; // half of the 1e-6 kN to which variants.csv rounds forces
const log = (s: string) => console.log(s);
const scratch = mkdtempSync(join(tmpdir(), 'panelpoint-bench-'));
const mb = (kb: number) => sig(kb / 1024, 4);

log(`sweep bench: ${STUDY}; machine: ${cpus().length} cores (${cpus()[0]?.model ?? 'unknown CPU'}), load average ${loadavg().map((v) => v.toFixed(2)).join(' ')}${sized ? '; --sized passed on' : ''}`);
ensureNumpy(log);
// Untimed first start: cli/bin/panelpoint.mjs rebuilds its bundle here if a source changed.
spawnSync(process.execPath, [CLI, '--version'], { cwd: root, stdio: 'ignore' });

interface SweepRun { workers: number; run: ChildRun; seconds: number; variants: number; perSecond: number; out: string }

async function sweep(workers: number, study = STUDY, label = ''): Promise<SweepRun> {
  const out = join(scratch, `w${workers}${label}`);
  const args = [CLI, 'sweep', study, '--out', out, '--workers', String(workers), '-q', '--json'];
  const run = await measureChild(process.execPath, args, root, scratch);
  if (run.code !== 0) throw new Error(`panelpoint sweep --workers ${workers} exited ${run.code}:\n${run.stderr}`);
  const summary = JSON.parse(run.stdout) as { seconds: number; range: { start: number; end: number } };
  const variants = summary.range.end - summary.range.start;
  const r = { workers, run, seconds: summary.seconds, variants, perSecond: variants / summary.seconds, out };
  log(`  ${workers} worker(s)${label ? ` ${label}` : ''}: ${variants.toLocaleString('en-US')} variants in ${r.seconds.toFixed(2)} s = ${Math.round(r.perSecond).toLocaleString('en-US')} variants/s; ` +
    `wall ${run.wallSeconds.toFixed(2)} s spawn to exit (start-up ${(run.wallSeconds - r.seconds).toFixed(2)} s); peak RSS ${mb(run.peakRssKB)} MB (${run.rssMethod})`);
  return r;
}

const hashOf = (file: string) => createHash('sha256').update(readFileSync(file)).digest('hex');

/** Panelpoint's figures at full precision for the sampled indices, from the engine in this process. */
function fullPrecision(indices: Iterable<number>): Map<number, PeakRow> {
  const resolved = resolveStudy(JSON.parse(readFileSync(join(root, STUDY), 'utf8')));
  if (!resolved.setup) throw new Error(`the study does not resolve: ${resolved.issues.map((i) => i.message).join('; ')}`);
  const ev = new VariantEvaluator(resolved.setup);
  const rows = new Map<number, PeakRow>();
  for (const i of indices) {
    const r = ev.evaluate(i);
    if (!r) continue;
    const stable = r.status === 'determinate' || r.status === 'indeterminate';
    rows.set(i, {
      index: i, depth: Number(r.params.depth), status: r.status, joints: r.joints, members: r.members, reactions: r.reactions, k: r.k, s: r.s,
      peakTension: stable ? r.peakTension : NaN, peakCompression: stable ? r.peakCompression : NaN,
    });
  }
  return rows;
}

const describe = (a: Agreement) =>
  `${a.compared} variants, max relative difference ${a.maxRelDiff.toExponential(2)}, max absolute ${a.maxAbsDiff.toExponential(2)} kN, ` +
  `${a.outside} peak(s) outside tolerance, ${a.mismatches} status/count/k/s/depth mismatch(es)${a.examples.length ? `: ${a.examples.join('; ')}` : ''}`;

try {
  log(`panelpoint sweep (child process, -q --json), ${STUDY}:`);
  const w1 = await sweep(1);
  const w2 = await sweep(2);
  // Each run's output is checked, then deleted: a million variants write ≈ 750 MB.
  const identical = hashOf(join(w1.out, 'variants.csv')) === hashOf(join(w2.out, 'variants.csv'))
    && hashOf(join(w1.out, 'variants.jsonl')) === hashOf(join(w2.out, 'variants.jsonl'));
  if (!keep) rmSync(w1.out, { recursive: true, force: true });
  log(`the short run, ${SHORT_STUDY}:`);
  const s1 = await sweep(1, SHORT_STUDY, 'short');
  const s2 = await sweep(2, SHORT_STUDY, 'short');
  const shortSpeedup = s2.perSecond / s1.perSecond;
  log(`  short run speed-up 2 workers / 1 worker: ${shortSpeedup.toFixed(2)}× (each worker's start-up and JIT warm-up weigh ten times more here)`);
  // Member sizing on: the short study with a design block (AISC 360-16 LRFD, A500 Gr. C, the CHS catalogue).
  let sizedFigures = {};
  if (sized) {
    const sizedStudy = join(scratch, 'sweep-bench-sized.json');
    const base = JSON.parse(readFileSync(join(root, SHORT_STUDY), 'utf8'));
    writeFileSync(sizedStudy, JSON.stringify({ ...base, name: `${base.name} (sized)`, design: { code: 'aisc360-16-lrfd', material: 'a500-c-round', catalogue: 'chs', deflectionLimit: 240 } }));
    const ws = await sweep(2, sizedStudy, 'sized');
    const share = ws.perSecond / s2.perSecond;
    log(`  sizing on, 2 workers: ${Math.round(ws.perSecond).toLocaleString('en-US')} variants/s = ${(100 * share).toFixed(0)} % of the unsized short run (target ≥ 25 %)`);
    sizedFigures = { sizedVariantsPerSecond2: Math.round(ws.perSecond), sizedShareOfUnsized: sig(share, 3), sizedPeakRssMB: mb(ws.run.peakRssKB) };
  }
  const speedup = w2.perSecond / w1.perSecond;
  log(`speed-up 2 workers / 1 worker (${w2.variants.toLocaleString('en-US')} variants): ${speedup.toFixed(2)}× (2 cores); variants.csv and variants.jsonl identical for 1 and 2 workers: ${identical}`);

  const stride = Math.max(1, Math.floor(w2.variants / sample));
  const limit = Math.ceil(w2.variants / stride);
  const peerCsv = join(scratch, 'numpy-peer.csv');
  log(`NumPy peer (bench/peer/pratt_sweep.py, one core) on ${limit} variants: indices 0, ${stride}, ${2 * stride}, … (the study's mix of panels and supports):`);
  const peer = await runPeer(root, STUDY, limit, stride, peerCsv, scratch);
  log(peer.text.split('\n').map((l) => `  ${l.trim()}`).join('\n'));
  const ratio = w2.perSecond / peer.variantsPerSecond;
  log(`  Panelpoint with 2 workers / NumPy peer: ${Math.round(ratio).toLocaleString('en-US')}× (1 worker: ${Math.round(w1.perSecond / peer.variantsPerSecond).toLocaleString('en-US')}×)`);

  const peerRows = readPeakCsv(peerCsv, { tension: 'peakTension_kN', compression: 'peakCompression_kN' });
  const wanted = new Set(peerRows.keys());
  const csvRows = readPeakCsv(join(w2.out, 'variants.csv'), { tension: 'peakTension_kN', compression: 'peakCompression_kN' }, wanted);
  const fromCsv = comparePeaks(csvRows, peerRows, REL_TOL, CSV_ROUNDING);
  const full = comparePeaks(fullPrecision(wanted), peerRows, REL_TOL, 0);
  log('agreement of peak tension and compression with the NumPy peer:');
  log(`  variants.csv (forces stored to 1e-6 kN; tolerance 1e-9 relative + 5e-7 kN): ${describe(fromCsv)}`);
  log(`  engine at full precision (same code as the workers, in this process; tolerance 1e-9 relative): ${describe(full)}`);
  const agree = fromCsv.outside + fromCsv.mismatches + full.outside + full.mismatches === 0 && fromCsv.compared === peerRows.size;
  if (!agree) {
    log('  DISAGREEMENT: see above');
    process.exitCode = 1;
  }
  if (keep) log(`outputs kept in ${scratch}`);
  log(JSON.stringify({
    bench: 'sweep',
    variants: w2.variants,
    variantsPerSecond1: Math.round(w1.perSecond),
    variantsPerSecond2: Math.round(w2.perSecond),
    speedup: sig(speedup, 3),
    seconds1: w1.seconds,
    seconds2: w2.seconds,
    wallSeconds1: sig(w1.run.wallSeconds, 4),
    wallSeconds2: sig(w2.run.wallSeconds, 4),
    peakRssMB1: mb(w1.run.peakRssKB),
    peakRssMB2: mb(w2.run.peakRssKB),
    peakRssMB: mb(Math.max(w1.run.peakRssKB, w2.run.peakRssKB)),
    identicalOutputs: identical,
    shortVariants: s2.variants,
    shortVariantsPerSecond1: Math.round(s1.perSecond),
    shortVariantsPerSecond2: Math.round(s2.perSecond),
    shortSpeedup: sig(shortSpeedup, 3),
    numpyVariants: peer.variants,
    numpyVariantsPerSecond: sig(peer.variantsPerSecond, 4),
    ratioToNumpy: sig(ratio, 3),
    maxRelDiff: sig(fromCsv.maxRelDiff, 3),
    maxRelDiffFullPrecision: sig(full.maxRelDiff, 3),
    agree,
    sized,
    ...sizedFigures,
  }));
} finally {
  if (!keep) rmSync(scratch, { recursive: true, force: true });
}
