/**
 * All truss families, looked up by id, and parameter completion. Lengths in metres, angles in
 * degrees.
 */
import { bowstring } from './curved-bowstring';
import { cantilever } from './cantilever';
import { compoundLink } from './compound-link';
import { compoundThreeBar } from './compound-three-bar';
import { howe } from './flat-howe';
import { kPanel } from './flat-k-panel';
import { pratt } from './flat-pratt';
import { warren } from './flat-warren';
import { warrenVerticals } from './flat-warren-verticals';
import { RISE, SLOPE, fillDefaults, num, riseOf } from './params';
import { fan } from './pitched-fan';
import { howeRoof } from './pitched-howe-roof';
import { kingPost } from './pitched-king-post';
import { prattRoof } from './pitched-pratt-roof';
import { queenPost } from './pitched-queen-post';
import { scissors } from './pitched-scissors';
import { wWeb } from './pitched-w-web';
import type { Params, TrussFamily } from './types';

/** Every family, flat first, then pitched, curved, cantilever and compound. */
export const families: readonly TrussFamily[] = [
  pratt, howe, warren, warrenVerticals, kPanel,
  wWeb, fan, kingPost, queenPost, scissors, howeRoof, prattRoof,
  bowstring, cantilever, compoundLink, compoundThreeBar,
];

/** The family with this id, or undefined. */
export function getFamily(id: string): TrussFamily | undefined {
  return families.find((f) => f.id === id);
}

/**
 * Every parameter of `f` with its default where `p` leaves it out (extra names are kept). When
 * the family has a slope and it is above 0, rise is replaced by the rise it gives, metres.
 */
export function withDefaults(f: TrussFamily, p: Params): Params {
  const out = fillDefaults(f.params, p);
  if (f.params.includes(SLOPE) && f.params.includes(RISE) && num(out, SLOPE) > 0) {
    const span = out.span;
    if (typeof span === 'number') out.rise = riseOf(out, span);
  }
  return out;
}

/** Names in `p` that `f` does not declare (a typo in a study, or a helper value), sorted. */
export function unknownParams(f: TrussFamily, p: Params): string[] {
  const known = new Set(f.params.map((s) => s.name));
  return Object.keys(p).filter((k) => !known.has(k)).sort();
}
