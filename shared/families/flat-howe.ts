/**
 * Howe truss, parallel chords: verticals at every panel point (end posts included) and one
 * diagonal per panel sloping up toward midspan (in compression under gravity load).
 */
import { TopologyBuilder, ids } from './builder';
import { defineFamily } from './define';
import { FLAT_DEPTH, FLAT_SPAN, allVerticals, flatBottom, flatTop, prepareFlat, parallelChords } from './flat-common';
import { ROLLER_ANGLE, SUPPORTS, applySupports, panelsParam } from './params';
import type { Params } from './types';

const PANELS = panelsParam(8, 2, 60, 'even, so the diagonals mirror about midspan');

function build(p: Params, n: number) {
  const b = new TopologyBuilder();
  parallelChords(b, n);
  allVerticals(b, n);
  for (let i = 0; i < n; i++) {
    if (i < n / 2) b.bar(`B${i}`, `T${i + 1}`, 'diagonal');
    else b.bar(`T${i}`, `B${i + 1}`, 'diagonal');
  }
  applySupports(b, p, 'B0', `B${n}`);
  return b.build(ids('T', 0, n), ids('B', 0, n));
}

/** The Howe family: joints B0..Bn, T0..Tn; panels even. */
export const howe = defineFamily({
  id: 'howe',
  name: 'Howe',
  category: 'flat',
  summary: 'Parallel chords, verticals at every panel point, diagonals sloping up toward midspan. Joints B0..Bn (bottom), T0..Tn (top); panels even.',
  params: [FLAT_SPAN, FLAT_DEPTH, PANELS, SUPPORTS, ROLLER_ANGLE],
  panels: PANELS,
  panelRule: 'even',
  span: FLAT_SPAN,
  build,
  prepare: prepareFlat,
  top: flatTop,
  bottom: flatBottom,
});
