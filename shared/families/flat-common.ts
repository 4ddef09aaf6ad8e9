/**
 * What the parallel-chord families share: span and depth, the two straight outlines, and the
 * chords with their panel-point joints. Lengths in metres.
 */
import { ids, type TopologyBuilder } from './builder';
import { depthParam, num, spanParam } from './params';
import type { Params } from './types';

/** Span of a flat truss, metres. */
export const FLAT_SPAN = spanParam(24);
/** Depth of a flat truss, metres. */
export const FLAT_DEPTH = depthParam(2.4);

/** Shape constants of a flat truss: k[0] = depth, metres. */
export function prepareFlat(p: Params, k: Float64Array): void {
  k[0] = num(p, FLAT_DEPTH);
}

/** Top outline of a flat truss: y = depth, metres. */
export function flatTop(_xi: number, k: Float64Array): number {
  return k[0];
}

/** Bottom outline of a flat truss: y = 0. */
export function flatBottom(): number {
  return 0;
}

/**
 * Joints B0..Bn (bottom) and T0..Tn (top) at the panel points x = i · span / n, with both chords.
 * Top chord members TC1..TCn and bottom chord members BC1..BCn, left to right.
 */
export function parallelChords(b: TopologyBuilder, n: number): void {
  for (let i = 0; i <= n; i++) {
    b.joint(`B${i}`, i / n, 0);
    b.joint(`T${i}`, i / n, 1);
  }
  b.chain(ids('T', 0, n), 'top');
  b.chain(ids('B', 0, n), 'bottom');
}

/** Verticals B_i–T_i at every panel point i = 0..n (V1..V(n+1)). */
export function allVerticals(b: TopologyBuilder, n: number): void {
  for (let i = 0; i <= n; i++) b.bar(`B${i}`, `T${i}`, 'vertical');
}
