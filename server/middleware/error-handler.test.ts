import express from 'express';
import request from 'supertest';
import { ConnectionRefusedError, DatabaseError } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../shared/errors';
import { HttpError } from '../http/http-error';
import { createLogger } from '../services/logger';
import { errorHandler, isDatabaseDown } from './error-handler';

function appThrowing(err: unknown, production: boolean, lines: string[] = []) {
  const app = express();
  app.get('/boom', () => {
    throw err;
  });
  app.use(errorHandler(createLogger({ sink: (l) => lines.push(l) }), production));
  return app;
}

describe('error handler', () => {
  it('answers an HttpError with its status, code, message and details', async () => {
    const res = await request(appThrowing(new HttpError(409, 'taken', 'Taken.', [{ path: 'slug', message: 'must be unique' }]), true)).get('/boom').expect(409);
    expect(res.body).toEqual({ error: { code: 'taken', message: 'Taken.', details: [{ path: 'slug', message: 'must be unique' }] } });
  });

  it('hides the message of an unexpected error in production, and logs it', async () => {
    const lines: string[] = [];
    const res = await request(appThrowing(new Error('secret internals'), true, lines)).get('/boom').expect(500);
    expect(res.body.error).toEqual({ code: 'internal-error', message: 'Something went wrong on the server; it has been logged.', details: [] });
    expect(lines.join('\n')).toContain('secret internals');
  });

  it('shows it in development', async () => {
    const res = await request(appThrowing(new Error('secret internals'), false)).get('/boom').expect(500);
    expect(res.body.error.message).toBe('secret internals');
  });

  it('turns an InputError from shared/ into 422 with its paths', async () => {
    const err = new InputError(undefined, [{ path: 'members[0].to', message: 'no node has id "x"', code: 'unknown-node' }]);
    const res = await request(appThrowing(err, true)).get('/boom').expect(422);
    expect(res.body.error.details).toEqual([{ path: 'members[0].to', message: 'no node has id "x"' }]);
  });

  it('turns a lost database into 503, whether refused or dropped mid-query', async () => {
    const refused = new ConnectionRefusedError(Object.assign(new Error('connect ECONNREFUSED'), { code: 'ECONNREFUSED' }));
    const dropped = new DatabaseError(Object.assign(new Error('socket closed'), { code: 'ER_SOCKET_UNEXPECTED_CLOSE', sql: '' }) as never);
    for (const err of [refused, dropped]) {
      const res = await request(appThrowing(err, true)).get('/boom').expect(503);
      expect(res.body.error.code).toBe('database-unavailable');
    }
    expect(isDatabaseDown(new DatabaseError(Object.assign(new Error('syntax'), { code: 'ER_PARSE_ERROR', sql: '' }) as never))).toBe(false);
  });
});
