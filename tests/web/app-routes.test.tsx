// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, screen, within } from '@testing-library/react';
import { ApiError } from '@/lib/api-client';
import { fakeApi, renderAt, SLUG } from './team-fixtures';
import { preferReducedMotion } from './helpers';

afterEach(cleanup);
beforeEach(preferReducedMotion);

const offline = () => Promise.reject(new ApiError(0, 'network', 'Cannot reach the team server. Check the connection and try again.'));

describe('routes', () => {
  it('shows the shell with the project picker and the projects the caller belongs to', async () => {
    renderAt('/projects', fakeApi('reviewer'));
    const list = await screen.findByRole('list');
    expect(within(list).getByRole('link', { name: 'Harrow Lane depot roof' }).getAttribute('href')).toBe(`/projects/${SLUG}`);
    expect(within(list).getByText('reviewer')).toBeTruthy();
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeTruthy();
    expect(await screen.findByLabelText('Project')).toBeTruthy();
  });

  it('sends project sections to the last project used', async () => {
    localStorage.setItem('panelpoint.project', SLUG);
    const getTokens = vi.fn(async () => []);
    const { router } = renderAt('/tokens', fakeApi('engineer', { getTokens }));
    expect(await screen.findByRole('heading', { name: 'API tokens' })).toBeTruthy();
    expect(router.state.location.pathname).toBe(`/projects/${SLUG}/tokens`);
    expect(getTokens).toHaveBeenCalledWith(SLUG);
  });

  it('renders a shipped example analysed in the browser', async () => {
    renderAt('/examples/depot-roof-r3', fakeApi());
    expect(await screen.findByTestId('verdict-status', {}, { timeout: 10_000 })).toBeTruthy();
    expect(screen.getByRole('heading', { level: 1 }).textContent).toMatch(/Harrow Lane depot/);
  });

  it('says so when an example does not exist', async () => {
    renderAt('/examples/no-such-truss', fakeApi());
    expect((await screen.findByRole('alert', {}, { timeout: 10_000 })).textContent).toMatch(/no example called "no-such-truss"/);
  });

  it("shows the API client's message when the server cannot be reached", async () => {
    const getVariant = vi.fn(offline);
    renderAt(`/projects/${SLUG}/runs/r1/variants/7`, fakeApi('engineer', { getVariant }));
    expect((await screen.findByRole('alert', {}, { timeout: 10_000 })).textContent).toContain('Cannot reach the team server');
    expect(getVariant).toHaveBeenCalledWith({ slug: SLUG, runId: 'r1' }, 7, expect.anything());
  });

  it("decodes a sharded run's key (it holds a slash) from the address", async () => {
    const getRun = vi.fn(offline);
    renderAt(`/projects/${SLUG}/runs/${encodeURIComponent('9a8b7c/4')}`, fakeApi('engineer', { getRun }));
    await screen.findByRole('alert', {}, { timeout: 10_000 });
    expect(getRun).toHaveBeenCalledWith({ slug: SLUG, runId: '9a8b7c/4' });
  });
});
