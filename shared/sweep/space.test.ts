import { describe, expect, it } from 'vitest';
import type { Study } from '../schemas/study';
import { passes, planSpace, spaceSize, variantAt, type SpacePlan } from './space';
import type { ParamSpec, Params } from './types';

const PARAMS: ParamSpec[] = [
  { name: 'span', unit: 'm', default: 24, min: 1, max: 200, description: 'Span.' },
  { name: 'depth', unit: 'm', default: 2, min: 0.1, max: 20, description: 'Depth.' },
  { name: 'panels', unit: '', default: 8, min: 2, max: 40, integer: true, description: 'Panels.' },
  { name: 'supports', unit: '', default: 'pin-roller', options: ['pin-roller', 'pin-pin'], description: 'Supports.' },
];

function plan(extra: Partial<Study>): SpacePlan {
  const result = planSpace({ name: 't', family: 'pratt', ...extra }, PARAMS);
  if ('issues' in result) throw new Error(JSON.stringify(result.issues));
  return result;
}

function all(p: SpacePlan): Params[] {
  return Array.from({ length: spaceSize(p) }, (_, i) => ({ ...variantAt(p, i) }));
}

function column(p: SpacePlan, name: string): number[] {
  return all(p).map((v) => v[name] as number);
}

describe('planSpace: expansion', () => {
  it('crosses lists, ranges and samples: the size is the product, before filters', () => {
    const p = plan({
      vary: {
        panels: [6, 8, 10],
        depth: { from: 1, to: 3, step: 0.25 },
        supports: ['pin-roller', 'pin-pin'],
        span: { sample: 'uniform', min: 18, max: 30, count: 5 },
      },
      where: ['panels >= 8'],
    });
    expect(spaceSize(p)).toBe(3 * 9 * 2 * 5);
    const keys = new Set(all(p).map((v) => JSON.stringify([v.panels, v.depth, v.supports, v.span])));
    expect(keys.size).toBe(spaceSize(p));
  });

  it('decodes the index in mixed radix, last dimension fastest', () => {
    const p = plan({ vary: { panels: [6, 8, 10], depth: [1, 2] } });
    expect(all(p).map((v) => [v.panels, v.depth])).toEqual([
      [6, 1], [6, 2], [8, 1], [8, 2], [10, 1], [10, 2],
    ]);
  });

  it('fills defaults and fixed values, converting a quantity to the parameter unit', () => {
    const p = plan({ fixed: { span: '80 ft', supports: 'pin-pin' } });
    expect(spaceSize(p)).toBe(1);
    const v = variantAt(p, 0);
    // 1 ft = 0.3048 m exactly (international foot, 1959)
    expect(v.span).toBeCloseTo(80 * 0.3048, 12);
    expect(v.supports).toBe('pin-pin');
    expect(v.depth).toBe(2);
    expect(v.panels).toBe(8);
  });

  it('reuses the output object and rejects an index outside the space', () => {
    const p = plan({ vary: { panels: [6, 8] } });
    const out: Params = {};
    expect(variantAt(p, 1, out)).toBe(out);
    expect(out.panels).toBe(8);
    expect(() => variantAt(p, 2)).toThrow(RangeError);
    expect(() => variantAt(p, -1)).toThrow(RangeError);
    expect(() => variantAt(p, 0.5)).toThrow(RangeError);
  });
});

describe('planSpace: ranges', () => {
  it('a range by count equals the same range by step, both ends included', () => {
    const byStep = column(plan({ vary: { depth: { from: 1, to: 3, step: 0.25 } } }), 'depth');
    const byCount = column(plan({ vary: { depth: { from: 1, to: 3, count: 9 } } }), 'depth');
    expect(byStep).toHaveLength(9);
    expect(byCount).toHaveLength(9);
    byStep.forEach((v, k) => expect(v).toBeCloseTo(1 + 0.25 * k, 12));
    byCount.forEach((v, k) => expect(v).toBeCloseTo(byStep[k], 12));
    expect(byStep[8]).toBe(3);
    expect(byCount[8]).toBe(3);
  });

  it('includes `to` when a step lands on it in floating point (0.3 / 0.1 < 3)', () => {
    const v = column(plan({ vary: { depth: { from: 0.1, to: 0.4, step: 0.1 } } }), 'depth');
    expect(v).toEqual([0.1, 0.2, 0.3, 0.4]);
  });

  it('includes `to` within 1e-9 and not beyond', () => {
    const within = column(plan({ vary: { depth: { from: 1, to: 2 - 5e-10, step: 0.5 } } }), 'depth');
    expect(within).toHaveLength(3);
    expect(within[2]).toBe(2 - 5e-10);
    const beyond = column(plan({ vary: { depth: { from: 1, to: 2 - 1e-8, step: 0.5 } } }), 'depth');
    expect(beyond).toEqual([1, 1.5]);
  });

  it('stops below `to` when the step does not land on it', () => {
    expect(column(plan({ vary: { depth: { from: 1, to: 3, step: 0.7 } } }), 'depth')).toEqual([1, 1.7, 2.4]);
  });

  it('a one-point range', () => {
    expect(column(plan({ vary: { depth: { from: 2, to: 2, count: 1 } } }), 'depth')).toEqual([2]);
    expect(column(plan({ vary: { depth: { from: 2, to: 2, step: 1 } } }), 'depth')).toEqual([2]);
  });
});

describe('planSpace: derived and where', () => {
  it('derives a family parameter from an auxiliary one, in order', () => {
    const p = plan({
      fixed: { span: 24 },
      vary: { ratio: [8, 12, 16] },
      derived: { depth: 'span / ratio', half: 'depth / 2' },
      where: ['half > 0'],
    });
    const v = all(p);
    expect(v.map((x) => x.depth)).toEqual([3, 2, 1.5]);
    expect(v.map((x) => x.half)).toEqual([1.5, 1, 0.75]);
    expect(v[0].span).toBe(24);
  });

  it('filters keep exactly the variants that satisfy every condition', () => {
    const panels = [4, 6, 8, 10, 12];
    const depths = [1, 1.5, 2, 2.5, 3];
    const p = plan({ vary: { panels, depth: depths }, where: ['depth / span >= 1/12', 'panels * 2 <= 20'] });
    let expected = 0;
    for (const n of panels) for (const d of depths) if (d / 24 >= 1 / 12 && n * 2 <= 20) expected++;
    const kept = all(p).filter((v) => passes(p, v));
    expect(kept).toHaveLength(expected);
    expect(kept.every((v) => (v.depth as number) >= 2 && (v.panels as number) <= 10)).toBe(true);
    expect(spaceSize(p)).toBe(25);
  });

  it('compares options as text with == and !=', () => {
    const p = plan({ vary: { supports: ['pin-roller', 'pin-pin'], panels: [6, 8] }, where: ['supports == "pin-pin" or panels != 6'] });
    const kept = all(p).filter((v) => passes(p, v)).map((v) => `${v.supports}/${v.panels}`);
    expect(kept).toEqual(['pin-roller/8', 'pin-pin/6', 'pin-pin/8']);
  });

  it('and, or, not and text comparisons nest', () => {
    const p = plan({
      vary: { supports: ['pin-roller', 'pin-pin'], panels: [6, 8, 10] },
      where: ['(supports != "pin-pin" or panels == 6) and not (panels > 8 and supports == "pin-roller")'],
    });
    const kept = all(p).filter((v) => passes(p, v)).map((v) => `${v.supports}/${v.panels}`);
    // the same condition written in plain TypeScript
    const expected = all(p)
      .filter((v) => (v.supports !== 'pin-pin' || v.panels === 6) && !((v.panels as number) > 8 && v.supports === 'pin-roller'))
      .map((v) => `${v.supports}/${v.panels}`);
    expect(kept).toEqual(expected);
    expect(kept).toEqual(['pin-roller/6', 'pin-roller/8', 'pin-pin/6']);
  });

  it('a derived value that is not a real number becomes NaN, and fails the filters', () => {
    const p = plan({ vary: { depth: [1, 4] }, derived: { slack: 'sqrt(depth - 2)' }, where: ['slack >= 0'] });
    const v = all(p);
    expect(v[0].slack).toBeNaN();
    expect(v[1].slack).toBeCloseTo(Math.sqrt(2), 12);
    expect(v.map((x) => passes(p, x))).toEqual([false, true]);
  });
});

describe('planSpace: samples', () => {
  const lhs = (min: number, max: number, count: number) => ({ sample: 'lhs' as const, min, max, count });

  it('lhs dimensions of equal count form one hypercube: co-sampled, not crossed', () => {
    const p = plan({ vary: { depth: lhs(1, 3, 10), ratio: lhs(8, 20, 10), span: lhs(18, 30, 5) }, where: ['ratio > 0'] });
    expect(p.dimensions.map((d) => d.names)).toEqual([['depth', 'ratio'], ['span']]);
    expect(spaceSize(p)).toBe(10 * 5);
  });

  it('each of the count strata is hit exactly once per dimension (Latin hypercube, McKay et al. 1979)', () => {
    const count = 50;
    const p = plan({ vary: { depth: lhs(1, 3, count), span: lhs(18, 30, count) } });
    expect(spaceSize(p)).toBe(count);
    for (const [name, min, max] of [['depth', 1, 3], ['span', 18, 30]] as const) {
      const strata = column(p, name).map((v) => Math.floor(((v - min) / (max - min)) * count));
      expect([...strata].sort((a, b) => a - b)).toEqual(Array.from({ length: count }, (_, k) => k));
    }
  });

  it('uniform samples lie in [min, max) and are crossed with the other dimensions', () => {
    const p = plan({ vary: { panels: [6, 8], depth: { sample: 'uniform', min: 1, max: 3, count: 20 } } });
    expect(spaceSize(p)).toBe(40);
    const d = column(p, 'depth');
    expect(d.every((x) => x >= 1 && x < 3)).toBe(true);
    expect(d.slice(0, 20)).toEqual(d.slice(20));
    expect(new Set(d).size).toBe(20);
  });

  it('the same seed gives the same samples; another seed other samples', () => {
    const vary = { depth: lhs(1, 3, 8), span: { sample: 'uniform' as const, min: 18, max: 30, count: 3 } };
    const a = all(plan({ vary, samples: { seed: 42 } }));
    const b = all(plan({ vary, samples: { seed: 42 } }));
    const c = all(plan({ vary, samples: { seed: 43 } }));
    expect(b).toEqual(a);
    expect(c.map((v) => v.depth)).not.toEqual(a.map((v) => v.depth));
  });

  it("a dimension's samples do not change when another dimension is added or moved", () => {
    const depth = lhs(1, 3, 8);
    const alone = column(plan({ vary: { depth } }), 'depth');
    const withOther = plan({ vary: { span: lhs(18, 30, 8), depth } });
    expect(column(withOther, 'depth')).toEqual(alone);
  });
});
