// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, render, screen } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { routes } from '@/app/router';
import { AppProvider, createQueryClient } from '@/app/provider';
import type { PanelpointApi } from '@/lib/api';
import { ApiError } from '@/lib/api-client';
import { preferReducedMotion } from './helpers';

afterEach(cleanup);
beforeEach(preferReducedMotion);

const offline = new ApiError(0, 'network', 'Cannot reach the team server. Check the connection and try again.');
const api = Object.fromEntries(
  ['signIn', 'signOut', 'getMe', 'getProjects', 'getStudies', 'getRuns', 'getVariant', 'getVariants'].map((k) => [k, vi.fn(() => Promise.reject(offline))]),
) as unknown as PanelpointApi;

function at(path: string) {
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  render(<AppProvider api={api} queryClient={createQueryClient()}><RouterProvider router={router} /></AppProvider>);
  return router;
}

describe('routes', () => {
  it('shows the shell and a "coming with the team server" panel for pages that need it', async () => {
    at('/projects/p1/runs/r1');
    expect(await screen.findByRole('heading', { name: 'Design space' })).toBeTruthy();
    expect(screen.getByText('Coming with the team server')).toBeTruthy();
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeTruthy();
    expect(screen.getByText('Panelpoint')).toBeTruthy();
  });

  it('renders a shipped example analysed in the browser', async () => {
    at('/examples/depot-roof-r3');
    expect(await screen.findByTestId('verdict-status', {}, { timeout: 10_000 })).toBeTruthy();
    expect(screen.getByRole('heading', { level: 1 }).textContent).toMatch(/Harrow Lane depot/);
  });

  it('says so when an example does not exist', async () => {
    at('/examples/no-such-truss');
    expect((await screen.findByRole('alert', {}, { timeout: 10_000 })).textContent).toMatch(/no example called "no-such-truss"/);
  });

  it("shows the API client's message when the server cannot be reached", async () => {
    at('/projects/p1/runs/r1/variants/v7');
    expect((await screen.findByRole('alert', {}, { timeout: 10_000 })).textContent).toContain('Cannot reach the team server');
    expect(api.getVariant).toHaveBeenCalledWith('r1', 'v7', expect.anything());
  });
});
