/** GET /api/docs: OpenAPI 3.1 from the route registry, with the TypeBox request schemas. */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SignIn } from '../../server/schemas/auth';
import { TokenCreate } from '../../server/schemas/tokens';
import { startTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let doc: { openapi: string; paths: Record<string, Record<string, Record<string, unknown>>> };
beforeAll(async () => {
  t = await startTestApp();
  doc = (await request(t.app).get('/api/docs').expect(200)).body;
});
afterAll(() => t.close());

const plain = (x: unknown) => JSON.parse(JSON.stringify(x));

describe('OpenAPI', () => {
  it('is OpenAPI 3.1 with every foundation route', () => {
    expect(doc.openapi).toBe('3.1.0');
    const ops = Object.entries(doc.paths).flatMap(([p, o]) => Object.keys(o).map((m) => `${m.toUpperCase()} ${p}`));
    expect(ops).toEqual(expect.arrayContaining([
      'POST /api/auth/sign-in', 'POST /api/auth/sign-out', 'GET /api/auth/me', 'POST /api/auth/password-reset',
      'POST /api/auth/password-reset/confirm', 'GET /api/users', 'POST /api/users', 'GET /api/users/{id}', 'PATCH /api/users/{id}',
      'DELETE /api/users/{id}', 'GET /api/projects', 'POST /api/projects', 'GET /api/projects/{slug}', 'PATCH /api/projects/{slug}',
      'DELETE /api/projects/{slug}', 'GET /api/projects/{slug}/members', 'POST /api/projects/{slug}/members',
      'PATCH /api/projects/{slug}/members/{userId}', 'DELETE /api/projects/{slug}/members/{userId}',
      'POST /api/projects/{slug}/invitations', 'GET /api/projects/{slug}/invitations', 'DELETE /api/projects/{slug}/invitations/{id}',
      'POST /api/invitations/accept', 'POST /api/projects/{slug}/tokens', 'GET /api/projects/{slug}/tokens',
      'DELETE /api/projects/{slug}/tokens/{id}', 'GET /api/health', 'GET /api/docs',
    ]));
  });

  it('carries the request schemas, path parameters, rights and security', () => {
    const signIn = doc.paths['/api/auth/sign-in'].post as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
    expect(signIn.requestBody.content['application/json'].schema).toEqual(plain(SignIn));
    expect(signIn.security).toBeUndefined();
    expect(Object.keys(signIn.responses)).toEqual(expect.arrayContaining(['200', '422', '429']));
    const token = doc.paths['/api/projects/{slug}/tokens'].post as Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
    expect(token.requestBody.content['application/json'].schema).toEqual(plain(TokenCreate));
    expect(token.parameters).toEqual([{ name: 'slug', in: 'path', required: true, schema: { type: 'string' } }]);
    expect(token['x-required-right']).toBe('tokens:manage');
    expect(token.security).toEqual([{ bearer: [] }, { cookie: [] }]);
    expect(Object.keys(token.responses)).toEqual(expect.arrayContaining(['201', '401', '403', '404', '422']));
  });

  it('gives every operation a unique operationId', () => {
    const ids = Object.values(doc.paths).flatMap((o) => Object.values(o).map((op) => op.operationId));
    expect(new Set(ids).size).toBe(ids.length);
  });
});
