/** Reading query parameters the same way in every controller: bad values are 422 with the parameter as path. */
import type { Request } from 'express';
import { HttpError } from '../http/http-error';

const bad = (name: string, message: string) => new HttpError(422, 'invalid-query', 'The query is not valid.', [{ path: name, message }]);

/** A single text parameter, or undefined when absent or empty. */
export function queryText(req: Request, name: string): string | undefined {
  const v = req.query[name];
  if (v === undefined || v === '') return undefined;
  if (typeof v !== 'string') throw bad(name, 'give it once, as text');
  return v;
}

/** `?limit=`: a whole number from 1 to `max`, `fallback` when absent. */
export function queryLimit(req: Request, fallback: number, max: number): number {
  const v = queryText(req, 'limit');
  if (v === undefined) return fallback;
  const n = Number(v);
  if (!Number.isInteger(n) || n < 1 || n > max) throw bad('limit', `must be a whole number from 1 to ${max}`);
  return n;
}
