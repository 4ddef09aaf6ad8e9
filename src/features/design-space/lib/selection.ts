/**
 * A box or lasso selection on the point chart, as the variants it holds, and for a box on a
 * single chart its ranges (the table turns a selection too large for `ids=` into ranges).
 */

export interface ChartSelection {
  indices: number[];
  /** The box in data units, when the selection was a box on the first (only) facet. */
  box?: { x: [number, number]; y: [number, number] };
}

interface PlotlySelectEvent {
  points?: { customdata?: unknown }[];
  range?: Record<string, [number, number] | undefined>;
}

/** Read Plotly's plotly_selected event; undefined when nothing is selected. */
export function selectionOf(event: unknown): ChartSelection | undefined {
  const e = event as PlotlySelectEvent | undefined;
  const indices = [...new Set((e?.points ?? []).map((p) => p.customdata).filter((c): c is number => typeof c === 'number'))].sort((a, b) => a - b);
  if (!indices.length) return undefined;
  const x = e?.range?.x;
  const y = e?.range?.y;
  const box = x && y ? { x: [Math.min(...x), Math.max(...x)] as [number, number], y: [Math.min(...y), Math.max(...y)] as [number, number] } : undefined;
  return { indices, ...(box ? { box } : {}) };
}
