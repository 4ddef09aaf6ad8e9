// Engine benchmark: analyses per second of the sweep fast path on one core (the main thread), for a
// 10-panel and a 40-panel flat Pratt truss, and the dense SVD classification for comparison.
// Run: node --import tsx bench/engine.bench.ts [--seconds S]   (S = timed seconds per case, default 2)
// The last line printed is one line of JSON with the figures (see bench/README.md).
import { getFamily } from '../shared/families/registry';
import { addCaseLoads } from '../shared/families/loads';
import { DEFAULT_SECTION } from '../shared/families/to-model';
import type { FamilyTopology, Params } from '../shared/families/types';
import type { StudyLoad } from '../shared/schemas/study-loads';
import { createKernel, type Kernel } from '../shared/engine/kernel';
import { findPeaksInto, PeakScratch } from '../shared/engine/peaks';

const peak = new PeakScratch();
import { classify } from '../shared/engine/classify';
import type { Structure } from '../shared/engine/structure';
import { argValue, sig, timeLoop, type LoopTiming } from './lib/time-loop';

const SECONDS = Number(argValue(process.argv, '--seconds') ?? 2);
const WARM = Math.min(0.5, SECONDS / 2);
const SPAN = 24; // m
const DEPTH_FROM = 0.8; // m
const DEPTH_TO = 4.0; // m
const DEPTHS = 1024; // depths cycled through, so every analysis sees new geometry

// The three cases and combinations of bench/studies/sweep-bench.json (kN/m², m).
const LOADS: StudyLoad[][] = [
  [{ case: 'D', kind: 'area', value: 0.6, spacing: 6, chord: 'top' }],
  [{ case: 'S', kind: 'area', value: 0.75, spacing: 6, chord: 'top' }],
  [{ case: 'W', kind: 'area', value: -0.5, spacing: 6, chord: 'top' }],
];
const COMBINATIONS = [[1.4, 0, 0], [1.2, 1.6, 0.5], [0.9, 0, 1.0]]; // factors on D, S, W
const NC = COMBINATIONS.length;

const family = getFamily('pratt');
if (!family) throw new Error("family 'pratt' is not in the registry");
const pratt = family;

/** One panel count: topology, kernel and buffers, built once. */
interface Case {
  panels: number; params: Params; topo: FamilyTopology; kernel: Kernel;
  x: Float64Array; y: Float64Array; EA: Float64Array; loads: Float64Array;
}

function setUp(panels: number): Case {
  const params: Params = { span: SPAN, depth: 2.4, panels, supports: 'pin-roller', rollerAngle: 60 };
  const problems = pratt.check(params);
  if (problems.length) throw new Error(problems.join('; '));
  const topo = pratt.topology(params);
  const nJ = topo.nodeIds.length;
  const nM = topo.from.length;
  const x = new Float64Array(nJ);
  const y = new Float64Array(nJ);
  pratt.geometry(params, topo, x, y);
  const { A, E } = DEFAULT_SECTION;
  const EA = new Float64Array(nM).fill(E * A);
  const area = new Float64Array(nM).fill(A);
  // Joint loads of a flat truss loaded per plan length do not depend on the depth: built once.
  const caseBuf = LOADS.map((l) => {
    const out = new Float64Array(2 * nJ);
    addCaseLoads(l, topo, x, y, area, out);
    return out;
  });
  const loads = new Float64Array(NC * 2 * nJ);
  COMBINATIONS.forEach((f, c) => {
    for (let q = 0; q < f.length; q++) for (let i = 0; i < 2 * nJ; i++) loads[c * 2 * nJ + i] += f[q] * caseBuf[q][i];
  });
  return { panels, params, topo, kernel: createKernel(topo, NC), x, y, EA, loads };
}

const depthAt = (i: number) => DEPTH_FROM + ((DEPTH_TO - DEPTH_FROM) * (i % DEPTHS)) / (DEPTHS - 1);

let sink = 0; // read at the end so no work can be optimised away

/** Geometry for a new depth and kernel.run only (no peaks): to split the cost. */
function runOnly(c: Case, i: number): void {
  c.params.depth = depthAt(i);
  pratt.geometry(c.params, c.topo, c.x, c.y);
  sink += c.kernel.run(c.x, c.y, c.EA, c.loads, NC) + c.kernel.forces[0];
}

/** One analysis: geometry for a new depth, kernel.run (pivot-test classification + 3 solves), peaks of each combination. */
function analyse(c: Case, i: number): void {
  c.params.depth = depthAt(i);
  pratt.geometry(c.params, c.topo, c.x, c.y);
  const k = c.kernel;
  if (k.run(c.x, c.y, c.EA, c.loads, NC) !== 0) throw new Error(`${c.panels} panels: unexpected mechanism at depth ${c.params.depth}`);
  const nM = k.nMembers, nJ = k.nJoints;
  for (let q = 0; q < NC; q++) {
    const p = findPeaksInto(peak, k.forces, q * nM, nM, k.disp, q * 2 * nJ, nJ);
    sink += p.tension - p.compression + p.displacement;
  }
}

function describe(c: Case): string {
  const k = c.kernel;
  return `${c.panels} panels (${k.nJoints} joints, ${k.nMembers} members, ${k.nFree} free dof, half-band ${k.shape.bw})`;
}

const fmt = (v: number) => Math.round(v).toLocaleString('en-US');
const line = (label: string, t: LoopTiming, unit = 'analyses') =>
  `  ${label}: ${fmt(t.perSecond)} ${unit}/s, ${t.microseconds.toFixed(2)} µs each over ${t.seconds.toFixed(2)} s ` +
  `(${t.calls.toLocaleString('en-US')} calls); fastest 10 ms round ${t.bestMicroseconds.toFixed(2)} µs = ${fmt(t.bestPerSecond)}/s`;

console.log(`engine bench: flat Pratt, ${SPAN} m span, pin-roller, depth ${DEPTH_FROM}–${DEPTH_TO} m, ${NC} combinations; one core (main thread), ≥ ${SECONDS} s per case after ${WARM} s warm-up`);
const c10 = setUp(10);
const c40 = setUp(40);
const t10 = timeLoop((i) => analyse(c10, i), SECONDS, WARM);
console.log(line(`fast path, ${describe(c10)}`, t10));
const t40 = timeLoop((i) => analyse(c40, i), SECONDS, WARM);
console.log(line(`fast path, ${describe(c40)}`, t40));
const ratio = t40.microseconds / t10.microseconds;
const bestRatio = t40.bestMicroseconds / t10.bestMicroseconds;
console.log(`  cost 40 panels / 10 panels: ${ratio.toFixed(2)}× (fastest rounds ${bestRatio.toFixed(2)}×) against 4× if linear in panels (joints ${c40.kernel.nJoints}/${c10.kernel.nJoints} = ${(c40.kernel.nJoints / c10.kernel.nJoints).toFixed(2)}×)`);
// Split, from the fastest rounds (a difference of two means is swamped by noise on a shared machine).
const r10 = timeLoop((i) => runOnly(c10, i), SECONDS / 2, WARM);
const r40 = timeLoop((i) => runOnly(c40, i), SECONDS / 2, WARM);
const split = (t: LoopTiming, r: LoopTiming) => `geometry + kernel.run ${r.bestMicroseconds.toFixed(2)} µs, findPeaksInto ×${NC} ${(t.bestMicroseconds - r.bestMicroseconds).toFixed(2)} µs`;
console.log(`  split (fastest rounds): 10 panels ${split(t10, r10)}; 40 panels ${split(t40, r40)}`);

// Dense path: classify() = equilibrium matrix, two Jacobi SVDs, modes, pebble game, findings.
const st: Structure = { ...c10.topo, name: 'pratt-10', x: c10.x, y: c10.y, EA: c10.EA, cases: [], caseLoads: [], combinations: [] };
const svd = timeLoop((i) => {
  c10.params.depth = depthAt(i);
  pratt.geometry(c10.params, c10.topo, c10.x, c10.y);
  const r = classify(st);
  sink += r.rank + r.conditioning;
}, SECONDS, WARM);
console.log(line('dense SVD classify (classify.ts), 10 panels', svd, 'classifications'));
const saves = svd.microseconds / t10.microseconds;
console.log(`  one fast-path analysis (classification + ${NC} solves + peaks) costs 1/${fmt(saves)} of the SVD classification alone (fastest rounds 1/${fmt(svd.bestMicroseconds / t10.bestMicroseconds)})`);

// Cross-check of the two paths on one variant: the same k and s.
analyse(c10, 0);
const check = classify(st);
if (check.mechanisms !== c10.kernel.k || check.selfStress !== c10.kernel.s) throw new Error(`fast path k=${c10.kernel.k} s=${c10.kernel.s}, SVD k=${check.mechanisms} s=${check.selfStress}`);

const rssMB = process.resourceUsage().maxRSS / 1024; // maxRSS is in kilobytes
console.log(`  peak RSS ${rssMB.toFixed(1)} MB (whole process, tsx loader included: ≈ 76 MB before any work; checksum ${sink.toExponential(6)})`);
console.log(JSON.stringify({
  bench: 'engine',
  panels10PerSecond: Math.round(t10.perSecond),
  panels40PerSecond: Math.round(t40.perSecond),
  microseconds10: sig(t10.microseconds),
  microseconds40: sig(t40.microseconds),
  costRatio40to10: sig(ratio, 3),
  bestPerSecond10: Math.round(t10.bestPerSecond),
  bestPerSecond40: Math.round(t40.bestPerSecond),
  bestCostRatio40to10: sig(bestRatio, 3),
  runMicroseconds10: sig(r10.bestMicroseconds),
  runMicroseconds40: sig(r40.bestMicroseconds),
  svdPerSecond10: Math.round(svd.perSecond),
  svdMicroseconds10: sig(svd.microseconds),
  fastPathSpeedupOverSvd: sig(saves, 3),
  peakRssMB: sig(rssMB, 3),
}));
