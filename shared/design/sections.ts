/**
 * Section properties from dimensions (area m², second moments m⁴, radii of gyration m) and the
 * validation of section input. Hollow rectangles are outer minus inner rectangle: corner radii are
 * ignored, which overstates A and I slightly against a rolled tube.
 */
import type { CatalogueSection, SectionShape } from '../schemas/design';
import type { Issue } from '../errors';
import { parseQuantity } from '../units';
import { designIssue, fmt, joinPath } from './issues';
import { G_STANDARD } from './materials';

/** Section shape tags. */
export type ShapeKind = SectionShape['shape'];

/** Dimensions in metres (area A in m²) of one shape. */
export type ShapeDims =
  | { shape: 'chs'; D: number; t: number }
  | { shape: 'shs'; B: number; t: number }
  | { shape: 'rhs'; H: number; B: number; t: number }
  | { shape: 'rod'; D: number }
  | { shape: 'given'; A: number; rx: number; ry: number };

/** Properties of one section. x: buckling in the truss plane; y: buckling out of it. */
export interface SectionProps {
  readonly id: string;
  readonly name: string;
  readonly shape: ShapeKind;
  /** Area for strength and stiffness, m² (from the design wall thickness). */
  readonly A: number;
  /** Area for weight, m² (from the dimensions as given: nominal wall thickness). */
  readonly massArea: number;
  /** Second moment for buckling in the truss plane (axis normal to the plane), m⁴. */
  readonly Ix: number;
  /** Second moment for buckling out of the truss plane, m⁴. */
  readonly Iy: number;
  /** Radii of gyration √(I/A), m. */
  readonly rx: number;
  readonly ry: number;
  /** Thickness that sets the grade's strength, m: the nominal wall t, a rod's D; 0 when unknown (given). */
  readonly thickness: number;
  /** Wall slenderness for local buckling: chs D/t; shs/rhs (largest side − 3t)/t; 0 for rod and given. */
  readonly wallRatio: number;
}

/**
 * Properties from dimensions in metres.
 * chs: A = π(D² − d²)/4, I = π(D⁴ − d⁴)/64 with d = D − 2t; rod: d = 0;
 * shs/rhs: A = BH − bh, Ix = (BH³ − bh³)/12, Iy = (HB³ − hb³)/12 with b = B − 2t, h = H − 2t.
 * Rectangular walls use b = side − 3t for the wall ratio (AISC 360-16 §B4.1b(d) when the corner
 * radius is unknown; from memory).
 */
export function sectionProperties(id: string, name: string, d: ShapeDims): SectionProps {
  let A: number, Ix: number, Iy: number, thickness: number, wallRatio: number;
  switch (d.shape) {
    case 'chs': case 'rod': {
      const D = d.D;
      const t = d.shape === 'chs' ? d.t : D / 2;
      const di = D - 2 * t;
      A = (Math.PI * (D * D - di * di)) / 4;
      Ix = Iy = (Math.PI * (D ** 4 - di ** 4)) / 64;
      thickness = d.shape === 'chs' ? t : D;
      wallRatio = d.shape === 'chs' ? D / t : 0;
      break;
    }
    case 'shs': case 'rhs': {
      const B = d.B;
      const H = d.shape === 'rhs' ? d.H : d.B;
      const b = B - 2 * d.t, h = H - 2 * d.t;
      A = B * H - b * h;
      Ix = (B * H ** 3 - b * h ** 3) / 12;
      Iy = (H * B ** 3 - h * b ** 3) / 12;
      thickness = d.t;
      wallRatio = (Math.max(B, H) - 3 * d.t) / d.t;
      break;
    }
    case 'given':
      A = d.A;
      Ix = d.A * d.rx * d.rx;
      Iy = d.A * d.ry * d.ry;
      thickness = 0;
      wallRatio = 0;
      break;
  }
  return { id, name, shape: d.shape, A, massArea: A, Ix, Iy, rx: Math.sqrt(Ix / A), ry: Math.sqrt(Iy / A), thickness, wallRatio };
}

/**
 * Properties with a design wall thickness of `wallFactor` × t (hollow shapes only): strength and
 * stiffness from the design thickness, weight (`massArea`) and the grade's thickness range from t.
 */
export function designProperties(id: string, name: string, d: ShapeDims, wallFactor: number): SectionProps {
  const nominal = sectionProperties(id, name, d);
  if (wallFactor === 1 || !('t' in d)) return nominal;
  const design = sectionProperties(id, name, { ...d, t: d.t * wallFactor });
  return { ...design, massArea: nominal.A, thickness: nominal.thickness };
}

/** Mass per length, kg/m, of area A (m²) at unit weight γ (kN/m³): A·γ·1000/g. */
export function massPerLength(A: number, unitWeight: number): number {
  return (A * unitWeight * 1000) / G_STANDARD;
}

/** Weight per length, kN/m, of area A (m²) at unit weight γ (kN/m³). */
export function weightPerLength(A: number, unitWeight: number): number {
  return A * unitWeight;
}

/** A dimension in m (bare numbers mm) or NaN with an issue. */
function dim(v: number | string, path: string, name: string, issues: Issue[], area = false): number {
  const r = area ? parseQuantity(v, 'mm^2', 'm^2') : parseQuantity(v, 'mm', 'm');
  if (r.error !== undefined) {
    issues.push(r.code === 'out-of-range' && typeof v === 'number' ? designIssue('design-not-finite', path, name) : designIssue('design-quantity', path, r.error));
    return NaN;
  }
  if (!(r.value > 0)) {
    issues.push(designIssue('design-not-positive', path, name, typeof v === 'number' ? (area ? `${v} mm²` : `${v} mm`) : v));
    return NaN;
  }
  return r.value;
}

const NAMES: Record<ShapeKind, (d: Record<string, number>) => string> = {
  chs: (d) => `CHS ${fmt(d.D * 1000)}×${fmt(d.t * 1000)}`,
  shs: (d) => `SHS ${fmt(d.B * 1000)}×${fmt(d.B * 1000)}×${fmt(d.t * 1000)}`,
  rhs: (d) => `RHS ${fmt(d.H * 1000)}×${fmt(d.B * 1000)}×${fmt(d.t * 1000)}`,
  rod: (d) => `Rod ${fmt(d.D * 1000)}`,
  given: () => 'given section',
};

/**
 * Read and check one section (dimensions mm unless a unit is given).
 * @param path - the section's path in its document, e.g. "catalogue.sections[3]"
 * @param wallFactor - design over nominal wall thickness (hollow shapes; see `designProperties`)
 * @returns its properties, or issues with paths: non-positive or non-finite dimensions, t ≥ D/2
 *   (chs), t ≥ B/2 (shs), t ≥ min(B, H)/2 (rhs)
 */
export function readSection(
  s: SectionShape | CatalogueSection, path: string, fallbackId = '', wallFactor = 1,
): { section?: SectionProps; issues: Issue[] } {
  const issues: Issue[] = [];
  const at = (k: string) => joinPath(path, k);
  const src = s as unknown as Record<string, number | string | undefined>;
  const d: Record<string, number> = {};
  const keys = { chs: ['D', 't'], shs: ['B', 't'], rhs: ['H', 'B', 't'], rod: ['D'], given: ['A', 'rx', 'ry'] }[s.shape];
  if (!keys) return { issues: [designIssue('design-quantity', at('shape'), `unknown shape ${JSON.stringify(s.shape)}`)] };
  for (const k of keys) {
    const v = src[k];
    if (v === undefined && k === 'ry') continue;
    if (v === undefined) {
      issues.push({ path, code: 'schema-missing-key', message: `missing key "${k}"` });
      continue;
    }
    d[k] = dim(v, at(k), k, issues, k === 'A');
  }
  if (s.shape === 'given' && d.ry === undefined) d.ry = d.rx;
  if ('t' in d && Number.isFinite(d.t)) {
    const sides: [string, number][] = s.shape === 'chs' ? [['D/2', d.D / 2]] : s.shape === 'shs' ? [['B/2', d.B / 2]] : [['H/2', d.H / 2], ['B/2', d.B / 2]];
    const [name, half] = sides.filter(([, h]) => Number.isFinite(h)).sort((a, b) => a[1] - b[1])[0] ?? ['', Infinity];
    if (d.t >= half) issues.push(designIssue('design-wall-too-thick', at('t'), d.t * 1000, name, half * 1000));
  }
  if (issues.length) return { issues };
  const c = s as Partial<CatalogueSection>;
  const id = typeof c.id === 'string' ? c.id : fallbackId;
  const name = typeof c.name === 'string' ? c.name : s.shape === 'given' ? id || NAMES.given(d) : NAMES[s.shape](d);
  return { section: designProperties(id, name, { shape: s.shape, ...d } as ShapeDims, wallFactor), issues };
}
