/** One log line per answered request: method, path, status, milliseconds, user id. */
import type { RequestHandler } from 'express';
import { principalOf } from '../http/context';
import type { Logger } from '../services/logger';

export function requestLog(logger: Logger): RequestHandler {
  return (req, res, next) => {
    const start = process.hrtime.bigint();
    res.on('finish', () => {
      const ms = Number(process.hrtime.bigint() - start) / 1e6;
      const fields = { method: req.method, path: req.originalUrl, status: res.statusCode, ms: Math.round(ms * 10) / 10, user: principalOf(req)?.user.id };
      if (res.statusCode >= 500) logger.warn('request', fields);
      else logger.info('request', fields);
    });
    next();
  };
}
