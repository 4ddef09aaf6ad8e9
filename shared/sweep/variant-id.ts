/**
 * Stable ids: FNV-1a 64-bit over a canonical text, as 16 hex digits, the same on every
 * machine. Numbers are written with 12 significant digits, so that 0.1 + 0.2 and 0.3 give
 * the same id; keys are sorted by UTF-16 code units (never by locale).
 */
import type { Study } from '../schemas/study';
import type { ParamValue, Params } from './types';
import { ValueCache, type ParamSlots } from './param-slots';
import type { SpacePlan } from './space';

/**
 * Canonical text of a number: `Number(x.toPrecision(12)).toString()`; -0 reads 0.
 */
export function canonicalNumber(x: number): string {
  // whole numbers below 1e12 print the same either way; skipping toPrecision saves time in a sweep
  if (Number.isInteger(x) && Math.abs(x) < 1e12) return x === 0 ? '0' : String(x);
  return Number.isFinite(x) ? Number(x.toPrecision(12)).toString() : String(x);
}

/**
 * FNV-1a 64-bit hash of the UTF-8 bytes of `text`, computed in two 32-bit halves.
 * @returns 16 lowercase hex digits
 */
export function fnv1a64(text: string): string {
  return /[^\x00-\x7f]/.test(text) ? fnv1a64Utf8(text) : fnv1a64Ascii(text);
}

/** FNV-1a 64 of ASCII text in four 16-bit limbs (every product stays below 2^32), fed piece by piece. */
class Fnv64Ascii {
  h0 = 0x2325; h1 = 0x8422; h2 = 0x9ce4; h3 = 0xcbf2;
  reset(): void {
    this.h0 = 0x2325; this.h1 = 0x8422; this.h2 = 0x9ce4; this.h3 = 0xcbf2;
  }
  /** Take the state of another hash (one that has been fed a common prefix). */
  copy(o: Fnv64Ascii): void {
    this.h0 = o.h0; this.h1 = o.h1; this.h2 = o.h2; this.h3 = o.h3;
  }
  feed(text: string): void {
    let h0 = this.h0, h1 = this.h1, h2 = this.h2, h3 = this.h3;
    for (let i = 0; i < text.length; i++) {
      h0 ^= text.charCodeAt(i);
      // × prime 0x100000001b3: limb 0 × 0x1b3, and limb k × 0x100 lands in limb k + 2.
      const t0 = h0 * 0x1b3;
      const t1 = h1 * 0x1b3 + (t0 >>> 16);
      const t2 = h2 * 0x1b3 + h0 * 0x100 + (t1 >>> 16);
      const t3 = h3 * 0x1b3 + h1 * 0x100 + (t2 >>> 16);
      h0 = t0 & 0xffff; h1 = t1 & 0xffff; h2 = t2 & 0xffff; h3 = t3 & 0xffff;
    }
    this.h0 = h0; this.h1 = h1; this.h2 = h2; this.h3 = h3;
  }
  /** 16 lowercase hex digits, in one string allocation. */
  hex(): string {
    const { h0, h1, h2, h3 } = this;
    return String.fromCharCode(
      HEX[h3 >>> 12], HEX[(h3 >>> 8) & 15], HEX[(h3 >>> 4) & 15], HEX[h3 & 15], HEX[h2 >>> 12], HEX[(h2 >>> 8) & 15], HEX[(h2 >>> 4) & 15], HEX[h2 & 15],
      HEX[h1 >>> 12], HEX[(h1 >>> 8) & 15], HEX[(h1 >>> 4) & 15], HEX[h1 & 15], HEX[h0 >>> 12], HEX[(h0 >>> 8) & 15], HEX[(h0 >>> 4) & 15], HEX[h0 & 15],
    );
  }
}
const asciiHash = new Fnv64Ascii();

function fnv1a64Ascii(text: string): string {
  asciiHash.reset();
  asciiHash.feed(text);
  return asciiHash.hex();
}

function fnv1a64Utf8(text: string): string {
  // offset basis 0xcbf29ce484222325; prime 0x100000001b3 = 2^40 + 0x1b3, so
  // (hi·2^32 + lo)·prime mod 2^64 = lo·0x1b3 + (hi·0x1b3 + lo·2^8)·2^32
  let hi = 0xcbf29ce4;
  let lo = 0x84222325;
  let pending = 0; // UTF-8 bytes of the current code point still to hash, low byte first
  let count = 0;
  for (let i = 0; i < text.length || count > 0; ) {
    let byte: number;
    if (count > 0) {
      byte = pending & 0xff;
      pending >>>= 8;
      count--;
    } else {
      let c = text.charCodeAt(i++);
      if (c < 0x80) byte = c;
      else {
        if (c >= 0xd800 && c <= 0xdfff) {
          const d = c <= 0xdbff && i < text.length ? text.charCodeAt(i) : 0;
          if (d >= 0xdc00 && d <= 0xdfff) {
            c = 0x10000 + ((c - 0xd800) << 10) + (d - 0xdc00);
            i++;
          } else c = 0xfffd; // a lone surrogate, encoded as U+FFFD like TextEncoder does
        }
        if (c < 0x800) {
          byte = 0xc0 | (c >> 6);
          pending = 0x80 | (c & 63);
          count = 1;
        } else if (c < 0x10000) {
          byte = 0xe0 | (c >> 12);
          pending = (0x80 | ((c >> 6) & 63)) | ((0x80 | (c & 63)) << 8);
          count = 2;
        } else {
          byte = 0xf0 | (c >> 18);
          pending = (0x80 | ((c >> 12) & 63)) | ((0x80 | ((c >> 6) & 63)) << 8) | ((0x80 | (c & 63)) << 16);
          count = 3;
        }
      }
    }
    lo = (lo ^ byte) >>> 0;
    const a = lo * 0x1b3; // < 2^41, exact in a double
    hi = (Math.imul(hi, 0x1b3) + Math.floor(a / 4294967296) + (lo << 8)) >>> 0;
    lo = a >>> 0;
  }
  return hi.toString(16).padStart(8, '0') + lo.toString(16).padStart(8, '0');
}

/**
 * Canonical text of a variant: the family, then `key=value` for each parameter in sorted
 * key order; numbers as `canonicalNumber`, strings JSON-quoted (so 6 and "6" differ).
 * @param names - the parameters to include (default: every key of params)
 */
export function variantText(family: string, params: Readonly<Params>, names?: readonly string[]): string {
  const keys = names ? sortedOnce(names) : Object.keys(params).sort(byCodeUnit);
  let text = quoted(family);
  for (const k of keys) {
    const v = params[k];
    text += `;${k}=${typeof v === 'number' ? canonicalNumber(v) : quoted(v)}`;
  }
  return text;
}

// A sweep asks for the same few names and option strings millions of times: sort and quote once.
const sortedCache = new WeakMap<readonly string[], readonly string[]>();
function sortedOnce(names: readonly string[]): readonly string[] {
  let s = sortedCache.get(names);
  if (!s) sortedCache.set(names, (s = [...names].sort(byCodeUnit)));
  return s;
}
const quoteCache = new Map<string, string>();
function quoted(v: string): string {
  let q = quoteCache.get(v);
  if (q === undefined) {
    q = JSON.stringify(v);
    if (quoteCache.size < 4096) quoteCache.set(v, q);
  }
  return q;
}

/**
 * Stable id of a variant from its family and parameters.
 * @param names - the parameters that define the truss; pass `plan.paramNames` so that a
 *   study's auxiliary names (used only in expressions) do not change the id
 * @returns 16 lowercase hex digits
 */
export function variantId(family: string, params: Readonly<Params>, names?: readonly string[]): string {
  return fnv1a64(variantText(family, params, names));
}

/**
 * Canonical JSON: object keys sorted, numbers as `canonicalNumber`, undefined left out.
 * @param keepOrder - object paths (`vary`, `derived`) whose key order carries meaning and is kept
 */
export function canonicalJson(value: unknown, keepOrder: ReadonlySet<string> = new Set(), path = ''): string {
  if (value === null || typeof value === 'boolean') return String(value);
  if (typeof value === 'number') return canonicalNumber(value);
  if (typeof value === 'string') return JSON.stringify(value);
  if (Array.isArray(value)) return `[${value.map((v, i) => canonicalJson(v, keepOrder, `${path}[${i}]`)).join(',')}]`;
  if (typeof value === 'object') {
    const obj = value as Record<string, unknown>;
    const keys = Object.keys(obj).filter((k) => obj[k] !== undefined);
    if (!keepOrder.has(path)) keys.sort(byCodeUnit);
    const child = (k: string) => (path ? `${path}.${k}` : k);
    return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalJson(obj[k], keepOrder, child(k))}`).join(',')}}`;
  }
  return 'null';
}

/**
 * Hash of a study, to tell shards of different studies apart. Covers everything that can
 * change a result or the order of variants; leaves out `$schema` and `description`. The key
 * order of `vary` (order of the index) and `derived` (order of evaluation) is kept.
 * @returns 16 lowercase hex digits
 */
export function studyHash(study: Study): string {
  const { $schema: _schema, description: _description, ...rest } = study;
  return fnv1a64(canonicalJson(rest, new Set(['vary', 'derived'])));
}

function byCodeUnit(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

const isAscii = (s: string) => !/[^\x00-\x7f]/.test(s);
/** Character codes of the hex digits. */
const HEX = Uint8Array.from('0123456789abcdef', (c) => c.charCodeAt(0));

/** Marks a canonical text that is not ASCII (the fast hash takes ASCII only); never part of a real text. */
const NOT_ASCII = '\u0000';

/**
 * `variantId` for the variants of one study, fast: the canonical text of each parameter value is
 * kept once seen, and the hash runs over the pieces without joining them. Same ids as `variantId`
 * (variant-id.test.ts compares them).
 */
export class VariantIdHasher {
  private readonly keys: readonly string[];
  private readonly prefixes: readonly string[];
  private readonly texts: Map<ParamValue, string>[];
  private readonly start: string;
  private readonly ascii: boolean;
  private readonly hash = new Fnv64Ascii();
  /** With slots: per key, its parameter index, and the canonical texts by dimension digit. */
  private readonly keyParam?: Int32Array;
  private readonly canonical?: ValueCache<string>;
  /** The hash state after the family's part of the text, which every id starts with. */
  private readonly afterFamily = new Fnv64Ascii();

  /**
   * @param slots - the evaluator's parameter slots, for `fromSlots` (with the plan they were made from)
   */
  constructor(private readonly family: string, private readonly names: readonly string[], private readonly slots?: ParamSlots, plan?: SpacePlan) {
    this.keys = sortedOnce(names);
    this.prefixes = this.keys.map((k) => `;${k}=`);
    this.texts = this.keys.map(() => new Map());
    this.start = quoted(family);
    this.ascii = isAscii(this.start) && this.prefixes.every(isAscii);
    this.afterFamily.feed(this.start);
    if (slots && plan) {
      this.keyParam = Int32Array.from(this.keys, (k) => slots.names.indexOf(k));
      this.canonical = new ValueCache(slots, (_i, v) => {
        const t = typeof v === 'number' ? canonicalNumber(v) : quoted(v);
        return isAscii(t) ? t : NOT_ASCII;
      }, plan);
    }
  }

  /** @returns the id of `params` (16 lowercase hex digits) */
  id(params: Readonly<Params>): string {
    if (!this.ascii) return variantId(this.family, params, this.names);
    const h = this.hash;
    h.copy(this.afterFamily);
    for (let i = 0; i < this.keys.length; i++) {
      const v = params[this.keys[i]];
      const cache = this.texts[i];
      let t = cache.get(v);
      if (t === undefined) {
        t = typeof v === 'number' ? canonicalNumber(v) : quoted(v);
        if (!isAscii(t)) return variantId(this.family, params, this.names);
        if (cache.size < 65536) cache.set(v, t);
      }
      h.feed(this.prefixes[i]);
      h.feed(t);
    }
    return h.hex();
  }

  /**
   * The id of the variant the slots last read (same as `id` of its params), reading the values
   * by index. Needs the slots given to the constructor; `params` is for the non-ASCII fallback.
   */
  fromSlots(params: Readonly<Params>): string {
    const keyParam = this.keyParam, canonical = this.canonical;
    if (!keyParam || !canonical || !this.ascii) return this.id(params);
    const h = this.hash;
    h.copy(this.afterFamily);
    for (let q = 0; q < keyParam.length; q++) {
      const t = canonical.get(keyParam[q]);
      if (t === NOT_ASCII) return variantId(this.family, params, this.names);
      h.feed(this.prefixes[q]);
      h.feed(t);
    }
    return h.hex();
  }
}
