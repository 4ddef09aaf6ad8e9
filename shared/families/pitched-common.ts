/**
 * What the pitched-roof families share: span, rise or slope, the triangular top outline, and the
 * panel-point roof builder used by the Pratt, Howe and scissors roofs and the bowstring.
 * Lengths in metres, angles in degrees.
 */
import { ids, type TopologyBuilder } from './builder';
import { RISE, ROLLER_ANGLE, SLOPE, SUPPORTS, checkRise, num, riseOf, spanParam } from './params';
import type { ParamSpec, Params } from './types';

/** Span of a pitched truss between the heel joints, metres. */
export const PITCHED_SPAN = spanParam(12, 'Span between the heel joints (the supports), m.');

/** Parameters every pitched family takes before its own: span, rise, slope. */
export const PITCHED_GEOMETRY: readonly ParamSpec[] = [PITCHED_SPAN, RISE, SLOPE];
/** Support parameters, listed after the panel count. */
export const END_SUPPORTS: readonly ParamSpec[] = [SUPPORTS, ROLLER_ANGLE];

/** Shape constants of a pitched truss: k[0] = rise, metres (from slope when set). */
export function preparePitched(p: Params, k: Float64Array): void {
  k[0] = riseOf(p, num(p, PITCHED_SPAN));
}

/** Top outline of a symmetric pitched truss: y = rise · (1 − |2xi − 1|), metres. */
export function pitchedTop(xi: number, k: Float64Array): number {
  return k[0] * (1 - Math.abs(2 * xi - 1));
}

/** A straight, level bottom outline: y = 0. */
export function ground(): number {
  return 0;
}

/** Rise/slope check of the pitched families. */
export function checkPitch(p: Params): string[] {
  return checkRise(p, num(p, PITCHED_SPAN));
}

/**
 * Roof truss with joints at every panel point: bottom B0..Bn, top T1..T(n-1) (heels B0 and Bn
 * shared by both chords), verticals B_i–T_i, and one diagonal in each panel except the two end
 * triangles. 'pratt': diagonals slope down toward midspan; 'howe': up toward midspan.
 * @returns the top and bottom chord chains (joint ids, left to right)
 */
export function panelRoof(b: TopologyBuilder, n: number, style: 'pratt' | 'howe'): { top: string[]; bottom: string[] } {
  for (let i = 0; i <= n; i++) {
    b.joint(`B${i}`, i / n, 0);
    if (i > 0 && i < n) b.joint(`T${i}`, i / n, 1);
  }
  const top = ['B0', ...ids('T', 1, n - 1), `B${n}`];
  const bottom = ids('B', 0, n);
  b.chain(top, 'top');
  b.chain(bottom, 'bottom');
  for (let i = 1; i < n; i++) b.bar(`B${i}`, `T${i}`, 'vertical');
  for (let i = 1; i < n - 1; i++) {
    const downToMid = i < n / 2 === (style === 'pratt');
    if (downToMid) b.bar(`T${i}`, `B${i + 1}`, 'diagonal');
    else b.bar(`B${i}`, `T${i + 1}`, 'diagonal');
  }
  return { top, bottom };
}
