/**
 * Warren truss with verticals: full-length parallel chords, a vertical at every panel point, and
 * diagonals alternating direction from panel to panel (starting down from the top end joint).
 */
import { TopologyBuilder, ids } from './builder';
import { defineFamily } from './define';
import { FLAT_DEPTH, FLAT_SPAN, allVerticals, flatBottom, flatTop, prepareFlat, parallelChords } from './flat-common';
import { ROLLER_ANGLE, SUPPORTS, applySupports, panelsParam } from './params';
import type { Params } from './types';

const PANELS = panelsParam(8, 2, 60, 'even, so the zigzag mirrors about midspan');

function build(p: Params, n: number) {
  const b = new TopologyBuilder();
  parallelChords(b, n);
  allVerticals(b, n);
  for (let i = 0; i < n; i++) {
    if (i % 2 === 0) b.bar(`T${i}`, `B${i + 1}`, 'diagonal');
    else b.bar(`B${i}`, `T${i + 1}`, 'diagonal');
  }
  applySupports(b, p, 'B0', `B${n}`);
  return b.build(ids('T', 0, n), ids('B', 0, n));
}

/** The Warren-with-verticals family: joints B0..Bn, T0..Tn; panels even. */
export const warrenVerticals = defineFamily({
  id: 'warren-verticals',
  name: 'Warren with verticals',
  category: 'flat',
  summary: 'Parallel chords, verticals at every panel point, diagonals alternating so they meet at B1, T2, B3... Joints B0..Bn, T0..Tn; panels even.',
  params: [FLAT_SPAN, FLAT_DEPTH, PANELS, SUPPORTS, ROLLER_ANGLE],
  panels: PANELS,
  panelRule: 'even',
  span: FLAT_SPAN,
  build,
  prepare: prepareFlat,
  top: flatTop,
  bottom: flatBottom,
});
