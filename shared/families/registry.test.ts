/**
 * The registry and the parameter rules: declared parameters are self-consistent, checks name
 * the parameter at fault, and topology keys change exactly when the topology does.
 */
import { describe, expect, it } from 'vitest';
import { families, getFamily, unknownParams, withDefaults } from './registry';

describe('registry', () => {
  it('holds the sixteen families with unique ids, found by getFamily', () => {
    const ids = families.map((f) => f.id);
    expect(new Set(ids).size).toBe(16);
    for (const id of ids) expect(getFamily(id)?.id).toBe(id);
    expect(getFamily('nope')).toBeUndefined();
  });
  for (const f of families) {
    it(`${f.id}: every default is allowed by its own spec and passes check`, () => {
      for (const s of f.params) {
        if (s.options) expect(s.options).toContain(s.default);
        else {
          expect(typeof s.default).toBe('number');
          if (s.min !== undefined) expect(s.default as number).toBeGreaterThanOrEqual(s.min);
          if (s.max !== undefined) expect(s.default as number).toBeLessThanOrEqual(s.max);
          if (s.integer) expect(Number.isInteger(s.default)).toBe(true);
        }
        expect(s.description.length).toBeGreaterThan(10);
      }
      expect(f.params.some((s) => s.name === 'span' && s.unit === 'm')).toBe(true);
      expect(f.params.some((s) => s.name === 'panels' && s.integer)).toBe(true);
      expect(f.check(withDefaults(f, {}))).toEqual([]);
      expect(f.check({})).toEqual([]);
    });
  }
});

describe('check', () => {
  const messages = (id: string, p: Record<string, number | string>) => getFamily(id)!.check(p);
  it('names the parameter at fault', () => {
    expect(messages('pratt', { panels: 7 })).toEqual([expect.stringMatching(/^panels must be even/)]);
    expect(messages('w-web', { panels: 5 })).toEqual([expect.stringMatching(/^panels must be even/)]);
    expect(messages('compound-link', { panels: 6 })).toEqual([expect.stringMatching(/^panels must be odd/)]);
    expect(messages('king-post', { panels: 3 })).toEqual([expect.stringMatching(/^panels must be one of 2, 4/)]);
    expect(messages('howe', { panels: 4.5 })).toEqual([expect.stringMatching(/^panels must be a whole number/)]);
    expect(messages('warren', { span: 0.2 })).toEqual([expect.stringMatching(/^span must be at least 1 m/)]);
    expect(messages('warren', { depth: '2 m' })).toEqual([expect.stringMatching(/^depth must be a finite number/)]);
    expect(messages('pratt', { supports: 'fixed' })).toEqual([expect.stringMatching(/^supports must be one of/)]);
    expect(messages('bowstring', { curve: 'circular', span: 10, rise: 6 })).toEqual([expect.stringMatching(/^rise must be at most span\/2/)]);
    expect(messages('cantilever', { tip: 'square', depth: 1, tipDepth: 1.5 })).toEqual([expect.stringMatching(/^tipDepth must be less than depth/)]);
    expect(messages('compound-three-bar', { linkage: 'crossed' })).toEqual([expect.stringMatching(/^linkage must be one of sound, concurrent, parallel/)]);
  });
  it('slope replaces rise: rise out of range is ignored when slope is set; a slope giving too much rise is reported', () => {
    expect(messages('fan', { rise: 500, slope: 30 })).toEqual([]);
    expect(messages('fan', { span: 300, slope: 60 })).toEqual([expect.stringMatching(/^slope 60 deg gives rise/)]);
  });
});

describe('topologyKey and withDefaults', () => {
  it('same key when only dimensions change, a new key when panels, supports, linkage or tip change', () => {
    const pratt = getFamily('pratt')!;
    const base = withDefaults(pratt, {});
    expect(pratt.topologyKey({ ...base, span: 30, depth: 3 })).toBe(pratt.topologyKey(base));
    expect(pratt.topologyKey({ ...base, panels: 10 })).not.toBe(pratt.topologyKey(base));
    expect(pratt.topologyKey({ ...base, supports: 'pin-pin' })).not.toBe(pratt.topologyKey(base));
    // the roller angle only matters for the inclined roller
    expect(pratt.topologyKey({ ...base, rollerAngle: 45 })).toBe(pratt.topologyKey(base));
    expect(pratt.topologyKey({ ...base, supports: 'pin-inclined', rollerAngle: 45 }))
      .not.toBe(pratt.topologyKey({ ...base, supports: 'pin-inclined', rollerAngle: 60 }));
    const three = getFamily('compound-three-bar')!;
    expect(three.topologyKey({ linkage: 'parallel' })).not.toBe(three.topologyKey({ linkage: 'sound' }));
    const cant = getFamily('cantilever')!;
    expect(cant.topologyKey({ tip: 'square' })).not.toBe(cant.topologyKey({ tip: 'pointed' }));
    expect(cant.topologyKey({ tipDepth: 0.3 })).toBe(cant.topologyKey({ tipDepth: 0.6 }));
    const bow = getFamily('bowstring')!;
    expect(bow.topologyKey({ curve: 'circular' })).toBe(bow.topologyKey({ curve: 'parabolic' }));
  });
  it.each(families.map((f) => [f.id, f] as const))('%s: the key reads only its topologyParams (a sweep reuses the topology when they repeat)', (_id, f) => {
    for (const supports of [undefined, 'pin-inclined']) {
      const base = withDefaults(f, supports && f.params.some((s) => s.name === 'supports') ? { supports } : {});
      for (const spec of f.params) {
        if (f.topologyParams.includes(spec.name)) continue;
        const others = spec.options ? spec.options : [spec.min, spec.max, typeof spec.default === 'number' ? spec.default * 1.37 : undefined];
        for (const v of others) {
          if (v === undefined || v === base[spec.name]) continue;
          expect(f.topologyKey({ ...base, [spec.name]: v }), `${spec.name} = ${v}`).toBe(f.topologyKey(base));
        }
      }
    }
  });
  it('fills defaults, keeps extra names, derives rise from slope', () => {
    const f = getFamily('scissors')!;
    const p = withDefaults(f, { span: 10, slope: 45, extra: 1 });
    expect(p.panels).toBe(6);
    expect(p.supports).toBe('pin-roller');
    expect(p.rise).toBeCloseTo(5, 12); // tan 45° = 1: rise = span / 2
    expect(p.extra).toBe(1);
    expect(unknownParams(f, p)).toEqual(['extra']);
  });
});
