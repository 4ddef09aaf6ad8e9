/**
 * Who may do what: the caller's global rights, and their role and rights in a project. A
 * project the caller may not see answers 404, exactly like one that does not exist.
 */
import { Op } from 'sequelize';
import {
  allProjectRights, globalRightsOf, projectRightsOf, type GlobalRight, type ProjectRight,
} from '../auth/rights';
import { Membership } from '../db/models/membership.model';
import { Project } from '../db/models/project.model';
import type { User } from '../db/models/user.model';
import type { Principal, ProjectAccess } from '../http/context';
import { projectNotFound } from '../http/http-error';

/** Global rights of the caller; none through an API token (tokens act inside their project only). */
export function globalRights(p: Principal): Set<GlobalRight> {
  return p.token ? new Set() : globalRightsOf(p.user.role);
}

function userRights(user: User, membership: Membership | null): Set<ProjectRight> | undefined {
  if (globalRightsOf(user.role).has('projects:all')) return allProjectRights();
  return membership ? projectRightsOf(membership.role) : undefined;
}

/** The caller's standing in the project `slug`; 404 when it does not exist or is not visible. */
export async function projectAccess(p: Principal, slug: string): Promise<ProjectAccess> {
  const project = await Project.findOne({ where: { slug } });
  if (!project || (p.token && p.token.projectId !== project.id)) throw projectNotFound();
  const membership = await Membership.findOne({ where: { userId: p.user.id, projectId: project.id } });
  const base = userRights(p.user, membership);
  if (!base) throw projectNotFound();
  const rights = p.token ? new Set(p.token.scopes.filter((s) => base.has(s))) : base;
  return { project, role: membership?.role ?? null, rights };
}

/** Projects the caller can see, each with the caller's role there (null: seen through projects:all). */
export async function visibleProjects(p: Principal): Promise<{ project: Project; role: Membership['role'] | null }[]> {
  const memberships = await Membership.findAll({ where: { userId: p.user.id } });
  const roleOf = new Map(memberships.map((m) => [m.projectId, m.role]));
  let where = {};
  if (p.token) where = { id: p.token.projectId };
  else if (!globalRightsOf(p.user.role).has('projects:all')) where = { id: { [Op.in]: [...roleOf.keys()] } };
  const all = globalRightsOf(p.user.role).has('projects:all');
  const projects = (await Project.findAll({ where, order: [['name', 'ASC']] })).filter((pr) => all || roleOf.has(pr.id));
  return projects.map((project) => ({ project, role: roleOf.get(project.id) ?? null }));
}
