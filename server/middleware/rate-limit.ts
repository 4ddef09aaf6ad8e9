/**
 * Attempt limits for sign-in and reset requests: `max` per window per client IP and email, so
 * one guessed account cannot be hammered and one client cannot spray many.
 */
import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { ServerConfig } from '../config';
import { HttpError } from '../http/http-error';
import { tagHandler } from '../http/route-meta';

function emailOf(req: Request): string {
  const email: unknown = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase().slice(0, 254) : '';
}

export interface AttemptLimitOptions {
  /** Words for the message: 'sign-in' gives "Too many sign-in attempts". */
  what: string;
  /** Count only failed attempts (sign-in: a right password does not use up the allowance). */
  onlyFailures: boolean;
}

export function attemptLimit(config: ServerConfig, options: AttemptLimitOptions): RequestHandler {
  const limiter = rateLimit({
    windowMs: config.signInLimit.windowMs,
    limit: config.signInLimit.max,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    skipSuccessfulRequests: options.onlyFailures,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? 'unknown')}|${emailOf(req)}`,
    handler: (_req, _res, next) => {
      next(new HttpError(429, 'too-many-attempts', `Too many ${options.what} attempts; wait a minute and try again.`));
    },
  });
  return tagHandler(limiter, { rateLimited: true });
}
