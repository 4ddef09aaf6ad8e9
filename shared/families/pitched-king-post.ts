/**
 * King-post truss: two rafters, a tie and a central post; with 4 panels two struts run from the
 * foot of the post to the middle of each rafter.
 */
import { TopologyBuilder } from './builder';
import { defineFamily } from './define';
import { END_SUPPORTS, PITCHED_GEOMETRY, PITCHED_SPAN, checkPitch, ground, pitchedTop, preparePitched } from './pitched-common';
import { applySupports, panelsParam } from './params';
import type { Params } from './types';

const PANELS = panelsParam(2, 2, 4, 'top chord panels, both slopes together: 2 (post only) or 4 (post and two struts)');

function build(p: Params, n: number) {
  const b = new TopologyBuilder();
  b.joint('B0', 0, 0);
  b.joint('B1', 0.5, 0);
  b.joint('B2', 1, 0);
  const top = n === 2 ? ['B0', 'T1', 'B2'] : ['B0', 'T1', 'T2', 'T3', 'B2'];
  for (let i = 1; i < n; i++) b.joint(`T${i}`, i / n, 1);
  const apex = `T${n / 2}`;
  b.chain(top, 'top');
  b.chain(['B0', 'B1', 'B2'], 'bottom');
  b.bar('B1', apex, 'vertical');
  if (n === 4) {
    b.bar('B1', 'T1', 'diagonal');
    b.bar('B1', 'T3', 'diagonal');
  }
  applySupports(b, p, 'B0', 'B2');
  return b.build(top, ['B0', 'B1', 'B2']);
}

/** The king-post family: bottom B0, B1 (post foot), B2; top T1 (apex) or T1..T3 (apex T2). */
export const kingPost = defineFamily({
  id: 'king-post',
  name: 'King post',
  category: 'pitched',
  summary: 'Two rafters, a tie and a central post; panels 4 adds struts from the post foot to the rafter middles. Joints B0, B1 (post foot), B2; T1 (apex) or T1..T3 (apex T2); panels 2 or 4.',
  params: [...PITCHED_GEOMETRY, PANELS, ...END_SUPPORTS],
  panels: PANELS,
  panelRule: [2, 4],
  span: PITCHED_SPAN,
  extraCheck: checkPitch,
  build,
  prepare: preparePitched,
  top: pitchedTop,
  bottom: ground,
});
