import { describe, expect, it } from 'vitest';
import { areaFactor, forceFactor, lengthFactor, modulusFactor, parseQuantity, type UnitResult } from './units';

const rel = (r: UnitResult, expected: number, tol: number) => {
  expect(r.error).toBeUndefined();
  expect(Math.abs(r.value! - expected)).toBeLessThanOrEqual(tol * Math.abs(expected));
};

describe('factors to SI', () => {
  it('lengths to metres', () => {
    rel(lengthFactor('m'), 1, 0);
    rel(lengthFactor('mm'), 1e-3, 1e-15); // SI prefix milli
    rel(lengthFactor('ft'), 0.3048, 1e-15); // exact by definition (NIST SP 811 App. B)
    rel(lengthFactor('in'), 0.0254, 1e-15); // exact by definition (NIST SP 811 App. B)
  });

  it('forces to kN', () => {
    rel(forceFactor('kN'), 1, 0);
    rel(forceFactor('N'), 1e-3, 1e-15); // SI prefix kilo
    rel(forceFactor('kip'), 4.4482216, 1e-7); // NIST SP 811 App. B: kip = 4.448 222 E+03 N
    rel(forceFactor('lbf'), 4.4482216e-3, 1e-7); // NIST SP 811 App. B: lbf = 4.448 222 E+00 N
  });

  it('areas to m²', () => {
    rel(areaFactor('m^2'), 1, 0);
    rel(areaFactor('mm^2'), 1e-6, 1e-15); // (1e-3 m)²
    rel(areaFactor('in^2'), 6.4516e-4, 1e-15); // (0.0254 m)², exact
    rel(areaFactor('m²'), 1, 0); // the superscript spelling
  });

  it('moduli to kN/m²', () => {
    rel(modulusFactor('kN/m^2'), 1, 0);
    rel(modulusFactor('kPa'), 1, 1e-15); // Pa = N/m² (SI)
    rel(modulusFactor('MPa'), 1e3, 1e-15); // 1 MPa = 1000 kN/m² (SI)
    rel(modulusFactor('N/mm^2'), 1e3, 1e-15); // 1 N/mm² = 1 MPa
    rel(modulusFactor('N/mm²'), 1e3, 1e-15);
    rel(modulusFactor('GPa'), 1e6, 1e-15);
    rel(modulusFactor('psi'), 6.894757, 1e-6); // NIST SP 811 App. B: psi = 6.894 757 E+03 Pa
    rel(modulusFactor('ksi'), 6.894757e3, 1e-6); // NIST SP 811 App. B: ksi = 6.894 757 E+06 Pa
  });
});

describe('bad units', () => {
  it('names the dimension a unit lacks', () => {
    expect(lengthFactor('kg')).toEqual({ error: "'kg' is not a length", code: 'wrong-dimension' });
    expect(forceFactor('m').error).toBe("'m' is not a force");
    expect(areaFactor('mm').error).toBe("'mm' is not an area");
    expect(modulusFactor('kN').error).toMatch(/^'kN' is not a modulus/);
  });

  it('rejects unknown, empty and numbered units', () => {
    expect(lengthFactor('xyz')).toEqual({ error: "unknown unit 'xyz'", code: 'unknown-unit' });
    expect(lengthFactor('').code).toBe('unknown-unit');
    expect(lengthFactor('KN').code).toBe('unknown-unit'); // units are case-sensitive
    expect(lengthFactor('5 m').code).toBe('unknown-unit');
  });
});

describe('parseQuantity', () => {
  it('reads a number in the default unit', () => {
    rel(parseQuantity(0.75, 'kPa', 'kN/m^2'), 0.75, 1e-15);
    rel(parseQuantity(12, 'ft', 'm'), 12 * 0.3048, 1e-15); // ft exact
    rel(parseQuantity('12', 'ft', 'm'), 12 * 0.3048, 1e-15); // a bare number as text
  });

  it('reads text with its own unit', () => {
    rel(parseQuantity('0.75 kPa', 'MPa', 'kN/m^2'), 0.75, 1e-15);
    rel(parseQuantity('250 mm', 'm', 'm'), 0.25, 1e-15);
    rel(parseQuantity('20 psf', 'kPa', 'kN/m^2'), 20 * 0.04788026, 1e-6); // NIST SP 811 App. B: lbf/ft² = 4.788 026 E+01 Pa
    rel(parseQuantity('2 klf', 'kN/m', 'kN/m'), 2 * 14.59390, 1e-6); // NIST SP 811 App. B: lbf/ft = 1.459 390 E+01 N/m, ×1000
    rel(parseQuantity(100, 'plf', 'kN/m'), 100 * 0.01459390, 1e-6); // same
  });

  it('returns an error, never throws', () => {
    expect(parseQuantity('2 kg', 'm', 'm')).toEqual({ error: "'2 kg' is not a length", code: 'wrong-dimension' });
    expect(parseQuantity(3, 'kg', 'm').code).toBe('wrong-dimension');
    expect(parseQuantity('2 kN', 'kPa', 'kN/m^2').error).toBe("'2 kN' is not a force per area");
    expect(parseQuantity('kPa', 'kPa', 'kN/m^2').code).toBe('bad-quantity');
    expect(parseQuantity('three metres', 'm', 'm').code).toBe('bad-quantity');
    expect(parseQuantity(Infinity, 'm', 'm').error).toBe('must be a finite number, not Infinity');
    expect(parseQuantity(NaN, 'm', 'm').code).toBe('out-of-range');
    expect(parseQuantity('1e999 m', 'm', 'm').code).toBe('out-of-range');
    expect(parseQuantity('1e308 km', 'm', 'm').code).toBe('out-of-range'); // 1e311 m overflows a double
    expect(parseQuantity(1, 'm', 'nope').code).toBe('unknown-unit');
  });
});
