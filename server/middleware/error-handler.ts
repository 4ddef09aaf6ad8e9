/**
 * The one error handler: every error becomes `{ error: { code, message, details } }`.
 * HttpError as thrown; a lost database 503; unique-key races 409; malformed JSON 400;
 * anything else 500, with its message hidden in production.
 */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ConnectionError, ForeignKeyConstraintError, UniqueConstraintError, ValidationError } from 'sequelize';
import { InputError } from '../../shared/errors';
import { HttpError } from '../http/http-error';
import type { Logger } from '../services/logger';

const DB_DOWN_CODES = new Set([
  'ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'EHOSTUNREACH', 'ENOTFOUND', 'PROTOCOL_CONNECTION_LOST',
  'ER_SOCKET_UNEXPECTED_CLOSE', 'ER_CONNECTION_ALREADY_CLOSED', 'ER_GET_CONNECTION_TIMEOUT', 'ER_CONNECTION_TIMEOUT',
  'ER_CON_COUNT_ERROR', 'ER_SERVER_SHUTDOWN',
]);

/** True for errors that mean the database cannot be reached (as opposed to a bad query). */
export function isDatabaseDown(err: unknown): boolean {
  if (err instanceof ConnectionError) return true;
  const e = err as { code?: unknown; fatal?: unknown; original?: unknown; parent?: unknown } | null;
  if (!e || typeof e !== 'object') return false;
  if (typeof e.code === 'string' && DB_DOWN_CODES.has(e.code)) return true;
  const inner = e.original ?? e.parent;
  return inner !== undefined && inner !== err && isDatabaseDown(inner);
}

export const databaseUnavailable = () =>
  new HttpError(503, 'database-unavailable', 'The database is not reachable; try again shortly.');

function bodyParserError(err: unknown): HttpError | undefined {
  const e = err as { type?: unknown; status?: unknown; expose?: unknown; message?: unknown };
  if (e?.type === 'entity.parse.failed') return new HttpError(400, 'invalid-json', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large') return new HttpError(413, 'body-too-large', 'The request body is too large.');
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500 && e.expose) {
    return new HttpError(e.status, 'bad-request', String(e.message));
  }
  return undefined;
}

/** The HttpError to answer with, and whether the error is the server's fault. */
export function toHttpError(err: unknown, production: boolean): HttpError {
  if (err instanceof HttpError) return err;
  if (err instanceof InputError) {
    return new HttpError(422, 'invalid-input', 'The input is not valid.', err.issues.map(({ path, message }) => ({ path, message })));
  }
  if (isDatabaseDown(err)) return databaseUnavailable();
  if (err instanceof UniqueConstraintError) {
    return new HttpError(409, 'conflict', 'This conflicts with something that already exists.', err.errors.map((e) => ({ path: e.path ?? '', message: 'must be unique' })));
  }
  if (err instanceof ForeignKeyConstraintError) return new HttpError(409, 'conflict', 'This refers to something that does not exist, or is still in use.');
  if (err instanceof ValidationError) {
    return new HttpError(422, 'invalid-input', 'The input is not valid.', err.errors.map((e) => ({ path: e.path ?? '', message: e.message })));
  }
  const parsed = bodyParserError(err);
  if (parsed) return parsed;
  const message = production || !(err instanceof Error) ? 'Something went wrong on the server; it has been logged.' : err.message;
  return new HttpError(500, 'internal-error', message);
}

export function errorHandler(logger: Logger, production: boolean): ErrorRequestHandler {
  return (err, req, res, next) => {
    const e = toHttpError(err, production);
    if (e.status === 503) logger.warn('service unavailable', { code: e.code, path: req.originalUrl, error: err });
    else if (e.status >= 500) logger.error('request failed', { path: req.originalUrl, error: err });
    if (res.headersSent) return next(err);
    res.status(e.status).json({ error: { code: e.code, message: e.message, details: e.details } });
  };
}

/** JSON 404 for /api paths no route answers. */
export const apiNotFound: RequestHandler = (req) => {
  throw new HttpError(404, 'route-not-found', `No API route ${req.method} ${req.path}.`);
};
