/**
 * The team server as an express app, without listen(): server/main.ts listens, tests drive it
 * with supertest. Every API route lives under /api and comes from a route module in
 * routes/api-routes.ts.
 */
import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import helmet from 'helmet';
import type { AppDeps, ResolvedDeps } from './app-deps';
import { initModels } from './db/init-models';
import { buildOpenApi } from './http/openapi';
import { serveWeb } from './http/static-web';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { requestLog } from './middleware/request-log';
import { API_ROUTES, type RouteModule } from './routes/api-routes';
import { createLogger } from './services/logger';
import { loggingMailer } from './services/mailer';

export const API_VERSION = '0.1.0';

export interface CreateAppOptions {
  /** Route modules to mount instead of API_ROUTES (tests of single features). */
  routes?: readonly RouteModule[];
  /** Serve the built web app from this folder (dist/web) beside /api, with an SPA fallback. */
  webDir?: string;
}

export function createApp(deps: AppDeps, options: CreateAppOptions = {}): Express {
  initModels(deps.sequelize);
  const logger = deps.logger ?? createLogger();
  const resolved: ResolvedDeps = { ...deps, logger, mailer: deps.mailer ?? loggingMailer(logger) };
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', deps.config.trustProxy);
  app.locals.deps = resolved;

  app.use(helmet());
  app.use(requestLog(logger));
  app.use(express.json({ limit: deps.config.jsonLimit }));
  app.use(cookieParser());

  const modules = (options.routes ?? API_ROUTES).map((m) => m(resolved));
  const api = express.Router();
  for (const m of modules) api.use(m.router);
  api.use(apiNotFound);
  app.use('/api', api);
  if (options.webDir) app.use(serveWeb(options.webDir));
  app.locals.openapi = buildOpenApi(modules.flatMap((m) => m.routes), { title: 'Panelpoint team server', version: API_VERSION });

  app.use(errorHandler(logger, deps.config.production));
  return app;
}
