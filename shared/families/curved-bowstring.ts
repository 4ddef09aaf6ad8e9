/**
 * Bowstring truss: curved top chord (parabola or circular arc through the supports and the crown),
 * straight bottom chord, verticals at every panel point and diagonals sloping down toward midspan.
 */
import { TopologyBuilder } from './builder';
import { defineFamily } from './define';
import { END_SUPPORTS, ground, panelRoof } from './pitched-common';
import { applySupports, num, opt, panelsParam, spanParam } from './params';
import type { ParamSpec, Params } from './types';

const SPAN = spanParam(24);
const RISE: ParamSpec = {
  name: 'rise', unit: 'm', default: 3, min: 0.05, max: 100,
  description: 'Height of the crown (top chord at midspan) above the bottom chord, m; at most span/2 for a circular arc.',
};
const CURVE: ParamSpec = {
  name: 'curve', unit: '', default: 'parabolic', options: ['parabolic', 'circular'],
  description: 'Shape of the top chord: parabolic y = 4·rise·x(span − x)/span², or a circular arc through both supports and the crown.',
};
const PANELS = panelsParam(8, 4, 40, 'even (a post sits at the crown)');

/** k[0] = rise (m), k[1] = 1 for a circle, k[2] = span (m), k[3] = radius (m). */
function prepare(p: Params, k: Float64Array): void {
  const h = num(p, RISE);
  const span = num(p, SPAN);
  k[0] = h;
  k[1] = opt(p, CURVE) === 'circular' ? 1 : 0;
  k[2] = span;
  k[3] = (span * span / 4 + h * h) / (2 * h);
}

/** Top chord height at xi = x / span, metres. */
function arch(xi: number, k: Float64Array): number {
  const h = k[0];
  if (k[1] === 0) return 4 * h * xi * (1 - xi);
  const r = k[3];
  const dx = (xi - 0.5) * k[2];
  return Math.sqrt(Math.max(0, r * r - dx * dx)) - (r - h);
}

function extraCheck(p: Params): string[] {
  const span = num(p, SPAN);
  if (opt(p, CURVE) === 'circular' && num(p, RISE) > span / 2) return [`rise must be at most span/2 = ${span / 2} m for a circular top chord (got ${num(p, RISE)} m)`];
  return [];
}

function build(p: Params, n: number) {
  const b = new TopologyBuilder();
  const chords = panelRoof(b, n, 'pratt');
  applySupports(b, p, 'B0', `B${n}`);
  return b.build(chords.top, chords.bottom);
}

/** The bowstring family: bottom B0..Bn, top T1..T(n-1) on the arch; panels even. */
export const bowstring = defineFamily({
  id: 'bowstring',
  name: 'Bowstring',
  category: 'curved',
  summary: 'Curved top chord (parabolic or circular, parameter curve) meeting a straight bottom chord at the supports; verticals and diagonals sloping down toward midspan. Joints B0..Bn, T1..T(n-1); panels even.',
  params: [SPAN, RISE, CURVE, PANELS, ...END_SUPPORTS],
  panels: PANELS,
  panelRule: 'even',
  span: SPAN,
  extraCheck,
  build,
  prepare,
  top: arch,
  bottom: ground,
});
