/**
 * Freezing and study variants: a frozen case is a valid case that its own recomputation passes;
 * a study variant found by index or id is rebuilt as a valid model whose statics match.
 */
import { describe, expect, it } from 'vitest';
import { analyze } from '../engine/analyze';
import { toStructure } from '../engine/to-structure';
import { analysisJson } from '../report/analysis-json';
import { resolveStudy } from '../sweep/resolve-study';
import { variantId } from '../sweep/variant-id';
import { allowanceFor, compareCase } from './compare';
import { DEFAULT_TOLERANCE, expectedFrom, frozenCase } from './freeze';
import { validateCase } from './validate-case';
import { findVariant, variantModel } from './variant-model';
import type { Model } from '../schemas/model';

const model: Model = {
  name: 'Two-bar frame',
  nodes: [{ id: 'A', x: 0, y: 0 }, { id: 'B', x: 4, y: 3 }, { id: 'C', x: 8, y: 0 }],
  members: [{ id: 'AB', from: 'A', to: 'B' }, { id: 'BC', from: 'B', to: 'C' }],
  supports: [{ node: 'A', type: 'pin' }, { node: 'C', type: 'pin' }],
  loads: [{ case: 'G', node: 'B', fy: -60 }, { case: 'H', node: 'B', fx: 20 }],
};

function recompute(data: unknown) {
  const c = toStructure(data);
  if (!c.structure) throw new Error(c.issues.map((i) => `${i.path}: ${i.message}`).join('\n'));
  return { doc: analysisJson(c.structure, analyze(c.structure), c.units), units: c.units };
}

describe('frozenCase', () => {
  it('keeps the classification and every figure of the chosen loadings, and passes its own check', () => {
    const { doc, units } = recompute(model);
    const c = frozenCase({ name: 'frozen', source: { kind: 'demo', citation: 'test' }, model, doc, loadings: ['G'] });
    expect(Object.keys(c.expected.results!)).toEqual(['G']);
    // method of joints at the apex: N = −P/(2 sin θ) = −60/1.2 = −50 kN
    expect(c.expected.results!.G.memberForces!.AB).toBeCloseTo(-50, 9);
    expect(c.expected.classification).toEqual({ status: 'determinate', joints: 3, members: 2, reactions: 4, mechanisms: 0, selfStress: 0, critical: false });
    expect(c.tolerance).toEqual(DEFAULT_TOLERANCE);
    const checked = validateCase(JSON.parse(JSON.stringify(c)));
    expect(checked.issues).toEqual([]);
    expect(compareCase(checked.case!.expected, doc, allowanceFor(c.tolerance, units)).ok).toBe(true);
  });

  it('freezes an unstable frame as its classification only', () => {
    const { doc } = recompute({ ...model, supports: [{ node: 'A', type: 'pin' }, { node: 'C', type: 'roller', angle: 90 }] });
    expect(expectedFrom(doc)).toEqual({ classification: expect.objectContaining({ status: 'unstable', mechanisms: 1 }) });
  });

  it('refuses a loading the recomputation does not have', () => {
    expect(() => expectedFrom(recompute(model).doc, ['W'])).toThrow(RangeError);
  });
});

const study = {
  name: 'small Pratt study',
  family: 'pratt',
  fixed: { span: 12 },
  vary: { panels: [4, 6], depth: [1.5, 3] },
  where: ['depth < 3 or panels == 4'],
  loads: [{ case: 'S', kind: 'area', value: 1, spacing: 6, chord: 'top' }],
};

describe('findVariant and variantModel', () => {
  const r = resolveStudy(study);
  it('resolves the test study', () => expect(r.issues).toEqual([]));
  const setup = r.setup!;

  it('finds a variant by index and by id, and refuses one the where filters drop', () => {
    const v = findVariant(setup, 2);
    if ('error' in v) throw new Error(v.error);
    expect(v.params).toMatchObject({ panels: 6, depth: 1.5, span: 12 });
    expect(v.id).toBe(variantId('pratt', v.params, setup.plan.paramNames));
    const byId = findVariant(setup, v.id);
    expect('error' in byId ? byId.error : byId.index).toBe(2);
    expect(findVariant(setup, 3)).toEqual({ error: "variant 3 is dropped by the study's where filters" });
    expect(findVariant(setup, 4)).toEqual({ error: "variant 4 is outside the study's space (0..3)" });
    expect(findVariant(setup, '0123456789abcdef')).toEqual({ error: 'no variant of the study has id 0123456789abcdef' });
  });

  it('rebuilds a valid model of the variant whose reactions balance the loads (statics)', () => {
    const v = findVariant(setup, 0);
    if ('error' in v) throw new Error(v.error);
    const m = variantModel(setup, r.combinations, v.params, 'variant 0');
    expect(m.name).toBe('variant 0');
    const { doc } = recompute(m);
    const total = (m.loads ?? []).reduce((s, l) => s + (l.fy ?? 0), 0);
    const res = Object.values(doc.results)[0] as { reactions: Record<string, { ry: number }> };
    const ry = Object.values(res.reactions).reduce((s, q) => s + q.ry, 0);
    expect(total).toBeLessThan(0);
    expect(ry).toBeCloseTo(-total, 9);
  });
});
