// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { createHttpApi } from '@/lib/api';
import { createApiClient } from '@/lib/api-client';
import { fakeApi, lastQuery, pageOf, renderAt, RUN_PATH, rows } from './team-fixtures';
import { preferReducedMotion } from './helpers';

afterEach(cleanup);
beforeEach(() => {
  preferReducedMotion();
  localStorage.clear();
});

const TABLE_ONLY = `${RUN_PATH}/variants`;
const table = () => screen.getByRole('table', { name: /Variants of run/ });

describe('variants table', () => {
  it('sorts on the server: ascending, then descending, from page 1', async () => {
    const api = fakeApi();
    renderAt(`${TABLE_ONLY}?page=2&size=5`, api);
    await screen.findByText('6–10 of 12');
    expect(lastQuery(api)).toMatchObject({ page: 2, pageSize: 5 });
    fireEvent.click(within(table()).getByRole('button', { name: /Weight/ }));
    await waitFor(() => expect(lastQuery(api)).toMatchObject({ sort: 'weight', page: 1, pageSize: 5 }));
    expect(within(table()).getByRole('columnheader', { name: /Weight/ }).getAttribute('aria-sort')).toBe('ascending');
    fireEvent.click(within(table()).getByRole('button', { name: /Weight/ }));
    await waitFor(() => expect(lastQuery(api).sort).toBe('-weight'));
    expect(within(table()).getByRole('columnheader', { name: /Weight/ }).getAttribute('aria-sort')).toBe('descending');
  });

  it('filters by status, critical forms and a numeric range, and pages through the result', async () => {
    const api = fakeApi();
    const { router } = renderAt(`${TABLE_ONLY}?size=2`, api);
    await screen.findByText('1–2 of 12');
    fireEvent.click(screen.getByLabelText('unstable', { selector: 'input' }));
    await waitFor(() => expect(lastQuery(api).status).toEqual(['unstable']));
    fireEvent.change(screen.getByLabelText('Critical forms'), { target: { value: 'false' } });
    await waitFor(() => expect(lastQuery(api).critical).toBe(false));
    fireEvent.change(screen.getByLabelText('Range of'), { target: { value: 'depth' } });
    fireEvent.change(screen.getByLabelText('from'), { target: { value: '1.4' } });
    fireEvent.change(screen.getByLabelText('to'), { target: { value: '1.9' } });
    fireEvent.click(screen.getByRole('button', { name: 'Add' }));
    await waitFor(() => expect(lastQuery(api).ranges).toEqual({ depth: { gte: 1.4, lte: 1.9 } }));
    await screen.findByText('1–2 of 5');
    fireEvent.click(screen.getByRole('button', { name: 'Next' }));
    await waitFor(() => expect(lastQuery(api)).toMatchObject({ page: 2, pageSize: 2, status: ['unstable'], critical: false }));
    expect(router.state.location.search).toContain('page=2');
    fireEvent.click(screen.getByRole('button', { name: 'Remove the range on depth' }));
    // Back to page 1 of the query without the range (answered from the cache).
    await waitFor(() => expect(screen.queryByRole('list', { name: 'Range filters' })).toBeNull());
    expect(new URLSearchParams(router.state.location.search).get('page')).toBeNull();
    expect(new URLSearchParams(router.state.location.search).get('status')).toBe('unstable');
  });

  it('sends those queries to the server as its parameters, and the CSV link carries the same filters', async () => {
    const fetch = vi.fn(async (_url: string) => new Response(JSON.stringify(pageOf({ page: 1, pageSize: 50 })), { status: 200, headers: { 'content-type': 'application/json' } }));
    const api = createHttpApi(createApiClient({ fetch: fetch as unknown as typeof globalThis.fetch }));
    const ref = { slug: 'harrow-lane-depot', runId: 'abc/4' };
    const q = { page: 3, pageSize: 100, sort: '-weight', status: ['determinate' as const, 'indeterminate' as const], critical: false, marked: 'candidate' as const, ranges: { depth: { gte: 1.5, lte: 2 }, weight: { lte: 9 } }, ids: [4, 9] };
    await api.getVariants(ref, q);
    const url = new URL(fetch.mock.calls[0][0], 'http://x');
    expect(url.pathname).toBe('/api/projects/harrow-lane-depot/runs/abc%2F4/variants');
    expect(Object.fromEntries(url.searchParams)).toEqual({
      sort: '-weight', status: 'determinate,indeterminate', critical: 'false', marked: 'candidate',
      'f.depth.gte': '1.5', 'f.depth.lte': '2', 'f.weight.lte': '9', ids: '4,9', page: '3', pageSize: '100',
    });
    const csv = new URL(api.variantsCsvUrl(ref, q), 'http://x');
    expect(csv.pathname).toBe('/api/projects/harrow-lane-depot/runs/abc%2F4/variants.csv');
    expect(csv.searchParams.get('page')).toBeNull();
    expect(csv.searchParams.get('f.depth.gte')).toBe('1.5');
    expect(csv.searchParams.get('sort')).toBe('-weight');
  });

  it('keeps the column choice in this browser', async () => {
    renderAt(TABLE_ONLY, fakeApi());
    await screen.findByText('1–12 of 12');
    expect(within(table()).getByRole('columnheader', { name: /Weight/ })).toBeTruthy();
    fireEvent.click(screen.getByText('Columns'));
    fireEvent.click(screen.getByRole('checkbox', { name: 'Weight (kN)' }));
    expect(within(table()).queryByRole('columnheader', { name: /Weight/ })).toBeNull();
    expect(JSON.parse(localStorage.getItem('panelpoint.variants.columns')!).hidden).toEqual(['weight']);
    cleanup();
    renderAt(TABLE_ONLY, fakeApi());
    await screen.findByText('1–12 of 12');
    expect(within(table()).queryByRole('columnheader', { name: /Weight/ })).toBeNull();
  });

  it('lets an engineer mark a candidate and shows their own mark pressed', async () => {
    const api = fakeApi('engineer');
    renderAt(TABLE_ONLY, api);
    await screen.findByText('1–12 of 12');
    const row = (i: number) => table().querySelector(`tr[data-variant="${i}"]`) as HTMLElement;
    expect(within(row(2)).getByRole('button', { name: 'Candidate' }).getAttribute('aria-pressed')).toBe('true');
    fireEvent.click(within(row(4)).getByRole('button', { name: 'Candidate' }));
    await waitFor(() => expect(api.setMark).toHaveBeenCalledWith(expect.objectContaining({ runId: expect.any(String) }), 4, 'candidate'));
    fireEvent.click(within(row(2)).getByRole('button', { name: 'Candidate' }));
    await waitFor(() => expect(api.clearMark).toHaveBeenCalledWith(expect.anything(), 2));
  });

  it('disables the marks for a viewer, with the reason as tooltip and description', async () => {
    const api = fakeApi('viewer');
    renderAt(TABLE_ONLY, api);
    await screen.findByText('1–12 of 12');
    const first = table().querySelector(`tr[data-variant="${rows()[0].index}"]`) as HTMLElement;
    for (const [name, why] of [['Candidate', /cannot mark candidates/], ['Reject', /cannot reject/]] as const) {
      const b = within(first).getByRole('button', { name });
      expect(b.getAttribute('aria-disabled')).toBe('true');
      expect(b.getAttribute('title')).toMatch(why);
      expect(document.getElementById(b.getAttribute('aria-describedby')!)!.textContent).toMatch(why);
      fireEvent.click(b);
    }
    expect(api.setMark).not.toHaveBeenCalled();
  });
});
