import Ajv from 'ajv';
import { describe, expect, it } from 'vitest';
import { Study } from './study';

const ajv = new Ajv({ allErrors: true });
const validate = ajv.compile(Study);

const example = {
  $schema: '../schemas/study.json',
  name: 'Depot roof, 24 m',
  description: 'Pratt roof truss, depth by span ratio.',
  family: 'pratt',
  fixed: { span: 24, supports: 'pin-roller' },
  vary: {
    panels: [6, 8, 10],
    ratio: { sample: 'lhs', min: 8, max: 20, count: 50 },
    camber: { from: 0, to: 0.1, count: 3 },
    slope: { from: 0, to: 5, step: 2.5 },
  },
  samples: { seed: 42 },
  derived: { depth: 'span / ratio' },
  where: ['depth / span >= 1/20', 'panels * 2 <= 40'],
  loads: [
    { case: 'D', kind: 'self-weight' },
    { case: 'D', kind: 'area', value: '0.5 kPa', spacing: 6, chord: 'top' },
    { case: 'S', kind: 'area', value: 0.8, spacing: '6 m', chord: 'top', projection: 'plan' },
  ],
  combinations: { preset: 'en1990-6.10', cases: { D: 'D' }, psi0: { S: 0.5 } },
  record: ['peakTension', 'peakCompression', 'maxDisplacement', 'spanOverDeflection'],
  objective: { minimize: 'maxAbsForce' },
};

describe('Study schema', () => {
  it('accepts the example study', () => {
    expect(validate(example), JSON.stringify(validate.errors)).toBe(true);
    expect(validate({ name: 'x', family: 'warren', combinations: [{ id: 'c', factors: { D: 1.2 } }] })).toBe(true);
  });
  it.each([
    ['an unknown top-level key', { ...example, extra: 1 }],
    ['a range with both step and count', { ...example, vary: { depth: { from: 1, to: 3, step: 0.5, count: 5 } } }],
    ['a zero step', { ...example, vary: { depth: { from: 1, to: 3, step: 0 } } }],
    ['an empty list', { ...example, vary: { depth: [] } }],
    ['an unknown sampler', { ...example, vary: { depth: { sample: 'sobol', min: 1, max: 2, count: 4 } } }],
    ['a name that is not an identifier', { ...example, fixed: { 'span m': 24 } }],
    ['an unknown preset', { ...example, combinations: { preset: 'bs5950' } }],
    ['ψ0 above 1', { ...example, combinations: { preset: 'en1990-6.10', psi0: { S: 1.2 } } }],
    ['an unknown figure', { ...example, record: ['peakTensoin'] }],
    ['an objective with both senses', { ...example, objective: { minimize: 'maxAbsForce', maximize: 'spanOverDeflection' } }],
    ['a negative seed', { ...example, samples: { seed: -1 } }],
  ])('rejects %s', (_what, study) => {
    expect(validate(study)).toBe(false);
  });
  it('has $id, title, and a description on every key', () => {
    expect(Study.$id).toMatch(/study\.json$/);
    expect(Study.title).toBeTruthy();
    const missing: string[] = [];
    const walk = (schema: Record<string, unknown>, path: string) => {
      const props = schema.properties as Record<string, Record<string, unknown>> | undefined;
      for (const [k, v] of Object.entries(props ?? {})) {
        if (!v.description && !(v.anyOf && (v.anyOf as Record<string, unknown>[]).every((o) => o.description))) missing.push(`${path}.${k}`);
        // loads are study-loads.ts, checked there
        if (`${path}.${k}` !== 'study.loads') walk(v, `${path}.${k}`);
      }
      for (const sub of [...((schema.anyOf as Record<string, unknown>[]) ?? []), schema.items, ...Object.values((schema.patternProperties as object) ?? {})]) {
        if (sub && typeof sub === 'object') walk(sub as Record<string, unknown>, path);
      }
    };
    walk(Study as unknown as Record<string, unknown>, 'study');
    expect(missing).toEqual([]);
  });
});
