// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { fakeApi, lastQuery, renderAt, RUN_PATH } from './team-fixtures';
import { downloadImage, lastPlot, plots } from './plot-mock';
import { preferReducedMotion } from './helpers';

vi.mock('react-plotly.js/factory', async () => (await import('./plot-mock')).factoryModule);
vi.mock('plotly.js-dist-min', async () => (await import('./plot-mock')).plotlyModule);

afterEach(cleanup);
beforeEach(() => {
  preferReducedMotion();
  plots.length = 0;
  localStorage.clear();
});

type Trace = { type: string; name: string; x: unknown[]; y: unknown[]; customdata: number[]; yaxis: string; marker: { symbol: string } };
const scatterTraces = () => (lastPlot((p) => (p.data as Trace[]).some((t) => t.type === 'scattergl')).data as Trace[]).filter((t) => t.customdata);

describe('run page: design space', () => {
  it('draws the points of the chosen figures, unstable variants on a strip and the critical form with its own marker', async () => {
    const api = fakeApi();
    renderAt(`${RUN_PATH}?x=depth&y=weight`, api);
    await waitFor(() => expect(scatterTraces().length).toBeGreaterThan(0), { timeout: 10_000 });
    expect(api.getPoints).toHaveBeenCalledWith({ slug: 'harrow-lane-depot', runId: 'b7e3c1d2-4f5a-4e6b-9c8d-1a2b3c4d5e6f' }, expect.objectContaining({ x: 'depth', y: 'weight', limit: 100_000 }), expect.anything());
    const traces = scatterTraces();
    // 6 stable variants in the main area, 6 unstable (no weight) on the strip axis y2, none hidden.
    const main = traces.filter((t) => t.yaxis === 'y');
    const strip = traces.filter((t) => t.yaxis === 'y2');
    expect(main.flatMap((t) => t.customdata).sort((a, b) => a - b)).toEqual([0, 2, 4, 6, 8, 10]);
    expect(strip.flatMap((t) => t.customdata).sort((a, b) => a - b)).toEqual([1, 3, 5, 7, 9, 11]);
    const critical = strip.find((t) => t.customdata.includes(5))!;
    expect(critical.customdata).toEqual([5]);
    expect(critical.marker.symbol).toBe('diamond-open');
    expect(strip.find((t) => t.customdata.includes(1))!.marker.symbol).toBe('x');
    expect(screen.getByText(/have no Weight \(kN\)/).textContent).toMatch(/^6 have no Weight/);
    for (const note of screen.getAllByRole('note')) expect(note.textContent).toContain('review by a licensed engineer');
  });

  it('filters the variants table by a box selection (ids in the query) and clears it again', async () => {
    const api = fakeApi();
    renderAt(`${RUN_PATH}?x=depth&y=weight`, api);
    await waitFor(() => expect(scatterTraces().length).toBeGreaterThan(0), { timeout: 10_000 });
    await screen.findByText('1–12 of 12');
    act(() => lastPlot((p) => !!p.onSelected).onSelected!({ points: [{ customdata: 4 }, { customdata: 2 }, { customdata: 4 }], range: { x: [1.1, 1.6], y: [5, 7] } }));
    await waitFor(() => expect(lastQuery(api).ids).toEqual([2, 4]));
    const table = screen.getByRole('table', { name: /Variants of run/ });
    await waitFor(() => expect(within(table).getAllByRole('row')).toHaveLength(3));
    expect(screen.getByText(/Chart selection:/).textContent).toContain('2');
    expect(screen.getByRole('link', { name: /CSV of these 2 variants/ })).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Show all' }));
    // Back to the unfiltered query (served from the cache: no new request needed).
    await waitFor(() => expect(within(table).getAllByRole('row')).toHaveLength(13));
    expect(screen.queryByText(/Chart selection:/)).toBeNull();
  });

  it('turns a box holding more variants than ids= can carry into ranges of the two fields', async () => {
    const api = fakeApi();
    renderAt(`${RUN_PATH}?x=depth&y=weight`, api);
    await waitFor(() => expect(scatterTraces().length).toBeGreaterThan(0), { timeout: 10_000 });
    const many = Array.from({ length: 1500 }, (_, i) => ({ customdata: i }));
    act(() => lastPlot((p) => !!p.onSelected).onSelected!({ points: many, range: { x: [1.25, 1.55], y: [5, 7.5] } }));
    await waitFor(() => expect(lastQuery(api).ranges).toEqual({ depth: { gte: 1.25, lte: 1.55 }, weight: { gte: 5, lte: 7.5 } }));
    expect(lastQuery(api).ids).toBeUndefined();
    expect(screen.getByText(/1500 variants selected: the table filters by the box/)).toBeTruthy();
  });

  it('splits by a parameter into facets and exports what is shown', async () => {
    const api = fakeApi();
    renderAt(`${RUN_PATH}?x=depth&y=weight&split=span`, api);
    await waitFor(() => expect((lastPlot((p) => !!p.onSelected).layout as { annotations?: { text: string }[] }).annotations?.map((a) => a.text)).toEqual(['span = 18', 'span = 24']), { timeout: 10_000 });
    expect(api.getPoints).toHaveBeenCalledWith(expect.anything(), expect.objectContaining({ x: 'index', y: 'index', color: 'span' }), expect.anything());
    const traces = scatterTraces();
    expect(new Set(traces.map((t) => t.yaxis))).toEqual(new Set(['y', 'y2', 'y3', 'y4']));
    fireEvent.click(screen.getAllByRole('button', { name: 'SVG' })[0]);
    await waitFor(() => expect(downloadImage).toHaveBeenCalledWith(expect.any(HTMLElement), expect.objectContaining({ format: 'svg' })));
  });
});
