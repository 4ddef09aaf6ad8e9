import { describe, expect, it } from 'vitest';
import { hash32, lhsColumn, mulberry32, permutation, streamFor, uniformSample } from './sampling';

/** FNV-1a 32-bit over UTF-16 code units, written the plain way with BigInt. */
function fnv32Reference(text: string): number {
  let h = 0x811c9dc5n;
  for (let i = 0; i < text.length; i++) h = ((h ^ BigInt(text.charCodeAt(i))) * 0x01000193n) & 0xffffffffn;
  return Number(h);
}

describe('mulberry32', () => {
  it('the same seed gives the same sequence, another seed another one', () => {
    const a = Array.from({ length: 100 }, mulberry32(42));
    const b = Array.from({ length: 100 }, mulberry32(42));
    const c = Array.from({ length: 100 }, mulberry32(43));
    expect(b).toEqual(a);
    expect(c).not.toEqual(a);
  });
  it('values in [0, 1) with the mean 1/2 and variance 1/12 of a uniform distribution', () => {
    const n = 200_000;
    const r = mulberry32(1);
    let sum = 0;
    let sq = 0;
    for (let i = 0; i < n; i++) {
      const u = r();
      expect(u >= 0 && u < 1).toBe(true);
      sum += u;
      sq += u * u;
    }
    const mean = sum / n;
    // standard error of the mean: sqrt(1/12 / n) ≈ 6.5e-4; allow about 5 of them
    expect(Math.abs(mean - 0.5)).toBeLessThan(3e-3);
    expect(Math.abs(sq / n - mean * mean - 1 / 12)).toBeLessThan(3e-3);
  });
});

describe('streams and samples', () => {
  it('hash32 is FNV-1a 32-bit', () => {
    for (const t of ['', 'a', 'foobar', 'lhs:depth']) expect(hash32(t)).toBe(fnv32Reference(t));
    // FNV reference test vectors (from memory)
    expect(hash32('a')).toBe(0xe40c292c);
    expect(hash32('foobar')).toBe(0xbf9cf968);
  });
  it('streams of different labels differ', () => {
    expect(streamFor(5, 'lhs:depth')()).not.toBe(streamFor(5, 'lhs:span')());
  });
  it('a permutation holds every index once', () => {
    const p = permutation(1000, mulberry32(9));
    expect([...p].sort((a, b) => a - b)).toEqual(Array.from({ length: 1000 }, (_, k) => k));
  });
  it('a Latin hypercube column hits each of its strata once', () => {
    const [min, max, count] = [-3, 5, 37];
    const v = lhsColumn(min, max, count, mulberry32(3));
    const strata = v.map((x) => Math.floor(((x - min) / (max - min)) * count));
    expect([...strata].sort((a, b) => a - b)).toEqual(Array.from({ length: count }, (_, k) => k));
  });
  it('uniform samples lie in [min, max)', () => {
    const v = uniformSample(2, 4, 1000, mulberry32(11));
    expect(v.every((x) => x >= 2 && x < 4)).toBe(true);
  });
});
