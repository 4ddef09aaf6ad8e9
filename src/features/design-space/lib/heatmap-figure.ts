/**
 * Heatmaps from GET …/aggregate: the count of variants per bin (too many to draw one by one), or
 * the mean of a figure per bin (a figure over two parameters), with count, min and max on hover.
 * When each occupied column (row) of bins holds one parameter value only, known from an aggregate
 * of that parameter itself (min = max per bin), the empty columns are dropped and the cells sit
 * at the exact values: a study's grid of 7 spans shows as 7 rows, not 7 thin stripes.
 */
import type { Aggregate } from '@/lib/run-types';
import { fmt } from '@/lib/format';
import { SEQUENTIAL, axisBase, baseLayout, type Layout, type Trace } from './plot-theme';

type Grid<T> = T[][];

/** Bin centres from edges. */
export const centres = (edges: readonly number[]) => edges.slice(1).map((e, i) => (e + edges[i]) / 2);

/**
 * A statistic as rows of y bins and columns of x bins (Plotly's z). The server answers
 * `[ix][iy]` (x outer), which is transposed; a grid already of y rows (outer length ny ≠ nx)
 * is kept as it is.
 */
export function orient<T>(grid: Grid<T> | undefined, nx: number, ny: number): Grid<T> {
  if (!grid?.length) return [];
  if (grid.length !== nx && grid.length === ny) return grid;
  return Array.from({ length: ny }, (_, r) => Array.from({ length: nx }, (_, c) => grid[c]?.[r] as T));
}

/**
 * The single value of each occupied bin along one axis, from an aggregate whose z is that axis's
 * own field; undefined when some bin holds more than one value (a continuous field).
 */
export function exactValues(agg: Aggregate | undefined, axis: 'x' | 'y'): (number | undefined)[] | undefined {
  if (!agg?.count.length) return undefined;
  const nx = agg.xEdges.length - 1;
  const ny = agg.yEdges.length - 1;
  const n = axis === 'x' ? nx : ny;
  const out: (number | undefined)[] = Array(n).fill(undefined);
  for (let i = 0; i < nx; i++) for (let j = 0; j < ny; j++) {
    if (!agg.count[i]?.[j]) continue;
    const [lo, hi] = [agg.min[i][j], agg.max[i][j]];
    const k = axis === 'x' ? i : j;
    if (lo === null || hi === null || Math.abs(hi - lo) > 1e-9 * Math.max(1, Math.abs(lo))) return undefined;
    if (out[k] !== undefined && Math.abs(out[k]! - lo) > 1e-9 * Math.max(1, Math.abs(lo))) return undefined;
    out[k] = lo;
  }
  return out;
}

export interface HeatmapLabels {
  x: string;
  y: string;
  /** The figure whose mean is shown; undefined for counts. */
  z?: string;
  /** Reverse the scale (compression: the larger magnitude, the more negative). */
  reverse?: boolean;
}

export interface HeatmapStats {
  bins: number;
  /** Variants in all bins. */
  total: number;
  /** Variants in cells that show a value (for a mean: those whose figure is known). */
  shown: number;
  /** Cells without a value to show. */
  empty: number;
}

/** Keep the columns (rows) `keep` of a grid. */
const pick = <T>(grid: Grid<T>, rows: number[], cols: number[]) => rows.map((r) => cols.map((c) => grid[r]?.[c] as T));

export function heatmapFigure(agg: Aggregate, labels: HeatmapLabels, exact?: { x?: (number | undefined)[]; y?: (number | undefined)[] }): { data: Trace[]; layout: Layout; stats: HeatmapStats } {
  const nx = Math.max(0, agg.xEdges.length - 1);
  const ny = Math.max(0, agg.yEdges.length - 1);
  const all = (n: number) => Array.from({ length: n }, (_, i) => i);
  const cols = exact?.x ? all(nx).filter((i) => exact.x![i] !== undefined) : all(nx);
  const rows = exact?.y ? all(ny).filter((j) => exact.y![j] !== undefined) : all(ny);
  const count = pick(orient(agg.count, nx, ny), rows, cols);
  const mean = pick(orient(agg.mean, nx, ny), rows, cols);
  const min = pick(orient(agg.min, nx, ny), rows, cols);
  const max = pick(orient(agg.max, nx, ny), rows, cols);
  let total = 0;
  let shown = 0;
  let empty = 0;
  const showMean = labels.z !== undefined && (agg.mean?.length ?? 0) > 0;
  const z = count.map((row, r) => row.map((n, c) => {
    total += n ?? 0;
    const v = !n ? null : showMean ? (mean[r]?.[c] ?? null) : n;
    if (v === null) empty++;
    else shown += n;
    return v;
  }));
  const text = count.map((row, r) => row.map((n, c) => {
    if (!n) return 'no variants';
    if (showMean && (mean[r]?.[c] ?? null) === null) return `${n} variant${n === 1 ? '' : 's'}, none with a value`;
    const range = showMean ? `<br>min ${fmt(min[r]?.[c])} · max ${fmt(max[r]?.[c])}` : '';
    return `${n} variant${n === 1 ? '' : 's'}${range}`;
  }));
  const zLabel = showMean ? `mean ${labels.z}` : 'variants';
  const xs = exact?.x ? cols.map((i) => exact.x![i]!) : cols.map((i) => centres(agg.xEdges)[i]);
  const ys = exact?.y ? rows.map((j) => exact.y![j]!) : rows.map((j) => centres(agg.yEdges)[j]);
  const data: Trace[] = [{
    type: 'heatmap', x: xs, y: ys, z, text,
    colorscale: SEQUENTIAL, reversescale: !!labels.reverse, hoverongaps: false, xgap: 1, ygap: 1,
    colorbar: { title: { text: zLabel, side: 'right', font: { size: 10 } }, thickness: 10, len: 0.85, tickfont: { size: 10 } },
    hovertemplate: `${labels.x} %{x}<br>${labels.y} %{y}<br>${showMean ? `${zLabel} %{z:.4g}<br>` : ''}%{text}<extra></extra>`,
  }];
  const axis = (text: string, values: number[] | undefined) => ({
    ...axisBase(), title: { ...(axisBase().title as object), text },
    // A few exact values: a tick at each.
    ...(values && values.length <= 16 ? { tickmode: 'array', tickvals: values, ticktext: values.map((v) => String(Number(v.toPrecision(6)))) } : {}),
  });
  const layout: Layout = {
    ...baseLayout(), dragmode: 'zoom',
    xaxis: axis(labels.x, exact?.x ? xs : undefined),
    yaxis: axis(labels.y, exact?.y ? ys : undefined),
  };
  return { data, layout, stats: { bins: rows.length * cols.length, total, shown, empty } };
}
