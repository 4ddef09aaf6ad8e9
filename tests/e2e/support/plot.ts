/**
 * Has a Plotly chart on the page drawn? `waitForDrawnChart` waits until Plotly has laid out a
 * plot with data, axes with ticks, and its points on a canvas (scattergl) or its cells in an
 * image (heatmap), and returns the page's clock at that moment: ms since the navigation started.
 * `colouredPixels` counts saturated pixels in a region of a screenshot (decoded by the browser):
 * the paper, grid and ink of the house look are grey, markers and heatmap cells are not.
 */
import type { Page } from 'playwright-core';

export interface Box { x: number; y: number; width: number; height: number }

/** The plot area (Plotly's drag rectangle) of the first subplot of the first chart. */
export async function plotArea(page: Page): Promise<Box> {
  const box = await page.locator('[data-testid="plot"] .draglayer .xy .nsewdrag').first().boundingBox();
  if (!box) throw new Error('the chart has no plot area');
  return box;
}

// Browser code as text: this project type-checks without the DOM library.
const drawn = (all: boolean) => `(() => {
  const plots = [...document.querySelectorAll('[data-testid="plot"]')].map((p) => p.querySelector('.js-plotly-plot'));
  const isDrawn = (gd) => gd && (gd._fullData ?? []).some((t) => (t._length ?? t.z?.length ?? 0) > 0)
    && gd.querySelector('.gl-container canvas, .heatmaplayer image') && gd.querySelector('.main-svg .xtick');
  const n = plots.filter(isDrawn).length;
  return n > 0 && (${all} ? n === plots.length : true) ? performance.now() : false;
})()`;

const COUNT_COLOURED = `async (src) => {
  const img = new Image();
  img.src = src;
  await img.decode();
  const c = document.createElement('canvas');
  [c.width, c.height] = [img.naturalWidth, img.naturalHeight];
  const g = c.getContext('2d');
  g.drawImage(img, 0, 0);
  const d = g.getImageData(0, 0, c.width, c.height).data;
  let n = 0;
  for (let i = 0; i < d.length; i += 4) if (Math.max(d[i], d[i + 1], d[i + 2]) - Math.min(d[i], d[i + 1], d[i + 2]) > 60) n++;
  return n;
}`;

/** `all`: wait for every chart on the page, not only the first one drawn. */
export async function waitForDrawnChart(page: Page, options: { all?: boolean; timeout?: number } = {}): Promise<number> {
  const handle = await page.waitForFunction(drawn(options.all ?? false), undefined, { timeout: options.timeout ?? 60_000, polling: 'raf' });
  return (await handle.jsonValue()) as number;
}

export async function colouredPixels(page: Page, clip: Box): Promise<number> {
  const png = await page.screenshot({ clip });
  return page.evaluate(`(${COUNT_COLOURED})(${JSON.stringify(`data:image/png;base64,${png.toString('base64')}`)})`) as Promise<number>;
}
