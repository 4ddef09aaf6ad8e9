import { describe, expect, it } from 'vitest';
import { Type } from '@sinclair/typebox';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { validateBody } from '../middleware/validate-body';
import { ApiRouter } from './api-router';
import { buildOpenApi } from './openapi';

const ok = () => undefined;

describe('ApiRouter', () => {
  it('records a route with its right, body schema and authentication', () => {
    const Body = Type.Object({ n: Type.Number() });
    const r = new ApiRouter('things').post('/projects/:slug/things', { summary: 'Add', status: 201 }, authenticate, requireRight('runs:push'), validateBody(Body), ok);
    expect(r.routes).toEqual([{
      method: 'post', path: '/projects/:slug/things', tag: 'things', doc: { summary: 'Add', status: 201 },
      authenticates: true, right: 'runs:push', body: Body, rateLimited: false,
    }]);
    const doc = buildOpenApi(r.routes, { title: 't', version: '1' }) as { paths: Record<string, Record<string, { operationId: string }>> };
    expect(Object.keys(doc.paths)).toEqual(['/api/projects/{slug}/things']);
    expect(doc.paths['/api/projects/{slug}/things'].post.operationId).toBe('postProjectsSlugThings');
  });

  it('refuses a project right on a path without :slug', () => {
    expect(() => new ApiRouter('x').get('/things', 'List', authenticate, requireRight('project:read'), ok)).toThrow(/needs :slug/);
  });

  it('refuses requireRight without authenticate before it', () => {
    expect(() => new ApiRouter('x').get('/users', 'List', requireRight('users:admin'), ok)).toThrow(/authenticate before/);
    expect(() => new ApiRouter('x').get('/users', 'List', requireRight('users:admin'), authenticate, ok)).toThrow(/authenticate before/);
  });
});
