/** Projects: the caller's list, creation (the creator becomes the project's admin), edits. */
import type { ProjectRight, Role } from '../auth/rights';
import { Membership } from '../db/models/membership.model';
import { Project } from '../db/models/project.model';
import type { User } from '../db/models/user.model';
import type { Principal, ProjectAccess } from '../http/context';
import { conflict } from '../http/http-error';
import type { ProjectCreate, ProjectUpdate } from '../schemas/projects';
import { visibleProjects } from './access.service';
import { audit } from './audit.service';

export interface PublicProject {
  slug: string;
  name: string;
  description: string;
  createdAt: Date;
  /** The caller's role; null when seen through `projects:all`. */
  role: Role | null;
}

export function publicProject(project: Project, role: Role | null): PublicProject {
  return { slug: project.slug, name: project.name, description: project.description, createdAt: project.createdAt, role };
}

export async function listProjects(p: Principal): Promise<PublicProject[]> {
  return (await visibleProjects(p)).map(({ project, role }) => publicProject(project, role));
}

export async function createProject(actor: User, input: ProjectCreate): Promise<PublicProject> {
  const sequelize = Project.sequelize!;
  const project = await sequelize.transaction(async (transaction) => {
    if (await Project.findOne({ where: { slug: input.slug }, transaction })) throw conflict('slug-taken', 'A project with this slug already exists.');
    const created = await Project.create({ slug: input.slug, name: input.name, description: input.description ?? '' }, { transaction });
    await Membership.create({ userId: actor.id, projectId: created.id, role: 'admin' }, { transaction });
    await audit({ userId: actor.id, projectId: created.id, action: 'project.create', entity: 'project', entityId: created.slug }, transaction);
    await audit({ userId: actor.id, projectId: created.id, action: 'member.add', entity: 'user', entityId: actor.id, details: { role: 'admin' } }, transaction);
    return created;
  });
  return publicProject(project, 'admin');
}

export function describeProject(access: ProjectAccess): PublicProject & { rights: ProjectRight[] } {
  return { ...publicProject(access.project, access.role), rights: [...access.rights].sort() };
}

export async function updateProject(actor: User, access: ProjectAccess, patch: ProjectUpdate): Promise<PublicProject> {
  await access.project.update(patch);
  await audit({ userId: actor.id, projectId: access.project.id, action: 'project.update', entity: 'project', entityId: access.project.slug, details: { changed: Object.keys(patch) } });
  return publicProject(access.project, access.role);
}

export async function deleteProject(actor: User, access: ProjectAccess): Promise<void> {
  const { project } = access;
  await project.destroy();
  await audit({ userId: actor.id, action: 'project.delete', entity: 'project', entityId: project.slug, details: { name: project.name } });
}
