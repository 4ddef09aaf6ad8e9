/**
 * Pratt truss, parallel chords: verticals at every panel point (end posts included) and one
 * diagonal per panel sloping down toward midspan (in tension under gravity load).
 */
import { TopologyBuilder, ids } from './builder';
import { defineFamily } from './define';
import { FLAT_DEPTH, FLAT_SPAN, allVerticals, flatBottom, flatTop, prepareFlat, parallelChords } from './flat-common';
import { ROLLER_ANGLE, SUPPORTS, applySupports, panelsParam } from './params';
import type { Params } from './types';

const PANELS = panelsParam(8, 2, 60, 'even, so the diagonals mirror about midspan');

/** Diagonals of panel i: from the top joint nearer the support down to the bottom joint nearer midspan. */
export function prattDiagonals(b: TopologyBuilder, n: number): void {
  for (let i = 0; i < n; i++) {
    if (i < n / 2) b.bar(`T${i}`, `B${i + 1}`, 'diagonal');
    else b.bar(`B${i}`, `T${i + 1}`, 'diagonal');
  }
}

function build(p: Params, n: number) {
  const b = new TopologyBuilder();
  parallelChords(b, n);
  allVerticals(b, n);
  prattDiagonals(b, n);
  applySupports(b, p, 'B0', `B${n}`);
  return b.build(ids('T', 0, n), ids('B', 0, n));
}

/** The Pratt family: joints B0..Bn, T0..Tn; panels even. */
export const pratt = defineFamily({
  id: 'pratt',
  name: 'Pratt',
  category: 'flat',
  summary: 'Parallel chords, verticals at every panel point, diagonals sloping down toward midspan. Joints B0..Bn (bottom), T0..Tn (top); panels even.',
  params: [FLAT_SPAN, FLAT_DEPTH, PANELS, SUPPORTS, ROLLER_ANGLE],
  panels: PANELS,
  panelRule: 'even',
  span: FLAT_SPAN,
  build,
  prepare: prepareFlat,
  top: flatTop,
  bottom: flatBottom,
});
