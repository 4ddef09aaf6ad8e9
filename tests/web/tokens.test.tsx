// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, screen, waitFor, within } from '@testing-library/react';
import type { ApiTokenInfo, CreatedToken } from '@/lib/api-types';
import { fakeApi, renderAt, SLUG } from './team-fixtures';
import { preferReducedMotion } from './helpers';

afterEach(cleanup);
beforeEach(preferReducedMotion);

const SECRET = 'pp_0123456789ab_QUJDREVGR0hJSktMTU5PUFFSU1RVVldYWVo0NTY3ODk';

function tokenApi() {
  const list: ApiTokenInfo[] = [
    { id: 1, name: 'ci-main', prefix: '4be1c09d7a3f', scopes: ['project:read', 'runs:push'], owner: { id: 7, name: 'Test engineer' }, createdAt: '2025-02-03T10:00:00Z', lastUsedAt: null, revokedAt: null },
  ];
  const createToken = vi.fn(async (_slug: string, input: { name: string; scopes?: string[] }) => {
    const t: CreatedToken = { ...list[0], id: 2, name: input.name, prefix: '0123456789ab', scopes: input.scopes as never, token: SECRET };
    const { token: _secret, ...kept } = t;
    list.unshift(kept);
    return t;
  });
  const revokeToken = vi.fn(async (_slug: string, id: number) => { list.find((t) => t.id === id)!.revokedAt = '2025-02-20T10:00:00Z'; });
  return { api: fakeApi('engineer', { getTokens: vi.fn(async () => list.map((t) => ({ ...t }))), createToken, revokeToken }), createToken, revokeToken };
}

describe('API tokens page', () => {
  it('shows a new token once: in the answer, never in the list or the cache, gone when dismissed', async () => {
    const { api, createToken } = tokenApi();
    const { queryClient } = renderAt(`/projects/${SLUG}/tokens`, api);
    await screen.findByRole('rowheader', { name: 'ci-main' });
    fireEvent.change(screen.getByLabelText('Name'), { target: { value: 'laptop CLI' } });
    fireEvent.click(screen.getByLabelText(/comments:write/));
    fireEvent.click(screen.getByRole('button', { name: 'Create token' }));
    const shown = await screen.findByTestId('new-token');
    expect(within(shown).getByText(SECRET)).toBeTruthy();
    expect(createToken).toHaveBeenCalledWith(SLUG, { name: 'laptop CLI', scopes: ['project:read', 'runs:push', 'comments:write'] });
    // The list is read again and names the token by its prefix only.
    const row = await waitFor(() => document.querySelector('tr[data-token="2"]') as HTMLElement);
    expect(row.textContent).toContain('pp_0123456789ab_…');
    expect(row.textContent).not.toContain(SECRET);
    expect(JSON.stringify(queryClient.getQueryCache().getAll().map((q) => q.state.data))).not.toContain(SECRET);
    fireEvent.click(within(shown).getByRole('button', { name: 'I have copied it' }));
    expect(screen.queryByTestId('new-token')).toBeNull();
    expect(screen.queryByText(SECRET)).toBeNull();
  });

  it('offers only the scopes the role holds, and revokes after a confirmation', async () => {
    const { api, revokeToken } = tokenApi();
    renderAt(`/projects/${SLUG}/tokens`, api);
    await screen.findByRole('rowheader', { name: 'ci-main' });
    expect((screen.getByLabelText(/cases:freeze/) as HTMLInputElement).disabled).toBe(true);
    expect((screen.getByLabelText(/runs:push/) as HTMLInputElement).disabled).toBe(false);
    fireEvent.click(screen.getByRole('button', { name: 'Revoke ci-main' }));
    expect(revokeToken).not.toHaveBeenCalled();
    fireEvent.click(screen.getByRole('button', { name: 'Revoke ci-main' }));
    await waitFor(() => expect(revokeToken).toHaveBeenCalledWith(SLUG, 1));
    expect(await screen.findByText(/^revoked /)).toBeTruthy();
  });
});
