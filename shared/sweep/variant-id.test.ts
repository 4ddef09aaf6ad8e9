import { describe, expect, it } from 'vitest';
import type { Study } from '../schemas/study';
import { canonicalNumber, fnv1a64, studyHash, variantId, variantText, VariantIdHasher } from './variant-id';

/** FNV-1a 64-bit written the plain way with BigInt, over UTF-8 bytes (Fowler, Noll, Vo). */
function fnvReference(text: string): string {
  let h = 0xcbf29ce484222325n;
  for (const b of new TextEncoder().encode(text)) {
    h ^= BigInt(b);
    h = (h * 0x100000001b3n) & 0xffffffffffffffffn;
  }
  return h.toString(16).padStart(16, '0');
}

describe('fnv1a64', () => {
  it('agrees with a straightforward BigInt implementation', () => {
    const texts = ['', 'a', 'foobar', '"pratt";depth=2.25;panels=8', 'ψ0 = 0.7 · 1.5', '😀 rocket', 'lone \ud800 high', 'lone \udc00 low', 'end \ud83d', 'x'.repeat(1000)];
    for (const t of texts) expect(fnv1a64(t)).toBe(fnvReference(t));
  });
  it('matches the published test vectors (FNV reference test suite, from memory)', () => {
    expect(fnv1a64('')).toBe('cbf29ce484222325');
    expect(fnv1a64('a')).toBe('af63dc4c8601ec8c');
    expect(fnv1a64('foobar')).toBe('85944171f73967e8');
  });
  it('agrees with the reference on many random strings', () => {
    let seed = 7;
    for (let n = 0; n < 300; n++) {
      let t = '';
      for (let k = 0; k < n % 40; k++) {
        seed = (Math.imul(seed, 1103515245) + 12345) >>> 0;
        t += String.fromCharCode(32 + (seed % 0x3000));
      }
      expect(fnv1a64(t)).toBe(fnvReference(t));
    }
  });
});

describe('variantId', () => {
  const params = { span: 24, depth: 2.25, panels: 8, supports: 'pin-roller' };

  it('hashes the canonical text: keys sorted, numbers to 12 digits, strings quoted', () => {
    const text = variantText('pratt', params);
    expect(text).toBe('"pratt";depth=2.25;panels=8;span=24;supports="pin-roller"');
    expect(variantId('pratt', params)).toBe(fnvReference(text));
    expect(variantId('pratt', params)).toMatch(/^[0-9a-f]{16}$/);
  });
  it('does not depend on key order or on rounding noise', () => {
    const shuffled = { supports: 'pin-roller', panels: 8, depth: 2.25, span: 24 };
    expect(variantId('pratt', shuffled)).toBe(variantId('pratt', params));
    expect(variantId('pratt', { ...params, depth: 0.1 + 0.2 })).toBe(variantId('pratt', { ...params, depth: 0.3 }));
  });
  it('changes with the family, any value, and number versus string', () => {
    const id = variantId('pratt', params);
    expect(variantId('howe', params)).not.toBe(id);
    expect(variantId('pratt', { ...params, depth: 2.26 })).not.toBe(id);
    expect(variantId('pratt', { a: 6 })).not.toBe(variantId('pratt', { a: '6' }));
  });
  it('restricted to the named parameters', () => {
    const names = ['span', 'depth', 'panels', 'supports'];
    expect(variantId('pratt', { ...params, ratio: 10 }, names)).toBe(variantId('pratt', params));
  });
  it('canonical numbers', () => {
    expect(canonicalNumber(-0)).toBe('0');
    expect(canonicalNumber(1 / 3)).toBe('0.333333333333');
    expect(canonicalNumber(1e21)).toBe('1e+21');
    expect(canonicalNumber(NaN)).toBe('NaN');
  });
});

describe('studyHash', () => {
  const study: Study = {
    name: 'Depot roof',
    description: 'first try',
    family: 'pratt',
    fixed: { span: 24, supports: 'pin-roller' },
    vary: { panels: [6, 8], depth: { from: 1, to: 3, step: 0.5 } },
    derived: { a: 'depth * 2', b: 'a + 1' },
    where: ['b > 2'],
  };
  it('ignores $schema, description and the key order of plain objects', () => {
    const same: Study = { ...study, $schema: '../schema.json', description: 'second try', fixed: { supports: 'pin-roller', span: 24 } };
    expect(studyHash(same)).toBe(studyHash(study));
    expect(studyHash(study)).toMatch(/^[0-9a-f]{16}$/);
  });
  it('keeps the order of vary (index order) and derived (evaluation order)', () => {
    expect(studyHash({ ...study, vary: { depth: study.vary!.depth, panels: study.vary!.panels } })).not.toBe(studyHash(study));
    expect(studyHash({ ...study, derived: { b: 'a + 1', a: 'depth * 2' } })).not.toBe(studyHash(study));
  });
  it('changes with any value that changes results', () => {
    expect(studyHash({ ...study, fixed: { span: 25, supports: 'pin-roller' } })).not.toBe(studyHash(study));
    expect(studyHash({ ...study, where: ['b > 3'] })).not.toBe(studyHash(study));
  });
});

it('canonicalNumber is Number(x.toPrecision(12)).toString() across magnitudes', () => {
  // the formula of the id specification, applied literally
  const literal = (x: number) => Number(x.toPrecision(12)).toString();
  for (const x of [0, 1, -1, 7, 123456789012, 999999999999, 1e12, 1e12 + 1, 12345678901234, 2 ** 53, -(2 ** 40), 1.5, 1e-7, 1 / 7, -2.25e15, 5e-324]) {
    expect(canonicalNumber(x)).toBe(literal(x));
  }
});

describe('VariantIdHasher', () => {
  it('gives the ids of variantId, for numbers, options, non-ASCII strings and repeated values', () => {
    const names = ['span', 'depth', 'panels', 'supports', 'label'];
    const hasher = new VariantIdHasher('pratt', names);
    const params = [
      { span: 24, depth: 2.25, panels: 8, supports: 'pin-roller', label: 'a' },
      { span: 24, depth: 0.1 + 0.2, panels: 8, supports: 'pin-pin', label: 'a' },
      { span: 24, depth: 0.3, panels: 8, supports: 'pin-pin', label: 'a' },
      { span: 24, depth: -0, panels: 1e15, supports: 'pin-pin', label: 'ψ east' },
      { span: NaN, depth: 2.25, panels: 8, supports: 'pin-roller', label: 'a' },
    ];
    for (const p of [...params, ...params]) expect(hasher.id(p)).toBe(variantId('pratt', p, names));
    expect(new VariantIdHasher('brücke', names).id(params[0])).toBe(variantId('brücke', params[0], names));
  });
});
