/**
 * Compound truss of two simple trusses joined by three bars across the middle panel. Each truss
 * ends in a vertical split at a mid-depth joint (M) braced by a K. linkage: "sound" (top, bottom
 * and one diagonal bar), "concurrent" (two crossing diagonals and the mid-depth bar, all through
 * one point: unstable), "parallel" (top, mid-depth and bottom bars: unstable).
 */
import { TopologyBuilder, ids } from './builder';
import { COMPOUND_PANELS, linkageParam, panelPoints, prattSide } from './compound-common';
import { defineFamily } from './define';
import { FLAT_DEPTH, FLAT_SPAN, flatBottom, flatTop, prepareFlat } from './flat-common';
import { ROLLER_ANGLE, SUPPORTS, applySupports, opt } from './params';
import type { Params } from './types';

const LINKAGE = linkageParam(
  ['sound', 'concurrent', 'parallel'],
  'sound: bars T(c)–T(c+1), B(c)–B(c+1), B(c)–T(c+1); concurrent: T(c)–B(c+1), B(c)–T(c+1), M(c)–M(c+1), meeting in one point (unstable); parallel: T–T, M–M, B–B (unstable).',
);

/** The three joining bars per linkage, as joint-id pairs for inner columns l = c and r = c + 1. */
function joiningBars(linkage: string, l: number, r: number): [string, string][] {
  if (linkage === 'concurrent') return [[`T${l}`, `B${r}`], [`B${l}`, `T${r}`], [`M${l}`, `M${r}`]];
  if (linkage === 'parallel') return [[`T${l}`, `T${r}`], [`M${l}`, `M${r}`], [`B${l}`, `B${r}`]];
  return [[`T${l}`, `T${r}`], [`B${l}`, `B${r}`], [`B${l}`, `T${r}`]];
}

function build(p: Params, n: number) {
  const c = (n - 1) / 2;
  const b = new TopologyBuilder();
  panelPoints(b, n);
  // Left truss: Pratt over columns 0..c−1, then a K panel to the split vertical at column c.
  prattSide(b, 0, c - 1, 'left');
  b.joint(`M${c}`, c / n, 0.5);
  b.bar(`T${c - 1}`, `T${c}`, 'top');
  b.bar(`B${c - 1}`, `B${c}`, 'bottom');
  b.bar(`M${c}`, `T${c - 1}`, 'diagonal');
  b.bar(`M${c}`, `B${c - 1}`, 'diagonal');
  b.bar(`B${c}`, `M${c}`, 'vertical');
  b.bar(`M${c}`, `T${c}`, 'vertical');
  // Right truss: the mirror image.
  b.joint(`M${c + 1}`, (c + 1) / n, 0.5);
  b.bar(`B${c + 1}`, `M${c + 1}`, 'vertical');
  b.bar(`M${c + 1}`, `T${c + 1}`, 'vertical');
  b.bar(`M${c + 1}`, `T${c + 2}`, 'diagonal');
  b.bar(`M${c + 1}`, `B${c + 2}`, 'diagonal');
  b.bar(`T${c + 1}`, `T${c + 2}`, 'top');
  b.bar(`B${c + 1}`, `B${c + 2}`, 'bottom');
  prattSide(b, c + 2, n, 'right');
  for (const [a, z] of joiningBars(opt(p, LINKAGE), c, c + 1)) b.bar(a, z, 'link');
  applySupports(b, p, 'B0', `B${n}`);
  return b.build(ids('T', 0, n), ids('B', 0, n));
}

/** The compound-three-bar family: B0..Bn, T0..Tn, M(c), M(c+1) with c = (n − 1)/2; panels odd. */
export const compoundThreeBar = defineFamily({
  id: 'compound-three-bar',
  name: 'Compound (three bars)',
  category: 'compound',
  summary: 'Two simple trusses (Pratt panels ending in a K onto a split vertical) joined by three bars across the middle panel. Joints B0..Bn, T0..Tn, M(c), M(c+1), c = (n − 1)/2; panels odd; linkage concurrent/parallel are the unstable arrangements.',
  params: [FLAT_SPAN, FLAT_DEPTH, COMPOUND_PANELS, LINKAGE, SUPPORTS, ROLLER_ANGLE],
  panels: COMPOUND_PANELS,
  panelRule: 'odd',
  span: FLAT_SPAN,
  extraKey: LINKAGE,
  build,
  prepare: prepareFlat,
  top: flatTop,
  bottom: flatBottom,
});
