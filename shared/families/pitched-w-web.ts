/**
 * W-web roof truss: a zigzag web between each rafter and the tie (one W for 4 top panels, a
 * longer zigzag for more). The tie has one panel fewer than the top chord.
 */
import { TopologyBuilder, ids } from './builder';
import { defineFamily } from './define';
import { END_SUPPORTS, PITCHED_GEOMETRY, PITCHED_SPAN, checkPitch, ground, pitchedTop, preparePitched } from './pitched-common';
import { applySupports, panelsParam } from './params';
import type { Params } from './types';

const PANELS = panelsParam(4, 4, 40, 'top chord panels, both slopes together; even (the tie then has panels − 1)');

function build(p: Params, n: number) {
  const k = n / 2;
  const nb = n - 1;
  const b = new TopologyBuilder();
  for (let j = 0; j <= nb; j++) b.joint(`B${j}`, j / nb, 0);
  for (let i = 1; i < n; i++) b.joint(`T${i}`, i / n, 1);
  const top = ['B0', ...ids('T', 1, n - 1), `B${nb}`];
  const bottom = ids('B', 0, nb);
  b.chain(top, 'top');
  b.chain(bottom, 'bottom');
  // Left slope: T1–B1–T2–B2–…–B(k−1)–T(k); the right slope is its mirror image.
  for (let j = 1; j < k; j++) {
    b.bar(`T${j}`, `B${j}`, 'web');
    b.bar(`B${j}`, `T${j + 1}`, 'web');
  }
  for (let j = k - 1; j >= 1; j--) {
    b.bar(`T${n - j - 1}`, `B${nb - j}`, 'web');
    b.bar(`B${nb - j}`, `T${n - j}`, 'web');
  }
  applySupports(b, p, 'B0', `B${nb}`);
  return b.build(top, bottom);
}

/** The w-web family: bottom B0..B(n−1), top T1..T(n−1) (apex T(n/2)); panels even. */
export const wWeb = defineFamily({
  id: 'w-web',
  name: 'W-web',
  category: 'pitched',
  summary: 'Pitched top chord in n panels over a tie in n − 1 panels, zigzag web T1–B1–T2–…–apex on each slope (one W at n = 4). Joints B0..B(n−1); T1..T(n−1), apex T(n/2); panels even.',
  params: [...PITCHED_GEOMETRY, PANELS, ...END_SUPPORTS],
  panels: PANELS,
  panelRule: 'even',
  span: PITCHED_SPAN,
  extraCheck: checkPitch,
  build,
  prepare: preparePitched,
  top: pitchedTop,
  bottom: ground,
});
