/**
 * Seeded random samples that come out the same on every machine: a 32-bit generator
 * (mulberry32) written here, plain uniform samples and Latin hypercube columns.
 *
 * Each sampled dimension draws from its own stream, seeded from the study seed and the
 * dimension's name, so adding, removing or reordering one dimension leaves the samples of
 * the others unchanged.
 */

/** A source of uniform numbers in [0, 1). */
export type Random = () => number;

/**
 * mulberry32: a small 32-bit generator with a full 2^32 period; integer arithmetic only,
 * so identical on every platform.
 * @param seed - any 32-bit integer
 * @returns a function giving numbers in [0, 1), multiples of 2^-32
 */
export function mulberry32(seed: number): Random {
  let a = seed | 0;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * FNV-1a 32-bit hash of a string's UTF-16 code units; used only to derive stream seeds.
 * @returns an unsigned 32-bit integer
 */
export function hash32(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

/**
 * The generator of one named stream of a study.
 * @param seed - the study seed (`samples.seed`), unsigned 32-bit
 * @param label - names the stream, e.g. `lhs:depth`
 */
export function streamFor(seed: number, label: string): Random {
  return mulberry32((hash32(label) ^ Math.imul(seed >>> 0, 0x9e3779b1)) >>> 0);
}

/**
 * `count` independent uniform values in [min, max), in the unit of min and max.
 * @returns a new array of length count
 */
export function uniformSample(min: number, max: number, count: number, random: Random): number[] {
  const out = new Array<number>(count);
  for (let i = 0; i < count; i++) out[i] = min + (max - min) * random();
  return out;
}

/**
 * A random permutation of 0..n-1 (Fisher–Yates, driven by `random`).
 * @returns a new Int32Array of length n
 */
export function permutation(n: number, random: Random): Int32Array {
  const p = new Int32Array(n);
  for (let i = 0; i < n; i++) p[i] = i;
  for (let i = n - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    const t = p[i];
    p[i] = p[j];
    p[j] = t;
  }
  return p;
}

/**
 * One column of a Latin hypercube: [min, max) cut into `count` equal strata, each hit
 * exactly once, in an order given by a seeded permutation, at a random point inside it.
 * Columns drawn from independent streams and read at the same index form the hypercube.
 * @returns a new array of length count, in the unit of min and max
 */
export function lhsColumn(min: number, max: number, count: number, random: Random): number[] {
  const strata = permutation(count, random);
  const out = new Array<number>(count);
  const width = (max - min) / count;
  for (let i = 0; i < count; i++) out[i] = min + width * (strata[i] + random());
  return out;
}
