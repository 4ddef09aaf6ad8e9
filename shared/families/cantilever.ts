/**
 * Cantilever truss on a wall: two wall joints (B0 bottom, T0 top) carry it; the top chord is
 * level, the bottom chord rises to the tip, which is a point (tip "pointed") or a post of depth
 * tipDepth ("square"). Verticals at every panel point, diagonals sloping down away from the wall
 * (in tension under gravity load).
 */
import { TopologyBuilder, ids } from './builder';
import { defineFamily } from './define';
import { depthParam, num, opt, panelsParam, spanParam } from './params';
import type { ParamSpec, Params } from './types';

const SPAN = spanParam(4, 'Reach from the wall to the tip, m.');
const DEPTH = depthParam(1.5, 'Depth at the wall between the two wall joints, m.');
const TIP: ParamSpec = {
  name: 'tip', unit: '', default: 'pointed', options: ['pointed', 'square'],
  description: 'pointed: the chords meet at one tip joint TIP; square: a tip post of depth tipDepth.',
};
const TIP_DEPTH: ParamSpec = {
  name: 'tipDepth', unit: 'm', default: 0.5, min: 0.05, max: 50,
  description: 'tip "square" only: depth at the tip, m; less than depth.',
};
const PANELS = panelsParam(4, 1, 40, 'any count');
const WALL: ParamSpec = {
  name: 'supports', unit: '', default: 'pin-roller', options: ['pin-roller', 'roller-pin', 'pin-pin'],
  description: 'Wall supports, top-bottom: pin-roller (top pin, bottom roller reacting horizontally), roller-pin, or pin-pin (no wall post).',
};

/** k[0] = depth at the wall, k[1] = depth at the tip (0 when pointed), metres. */
function prepare(p: Params, k: Float64Array): void {
  k[0] = num(p, DEPTH);
  k[1] = opt(p, TIP) === 'pointed' ? 0 : num(p, TIP_DEPTH);
}

/** Level top chord, metres. */
function top(_xi: number, k: Float64Array): number {
  return k[0];
}

/** Bottom chord rising from the wall to the tip, metres. */
function bottom(xi: number, k: Float64Array): number {
  return (k[0] - k[1]) * xi;
}

function extraCheck(p: Params): string[] {
  if (opt(p, TIP) === 'square' && num(p, TIP_DEPTH) >= num(p, DEPTH)) {
    return [`tipDepth must be less than depth = ${num(p, DEPTH)} m (got ${num(p, TIP_DEPTH)} m)`];
  }
  return [];
}

function build(p: Params, n: number) {
  const pointed = opt(p, TIP) === 'pointed';
  const wall = opt(p, WALL);
  const last = pointed ? n - 1 : n;
  const b = new TopologyBuilder();
  for (let i = 0; i <= last; i++) {
    b.joint(`B${i}`, i / n, 0);
    b.joint(`T${i}`, i / n, 1);
  }
  if (pointed) b.joint('TIP', 1, 1);
  const topChain = [...ids('T', 0, last), ...(pointed ? ['TIP'] : [])];
  const bottomChain = [...ids('B', 0, last), ...(pointed ? ['TIP'] : [])];
  b.chain(topChain, 'top');
  b.chain(bottomChain, 'bottom');
  // Between two pinned wall joints a post would only carry a self-stress.
  for (let i = wall === 'pin-pin' ? 1 : 0; i <= last; i++) b.bar(`B${i}`, `T${i}`, 'vertical');
  for (let i = 0; i < n && i + 1 <= last; i++) b.bar(`T${i}`, `B${i + 1}`, 'diagonal');
  b.support('T0', wall === 'roller-pin' ? 'roller' : 'pin', 0);
  b.support('B0', wall === 'pin-roller' ? 'roller' : 'pin', 0);
  return b.build(topChain, bottomChain);
}

/** The cantilever family: wall joints B0, T0; B_i, T_i along the reach; TIP when pointed. */
export const cantilever = defineFamily({
  id: 'cantilever',
  name: 'Cantilever',
  category: 'cantilever',
  summary: 'Truss projecting from a wall: wall joints B0 (bottom) and T0 (top), level top chord, bottom chord rising to a pointed tip (TIP) or a tip post; verticals, diagonals sloping down away from the wall.',
  params: [SPAN, DEPTH, TIP, TIP_DEPTH, PANELS, WALL],
  panels: PANELS,
  span: SPAN,
  extraCheck,
  extraKey: TIP,
  build,
  prepare,
  top,
  bottom,
});
