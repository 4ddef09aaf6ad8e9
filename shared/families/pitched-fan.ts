/**
 * Fan truss: tie in three equal panels; from each inner tie joint, webs fan out to every top
 * joint of its slope and to the apex.
 */
import { TopologyBuilder, ids } from './builder';
import { defineFamily } from './define';
import { END_SUPPORTS, PITCHED_GEOMETRY, PITCHED_SPAN, checkPitch, ground, pitchedTop, preparePitched } from './pitched-common';
import { applySupports, panelsParam } from './params';
import type { Params } from './types';

const PANELS = panelsParam(6, 6, 20, 'top chord panels, both slopes together; even (4 would be the w-web)');

function build(p: Params, n: number) {
  const k = n / 2;
  const b = new TopologyBuilder();
  const bottom = ['B0', 'B1', 'B2', 'B3'];
  bottom.forEach((id, i) => b.joint(id, i / 3, 0));
  for (let i = 1; i < n; i++) b.joint(`T${i}`, i / n, 1);
  const top = ['B0', ...ids('T', 1, n - 1), 'B3'];
  b.chain(top, 'top');
  b.chain(bottom, 'bottom');
  for (let i = 1; i <= k; i++) b.bar('B1', `T${i}`, 'web');
  for (let i = k; i < n; i++) b.bar('B2', `T${i}`, 'web');
  applySupports(b, p, 'B0', 'B3');
  return b.build(top, bottom);
}

/** The fan family: bottom B0..B3 (thirds), top T1..T(n-1) (apex T(n/2)); panels even, ≥ 6. */
export const fan = defineFamily({
  id: 'fan',
  name: 'Fan',
  category: 'pitched',
  summary: 'Tie in three equal panels; webs fan from B1 to every top joint of the left slope and the apex, likewise from B2. Joints B0..B3; T1..T(n-1), apex T(n/2); panels even, at least 6.',
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
