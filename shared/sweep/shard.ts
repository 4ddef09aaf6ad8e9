/**
 * Shards: a sweep split into n contiguous slices of the variant index range, so that n
 * machines can each run one and the results merge without gaps or overlaps.
 */
import type { Issue } from './types';

/** Shard `index` of `count`, 1-based. */
export interface Shard {
  /** 1 ≤ index ≤ count. */
  readonly index: number;
  /** Number of shards, ≥ 1. */
  readonly count: number;
}

/**
 * Read a shard written "i/n" (1-based), e.g. "2/8".
 * @returns the shard, or an issue at path `shard`
 */
export function parseShard(text: string): Shard | { issues: Issue[] } {
  const m = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  const fail = (message: string) => ({ issues: [{ path: 'shard', message }] });
  if (!m) return fail(`write the shard as i/n, e.g. 2/8; got "${text}"`);
  const i = Number(m[1]);
  const n = Number(m[2]);
  if (!Number.isSafeInteger(n) || n < 1) return fail(`the number of shards must be at least 1; got ${m[2]}`);
  if (!Number.isSafeInteger(i) || i < 1 || i > n) return fail(`the shard number must be from 1 to ${n}; got ${m[1]}`);
  return { index: i, count: n };
}

/**
 * The slice [start, end) of variant indices that shard i of n runs. Slices are contiguous,
 * in order, differ in length by at most one, and together cover 0..total-1 exactly once.
 * @param total - number of variants (before filters)
 * @param i - shard number, 1-based
 * @param n - number of shards
 */
export function shardRange(total: number, i: number, n: number): { start: number; end: number } {
  if (!Number.isSafeInteger(total) || total < 0) throw new RangeError(`total must be a whole number ≥ 0; got ${total}`);
  if (!Number.isSafeInteger(n) || n < 1 || !Number.isSafeInteger(i) || i < 1 || i > n) {
    throw new RangeError(`shard ${i}/${n} is not a shard: need 1 ≤ i ≤ n`);
  }
  const q = Math.floor(total / n);
  const r = total - q * n;
  const start = (i - 1) * q + Math.min(i - 1, r);
  return { start, end: start + q + (i - 1 < r ? 1 : 0) };
}
