/**
 * Where each family parameter of a sweep takes its value from: a column of a varied dimension,
 * the study's base (fixed or default: the same for every variant), or a derived expression. A
 * sweep reads a variant's values by parameter index through these slots instead of by name from
 * the params object (a keyed read with a changing name is slow in V8), and keeps per-value work
 * (texts of the JSON line, the id's canonical text) in arrays indexed by a dimension's digit.
 */
import type { SpacePlan } from './space';
import type { ParamValue, Params } from './types';

/** A dimension this large or larger gets no per-digit cache (its values rarely repeat). */
export const DIGIT_CACHE_LIMIT = 1 << 17;

export class ParamSlots {
  /** Per parameter: its dimension, or −1 (base value), or −2 (derived: read by name). */
  readonly dim: Int32Array;
  /** Per parameter: its column in the dimension. */
  readonly col: Int32Array;
  /** The digit of every dimension of the current variant: pass it to `variantAt`. */
  readonly digits: Int32Array;
  /** The values of the last `read`, by parameter index. */
  readonly values: ParamValue[];

  constructor(private readonly plan: SpacePlan, readonly names: readonly string[]) {
    const derived = new Set(plan.derived.map((e) => e.name));
    this.dim = new Int32Array(names.length).fill(-1);
    this.col = new Int32Array(names.length);
    names.forEach((n, i) => {
      if (derived.has(n)) {
        this.dim[i] = -2;
        return;
      }
      plan.dimensions.forEach((d, di) => {
        const k = d.names.indexOf(n);
        if (k >= 0) {
          this.dim[i] = di;
          this.col[i] = k;
        }
      });
    });
    this.digits = new Int32Array(plan.dimensions.length);
    this.values = names.map((n) => plan.base[n]);
  }

  /** Read the values of the variant `variantAt(plan, index, p, slots.digits)` just filled. */
  read(p: Readonly<Params>): void {
    const { dimensions } = this.plan;
    for (let i = 0; i < this.values.length; i++) {
      const d = this.dim[i];
      if (d >= 0) this.values[i] = dimensions[d].columns[this.col[i]][this.digits[d]];
      else if (d === -2) this.values[i] = p[this.names[i]];
    }
  }
}

/**
 * Something made from a parameter value (its text, say), kept per dimension digit: made once per
 * distinct value of a varied parameter, once for a base value, and per variant for a derived one.
 */
export class ValueCache<T> {
  private readonly byDigit: ((T | undefined)[] | undefined)[];
  private readonly constant: (T | undefined)[];
  private readonly lastValue: ParamValue[];
  private readonly lastMade: (T | undefined)[];

  constructor(private readonly slots: ParamSlots, private readonly make: (i: number, v: ParamValue) => T, plan: SpacePlan) {
    const n = slots.names.length;
    this.byDigit = Array.from({ length: n }, (_, i) => {
      const d = slots.dim[i];
      return d >= 0 && plan.dimensions[d].size < DIGIT_CACHE_LIMIT ? new Array<T | undefined>(plan.dimensions[d].size) : undefined;
    });
    this.constant = new Array<T | undefined>(n);
    this.lastValue = new Array<ParamValue>(n).fill(NaN);
    this.lastMade = new Array<T | undefined>(n);
  }

  /** The thing for parameter `i` of the variant last read by the slots. */
  get(i: number): T {
    const s = this.slots, d = s.dim[i];
    if (d === -1) return (this.constant[i] ??= this.make(i, s.values[i]));
    const cache = this.byDigit[i];
    if (cache !== undefined) {
      const digit = s.digits[d];
      let t = cache[digit];
      if (t === undefined) cache[digit] = t = this.make(i, s.values[i]);
      return t;
    }
    // a large dimension or a derived value: keep only the last (the slower dimensions repeat it)
    const v = s.values[i];
    if (this.lastValue[i] === v && this.lastMade[i] !== undefined) return this.lastMade[i]!;
    const t = this.make(i, v);
    this.lastValue[i] = v;
    this.lastMade[i] = t;
    return t;
  }
}
