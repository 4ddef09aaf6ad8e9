/**
 * Shipped grades and material input, against unit definitions: 1 ksi = 1000 lbf/in² with
 * 1 lbf = 4.4482216152605 N and 1 in = 25.4 mm (exact), so 1 ksi = 6.894757 MPa; g = 9.80665 m/s².
 */
import { describe, expect, it } from 'vitest';
import { GRADE_IDS, SHIPPED_GRADES, materialFrom, resolveMaterial } from './materials';
import { Material } from '../schemas/design';
import { compileSchema } from '../schemas/validate';

const KSI = (4.4482216152605 * 1000) / 25.4 ** 2; // MPa per ksi
const rel = (got: number, want: number, tol = 1e-9) => expect(Math.abs(got / want - 1)).toBeLessThan(tol);

describe('shipped grades', () => {
  it('ASTM grades in ksi with E = 29,000 ksi (≈ 199.95 GPa); EN grades in MPa with E = 210 GPa (EN 1993-1-1 §3.2.6)', () => {
    const want: Record<string, [number, number, number]> = {
      'a500-c-round': [46 * KSI, 62 * KSI, 29000 * KSI],
      'a500-c-shaped': [50 * KSI, 62 * KSI, 29000 * KSI],
      a992: [50 * KSI, 65 * KSI, 29000 * KSI],
      'a53-b': [35 * KSI, 60 * KSI, 29000 * KSI],
      s275: [275, 430, 210000],
      s355: [355, 490, 210000],
      s355j2h: [355, 490, 210000],
    };
    expect([...GRADE_IDS].sort()).toEqual(Object.keys(want).sort());
    const validate = compileSchema(Material);
    for (const g of SHIPPED_GRADES) expect(validate(g.material)).toEqual([]);
    for (const [id, [fy, fu, E]] of Object.entries(want)) {
      const m = materialFrom(id, 'material').material!;
      rel(m.Fy, fy * 1000);
      rel(m.Fu, fu * 1000);
      rel(m.E, E * 1000);
      // 7850 kg/m³ × 9.80665 m/s² = 76.982 kN/m³ (≈ 77.0)
      rel(m.unitWeight, 76.9822025);
      expect(m.standard).not.toBe('');
    }
    expect(materialFrom('s355', 'material').material!.maxThickness).toBe(0.04);
  });

  it('an unknown grade names the known ones, at the given path', () => {
    const r = materialFrom('S420', 'material');
    expect(r.material).toBeUndefined();
    expect(r.issues).toEqual([expect.objectContaining({ path: 'material', code: 'design-unknown-material' })]);
    expect(r.issues[0].message).toContain('no material grade "S420"; known grades: "a500-c-round"');
  });
});

describe('material input', () => {
  it('numbers are SI (kN/m², kN/m³); a unit weight may be given directly', () => {
    const m = resolveMaterial({ id: 'm', Fy: 300000, Fu: '450 N/mm^2', E: '2.05e5 MPa', density: '77 kN/m^3' }, 'material').material;
    expect(m.Fy).toBe(300000);
    rel(m.Fu, 450000);
    rel(m.E, 2.05e8);
    rel(m.unitWeight, 77);
  });

  it('bad units, a non-positive strength, Fu below Fy', () => {
    const r = resolveMaterial({ id: 'm', Fy: '50 ksi', Fu: '40 ksi', E: '29000 kip', density: '7850 m' }, 'material');
    expect(r.issues.map((i) => i.path)).toEqual(['material.E', 'material.density', 'material.Fu']);
    expect(r.issues[0].message).toContain('is not a force per area');
    expect(r.issues[1].message).toContain('nor a mass per volume');
    expect(r.issues[2].message).toBe('Fu = 275.8 MPa is below Fy = 344.7 MPa');
    expect(resolveMaterial({ id: 'm', Fy: -1, Fu: 1, E: 1, density: 1 }, 'material').issues[0]).toMatchObject({ path: 'material.Fy' });
  });
});
