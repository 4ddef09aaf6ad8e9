/**
 * The Plotly figure of "any figure against any other": WebGL scatter traces per group, facets
 * side by side with shared axes, and under each facet a strip with a row per status for the
 * variants that have no y value (drawn there, not hidden). Each point carries its variant index
 * as customdata, so a box or lasso selection yields the variants.
 */
import { QUALITATIVE, SEQUENTIAL, axisBase, baseLayout, type Layout, type Trace } from './plot-theme';
import { KIND_LABEL, KIND_MARKER, STRIP_ROW, KINDS } from './point-kinds';
import type { Grouped, PointGroup } from './group-points';

export interface ScatterLabels {
  x: string;
  y: string;
  /** The colour figure's label, when colouring by a figure. */
  colour?: string;
  /** The split parameter's name. */
  split?: string;
  /** Reverse the colour scale (compression: the larger magnitude, the more negative). */
  colourReverse?: boolean;
}

const MAX_COLUMNS = 3;
/** Pixels per row of the strip, and the chart's margins (top with facets, bottom). */
const STRIP_ROW_PX = 15;
const MARGIN = { single: 36, facets: 70, bottom: 44 };

/** Axis ids of facet f: x, main y, strip y ('' suffix for the first). */
function axes(f: number) {
  const s = (n: number) => (n === 1 ? '' : String(n));
  return { x: s(f + 1), y: s(2 * f + 1), strip: s(2 * f + 2) };
}

function colourRange(g: Grouped): [number, number] | undefined {
  let [lo, hi] = [Infinity, -Infinity];
  for (const f of g.facets) for (const grp of f.main) if (grp.key === 'figure') for (const c of grp.color) if (c !== null) [lo, hi] = [Math.min(lo, c), Math.max(hi, c)];
  return lo <= hi ? [lo, hi] : undefined;
}

function trace(grp: PointGroup, f: number, strip: boolean, g: Grouped, labels: ScatterLabels, seen: Set<string>): Trace {
  const ax = axes(f);
  const name = grp.kind ? KIND_LABEL[grp.kind] : grp.split !== undefined ? `${labels.split} = ${grp.split}` : `Stable, coloured by ${labels.colour}`;
  const marker: Record<string, unknown> = grp.kind ? { ...KIND_MARKER[grp.kind] } : { symbol: 'circle', size: 5, opacity: 0.75 };
  if (grp.split !== undefined) marker.color = QUALITATIVE[g.splitValues.indexOf(grp.split) % QUALITATIVE.length];
  if (grp.key === 'figure') {
    const range = colourRange(g);
    Object.assign(marker, {
      color: grp.color, colorscale: SEQUENTIAL, reversescale: !!labels.colourReverse, cmin: range?.[0], cmax: range?.[1], showscale: !seen.has('figure'),
      colorbar: { title: { text: labels.colour, side: 'right', font: { size: 10 } }, thickness: 10, len: 0.8, tickfont: { size: 10 } },
    });
  }
  if (grp.kind && !strip) marker.line = { width: 1, color: marker.color };
  const legendKey = grp.key;
  const showlegend = !seen.has(legendKey);
  seen.add(legendKey);
  const where = strip ? `${labels.y}: none` : `${labels.y} %{y:.5~g}`;
  return {
    type: 'scattergl', mode: 'markers', name, legendgroup: legendKey, showlegend,
    x: grp.x, y: strip ? grp.x.map(() => STRIP_ROW[grp.kind ?? 'determinate']) : grp.y,
    customdata: grp.index, marker,
    xaxis: `x${ax.x}`, yaxis: `y${strip ? ax.strip : ax.y}`,
    hovertemplate: `${labels.x} %{x:.5~g}<br>${where}<br>variant %{customdata}<extra>${name}</extra>`,
  };
}

/** Rows of the strip present in the data, top to bottom (a category axis lists from the bottom up). */
function stripRowsOf(g: Grouped): string[] {
  const present = new Set(g.facets.flatMap((f) => f.strip.map((s) => STRIP_ROW[s.kind ?? 'determinate'])));
  return KINDS.map((k) => STRIP_ROW[k]).filter((r, i, all) => present.has(r) && all.indexOf(r) === i).reverse();
}

/** A transparent point, so a facet without stable variants still draws its axes at the shared range. */
function placeholder(g: Grouped, f: number): Trace | undefined {
  const first = g.facets.flatMap((x) => x.main).find((m) => m.x.length);
  if (!first) return undefined;
  const ax = axes(f);
  return { type: 'scattergl', mode: 'markers', x: [first.x[0]], y: [first.y[0]], marker: { opacity: 0, size: 1 }, hoverinfo: 'skip', showlegend: false, xaxis: `x${ax.x}`, yaxis: `y${ax.y}` };
}

/** Traces and layout of the grouped points, for a chart `height` pixels tall. */
export function scatterFigure(g: Grouped, labels: ScatterLabels, height = 470): { data: Trace[]; layout: Layout } {
  const n = g.facets.length;
  const cols = Math.min(n, MAX_COLUMNS);
  const rows = Math.ceil(n / cols);
  const hasStrip = g.strip > 0;
  const stripRows = stripRowsOf(g);
  const top = n > 1 ? MARGIN.facets : MARGIN.single;
  const plotPx = Math.max(100, height - top - MARGIN.bottom);
  const stripShare = hasStrip ? Math.min(0.4, (STRIP_ROW_PX * stripRows.length + 8) / (plotPx / rows)) : 0;
  const seen = new Set<string>();
  const data: Trace[] = [];
  const base = baseLayout();
  const layout: Layout = {
    ...base, annotations: [] as unknown[], margin: { l: 56, r: 12, t: top, b: MARGIN.bottom },
    legend: { ...(base.legend as object), y: 1 + (n > 1 ? 30 : 6) / plotPx },
  };
  const gapX = n > 1 ? 0.04 : 0;
  const gapY = rows > 1 ? 0.1 : 0;
  g.facets.forEach((facet, f) => {
    const [col, row] = [f % cols, Math.floor(f / cols)];
    const x0 = col / cols + (col ? gapX / 2 : 0);
    const x1 = (col + 1) / cols - (col < cols - 1 ? gapX / 2 : 0);
    const top = 1 - row / rows - (row ? gapY / 2 : 0);
    const bottom = 1 - (row + 1) / rows + (row < rows - 1 ? gapY / 2 : 0);
    const split = bottom + (top - bottom) * stripShare;
    const ax = axes(f);
    const last = row === rows - 1;
    layout[`xaxis${ax.x}`] = {
      ...axisBase(), domain: [x0, x1], anchor: `y${hasStrip ? ax.strip : ax.y}`,
      ...(f ? { matches: 'x' } : {}), title: { ...(axisBase().title as object), text: last ? labels.x : '' },
    };
    layout[`yaxis${ax.y}`] = {
      ...axisBase(), domain: [hasStrip ? split + 0.02 : split, top], anchor: `x${ax.x}`,
      ...(f ? { matches: 'y' } : {}), title: { ...(axisBase().title as object), text: col === 0 ? labels.y : '' },
    };
    if (hasStrip) {
      layout[`yaxis${ax.strip}`] = {
        ...axisBase(), domain: [bottom, split], anchor: `x${ax.x}`, type: 'category', categoryorder: 'array',
        categoryarray: stripRows, range: [-0.6, stripRows.length - 0.4], fixedrange: true, showgrid: false, showline: false,
        ticks: '', tickfont: { size: 9, color: '#737d84' },
      };
    }
    if (facet.value) {
      (layout.annotations as unknown[]).push({
        text: `${labels.split} = ${facet.value}`, xref: 'paper', yref: 'paper', x: (x0 + x1) / 2, y: top,
        xanchor: 'center', yanchor: 'bottom', showarrow: false, font: { size: 11 },
      });
    }
    for (const grp of facet.main) data.push(trace(grp, f, false, g, labels, seen));
    for (const grp of facet.strip) data.push(trace(grp, f, true, g, labels, seen));
    const hold = facet.main.length ? undefined : placeholder(g, f);
    if (hold) data.push(hold);
  });
  return { data, layout };
}
