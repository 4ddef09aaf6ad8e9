/**
 * The built web app (dist/web, `npx vite build`) on the same port as /api: hashed assets with a
 * long cache, and index.html for every other GET that asks for HTML, so the app's own router
 * handles deep links (/projects/x/runs/y). /api paths never fall back: they keep their JSON 404.
 */
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import express, { type Router } from 'express';

/**
 * The page's policy: helmet's default, except that scripts may use eval. The web app checks
 * files in the browser with Ajv, which compiles each schema to a function; inline scripts stay
 * forbidden and everything still loads from this origin only.
 */
export const WEB_CSP = [
  "default-src 'self'", "base-uri 'self'", "font-src 'self' https: data:", "form-action 'self'", "frame-ancestors 'self'",
  "img-src 'self' data: blob:", "object-src 'none'", "script-src 'self' 'unsafe-eval'", "script-src-attr 'none'",
  "style-src 'self' https: 'unsafe-inline'", "worker-src 'self' blob:", 'upgrade-insecure-requests',
].join(';');

export function webAppBuilt(dir: string): boolean {
  return existsSync(join(dir, 'index.html'));
}

export function serveWeb(dir: string): Router {
  const root = resolve(dir);
  const router = express.Router();
  router.use(express.static(root, {
    index: false,
    setHeaders(res, path) {
      res.setHeader('Cache-Control', path.startsWith(join(root, 'assets')) ? 'public, max-age=31536000, immutable' : 'no-cache');
      if (path.endsWith('.html')) res.setHeader('Content-Security-Policy', WEB_CSP);
    },
  }));
  router.use((req, res, next) => {
    const spaRequest = (req.method === 'GET' || req.method === 'HEAD') && !/^\/api(\/|$)/.test(req.path) && req.accepts('html') === 'html';
    if (!spaRequest) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.setHeader('Content-Security-Policy', WEB_CSP);
    res.sendFile(join(root, 'index.html'));
  });
  return router;
}
