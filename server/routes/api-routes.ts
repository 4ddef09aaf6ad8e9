/**
 * Every route module of the API, mounted under /api in this order. A feature adds its module
 * here (one line); its routes join GET /api/docs by themselves.
 */
import type { ResolvedDeps } from '../app-deps';
import type { ApiRouter } from '../http/api-router';
import { authRoutes } from './auth.route';
import { casesRoutes } from './cases.route';
import { checksRoutes } from './checks.route';
import { invitationsRoutes } from './invitations.route';
import { mailRoutes } from './mail.route';
import { membersRoutes } from './members.route';
import { projectsRoutes } from './projects.route';
import { systemRoutes } from './system.route';
import { tokensRoutes } from './tokens.route';
import { uploadsRoutes } from './uploads.route';
import { usersRoutes } from './users.route';
import { studiesRoutes } from './studies.route';
import { runsRoutes } from './runs.route';
import { variantsRoutes } from './variants.route';
import { marksRoutes } from './marks.route';
import { commentsRoutes } from './comments.route';

export type RouteModule = (deps: ResolvedDeps) => ApiRouter;

export const API_ROUTES: readonly RouteModule[] = [
  systemRoutes,
  authRoutes,
  usersRoutes,
  projectsRoutes,
  membersRoutes,
  invitationsRoutes,
  tokensRoutes,
  uploadsRoutes,
  casesRoutes,
  checksRoutes,
  mailRoutes,
  studiesRoutes,
  runsRoutes,
  variantsRoutes,
  marksRoutes,
  commentsRoutes,
];
