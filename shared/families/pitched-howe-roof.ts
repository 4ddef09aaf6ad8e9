/**
 * Pitched Howe roof truss: verticals at every panel point, diagonals sloping up toward the
 * apex post (in compression under gravity load).
 */
import { TopologyBuilder } from './builder';
import { defineFamily } from './define';
import { END_SUPPORTS, PITCHED_GEOMETRY, PITCHED_SPAN, checkPitch, ground, panelRoof, pitchedTop, preparePitched } from './pitched-common';
import { applySupports, panelsParam } from './params';
import type { Params } from './types';

const PANELS = panelsParam(6, 4, 40, 'panels along each chord, both slopes together; even (the apex post sits at midspan)');

function build(p: Params, n: number) {
  const b = new TopologyBuilder();
  const chords = panelRoof(b, n, 'howe');
  applySupports(b, p, 'B0', `B${n}`);
  return b.build(chords.top, chords.bottom);
}

/** The pitched Howe family: bottom B0..Bn, top T1..T(n-1), apex T(n/2); panels even. */
export const howeRoof = defineFamily({
  id: 'howe-roof',
  name: 'Howe roof',
  category: 'pitched',
  summary: 'Pitched top chord, verticals at every panel point, diagonals sloping up toward the apex. Joints B0..Bn (bottom; B0, Bn are the heels), T1..T(n-1) (top); panels even.',
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
