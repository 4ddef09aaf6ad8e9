/**
 * Member design inside a sweep: every stable variant is sized, its weight is Σ length × area × unit
 * weight of the sections it reports, weight ranks only variants that pass, and a catalogue too light
 * for the loads leaves variants recorded as unsizable (not dropped).
 */
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { resolveStudy } from '../../shared/sweep/resolve-study';
import { VariantEvaluator } from '../../shared/sweep/evaluate';
import { buildModel } from '../../shared/families/to-model';
import { SHIPPED_CATALOGUES } from '../../shared/design/catalogues';
import { runCli } from './run-cli';

const sized = JSON.parse(readFileSync(new URL('../../examples/studies/depot-roof-sized.json', import.meta.url), 'utf8'));
const small = { ...sized, vary: { panels: [6, 8], depth: [1.8, 2.4, 3.0], supports: ['pin-roller', 'pin-pin'] } };

describe('a sized sweep', () => {
  const r = resolveStudy(small);
  const ev = new VariantEvaluator(r.setup!);

  it('sizes every stable variant, and its weight is Σ L·A·γ of the sections it reports', () => {
    const chs = SHIPPED_CATALOGUES.find((c) => c.id === 'chs')!.sections;
    // ASTM A500 Gr. C unit weight: 7850 kg/m³ × 9.80665 m/s² = 76.98 kN/m³ (density from memory; g standard).
    const gamma = (7850 * 9.80665) / 1000;
    for (let i = 0; i < r.setup!.plan.size; i++) {
      const rec = ev.evaluate(i)!;
      expect(['determinate', 'indeterminate']).toContain(rec.status);
      expect(rec.design.status).toBe('sized');
      expect(rec.design.maxUtilisation).toBeLessThanOrEqual(1);
      const bySection = Object.fromEntries(rec.design.sections.split('; ').map((kv) => kv.split('=')));
      const model = buildModel(r.setup!.family, rec.params, { loads: [] });
      const at = Object.fromEntries(model.nodes.map((n) => [n.id, n]));
      let w = 0;
      for (const m of model.members) {
        const name = bySection[m.group!];
        const s = chs.find((c) => c.name === name)! as { D: number; t: number };
        // Round hollow section, nominal wall (weight): A = π(D² − (D − 2t)²)/4, D and t in mm → m².
        const D = s.D / 1000, t = s.t / 1000;
        const A = (Math.PI * (D * D - (D - 2 * t) ** 2)) / 4;
        w += Math.hypot(at[m.to].x - at[m.from].x, at[m.to].y - at[m.from].y) * A * gamma;
      }
      expect(rec.design.weight).toBeCloseTo(w, 6);
    }
  });

  it('ranks by weight only variants whose members and deflection pass', async () => {
    const { code, out } = await runCli('sweep', 'examples/studies/depot-roof-sized.json', '--out', `/tmp/pp-sized-${process.pid}`, '--workers', '1', '-q', '--json');
    expect(code).toBe(0);
    const summary = JSON.parse(out);
    expect(summary.design.sized + summary.design.unsizable + summary.design.notSettled).toBe(summary.byStatus.determinate + summary.byStatus.indeterminate);
    const weights = summary.best.map((b: { weight: number }) => b.weight);
    expect(weights).toEqual([...weights].sort((a, b) => a - b));
    for (const b of summary.best) expect(b.spanOverDeflection).toBeGreaterThanOrEqual(240);
  });

  it('records variants that no catalogue section can carry as unsizable, with the group and member', () => {
    const light = { ...small, design: { ...small.design, catalogue: { id: 'tiny', sections: [{ id: 'c1', name: 'CHS 48.3×3.2', shape: 'chs', D: 48.3, t: 3.2 }] } } };
    const rr = resolveStudy(light);
    expect(rr.issues).toEqual([]);
    const e2 = new VariantEvaluator(rr.setup!);
    const rec = e2.evaluate(0)!;
    expect(rec.status).toBe('determinate');
    expect(rec.design.status).toBe('unsizable');
    expect(rec.design.reason).toMatch(/top|bottom|diagonal|vertical/);
  });

  it('refuses a bad design spec before any work, naming the path', () => {
    const bad = resolveStudy({ ...small, design: { ...small.design, material: 'unobtanium' } });
    expect(bad.setup).toBeUndefined();
    expect(bad.issues.map((i) => i.path)).toContain('design.material');
    const noDesign = resolveStudy({ ...small, design: undefined, objective: { minimize: 'weight' } });
    expect(noDesign.issues.map((i) => i.path)).toContain('objective');
  });
});
