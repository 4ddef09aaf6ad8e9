// @vitest-environment jsdom
import { describe, expect, it, vi } from 'vitest';
import { ApiError, createApiClient } from '@/lib/api-client';

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

describe('api client', () => {
  it("turns the server's error JSON into an ApiError with code, message and details", async () => {
    const fetch = vi.fn(async () => json(400, { error: { code: 'invalid-body', message: 'The model has 1 problem.', details: [{ path: 'members[3].to', message: 'unknown joint' }] } }));
    const c = createApiClient({ fetch });
    const err = (await c.post('/runs', { a: 1 }).catch((e: unknown) => e)) as ApiError;
    expect(err).toBeInstanceOf(ApiError);
    expect([err.status, err.code, err.message]).toEqual([400, 'invalid-body', 'The model has 1 problem.']);
    expect(err.details).toEqual([{ path: 'members[3].to', message: 'unknown joint' }]);
    expect(fetch).toHaveBeenCalledWith('/api/runs', expect.objectContaining({ method: 'POST', body: '{"a":1}' }));
  });

  it('calls onUnauthorized on a 401 and still rejects', async () => {
    const onUnauthorized = vi.fn();
    const c = createApiClient({ fetch: async () => json(401, { error: { code: 'unauthenticated', message: 'Sign in first.' } }), onUnauthorized });
    await expect(c.get('/auth/me')).rejects.toMatchObject({ status: 401, message: 'Sign in first.' });
    expect(onUnauthorized).toHaveBeenCalledTimes(1);
  });

  it('gives a message a person can act on when the body is not JSON or the server is away', async () => {
    const proxy = createApiClient({ fetch: async () => new Response('<html>Bad gateway</html>', { status: 502, headers: { 'content-type': 'text/html' } }) });
    await expect(proxy.get('/projects')).rejects.toMatchObject({ status: 502, code: 'http-502', message: expect.stringContaining('not available') });
    const away = createApiClient({ fetch: async () => { throw new TypeError('fetch failed'); } });
    await expect(away.get('/projects')).rejects.toMatchObject({ status: 0, code: 'network' });
    const html = createApiClient({ fetch: async () => new Response('<!doctype html>', { status: 200, headers: { 'content-type': 'text/html' } }) });
    await expect(html.get('/projects', { query: { page: 2, q: undefined } })).rejects.toMatchObject({ code: 'bad-response' });
  });
});
