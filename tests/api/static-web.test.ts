/** The built web app beside /api (server/http/static-web.ts): assets, deep links to index.html, /api untouched. */
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { startTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let app: ReturnType<typeof createApp>;
const dir = mkdtempSync(join(tmpdir(), 'pp-web-'));
beforeAll(async () => {
  t = await startTestApp();
  mkdirSync(join(dir, 'assets'));
  writeFileSync(join(dir, 'index.html'), '<!doctype html><title>Panelpoint</title><div id="root"></div>');
  writeFileSync(join(dir, 'assets', 'index-abc123.js'), 'console.log(1)');
  app = createApp({ sequelize: t.sequelize, config: t.config, mailer: t.mailer }, { webDir: dir });
});
afterAll(async () => {
  rmSync(dir, { recursive: true, force: true });
  await t.close();
});

describe('the web app on the API port', () => {
  it('serves hashed assets with a long cache and the page with a policy that lets Ajv compile', async () => {
    const js = await request(app).get('/assets/index-abc123.js').expect(200);
    expect(js.headers['cache-control']).toContain('immutable');
    const page = await request(app).get('/').set('Accept', 'text/html').expect(200);
    expect(page.text).toContain('<div id="root">');
    expect(page.headers['cache-control']).toBe('no-cache');
    expect(page.headers['content-security-policy']).toMatch(/script-src 'self' 'unsafe-eval'/);
    expect(page.headers['content-security-policy']).toMatch(/object-src 'none'/);
  });

  it('answers deep links with index.html, so the browser router takes over', async () => {
    const res = await request(app).get('/projects/harrow-lane-depot/runs/abc').set('Accept', 'text/html').expect(200);
    expect(res.text).toContain('<title>Panelpoint</title>');
  });

  it('leaves /api alone: unknown API paths stay JSON 404, and so do non-HTML requests', async () => {
    const api = await request(app).get('/api/no-such-route').set('Accept', 'text/html').expect(404);
    expect(api.body.error.code).toBe('route-not-found');
    await request(app).get('/api/health').expect(200);
    await request(app).get('/assets/missing.js').set('Accept', 'application/javascript').expect(404);
    await request(app).post('/projects').set('Accept', 'text/html').expect(404);
  });
});
