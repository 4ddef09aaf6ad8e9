/**
 * Section properties against closed-form geometry, the shipped catalogues, and the validation of
 * section input (paths and messages).
 */
import { describe, expect, it } from 'vitest';
import { massPerLength, readSection, sectionProperties } from './sections';
import { CATALOGUE_IDS, SHIPPED_CATALOGUES, catalogueFrom, prepareCatalogue } from './catalogues';
import { G_STANDARD } from './materials';
import { Catalogue } from '../schemas/design';
import { compileSchema } from '../schemas/validate';

const rel = (got: number, want: number, tol = 1e-12) => expect(Math.abs(got / want - 1)).toBeLessThan(tol);

describe('properties from dimensions (closed-form geometry)', () => {
  it('CHS: A = π(D² − d²)/4, I = π(D⁴ − d⁴)/64, r = √(I/A)', () => {
    const s = readSection({ shape: 'chs', D: 114.3, t: 6 }, 'x').section!;
    const D = 0.1143, d = 0.1023;
    rel(s.A, (Math.PI * (D * D - d * d)) / 4);
    rel(s.Ix, (Math.PI * (D ** 4 - d ** 4)) / 64);
    expect(s.Iy).toBe(s.Ix);
    // Independently, by hand: r = √(D² + d²)/4 = √(13064.49 + 10465.29)/4 = √23529.78/4 = 153.394/4 = 38.3485 mm
    rel(s.rx, 0.0383485, 2e-6);
    // and A = π × 2599.20/4 = 2041.41 mm²
    rel(s.A, 2041.41e-6, 2e-6);
    expect(s.name).toBe('CHS 114.3×6');
  });

  it('SHS 100×5: outer minus inner squares, corners square (A = 100² − 90² = 1900 mm², I = (100⁴ − 90⁴)/12)', () => {
    const s = readSection({ shape: 'shs', B: 100, t: 5 }, 'x').section!;
    rel(s.A, 1900e-6);
    rel(s.Ix, (1e8 - 6.561e7) / 12 * 1e-12);
    rel(s.rx, Math.sqrt(s.Ix / s.A));
    expect(s.Iy).toBeCloseTo(s.Ix, 20);
    expect(s.wallRatio).toBeCloseTo((100 - 15) / 5, 12);
  });

  it('rod: A = πD²/4, I = πD⁴/64, r = D/4', () => {
    const s = readSection({ shape: 'rod', D: 20 }, 'x').section!;
    rel(s.A, (Math.PI * 0.02 ** 2) / 4);
    rel(s.rx, 0.02 / 4);
    expect(s.thickness).toBe(0.02);
  });

  it('given: A and radii in mm (or with units); ry defaults to rx', () => {
    const s = readSection({ shape: 'given', A: '12.5 cm^2', rx: 30 }, 'x', 'G1').section!;
    rel(s.A, 12.5e-4);
    rel(s.ry, 0.03);
    rel(s.Ix, 12.5e-4 * 0.03 ** 2);
    expect(s.name).toBe('G1');
  });

  it('units: "4.5 in" is 114.3 mm', () => {
    const a = readSection({ shape: 'chs', D: '4.5 in', t: '6 mm' }, 'x').section!;
    const b = readSection({ shape: 'chs', D: 114.3, t: 6 }, 'x').section!;
    rel(a.A, b.A, 1e-12);
  });

  it('mass per length = A × ρ: CHS 114.3×6 at 7850 kg/m³ is 2041.41e-6 × 7850 = 16.025 kg/m', () => {
    const s = sectionProperties('c', 'c', { shape: 'chs', D: 0.1143, t: 0.006 });
    rel(massPerLength(s.A, (7850 * G_STANDARD) / 1000), 16.025, 2e-5);
  });
});

describe('validation with paths', () => {
  it('a non-positive dimension', () => {
    const r = readSection({ shape: 'chs', D: -114.3, t: 6 }, 'catalogue.sections[2]');
    expect(r.section).toBeUndefined();
    expect(r.issues).toEqual([expect.objectContaining({ path: 'catalogue.sections[2].D', message: 'D must be greater than 0 (got -114.3 mm)' })]);
    expect(readSection({ shape: 'rod', D: 0 }, 's').issues[0].path).toBe('s.D');
  });

  it('t ≥ D/2, B/2 and the smaller half of an RHS', () => {
    expect(readSection({ shape: 'chs', D: 20, t: 10 }, 's').issues).toEqual([
      expect.objectContaining({ path: 's.t', message: 'wall thickness t = 10 mm must be less than D/2 = 10 mm' }),
    ]);
    expect(readSection({ shape: 'shs', B: 50, t: 30 }, 's').issues[0].message).toContain('B/2 = 25 mm');
    expect(readSection({ shape: 'rhs', H: 200, B: 40, t: 20 }, 's').issues[0].message).toContain('B/2 = 20 mm');
  });

  it('NaN, a bad unit and a quantity of the wrong kind', () => {
    expect(readSection({ shape: 'rod', D: NaN }, 's').issues[0]).toMatchObject({ path: 's.D', message: 'D must be a finite number' });
    expect(readSection({ shape: 'rod', D: '20 parsecs' }, 's').issues[0].path).toBe('s.D');
    expect(readSection({ shape: 'rod', D: '20 kN' }, 's').issues[0].message).toContain('is not a length');
  });
});

describe('catalogues', () => {
  it('every shipped catalogue conforms to the Catalogue schema, is valid and sorted by weight', () => {
    expect(CATALOGUE_IDS).toEqual(['chs', 'shs', 'rod', 'all']);
    const validate = compileSchema(Catalogue);
    for (const c of SHIPPED_CATALOGUES) {
      expect(validate(c)).toEqual([]);
      const p = catalogueFrom(c.id, 'catalogue');
      expect(p.issues).toEqual([]);
      const A = p.catalogue!.massArea;
      for (let i = 1; i < A.length; i++) expect(A[i]).toBeGreaterThanOrEqual(A[i - 1]);
      expect(A.length).toBe(c.sections.length);
    }
  });

  it('an unknown catalogue id names the known ones; a duplicate section id points at the second', () => {
    expect(catalogueFrom('ipe', 'catalogue').issues[0]).toMatchObject({ path: 'catalogue', message: expect.stringContaining('"chs", "shs", "rod", "all"') });
    const r = prepareCatalogue({ id: 'c', sections: [{ id: 'a', shape: 'rod', D: 10 }, { id: 'a', shape: 'rod', D: 12 }, { id: 'b', shape: 'chs', D: 10, t: 6 }] }, 'catalogue');
    expect(r.issues.map((i) => i.path)).toEqual(['catalogue.sections[1].id', 'catalogue.sections[2].t']);
    expect(r.issues[0].message).toBe('duplicate section id "a" (first at catalogue.sections[0])');
  });
});
