/** With the database unreachable, routes that need it answer 503 database-unavailable. */
import { createServer } from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { issueSession } from '../../server/auth/session';
import { createSequelize } from '../../server/db/sequelize';
import { createLogger } from '../../server/services/logger';
import { testConfig } from './support/test-app';

/** A loopback port nobody listens on. */
async function closedPort(): Promise<number> {
  const srv = createServer();
  await new Promise<void>((done) => srv.listen(0, '127.0.0.1', done));
  const { port } = srv.address() as { port: number };
  await new Promise<void>((done) => srv.close(() => done()));
  return port;
}

const config = testConfig();
const logs: string[] = [];
let sequelize: ReturnType<typeof createSequelize>;
let app: ReturnType<typeof createApp>;

beforeAll(async () => {
  sequelize = createSequelize({ host: '127.0.0.1', port: await closedPort(), database: 'none', user: 'none', password: 'x' });
  app = createApp({ sequelize, config, logger: createLogger({ sink: (l) => logs.push(l) }) });
});
afterAll(() => sequelize.close());

const DOWN = { code: 'database-unavailable', message: 'The database is not reachable; try again shortly.', details: [] };

describe('database down', () => {
  it('health answers 503', async () => {
    expect((await request(app).get('/api/health').expect(503)).body.error).toEqual(DOWN);
  });

  it('sign-in answers 503, not 401 or 500', async () => {
    const res = await request(app).post('/api/auth/sign-in').send({ email: 'a@b.example', password: 'secret-pw' }).expect(503);
    expect(res.body.error).toEqual(DOWN);
    expect(logs.join('\n')).not.toContain('secret-pw');
  });

  it('an authenticated route answers 503', async () => {
    const res = await request(app).get('/api/auth/me').set('Authorization', `Bearer ${issueSession(1, config)}`).expect(503);
    expect(res.body.error).toEqual(DOWN);
  });

  it('routes that need no database still answer', async () => {
    await request(app).get('/api/docs').expect(200);
    await request(app).post('/api/auth/sign-out').expect(204);
  });
});
