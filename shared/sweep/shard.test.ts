import { describe, expect, it } from 'vitest';
import { parseShard, shardRange } from './shard';

describe('parseShard', () => {
  it('reads i/n, 1-based', () => {
    expect(parseShard('2/8')).toEqual({ index: 2, count: 8 });
    expect(parseShard(' 1 / 1 ')).toEqual({ index: 1, count: 1 });
    expect(parseShard('8/8')).toEqual({ index: 8, count: 8 });
  });
  it('rejects anything else with an issue at `shard`', () => {
    for (const bad of ['0/8', '9/8', '1/0', '2', '2/8/1', '-1/8', '1.5/8', 'a/b', '']) {
      const r = parseShard(bad);
      expect('issues' in r && r.issues[0].path).toBe('shard');
    }
  });
});

describe('shardRange', () => {
  it('slices cover every index exactly once, in order, contiguous, lengths within one', () => {
    for (const total of [0, 1, 2, 7, 10, 99, 100, 1001]) {
      for (const n of [1, 2, 3, 7, 8, 16, 150]) {
        const hits = new Uint8Array(total);
        let next = 0;
        const lengths: number[] = [];
        for (let i = 1; i <= n; i++) {
          const { start, end } = shardRange(total, i, n);
          expect(start).toBe(next);
          for (let k = start; k < end; k++) hits[k]++;
          lengths.push(end - start);
          next = end;
        }
        expect(next).toBe(total);
        expect(hits.every((h) => h === 1)).toBe(true);
        expect(Math.max(...lengths) - Math.min(...lengths)).toBeLessThanOrEqual(1);
      }
    }
  });
  it('works near the largest safe index', () => {
    const total = Number.MAX_SAFE_INTEGER;
    expect(shardRange(total, 3, 3).end).toBe(total);
    expect(shardRange(total, 2, 3).start).toBe(shardRange(total, 1, 3).end);
  });
  it('rejects misuse', () => {
    expect(() => shardRange(10, 0, 3)).toThrow(RangeError);
    expect(() => shardRange(10, 4, 3)).toThrow(RangeError);
    expect(() => shardRange(-1, 1, 3)).toThrow(RangeError);
  });
});
