/**
 * Sort the columnar points of a run into facets and traces: by status (critical forms apart),
 * by split value, and into the main area (x and y known), the strip under it (y unknown: an
 * unstable variant has no forces) or not placed at all (x unknown).
 */
import type { Points } from '@/lib/run-types';
import { isStable, kindOf, KINDS, type PointKind } from './point-kinds';

export type ColourBy = { kind: 'status' } | { kind: 'figure' } | { kind: 'split' };

export interface PointGroup {
  /** 'status:<kind>', 'figure' (stable points coloured by a figure) or 'split:<value>'. */
  key: string;
  kind?: PointKind;
  split?: string;
  x: (number | string)[];
  y: (number | string)[];
  color: (number | null)[];
  index: number[];
}

export interface Facet {
  /** The split value of a facet; '' when there is one facet. */
  value: string;
  main: PointGroup[];
  strip: PointGroup[];
}

export interface Grouped {
  facets: Facet[];
  /** Variants drawn per kind, main area and strip together. */
  drawn: Record<PointKind, number>;
  strip: number;
  /** Variants whose x is unknown, per kind: not drawn, listed in words. */
  notPlaced: Record<PointKind, number>;
  /** Split values in order (numbers ascending, then text). */
  splitValues: string[];
}

export interface GroupOptions {
  critical: ReadonlySet<number>;
  /** Split value per variant index (from a second points request), with the way it is shown. */
  split?: { values: ReadonlyMap<number, string | number | null>; as: 'facets' | 'traces' };
  colourBy: 'status' | 'figure';
}

const zero = (): Record<PointKind, number> => ({ determinate: 0, indeterminate: 0, unstable: 0, critical: 0, error: 0 });

export function splitLabel(v: string | number | null | undefined): string {
  return v === null || v === undefined ? '—' : String(v);
}

function orderValues(values: Iterable<string>): string[] {
  return [...new Set(values)].sort((a, b) => {
    const [na, nb] = [Number(a), Number(b)];
    if (Number.isFinite(na) && Number.isFinite(nb)) return na - nb;
    return a.localeCompare(b);
  });
}

function groupKey(kind: PointKind, split: string, o: GroupOptions): string {
  if (!isStable(kind)) return `status:${kind}`;
  if (o.split?.as === 'traces') return `split:${split}`;
  return o.colourBy === 'figure' ? 'figure' : `status:${kind}`;
}

/** Group the points; `points.color` holds the colour figure when colouring by a figure. */
export function groupPoints(points: Points, o: GroupOptions): Grouped {
  const splitOf = (index: number) => (o.split ? splitLabel(o.split.values.get(index)) : '');
  const splitValues = o.split ? orderValues(points.index.map(splitOf)) : [];
  const facetValues = o.split?.as === 'facets' ? splitValues : [''];
  const facets: Facet[] = facetValues.map((value) => ({ value, main: [], strip: [] }));
  const facetAt = new Map(facetValues.map((v, i) => [v, i]));
  const lookup = new Map<string, PointGroup>();
  const drawn = zero();
  const notPlaced = zero();
  let strip = 0;

  for (let i = 0; i < points.index.length; i++) {
    const kind = kindOf(points.status[i], o.critical.has(points.index[i]));
    const x = points.x[i];
    if (x === null || x === undefined) {
      notPlaced[kind]++;
      continue;
    }
    const sv = splitOf(points.index[i]);
    const f = facetAt.get(o.split?.as === 'facets' ? sv : '') ?? 0;
    const y = points.y[i];
    const onStrip = y === null || y === undefined;
    const key = onStrip ? `status:${kind}` : groupKey(kind, sv, o);
    const id = `${f}|${onStrip ? 's' : 'm'}|${key}`;
    let g = lookup.get(id);
    if (!g) {
      g = { key, kind: key.startsWith('status:') ? kind : undefined, split: key.startsWith('split:') ? sv : undefined, x: [], y: [], color: [], index: [] };
      lookup.set(id, g);
      (onStrip ? facets[f].strip : facets[f].main).push(g);
    }
    g.x.push(x);
    g.y.push(onStrip ? '' : y);
    const c = points.color?.[i];
    g.color.push(typeof c === 'number' ? c : null);
    g.index.push(points.index[i]);
    drawn[kind]++;
    if (onStrip) strip++;
  }
  const rank = (g: PointGroup) => (g.kind ? KINDS.indexOf(g.kind) + 100 : g.split !== undefined ? splitValues.indexOf(g.split) : 0);
  for (const f of facets) {
    f.main.sort((a, b) => rank(a) - rank(b));
    f.strip.sort((a, b) => rank(a) - rank(b));
  }
  return { facets, drawn, strip, notPlaced, splitValues };
}
