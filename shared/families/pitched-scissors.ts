/**
 * Scissors truss: pitched top chord over a bottom chord that is itself pitched (a raised ceiling),
 * verticals at every panel point and diagonals sloping down toward midspan.
 */
import { TopologyBuilder } from './builder';
import { defineFamily } from './define';
import { END_SUPPORTS, PITCHED_GEOMETRY, PITCHED_SPAN, checkPitch, panelRoof, pitchedTop, preparePitched } from './pitched-common';
import { applySupports, num, panelsParam } from './params';
import type { ParamSpec, Params } from './types';

const PANELS = panelsParam(6, 4, 40, 'panels along each chord, both slopes together; even (a post sits at midspan)');

const BOTTOM_RATIO: ParamSpec = {
  name: 'bottomRatio', unit: '', default: 0.5, min: 0, max: 0.8,
  description: 'Rise of the bottom chord at midspan as a fraction of the top rise (0.5, half the pitch, is common practice).',
};

/** k[0] = rise (m), k[1] = bottomRatio. */
function prepare(p: Params, k: Float64Array): void {
  preparePitched(p, k);
  k[1] = num(p, BOTTOM_RATIO);
}

/** Bottom outline: the top outline scaled by bottomRatio, metres. */
function scissorBottom(xi: number, k: Float64Array): number {
  return k[1] * pitchedTop(xi, k);
}

function build(p: Params, n: number) {
  const b = new TopologyBuilder();
  const chords = panelRoof(b, n, 'pratt');
  applySupports(b, p, 'B0', `B${n}`);
  return b.build(chords.top, chords.bottom);
}

/** The scissors family: bottom B0..Bn on the raised bottom chord, top T1..T(n-1); panels even. */
export const scissors = defineFamily({
  id: 'scissors',
  name: 'Scissors',
  category: 'pitched',
  summary: 'Pitched top chord over a pitched bottom chord (rise × bottomRatio at midspan), verticals and diagonals sloping down toward midspan. Joints B0..Bn (bottom; B0, Bn the heels), T1..T(n-1); panels even.',
  params: [...PITCHED_GEOMETRY, BOTTOM_RATIO, PANELS, ...END_SUPPORTS],
  panels: PANELS,
  panelRule: 'even',
  span: PITCHED_SPAN,
  extraCheck: checkPitch,
  build,
  prepare,
  top: pitchedTop,
  bottom: scissorBottom,
});
