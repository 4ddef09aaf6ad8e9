/**
 * Queen-post truss: two posts at the third points of the tie, struts from their feet to the apex;
 * with 6 panels, a further strut from each post foot to the middle of the outer rafter length.
 */
import { TopologyBuilder } from './builder';
import { defineFamily } from './define';
import { END_SUPPORTS, PITCHED_GEOMETRY, PITCHED_SPAN, checkPitch, ground, pitchedTop, preparePitched } from './pitched-common';
import { applySupports, panelsParam } from './params';
import type { Params } from './types';

const PANELS = panelsParam(4, 4, 6, 'top chord panels, both slopes together: 4 (posts and apex struts) or 6 (plus outer struts)');

function build(p: Params, n: number) {
  const b = new TopologyBuilder();
  const bottom = ['B0', 'B1', 'B2', 'B3'];
  bottom.forEach((id, i) => b.joint(id, i / 3, 0));
  // Top joints: post heads at 1/3 and 2/3, the apex, and for 6 panels the outer rafter middles.
  const at = n === 4 ? [1 / 3, 1 / 2, 2 / 3] : [1 / 6, 1 / 3, 1 / 2, 2 / 3, 5 / 6];
  const top = at.map((xi, k) => b.joint(`T${k + 1}`, xi, 1));
  const [postL, apex, postR] = n === 4 ? [top[0], top[1], top[2]] : [top[1], top[2], top[3]];
  b.chain(['B0', ...top, 'B3'], 'top');
  b.chain(bottom, 'bottom');
  b.bar('B1', postL, 'vertical');
  b.bar('B2', postR, 'vertical');
  b.bar('B1', apex, 'diagonal');
  b.bar('B2', apex, 'diagonal');
  if (n === 6) {
    b.bar('B1', top[0], 'diagonal');
    b.bar('B2', top[4], 'diagonal');
  }
  applySupports(b, p, 'B0', 'B3');
  return b.build(['B0', ...top, 'B3'], bottom);
}

/** The queen-post family: bottom B0..B3 (thirds), top T1..T3 (apex T2) or T1..T5 (apex T3). */
export const queenPost = defineFamily({
  id: 'queen-post',
  name: 'Queen post',
  category: 'pitched',
  summary: 'Tie in three equal panels, posts at the third points, struts from the post feet to the apex; panels 6 adds struts to the outer rafter middles. Joints B0..B3; T1..T3 or T1..T5; panels 4 or 6.',
  params: [...PITCHED_GEOMETRY, PANELS, ...END_SUPPORTS],
  panels: PANELS,
  panelRule: [4, 6],
  span: PITCHED_SPAN,
  extraCheck: checkPitch,
  build,
  prepare: preparePitched,
  top: pitchedTop,
  bottom: ground,
});
