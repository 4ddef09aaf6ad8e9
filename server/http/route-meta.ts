/**
 * Middleware factories (authenticate, requireRight, validateBody) tag the functions they return,
 * so the route registry can describe each route in OpenAPI without a second list.
 */
import type { RequestHandler } from 'express';
import type { TSchema } from '@sinclair/typebox';
import type { Right } from '../auth/rights';

export interface HandlerMeta {
  authenticates?: boolean;
  right?: Right;
  body?: TSchema;
  /** Answers 429 when called too often. */
  rateLimited?: boolean;
}

const META = Symbol('panelpoint.handler-meta');
type Tagged = RequestHandler & { [META]?: HandlerMeta };

/** Attach OpenAPI-relevant facts to a middleware; returns the same function. */
export function tagHandler<T extends RequestHandler>(fn: T, meta: HandlerMeta): T {
  (fn as Tagged)[META] = { ...(fn as Tagged)[META], ...meta };
  return fn;
}

export function handlerMeta(fn: RequestHandler): HandlerMeta {
  return (fn as Tagged)[META] ?? {};
}
