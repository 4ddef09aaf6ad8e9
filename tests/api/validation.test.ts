/** Validation errors name the paths at fault; every error has the one JSON shape. */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './support/test-app';
import { buildWorld, type World } from './support/world';

let t: TestApp;
let w: World;

beforeAll(async () => {
  t = await startTestApp();
  w = await buildWorld(t);
});
afterAll(() => t.close());

describe('request validation', () => {
  it('answers 422 with one detail per problem, each with its path', async () => {
    const res = await w.as('admin').post('/api/users').send({ email: 'not an email', name: '', role: 'owner', shoe: 42 }).expect(422);
    expect(res.body.error.code).toBe('invalid-body');
    const byPath = Object.fromEntries(res.body.error.details.map((d: { path: string; message: string }) => [d.path, d.message]));
    expect(Object.keys(byPath).sort()).toEqual(['email', 'name', 'role', 'shoe']);
    expect(byPath.shoe).toBe('unknown key "shoe"');
    expect(byPath.role).toBe('must be one of "admin", "engineer", "reviewer", "viewer"');
    expect(byPath.name).toBe('must not be empty');
  });

  it('points a missing key at the object that lacks it', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: 'a@b.example' }).expect(422);
    expect(res.body.error.details).toEqual([{ path: '', message: 'missing key "password"' }]);
  });

  it('uses array indices in paths', async () => {
    const res = await w.as('engineer').post(`/api/projects/${w.project.slug}/tokens`).send({ name: 'x', scopes: ['project:read', 'fly'] }).expect(422);
    expect(res.body.error.details.map((d: { path: string }) => d.path)).toEqual(['scopes[1]']);
  });

  it('treats a missing body as an empty object', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').expect(422);
    expect(res.body.error.details.map((d: { message: string }) => d.message)).toEqual(['missing key "email"', 'missing key "password"']);
  });

  it('answers 400 to malformed JSON', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email":').expect(400);
    expect(res.body.error).toEqual({ code: 'invalid-json', message: 'The request body is not valid JSON.', details: [] });
  });

  it('rejects an empty patch', async () => {
    const res = await w.as('admin').patch(`/api/projects/${w.project.slug}`).send({}).expect(422);
    expect(res.body.error.details).toHaveLength(1);
  });
});

describe('other errors', () => {
  it('answers unknown API routes with a JSON 404', async () => {
    const res = await request(t.app).get('/api/nothing/here').expect(404);
    expect(res.body.error).toMatchObject({ code: 'route-not-found', details: [] });
  });

  it('answers 409 to a taken slug and a taken email', async () => {
    await w.as('admin').post('/api/projects').send({ slug: w.project.slug, name: 'Again' }).expect(409);
    const res = await w.as('admin').post('/api/users').send({ email: w.people.viewer.email.toUpperCase(), name: 'Twin', role: 'viewer' }).expect(409);
    expect(res.body.error.code).toBe('email-taken');
  });

  it('answers 404 to ids that are not numbers', async () => {
    expect((await w.as('admin').get('/api/users/abc').expect(404)).body.error.code).toBe('user-not-found');
  });

  it('keeps an admin from demoting or deleting themself', async () => {
    const id = w.people.admin.user.id;
    expect((await w.as('admin').patch(`/api/users/${id}`).send({ role: 'viewer' }).expect(409)).body.error.code).toBe('cannot-change-self');
    await w.as('admin').delete(`/api/users/${id}`).expect(409);
  });
});
