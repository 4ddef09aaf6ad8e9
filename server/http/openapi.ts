/** The OpenAPI 3.1 description of the API, built from the routes the ApiRouters recorded. */
import type { TSchema } from '@sinclair/typebox';
import type { RouteEntry } from './api-router';

type Json = Record<string, unknown>;

const ERROR_SCHEMA = {
  type: 'object',
  required: ['error'],
  properties: {
    error: {
      type: 'object',
      required: ['code', 'message', 'details'],
      properties: {
        code: { type: 'string' },
        message: { type: 'string' },
        details: {
          type: 'array',
          items: { type: 'object', required: ['path', 'message'], properties: { path: { type: 'string' }, message: { type: 'string' } } },
        },
      },
    },
  },
};

/** A TypeBox schema as plain JSON Schema (TypeBox's symbol keys dropped). */
function plain(schema: TSchema): Json {
  return JSON.parse(JSON.stringify(schema)) as Json;
}

const errorResponse = (description: string) => ({ description, content: { 'application/json': { schema: { $ref: '#/components/schemas/Error' } } } });

function operation(r: RouteEntry): Json {
  const params = [...r.path.matchAll(/:([A-Za-z0-9_]+)/g)].map((m) => ({
    name: m[1], in: 'path', required: true, schema: { type: 'string' },
  }));
  const status = String(r.doc.status ?? 200);
  const responses: Json = { [status]: { description: status === '204' ? 'Done; no content' : 'Success' } };
  if (r.body) responses['422'] = errorResponse('The body does not match the schema; details carry the paths');
  if (r.authenticates) responses['401'] = errorResponse('Not signed in, or the token is not valid');
  if (r.right) responses['403'] = errorResponse(`The caller lacks the right ${r.right}`);
  if (r.path.includes(':')) responses['404'] = errorResponse('No such thing, or not visible to the caller');
  if (r.rateLimited) responses['429'] = errorResponse('Too many attempts');
  responses['503'] = errorResponse('The database is not reachable');
  const op: Json = {
    tags: [r.tag],
    summary: r.doc.summary,
    operationId: `${r.method}${r.path.replace(/[/:-]+([a-z])?/g, (_, c: string | undefined) => (c ?? '').toUpperCase())}`,
    responses,
  };
  if (r.doc.description) op.description = r.doc.description;
  if (params.length) op.parameters = params;
  if (r.body) op.requestBody = { required: true, content: { 'application/json': { schema: plain(r.body) } } };
  if (r.authenticates) op.security = [{ bearer: [] }, { cookie: [] }];
  if (r.right) op['x-required-right'] = r.right;
  return op;
}

export interface OpenApiInfo {
  title: string;
  version: string;
}

/** The document for GET /api/docs; paths in OpenAPI form (`/api/projects/{slug}`). */
export function buildOpenApi(routes: readonly RouteEntry[], info: OpenApiInfo): Json {
  const paths: Record<string, Json> = {};
  for (const r of routes) {
    const path = '/api' + r.path.replace(/:([A-Za-z0-9_]+)/g, '{$1}');
    paths[path] ??= {};
    paths[path][r.method] = operation(r);
  }
  return {
    openapi: '3.1.0',
    info,
    paths,
    components: {
      schemas: { Error: ERROR_SCHEMA },
      securitySchemes: {
        bearer: { type: 'http', scheme: 'bearer', description: 'A session JWT from sign-in, or an API token pp_<prefix>_<secret>' },
        cookie: { type: 'apiKey', in: 'cookie', name: 'pp_session' },
      },
    },
  };
}
