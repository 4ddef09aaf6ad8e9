/**
 * Section catalogues: the shipped lists (nominal dimension combinations common in the trade;
 * properties are computed from the dimensions, no tabulated value is copied) and the prepared
 * form sizing works on, sorted by area (so by weight) once. Dimensions in mm, properties SI.
 */
import type { Catalogue } from '../schemas/design';
import type { Issue } from '../errors';
import { designIssue, joinPath } from './issues';
import { readSection, type SectionProps } from './sections';

// Outside diameter × wall, mm: diameters of the ISO 4200 / EN 10210-2 series with common walls
// (common practice; hot-finished circular hollow sections).
const CHS: readonly [number, number][] = [
  [42.4, 3.2], [48.3, 3.2], [48.3, 4], [60.3, 3.2], [60.3, 4], [76.1, 3.2], [76.1, 4], [88.9, 4], [88.9, 5],
  [114.3, 5], [114.3, 6], [139.7, 6.3], [139.7, 8], [168.3, 6.3], [168.3, 8], [193.7, 8], [219.1, 8], [219.1, 10],
  [244.5, 10], [273, 10], [323.9, 10], [323.9, 12.5],
];
// Side × wall, mm: square hollow sections of the EN 10210-2 range (common practice).
const SHS: readonly [number, number][] = [
  [40, 4], [50, 4], [50, 5], [60, 4], [60, 5], [70, 5], [80, 5], [80, 6.3], [90, 6.3], [100, 5], [100, 6.3], [100, 8],
  [120, 6.3], [120, 8], [140, 8], [150, 8], [150, 10], [160, 8], [180, 10], [200, 8], [200, 10],
];
// Round bar diameters, mm (common stock sizes; common practice).
const ROD: readonly number[] = [12, 16, 20, 25, 30, 36, 40];

const chs = (): Catalogue['sections'] => CHS.map(([D, t]) => ({ id: `CHS${D}x${t}`, name: `CHS ${D}×${t}`, shape: 'chs', D, t }));
const shs = (): Catalogue['sections'] => SHS.map(([B, t]) => ({ id: `SHS${B}x${t}`, name: `SHS ${B}×${B}×${t}`, shape: 'shs', B, t }));
const rod = (): Catalogue['sections'] => ROD.map((D) => ({ id: `ROD${D}`, name: `Rod ${D}`, shape: 'rod', D }));

/** Shipped catalogues: chs, shs, rod, and all (the three together). */
export const SHIPPED_CATALOGUES: readonly Catalogue[] = [
  { id: 'chs', name: 'Circular hollow sections', sections: chs() },
  { id: 'shs', name: 'Square hollow sections', sections: shs() },
  { id: 'rod', name: 'Round bars', sections: rod() },
  { id: 'all', name: 'Circular and square hollow sections and round bars', sections: [...chs(), ...shs(), ...rod()] },
];

/** Ids of the shipped catalogues, in order. */
export const CATALOGUE_IDS: readonly string[] = SHIPPED_CATALOGUES.map((c) => c.id);

/** A catalogue ready for sizing: sections sorted by area ascending, with their key numbers as typed arrays. */
export interface PreparedCatalogue {
  readonly id: string;
  readonly name: string;
  /** Sorted by weight (massArea) ascending (ties: larger least radius first, then id). */
  readonly sections: readonly SectionProps[];
  /** Per sorted section: design area m², area for weight m², second moments m⁴, radii m, thickness m, wall ratio. */
  readonly A: Float64Array;
  readonly massArea: Float64Array;
  readonly Ix: Float64Array;
  readonly Iy: Float64Array;
  readonly rx: Float64Array;
  readonly ry: Float64Array;
  readonly thickness: Float64Array;
  readonly wallRatio: Float64Array;
  /** Largest A (m²), Ix and Iy (m⁴) among sections 0..i: non-decreasing, so sizing can binary-search them. */
  readonly AMax: Float64Array;
  readonly IxMax: Float64Array;
  readonly IyMax: Float64Array;
  /** Per sorted section: 0 chs, 1 shs, 2 rhs, 3 rod, 4 given. */
  readonly shape: Uint8Array;
}

/** Shape tags in the order of `PreparedCatalogue.shape`. */
export const SHAPE_CODES = ['chs', 'shs', 'rhs', 'rod', 'given'] as const;

/**
 * Check every section of a catalogue and sort it by area.
 * @param path - the catalogue's path in its document ("catalogue")
 * @param wallFactor - design over nominal wall thickness of hollow sections (1: as given)
 * @returns the prepared catalogue, or issues with paths such as `catalogue.sections[3].t`
 */
export function prepareCatalogue(c: Catalogue, path: string, wallFactor = 1): { catalogue?: PreparedCatalogue; issues: Issue[] } {
  const issues: Issue[] = [];
  const read: SectionProps[] = [];
  const firstAt = new Map<string, string>();
  c.sections.forEach((s, i) => {
    const p = joinPath(path, 'sections', i);
    const prev = firstAt.get(s.id);
    if (prev !== undefined) issues.push(designIssue('design-duplicate-section', joinPath(p, 'id'), s.id, prev));
    else firstAt.set(s.id, p);
    const r = readSection(s, p, '', wallFactor);
    issues.push(...r.issues);
    if (r.section) read.push(r.section);
  });
  if (issues.length) return { issues };
  const least = (s: SectionProps) => Math.min(s.rx, s.ry);
  read.sort((a, b) => a.massArea - b.massArea || a.A - b.A || least(b) - least(a) || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  return { catalogue: fromSorted(c.id, c.name ?? c.id, read), issues };
}

/** A prepared catalogue from sections already sorted by area. */
export function fromSorted(id: string, name: string, sorted: readonly SectionProps[]): PreparedCatalogue {
  const pick = (f: (s: SectionProps) => number) => Float64Array.from(sorted, f);
  const runningMax = (v: Float64Array) => {
    const out = new Float64Array(v.length);
    for (let i = 0; i < v.length; i++) out[i] = i ? Math.max(out[i - 1], v[i]) : v[i];
    return out;
  };
  const A = pick((s) => s.A), Ix = pick((s) => s.Ix), Iy = pick((s) => s.Iy);
  return {
    id, name, sections: sorted,
    A, massArea: pick((s) => s.massArea), Ix, Iy, AMax: runningMax(A), IxMax: runningMax(Ix), IyMax: runningMax(Iy), rx: pick((s) => s.rx), ry: pick((s) => s.ry),
    thickness: pick((s) => s.thickness), wallRatio: pick((s) => s.wallRatio),
    shape: Uint8Array.from(sorted, (s) => SHAPE_CODES.indexOf(s.shape)),
  };
}

/** A catalogue by shipped id or given in full, prepared; an unknown id names the known ones. */
export function catalogueFrom(spec: string | Catalogue, path: string, wallFactor = 1): { catalogue?: PreparedCatalogue; issues: Issue[] } {
  if (typeof spec !== 'string') return prepareCatalogue(spec, path, wallFactor);
  const c = SHIPPED_CATALOGUES.find((x) => x.id === spec);
  if (!c) return { issues: [designIssue('design-unknown-catalogue', path, spec, CATALOGUE_IDS)] };
  return prepareCatalogue(c, path, wallFactor);
}
