/**
 * Shipped steel grades and the reading of a material into SI numbers: strengths and modulus in
 * kN/m² (1 MPa = 1000 kN/m²), unit weight in kN/m³.
 */
import type { Material } from '../schemas/design';
import type { Issue } from '../errors';
import { parseQuantity } from '../units';
import { designIssue, joinPath } from './issues';

/** Standard gravity, m/s² (the conventional value; turns a mass density into a unit weight). */
export const G_STANDARD = 9.80665;

/** A material in SI: Fy, Fu, E in kN/m²; unitWeight in kN/m³; maxThickness in m (Infinity: no limit). */
export interface ResolvedMaterial {
  readonly id: string;
  readonly name: string;
  readonly standard: string;
  readonly Fy: number;
  readonly Fu: number;
  readonly E: number;
  readonly unitWeight: number;
  /** Largest element thickness the strengths hold for, m (solid bars: the diameter). */
  readonly maxThickness: number;
}

/** A shipped grade: the material as a user would write it, plus the thickness range of its values. */
export interface ShippedGrade {
  readonly material: Material;
  /** Largest thickness the stated strengths hold for, mm; absent when the standard gives one value. */
  readonly maxThicknessMm?: number;
}

// ASTM grades take E = 29,000 ksi, the modulus AISC 360-16 uses throughout (from memory). EN grades take E = 210,000 N/mm² (EN 1993-1-1 §3.2.6(1)). Every grade takes a
// mass density of 7850 kg/m³ (common practice), i.e. 7850 × 9.80665 = 76.98 ≈ 77.0 kN/m³.
const ASTM_E = '29000 ksi';
const EN_E = '210 GPa';
const RHO = '7850 kg/m^3';

/** Shipped grades. Strengths are minimum specified values, all from memory: check before relying on them. */
export const SHIPPED_GRADES: readonly ShippedGrade[] = [
  // ASTM A500/A500M Gr. C (cold-formed HSS), round: Fy 46 ksi, Fu 62 ksi (from memory).
  { material: { id: 'a500-c-round', name: 'A500 Gr. C (round HSS)', standard: 'ASTM A500 Gr. C, round', Fy: '46 ksi', Fu: '62 ksi', E: ASTM_E, density: RHO } },
  // ASTM A500 Gr. C, square and rectangular ("shaped") HSS: Fy 50 ksi, Fu 62 ksi (from memory).
  { material: { id: 'a500-c-shaped', name: 'A500 Gr. C (square/rectangular HSS)', standard: 'ASTM A500 Gr. C, shaped', Fy: '50 ksi', Fu: '62 ksi', E: ASTM_E, density: RHO } },
  // ASTM A992 (wide-flange shapes): Fy 50 ksi, Fu 65 ksi (from memory).
  { material: { id: 'a992', name: 'A992', standard: 'ASTM A992', Fy: '50 ksi', Fu: '65 ksi', E: ASTM_E, density: RHO } },
  // ASTM A53 Gr. B (pipe): Fy 35 ksi, Fu 60 ksi (from memory).
  { material: { id: 'a53-b', name: 'A53 Gr. B (pipe)', standard: 'ASTM A53 Gr. B', Fy: '35 ksi', Fu: '60 ksi', E: ASTM_E, density: RHO } },
  // EN 10025-2 S275, nominal t ≤ 40 mm: fy 275, fu 430 N/mm² (EN 1993-1-1 Table 3.1; from memory).
  // For 40 < t ≤ 80 mm the table gives 255/410 (from memory): not shipped.
  { material: { id: 's275', name: 'S275', standard: 'EN 10025-2 S275, t ≤ 40 mm (EN 1993-1-1 Table 3.1)', Fy: '275 MPa', Fu: '430 MPa', E: EN_E, density: RHO }, maxThicknessMm: 40 },
  // EN 10025-2 S355, nominal t ≤ 40 mm: fy 355, fu 490 N/mm² (EN 1993-1-1 Table 3.1; from memory).
  // For 40 < t ≤ 80 mm the table gives 335/470 (from memory): not shipped.
  { material: { id: 's355', name: 'S355', standard: 'EN 10025-2 S355, t ≤ 40 mm (EN 1993-1-1 Table 3.1)', Fy: '355 MPa', Fu: '490 MPa', E: EN_E, density: RHO }, maxThicknessMm: 40 },
  // EN 10210-1 S355J2H, hot-finished hollow sections, t ≤ 40 mm: fy 355, fu 490 N/mm²
  // (EN 1993-1-1 Table 3.1, hollow sections; from memory). The product standard itself grades fy
  // down with thickness above 16 mm and states fu 470–630 N/mm² for 3 ≤ t ≤ 100 mm (from memory).
  { material: { id: 's355j2h', name: 'S355J2H', standard: 'EN 10210-1 S355J2H, t ≤ 40 mm (EN 1993-1-1 Table 3.1)', Fy: '355 MPa', Fu: '490 MPa', E: EN_E, density: RHO }, maxThicknessMm: 40 },
];

/** Ids of the shipped grades, in order. */
export const GRADE_IDS: readonly string[] = SHIPPED_GRADES.map((g) => g.material.id);

/** The shipped grade with this id, or undefined. */
export function shippedGrade(id: string): ShippedGrade | undefined {
  return SHIPPED_GRADES.find((g) => g.material.id === id);
}

/** A stress or modulus in kN/m² (bare numbers are kN/m²). */
function stress(v: number | string, path: string, issues: Issue[]): number {
  const r = parseQuantity(v, 'kN/m^2', 'kN/m^2');
  if (r.error !== undefined) {
    issues.push(designIssue('design-quantity', path, r.error));
    return NaN;
  }
  if (!(r.value > 0)) issues.push(designIssue('design-not-positive', path, path.split('.').pop() ?? path, String(v)));
  return r.value;
}

/** A unit weight in kN/m³ from a weight per volume, or from a mass density times g. */
function unitWeight(v: number | string, path: string, issues: Issue[]): number {
  let r = parseQuantity(v, 'kN/m^3', 'kN/m^3');
  if (r.code === 'wrong-dimension') {
    const mass = parseQuantity(v, 'kg/m^3', 'kg/m^3');
    if (mass.error === undefined) r = { value: (mass.value * G_STANDARD) / 1000 };
    else r = { error: `${r.error} nor a mass per volume`, code: 'wrong-dimension' };
  }
  if (r.error !== undefined) {
    issues.push(designIssue('design-quantity', path, r.error));
    return NaN;
  }
  if (!(r.value > 0)) issues.push(designIssue('design-not-positive', path, 'density', String(v)));
  return r.value;
}

/**
 * Read a material into SI numbers.
 * @param path - where the material sits in its document, for issue paths ("material")
 * @param maxThicknessMm - thickness range of the strengths, mm (shipped grades)
 * @returns the material (NaN where a quantity failed) and its issues (empty when valid)
 */
export function resolveMaterial(m: Material, path: string, maxThicknessMm?: number): { material: ResolvedMaterial; issues: Issue[] } {
  const issues: Issue[] = [];
  const at = (k: string) => joinPath(path, k);
  const Fy = stress(m.Fy, at('Fy'), issues);
  const Fu = stress(m.Fu, at('Fu'), issues);
  const E = stress(m.E, at('E'), issues);
  const gamma = unitWeight(m.density, at('density'), issues);
  if (Fu < Fy) issues.push(designIssue('design-fu-below-fy', at('Fu'), Fu, Fy));
  const material: ResolvedMaterial = {
    id: m.id, name: m.name ?? m.id, standard: m.standard ?? '', Fy, Fu, E, unitWeight: gamma,
    maxThickness: maxThicknessMm === undefined ? Infinity : maxThicknessMm / 1000,
  };
  return { material, issues };
}

/**
 * A material by shipped id or given in full, in SI.
 * @returns the material, or issues (an unknown id names the known grades)
 */
export function materialFrom(spec: string | Material, path: string): { material?: ResolvedMaterial; issues: Issue[] } {
  if (typeof spec !== 'string') return resolveMaterial(spec, path);
  const g = shippedGrade(spec);
  if (!g) return { issues: [designIssue('design-unknown-material', path, spec, GRADE_IDS)] };
  return resolveMaterial(g.material, path, g.maxThicknessMm);
}
