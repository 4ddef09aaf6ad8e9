/**
 * Every route module of the API, mounted under /api in this order. A feature adds its module
 * here (one line); its routes join GET /api/docs by themselves.
 */
import type { ResolvedDeps } from '../app-deps';
import type { ApiRouter } from '../http/api-router';
import { authRoutes } from './auth.route';
import { invitationsRoutes } from './invitations.route';
import { membersRoutes } from './members.route';
import { projectsRoutes } from './projects.route';
import { systemRoutes } from './system.route';
import { tokensRoutes } from './tokens.route';
import { usersRoutes } from './users.route';

export type RouteModule = (deps: ResolvedDeps) => ApiRouter;

export const API_ROUTES: readonly RouteModule[] = [
  systemRoutes,
  authRoutes,
  usersRoutes,
  projectsRoutes,
  membersRoutes,
  invitationsRoutes,
  tokensRoutes,
];
