// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, screen, waitFor } from '@testing-library/react';
import { ApiError } from '@/lib/api-client';
import { isPublicPath } from '@/app/public-paths';
import { fakeApi, meAs, renderAt } from './team-fixtures';
import { preferReducedMotion } from './helpers';

afterEach(cleanup);
beforeEach(preferReducedMotion);

const unauthenticated = () => Promise.reject(new ApiError(401, 'unauthenticated', 'Sign in first.'));

function fill(email: string, password: string) {
  fireEvent.change(screen.getByLabelText('Email'), { target: { value: email } });
  fireEvent.change(screen.getByLabelText('Password'), { target: { value: password } });
  fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
}

describe('sign-in page', () => {
  it("shows the server's message when the password is wrong, and stays", async () => {
    const signIn = vi.fn(() => Promise.reject(new ApiError(401, 'wrong-credentials', 'Wrong email or password.')));
    const { router } = renderAt('/sign-in', fakeApi('engineer', { signIn, getMe: vi.fn(unauthenticated) }));
    fill('engineer@panelpoint.example', 'not it');
    expect((await screen.findByRole('alert')).textContent).toBe('Wrong email or password.');
    expect(signIn).toHaveBeenCalledWith({ email: 'engineer@panelpoint.example', password: 'not it' });
    expect(router.state.location.pathname).toBe('/sign-in');
  });

  it('lists field problems the server names', async () => {
    const signIn = vi.fn(() => Promise.reject(new ApiError(422, 'invalid-body', 'The request body is not valid.', [{ path: 'email', message: 'must match pattern' }])));
    renderAt('/sign-in', fakeApi('engineer', { signIn, getMe: vi.fn(unauthenticated) }));
    fill('x@y.z', 'pw');
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('The request body is not valid.');
    expect(alert.textContent).toContain('email must match pattern');
  });

  it('goes back to the page that asked for a sign-in, and shows who is signed in', async () => {
    let signedIn = false;
    const signIn = vi.fn(async () => { signedIn = true; return { user: meAs('reviewer').user, token: 't', expiresIn: 3600 }; });
    const getMe = vi.fn(() => (signedIn ? Promise.resolve(meAs('reviewer')) : unauthenticated()));
    const { router } = renderAt(`/sign-in?next=${encodeURIComponent('/projects/harrow-lane-depot')}`, fakeApi('reviewer', { signIn, getMe }));
    fill('reviewer@panelpoint.example', 'the right one');
    await waitFor(() => expect(router.state.location.pathname).toBe('/projects/harrow-lane-depot'));
    expect(await screen.findByText('Test reviewer')).toBeTruthy();
  });

  it('does not follow a next address off the site', async () => {
    const signIn = vi.fn(async () => ({ user: meAs('viewer').user, token: 't', expiresIn: 3600 }));
    const { router } = renderAt(`/sign-in?next=${encodeURIComponent('//elsewhere.example/x')}`, fakeApi('viewer', { signIn }));
    fill('viewer@panelpoint.example', 'pw');
    await waitFor(() => expect(router.state.location.pathname).toBe('/projects'));
  });

  it('treats sign-in, reset, invitation and example pages as public (a 401 there does not redirect)', () => {
    for (const p of ['/sign-in', '/reset-password?token=x', '/invitations/accept?token=y', '/examples/depot-roof-r3']) expect(isPublicPath(p), p).toBe(true);
    for (const p of ['/projects', '/projects/a/runs/b', '/admin', '/tokens']) expect(isPublicPath(p), p).toBe(false);
  });
});
