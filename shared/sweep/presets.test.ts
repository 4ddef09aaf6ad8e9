import { describe, expect, it } from 'vitest';
import { checkCombinations } from './check-combinations';
import { expandCombinations, type Combination } from './presets';

/** Factors by id, for comparison with the standard's table. */
function byId(list: Combination[]): Record<string, Record<string, number>> {
  return Object.fromEntries(list.map((c) => [c.id, c.factors]));
}

function expectFactors(actual: Record<string, number>, expected: Record<string, number>): void {
  expect(Object.keys(actual).sort()).toEqual(Object.keys(expected).sort());
  for (const [k, f] of Object.entries(expected)) expect(actual[k]).toBeCloseTo(f, 12);
}

describe('ASCE/SEI 7-16 §2.3.1 basic LRFD combinations (from memory, check the edition)', () => {
  const asce = { preset: 'asce7-lrfd' as const };

  it('D, L, S, W: each combination of the clause, "or" expanded for the cases present', () => {
    const c = byId(expandCombinations(asce, ['D', 'L', 'S', 'W']));
    expect(Object.keys(c)).toEqual(['asce7-1', 'asce7-2-S', 'asce7-3-S-L', 'asce7-3-S-W', 'asce7-4-S', 'asce7-5']);
    expectFactors(c['asce7-1'], { D: 1.4 }); // §2.3.1 (1): 1.4D
    expectFactors(c['asce7-2-S'], { D: 1.2, L: 1.6, S: 0.5 }); // §2.3.1 (2): 1.2D + 1.6L + 0.5(Lr or S or R)
    expectFactors(c['asce7-3-S-L'], { D: 1.2, S: 1.6, L: 1.0 }); // §2.3.1 (3): 1.2D + 1.6(Lr or S or R) + (L or 0.5W)
    expectFactors(c['asce7-3-S-W'], { D: 1.2, S: 1.6, W: 0.5 }); // §2.3.1 (3), the 0.5W alternative
    expectFactors(c['asce7-4-S'], { D: 1.2, W: 1.0, L: 1.0, S: 0.5 }); // §2.3.1 (4): 1.2D + 1.0W + L + 0.5(Lr or S or R)
    expectFactors(c['asce7-5'], { D: 0.9, W: 1.0 }); // §2.3.1 (5): 0.9D + 1.0W
  });

  it('all six cases: every alternative of every "or" term', () => {
    const list = expandCombinations(asce, ['D', 'L', 'Lr', 'S', 'R', 'W']);
    // §2.3.1: (1) 1 + (2) 3 roof alternatives + (3) 3 × 2 + (4) 3 + (5) 1
    expect(list).toHaveLength(1 + 3 + 6 + 3 + 1);
    expectFactors(byId(list)['asce7-3-R-W'], { D: 1.2, R: 1.6, W: 0.5 }); // §2.3.1 (3)
    expect(list.every((c) => c.source.startsWith('ASCE/SEI 7-16 §2.3.1, combination'))).toBe(true);
  });

  it('only dead load: terms without a case drop out and duplicates are left out', () => {
    const list = expandCombinations(asce, ['D']);
    // §2.3.1 (1) 1.4D; (2)–(4) all reduce to 1.2D; (5) 0.9D
    expect(list.map((c) => c.factors)).toEqual([{ D: 1.4 }, { D: 1.2 }, { D: 0.9 }]);
  });

  it('maps roles to the study’s own case ids', () => {
    const c = byId(expandCombinations({ preset: 'asce7-lrfd', cases: { D: 'dead', S: 'snow' } }, ['dead', 'snow']));
    expectFactors(c['asce7-2-snow'], { dead: 1.2, snow: 0.5 }); // §2.3.1 (2) without L
  });
});

describe('EN 1990 eq. (6.10) with Table A1.2(B) and ψ0 of Table A1.1 (from memory)', () => {
  const en = { preset: 'en1990-6.10' as const };

  it('each variable action leading in turn, with γG = 1.35, γQ = 1.5 and default ψ0', () => {
    const c = byId(expandCombinations(en, ['D', 'L', 'S', 'W']));
    expect(Object.keys(c)).toEqual(['en1990-6.10-G', 'en1990-6.10-L', 'en1990-6.10-S', 'en1990-6.10-W', 'en1990-6.10-fav-W']);
    expectFactors(c['en1990-6.10-G'], { D: 1.35 }); // eq. (6.10), no variable action
    // ψ0: imposed (categories A–D) 0.7, snow (site ≤ 1000 m) 0.5, wind 0.6 — Table A1.1
    expectFactors(c['en1990-6.10-L'], { D: 1.35, L: 1.5, S: 1.5 * 0.5, W: 1.5 * 0.6 });
    expectFactors(c['en1990-6.10-S'], { D: 1.35, S: 1.5, L: 1.5 * 0.7, W: 1.5 * 0.6 });
    expectFactors(c['en1990-6.10-W'], { D: 1.35, W: 1.5, L: 1.5 * 0.7, S: 1.5 * 0.5 });
    expectFactors(c['en1990-6.10-fav-W'], { D: 1.0, W: 1.5 }); // γG,inf = 1.00, Table A1.2(B)
    expect(c['en1990-6.10-S'].L).toBe(1.05); // 1.5 × 0.7 rounded to 12 digits, not 1.0499999999999998
  });

  it('ψ0 per category given by the study', () => {
    // category E (storage) has ψ0 = 1.0 in Table A1.1 (from memory)
    const c = byId(expandCombinations({ preset: 'en1990-6.10', psi0: { L: 1.0 } }, ['D', 'L', 'S']));
    expectFactors(c['en1990-6.10-S'], { D: 1.35, S: 1.5, L: 1.5 });
  });

  it('imposed load on roofs is not combined with snow or wind (EN 1991-1-1 §3.3.2(1), from memory)', () => {
    const c = byId(expandCombinations(en, ['D', 'Lr', 'S']));
    expectFactors(c['en1990-6.10-Lr'], { D: 1.35, Lr: 1.5 });
    expectFactors(c['en1990-6.10-S'], { D: 1.35, S: 1.5 });
  });

  it('sources name the equation and the table', () => {
    const list = expandCombinations(en, ['D', 'W']);
    expect(list.every((c) => c.source.includes('EN 1990 eq. (6.10)'))).toBe(true);
  });
});

describe('custom and default combinations', () => {
  it('custom factors pass through with their source', () => {
    const list = expandCombinations([{ id: 'c1', factors: { D: 1.1, L: 1.3 }, source: 'project brief' }, { id: 'c2', factors: { D: 1 } }], ['D', 'L']);
    expect(list).toEqual([
      { id: 'c1', factors: { D: 1.1, L: 1.3 }, source: 'project brief' },
      { id: 'c2', factors: { D: 1 }, source: 'study file (custom factors)' },
    ]);
  });
  it('no combinations: each case alone, factor 1', () => {
    expect(expandCombinations(undefined, ['D', 'S']).map((c) => [c.id, c.factors])).toEqual([
      ['D', { D: 1 }],
      ['S', { S: 1 }],
    ]);
  });
  it('checkCombinations finds nothing wrong in a sound preset', () => {
    expect(checkCombinations({ preset: 'en1990-6.10', cases: { D: 'G' }, psi0: { T: 0.6 } }, ['G', 'S', 'T'])).toEqual([]);
    expect(checkCombinations({ preset: 'asce7-lrfd' }, ['D', 'L', 'Lr', 'S', 'R', 'W'])).toEqual([]);
  });
  it('a role given only by its ψ0 becomes a variable action', () => {
    const c = byId(expandCombinations({ preset: 'en1990-6.10', psi0: { T: 0.6 } }, ['D', 'T']));
    expectFactors(c['en1990-6.10-T'], { D: 1.35, T: 1.5 }); // eq. (6.10), T leading
  });
});
