// @vitest-environment jsdom
// The pure parts behind the charts and the table: grouping points, heatmap grids, table state in the address.
import { describe, expect, it } from 'vitest';
import type { Aggregate, Points } from '@/lib/run-types';
import { groupPoints } from '@/features/design-space/lib/group-points';
import { exactValues, heatmapFigure, orient } from '@/features/design-space/lib/heatmap-figure';
import { selectionOf } from '@/features/design-space/lib/selection';
import { queryFromParams, withQuery } from '@/features/variants/lib/table-state';
import { variantQueryParams } from '@/lib/variant-query';

const points: Points = {
  count: 5, truncated: false, index: [0, 1, 2, 3, 4],
  status: ['determinate', 'unstable', 'unstable', 'error', 'indeterminate'],
  x: [1, 1.5, 2, null, 2.5], y: [10, null, null, null, 12], color: [0.5, null, null, null, 0.9],
};

describe('grouping points', () => {
  it('keeps every variant: drawn in the main area, on the strip (no y) or counted as not placed (no x)', () => {
    const g = groupPoints(points, { critical: new Set([2]), colourBy: 'status' });
    const main = g.facets[0].main.flatMap((m) => m.index);
    const strip = g.facets[0].strip.flatMap((m) => m.index);
    expect(main.sort()).toEqual([0, 4]);
    expect(strip.sort()).toEqual([1, 2]);
    expect(g.notPlaced.error).toBe(1);
    expect(g.facets[0].strip.find((s) => s.index.includes(2))!.kind).toBe('critical');
    const total = Object.values(g.drawn).reduce((a, b) => a + b, 0) + Object.values(g.notPlaced).reduce((a, b) => a + b, 0);
    expect(total).toBe(points.count);
  });

  it('colours stable variants by a figure in one trace, and splits into facets ordered by value', () => {
    const values = new Map<number, number | string | null>([[0, 24], [1, 18], [2, 18], [3, 18], [4, 24]]);
    const g = groupPoints(points, { critical: new Set(), colourBy: 'figure', split: { values, as: 'facets' } });
    expect(g.facets.map((f) => f.value)).toEqual(['18', '24']);
    const coloured = g.facets[1].main.find((m) => m.key === 'figure')!;
    expect(coloured.index).toEqual([0, 4]);
    expect(coloured.color).toEqual([0.5, 0.9]);
  });
});

describe('heatmap grids', () => {
  // 3 x bins, 2 y bins, the server's [ix][iy] order.
  const agg: Aggregate = {
    xEdges: [0, 1, 2, 3], yEdges: [10, 20, 30],
    count: [[1, 0], [0, 2], [3, 4]], min: [[5, null], [null, 6], [1, 2]], max: [[5, null], [null, 8], [1, 3]], mean: [[5, null], [null, 7], [1, 2.5]],
  };

  it('turns [ix][iy] into rows of y for Plotly, and keeps a grid already in rows', () => {
    expect(orient(agg.count, 3, 2)).toEqual([[1, 0, 3], [0, 2, 4]]);
    expect(orient([[1, 0, 3], [0, 2, 4]], 3, 2)).toEqual([[1, 0, 3], [0, 2, 4]]);
  });

  it('draws cells at the exact parameter values when each bin holds one, dropping empty columns', () => {
    // The parameter x itself as z: one value per occupied column (0.2, 1.5, 2.9).
    const onX: Aggregate = { ...agg, count: [[1, 0], [0, 2], [3, 0]], min: [[0.2, null], [null, 1.5], [2.9, null]], max: [[0.2, null], [null, 1.5], [2.9, null]] };
    expect(exactValues(onX, 'x')).toEqual([0.2, 1.5, 2.9]);
    expect(exactValues(agg, 'x')).toBeUndefined(); // min ≠ max in a cell: not a single value
    const fig = heatmapFigure(agg, { x: 'depth', y: 'span', z: 'Weight (kN)' }, { x: [0.2, undefined, 2.9] });
    const t = fig.data[0] as { x: number[]; z: (number | null)[][] };
    expect(t.x).toEqual([0.2, 2.9]);
    expect(t.z).toEqual([[5, 1], [null, 2.5]]);
    expect(fig.stats.total).toBe(8);
  });
});

describe('selection and table state', () => {
  it('reads indices (once each) and the box from a Plotly selection', () => {
    expect(selectionOf({ points: [{ customdata: 9 }, { customdata: 3 }, { customdata: 9 }, {}], range: { x: [2, 1], y: [5, 7] } }))
      .toEqual({ indices: [3, 9], box: { x: [1, 2], y: [5, 7] } });
    expect(selectionOf({ points: [] })).toBeUndefined();
  });

  it("round-trips the table's query through the address without touching the chart's keys", () => {
    const q = { page: 3, pageSize: 100, sort: '-weight', status: ['unstable' as const], critical: true, ranges: { depth: { gte: 1.5 } }, ids: [2, 7] };
    const p = withQuery(new URLSearchParams('x=depth&y=weight&page=9'), q);
    expect(p.get('x')).toBe('depth');
    expect(queryFromParams(p)).toEqual(q);
    expect(variantQueryParams({ ...q, pageSize: 5000 }).pageSize).toBe('500');
  });
});
