/**
 * Warren truss without verticals: equilateral-style zigzag web, bottom joints at the panel points,
 * top joints over the middle of each bottom panel, so the top chord is one panel shorter.
 */
import { TopologyBuilder, ids } from './builder';
import { defineFamily } from './define';
import { FLAT_DEPTH, FLAT_SPAN, flatBottom, flatTop, prepareFlat } from './flat-common';
import { ROLLER_ANGLE, SUPPORTS, applySupports, panelsParam } from './params';
import type { Params } from './types';

const PANELS = panelsParam(8, 2, 60, 'bottom chord panels; any count (the zigzag is symmetric either way)');

function build(p: Params, n: number) {
  const b = new TopologyBuilder();
  b.joint('B0', 0, 0);
  for (let i = 1; i <= n; i++) {
    b.joint(`T${i}`, (i - 0.5) / n, 1);
    b.joint(`B${i}`, i / n, 0);
  }
  b.chain(ids('T', 1, n), 'top');
  b.chain(ids('B', 0, n), 'bottom');
  for (let i = 1; i <= n; i++) {
    b.bar(`B${i - 1}`, `T${i}`, 'diagonal');
    b.bar(`T${i}`, `B${i}`, 'diagonal');
  }
  applySupports(b, p, 'B0', `B${n}`);
  // The end diagonals form the roof outline from the supports to T1 and Tn.
  return b.build(['B0', ...ids('T', 1, n), `B${n}`], ids('B', 0, n));
}

/** The Warren family: joints B0..Bn (bottom), T1..Tn (top, at panel middles). */
export const warren = defineFamily({
  id: 'warren',
  name: 'Warren',
  category: 'flat',
  summary: 'Parallel chords, zigzag diagonals, no verticals. Joints B0..Bn (bottom, panel points), T1..Tn (top, over panel middles); the top chord chain runs B0, T1..Tn, Bn.',
  params: [FLAT_SPAN, FLAT_DEPTH, PANELS, SUPPORTS, ROLLER_ANGLE],
  panels: PANELS,
  span: FLAT_SPAN,
  build,
  prepare: prepareFlat,
  top: flatTop,
  bottom: flatBottom,
});
