/**
 * Per-case results beside combinations: a linear elastic frame obeys superposition, so every
 * combination equals the factored sum of its cases (common practice: linear analysis).
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { toStructure } from '../../shared/engine/to-structure';
import { analyze } from '../../shared/engine/analyze';

describe('load cases and combinations', () => {
  const model = JSON.parse(readFileSync(new URL('../../examples/models/depot-roof-r3.json', import.meta.url), 'utf8'));
  const st = toStructure(model).structure!;
  const an = analyze(st);

  it('solves each case alone as well as each combination', () => {
    expect(an.results.map((r) => r.id)).toEqual(['ULS-1', 'ULS-3', 'ULS-6']);
    expect(an.caseResults.map((r) => r.id)).toEqual(['D', 'S', 'W']);
    expect(an.caseResults.every((r) => r.kind === 'case')).toBe(true);
  });

  it('every combination is the factored sum of its cases (forces, displacements, reactions)', () => {
    for (const combo of model.combinations as { id: string; factors: Record<string, number> }[]) {
      const r = an.results.find((x) => x.id === combo.id)!;
      for (const key of ['forces', 'disp', 'react'] as const) {
        const sum = new Float64Array(r[key].length);
        for (const [c, f] of Object.entries(combo.factors)) {
          const cr = an.caseResults.find((x) => x.id === c)!;
          cr[key].forEach((v, i) => (sum[i] += f * v));
        }
        sum.forEach((v, i) => expect(r[key][i]).toBeCloseTo(v, 9));
      }
    }
  });
});
