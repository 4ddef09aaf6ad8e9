import { describe, expect, it } from 'vitest';
import type { Study } from '../schemas/study';
import { resolveStudy } from './resolve-study';
import { VariantEvaluator } from './evaluate';
import { ParamSlots, ValueCache } from './param-slots';
import { RecordEncoder } from './record-bytes';
import { variantAt } from './space';
import { variantId } from './variant-id';

/** A fictional depot roof study with every source of a value: list, range, co-sampled hypercube, fixed, default and derived. */
const study: Study = {
  name: 'Depot roof slots',
  family: 'pratt',
  fixed: { span: 21.6 },
  vary: {
    supports: ['pin-roller', 'pin-pin', 'roller-roller'],
    panels: [6, 8, 10],
    ratio: { from: 8, to: 14, count: 7 },
  },
  derived: { depth: 'span / ratio' },
  loads: [{ case: 'D', kind: 'area', value: 0.6, spacing: 6, chord: 'top' }],
  combinations: [{ id: 'C1', factors: { D: 1.4 } }],
} as Study;

const sampled: Study = {
  name: 'Footbridge samples', family: 'warren',
  vary: { depth: { sample: 'lhs', min: 1, max: 3, count: 40 }, span: { sample: 'lhs', min: 24, max: 36, count: 40 }, panels: [8, 10], supports: ['pin-roller', 'pin-pin'] },
  samples: { seed: 11 },
  loads: [{ case: 'D', kind: 'line', value: 4, chord: 'bottom' }],
  combinations: [{ id: 'C1', factors: { D: 1.35 } }],
} as Study;

function setupOf(s: Study) {
  const r = resolveStudy(s);
  if (!r.setup) throw new Error(r.issues.map((i) => `${i.path}: ${i.message}`).join('; '));
  return r.setup;
}

describe('ParamSlots: the values of a variant by parameter index', () => {
  it.each([['list, range and derived', study], ['Latin hypercube', sampled]] as const)('%s: equal to variantAt, for every variant', (_l, s) => {
    const { plan } = setupOf(s);
    const slots = new ParamSlots(plan, plan.paramNames);
    const p = {};
    for (let i = 0; i < plan.size; i++) {
      variantAt(plan, i, p, slots.digits);
      slots.read(p);
      expect(slots.values).toEqual(plan.paramNames.map((n) => (p as Record<string, unknown>)[n]));
    }
  });
  it('ValueCache makes each distinct value once per parameter and returns it for the digit', () => {
    const { plan } = setupOf(study);
    const slots = new ParamSlots(plan, plan.paramNames);
    const made: string[] = [];
    const cache = new ValueCache(slots, (i, v) => {
      made.push(`${plan.paramNames[i]}=${v}`);
      return `${plan.paramNames[i]}=${v}`;
    }, plan);
    const p = {};
    for (let pass = 0; pass < 2; pass++) {
      for (let i = 0; i < plan.size; i++) {
        variantAt(plan, i, p, slots.digits);
        slots.read(p);
        plan.paramNames.forEach((n, k) => expect(cache.get(k)).toBe(`${n}=${(p as Record<string, unknown>)[n]}`));
      }
    }
    const supports = made.filter((m) => m.startsWith('supports='));
    expect(new Set(supports).size).toBe(supports.length); // a varied value: made once, however often it recurs
    expect(made.filter((m) => m.startsWith('span=')).length).toBe(1); // fixed: once
  });
});

describe('the sweep evaluator and encoder with slots', () => {
  it.each([['list, range and derived', study], ['Latin hypercube', sampled]] as const)('%s: ids equal variantId, lines equal formatRecord', (_l, s) => {
    const setup = setupOf(s);
    const ev = new VariantEvaluator(setup);
    const enc = new RecordEncoder(setup.plan.paramNames, false, ev.slots, setup.plan);
    const plain = new RecordEncoder(setup.plan.paramNames, false);
    const decode = (b: Uint8Array) => new TextDecoder().decode(b);
    for (let i = 0; i < setup.plan.size; i++) {
      const r = ev.evaluate(i)!;
      expect(r.id).toBe(variantId(setup.family.id, r.params, setup.plan.paramNames));
      enc.write(r);
      plain.write(r);
      // the encoder without slots is checked against formatRecord in record-bytes.test.ts
      expect(decode(enc.jsonl.take())).toBe(decode(plain.jsonl.take()));
      expect(decode(enc.csv.take())).toBe(decode(plain.csv.take()));
    }
  });
});
