/**
 * Reference case files: the schema with the model checked by its own form, the full JSON Schema
 * compiled by the one Ajv, and the shape test used to pick case files out of a folder.
 */
import { describe, expect, it } from 'vitest';
import { compileSchema } from '../schemas/validate';
import { ReferenceCase } from '../schemas/reference-case';
import { Model } from '../schemas/model';
import { looksLikeCase, prefixPath, validateCase } from './validate-case';

const model = {
  name: 'Two-bar frame',
  nodes: [{ id: 'A', x: 0, y: 0 }, { id: 'B', x: 4, y: 3 }, { id: 'C', x: 8, y: 0 }],
  members: [{ id: 'AB', from: 'A', to: 'B' }, { id: 'BC', from: 'B', to: 'C' }],
  supports: [{ node: 'A', type: 'pin' }, { node: 'C', type: 'pin' }],
  loads: [{ case: 'G', node: 'B', fy: -60 }],
};
const good = {
  name: 'Two-bar frame',
  source: { kind: 'closed-form', citation: 'Method of joints: N = −P/(2 sin θ)' },
  model,
  expected: {
    classification: { status: 'determinate', joints: 3, members: 2, reactions: 4, mechanisms: 0, selfStress: 0, critical: false },
    results: { G: { memberForces: { AB: -50, BC: -50 } } },
  },
  tolerance: { absolute: { force: 1e-6, displacement: 1e-9 }, relative: 1e-6 },
};
const clone = <T>(v: T): T => JSON.parse(JSON.stringify(v)) as T;

describe('validateCase', () => {
  it('accepts a case with an inline model and hands the model on unchecked', () => {
    const r = validateCase(good);
    expect(r.issues).toEqual([]);
    expect(r.case?.model).toEqual({ kind: 'inline', model });
  });

  it('accepts { file } and { study, variant } models', () => {
    expect(validateCase({ ...good, model: { file: 'm.json' } }).case?.model).toEqual({ kind: 'file', file: 'm.json' });
    expect(validateCase({ ...good, model: { study: 's.json', variant: 3 } }).case?.model).toEqual({ kind: 'study', study: 's.json', variant: 3 });
    expect(validateCase({ ...good, model: { study: {}, variant: '00ff00ff00ff00ff' } }).case?.model.kind).toBe('study');
  });

  it('names the path of each problem', () => {
    const bad = clone(good) as Record<string, unknown> & { expected: Record<string, unknown>; tolerance: { relative: unknown } };
    delete bad.expected.classification;
    bad.tolerance.relative = -1;
    bad.extra = 1;
    const paths = validateCase(bad).issues.map((i) => `${i.path}: ${i.message}`);
    expect(paths).toContain('expected: missing key "classification"');
    expect(paths).toContain('tolerance.relative: must be at least 0');
    expect(paths).toContain('extra: unknown key "extra"');
  });

  it('checks the model reference forms at their own paths', () => {
    const issues = (m: unknown) => validateCase({ ...good, model: m }).issues.map((i) => `${i.path}: ${i.message}`);
    expect(issues({ file: '' })).toEqual(['model.file: must not be empty']);
    expect(issues({ file: 'm.json', x: 1 })).toEqual(['model.x: unknown key "x"']);
    expect(issues({ study: 's.json', variant: -1 })[0]).toMatch(/^model\.variant/);
    expect(issues({ study: 3, variant: 0 })).toEqual(['model.study: must be a study file path or a study object']);
    expect(issues([1])).toEqual(['model: must be a model object, { "file": ... } or { "study": ..., "variant": ... }']);
  });

  it('rejects a weight that is not a number, and expected figures that are not numbers', () => {
    const bad = clone(good) as unknown as { expected: { weight: unknown; results: { G: { memberForces: Record<string, unknown> } } } };
    bad.expected.weight = 'heavy';
    bad.expected.results.G.memberForces.AB = '−50';
    const paths = validateCase(bad).issues.map((i) => i.path);
    expect(paths).toContain('expected.weight');
    expect(paths).toContain('expected.results.G.memberForces.AB');
  });
});

describe('the full ReferenceCase schema', () => {
  it('compiles beside the model schema and accepts the same case', () => {
    compileSchema(Model)(model);
    const check = compileSchema(ReferenceCase);
    expect(check(good)).toEqual([]);
    expect(check({ ...good, model: { file: 'm.json' } })).toEqual([]);
    expect(check({ ...good, model: { ...model, nodes: 'none' } }).length).toBeGreaterThan(0);
  });
});

describe('looksLikeCase and prefixPath', () => {
  it('tells cases from models by their keys', () => {
    expect(looksLikeCase(good)).toBe(true);
    expect(looksLikeCase(model)).toBe(false);
    expect(looksLikeCase([good])).toBe(false);
  });
  it('joins paths', () => {
    expect(prefixPath('model', '')).toBe('model');
    expect(prefixPath('model', 'members[3].to')).toBe('model.members[3].to');
    expect(prefixPath('model', '[2]')).toBe('model[2]');
  });
});
