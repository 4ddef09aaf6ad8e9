/**
 * What a handler knows about the request: who is calling (set by `authenticate`), the project
 * and the caller's rights in it (set by `requireRight` for project rights), and the app's deps.
 */
import type { Request } from 'express';
import type { ResolvedDeps } from '../app-deps';
import type { ProjectRight, Role } from '../auth/rights';
import type { ApiToken } from '../db/models/api-token.model';
import type { Project } from '../db/models/project.model';
import type { User } from '../db/models/user.model';
import { unauthorized } from './http-error';

export interface Principal {
  user: User;
  /** How the caller proved who they are. */
  via: 'cookie' | 'bearer' | 'api-token';
  /** The API token, when `via` is 'api-token': the caller is limited to its project and scopes. */
  token?: ApiToken;
}

export interface ProjectAccess {
  project: Project;
  /** The caller's role in the project; null for someone who sees it through `projects:all`. */
  role: Role | null;
  rights: ReadonlySet<ProjectRight>;
}

const principals = new WeakMap<Request, Principal>();
const access = new WeakMap<Request, ProjectAccess>();

export function setPrincipal(req: Request, principal: Principal): void {
  principals.set(req, principal);
}

/** The caller, or undefined before `authenticate` (public routes). */
export function principalOf(req: Request): Principal | undefined {
  return principals.get(req);
}

/** The caller; 401 when nobody signed in. */
export function currentPrincipal(req: Request): Principal {
  const p = principals.get(req);
  if (!p) throw unauthorized();
  return p;
}

/** The signed-in user; 401 when nobody signed in. */
export function currentUser(req: Request): User {
  return currentPrincipal(req).user;
}

export function setProjectAccess(req: Request, value: ProjectAccess): void {
  access.set(req, value);
}

/** The project named by `:slug` with the caller's role and rights; set by `requireRight(<project right>)`. */
export function currentProject(req: Request): ProjectAccess {
  const a = access.get(req);
  if (!a) throw new Error('currentProject() needs requireRight(<a project right>) earlier in the route');
  return a;
}

/** The dependencies createApp was given, defaults filled in. */
export function appDeps(req: Request): ResolvedDeps {
  return req.app.locals.deps as ResolvedDeps;
}
