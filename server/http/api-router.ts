/**
 * An express Router that also records each route for the OpenAPI description. A route file reads
 * like a table:
 *
 *   const r = new ApiRouter('projects');
 *   r.post('/projects', { summary: 'Create a project', status: 201 },
 *     authenticate, requireRight('projects:create'), validateBody(ProjectCreate), createProject);
 *
 * Paths are relative to /api. A project right needs `:slug` in the path.
 */
import express, { type RequestHandler, type Router } from 'express';
import type { TSchema } from '@sinclair/typebox';
import { isProjectRight, type Right } from '../auth/rights';
import { handlerMeta } from './route-meta';

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

export interface RouteDoc {
  summary: string;
  description?: string;
  /** Status of a successful answer; 200 unless given. */
  status?: number;
}

export interface RouteEntry {
  method: Method;
  /** Express path relative to /api, e.g. `/projects/:slug/tokens`. */
  path: string;
  tag: string;
  doc: RouteDoc;
  authenticates: boolean;
  right?: Right;
  body?: TSchema;
  rateLimited: boolean;
}

export class ApiRouter {
  readonly router: Router = express.Router();
  readonly routes: RouteEntry[] = [];

  constructor(readonly tag: string) {}

  get(path: string, doc: RouteDoc | string, ...handlers: RequestHandler[]): this {
    return this.add('get', path, doc, handlers);
  }
  post(path: string, doc: RouteDoc | string, ...handlers: RequestHandler[]): this {
    return this.add('post', path, doc, handlers);
  }
  put(path: string, doc: RouteDoc | string, ...handlers: RequestHandler[]): this {
    return this.add('put', path, doc, handlers);
  }
  patch(path: string, doc: RouteDoc | string, ...handlers: RequestHandler[]): this {
    return this.add('patch', path, doc, handlers);
  }
  delete(path: string, doc: RouteDoc | string, ...handlers: RequestHandler[]): this {
    return this.add('delete', path, doc, handlers);
  }

  private add(method: Method, path: string, doc: RouteDoc | string, handlers: RequestHandler[]): this {
    const metas = handlers.map(handlerMeta);
    const entry: RouteEntry = {
      method, path, tag: this.tag,
      doc: typeof doc === 'string' ? { summary: doc } : doc,
      authenticates: metas.some((m) => m.authenticates),
      right: metas.find((m) => m.right)?.right,
      body: metas.find((m) => m.body)?.body,
      rateLimited: metas.some((m) => m.rateLimited),
    };
    const where = `${method.toUpperCase()} ${path}`;
    const authAt = metas.findIndex((m) => m.authenticates);
    const rightAt = metas.findIndex((m) => m.right);
    if (rightAt >= 0 && (authAt < 0 || authAt > rightAt)) throw new Error(`${where}: requireRight needs authenticate before it`);
    if (entry.right && isProjectRight(entry.right) && !path.includes(':slug')) {
      throw new Error(`${where}: the project right ${entry.right} needs :slug in the path`);
    }
    this.router[method](path, ...handlers);
    this.routes.push(entry);
    return this;
  }
}
