/**
 * The house look for Plotly: paper and ink from styles.css, JetBrains Mono for figures, thin
 * grids, legend on top; and the chart config (no logo, our own export buttons).
 */

/** A Plotly trace or layout as plain data (the factory types them `unknown`). */
export type Trace = Record<string, unknown>;
export type Layout = Record<string, unknown>;

export const INK = '#1c2226';
export const INK_3 = '#737d84';
export const SHEET = '#fcfcfa';
export const GRID = '#e8e5dd';
export const RULE = '#bfbab0';
export const MONO = "'JetBrains Mono', ui-monospace, Menlo, Consolas, monospace";

/** Sequential scale from paper to the tension blue: calm, readable in grey, colour-blind safe. */
export const SEQUENTIAL: [number, string][] = [[0, '#f1eee4'], [0.3, '#b9cbdc'], [0.65, '#5d86b3'], [1, '#173d70']];

/** Colours of split values (one trace per value), distinct in hue and lightness. */
export const QUALITATIVE = ['#1d4f91', '#c0581c', '#2f6f4e', '#7b4f96', '#946200', '#2f8a99', '#5a6066', '#b3416a'];

export function axisBase(): Layout {
  return {
    gridcolor: GRID, linecolor: RULE, zeroline: false, showline: true, ticks: 'outside', tickcolor: RULE, ticklen: 3,
    tickfont: { family: MONO, size: 10, color: INK }, automargin: true,
    title: { font: { size: 11, color: INK } },
  };
}

export function baseLayout(): Layout {
  return {
    paper_bgcolor: SHEET, plot_bgcolor: SHEET,
    font: { family: MONO, size: 11, color: INK },
    margin: { l: 56, r: 12, t: 36, b: 44 },
    legend: { orientation: 'h', x: 0, y: 1.01, yanchor: 'bottom', font: { size: 10 }, itemsizing: 'constant' },
    hoverlabel: { font: { family: MONO, size: 11 }, bgcolor: SHEET, bordercolor: RULE },
    dragmode: 'select',
    selectdirection: 'any',
    // Zoom and selection survive new data of the same chart.
    uirevision: 'keep',
  };
}

export const PLOT_CONFIG = {
  displaylogo: false,
  responsive: true,
  scrollZoom: false,
  modeBarButtonsToRemove: ['toImage', 'autoScale2d'],
};
