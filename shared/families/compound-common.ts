/**
 * What the two compound families share: two parallel-chord Pratt trusses side by side, one over
 * the columns left of the middle panel and one right of it, joined across the middle panel.
 * Lengths in metres.
 */
import { ids, type TopologyBuilder } from './builder';
import { panelsParam } from './params';
import type { ParamSpec } from './types';

/** Total panel count: odd, so the middle panel (the joint between the two trusses) sits at midspan. */
export const COMPOUND_PANELS = panelsParam(7, 3, 59, 'odd: the middle panel joins the two simple trusses');

/** The `linkage` parameter with the given options ('sound' first, the default). */
export function linkageParam(options: string[], description: string): ParamSpec {
  return { name: 'linkage', unit: '', default: 'sound', options, description };
}

/** Joints B0..Bn and T0..Tn at the panel points x = i · span / n. */
export function panelPoints(b: TopologyBuilder, n: number): void {
  for (let i = 0; i <= n; i++) {
    b.joint(`B${i}`, i / n, 0);
    b.joint(`T${i}`, i / n, 1);
  }
}

/**
 * A Pratt truss over columns lo..hi: chords, a vertical at each column, diagonals sloping down
 * toward the middle of the span (toward hi on the left side, toward lo on the right side).
 */
export function prattSide(b: TopologyBuilder, lo: number, hi: number, side: 'left' | 'right'): void {
  b.chain(ids('T', lo, hi), 'top');
  b.chain(ids('B', lo, hi), 'bottom');
  for (let i = lo; i <= hi; i++) b.bar(`B${i}`, `T${i}`, 'vertical');
  for (let i = lo; i < hi; i++) {
    if (side === 'left') b.bar(`T${i}`, `B${i + 1}`, 'diagonal');
    else b.bar(`B${i}`, `T${i + 1}`, 'diagonal');
  }
}
