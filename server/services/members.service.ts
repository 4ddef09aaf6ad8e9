/** Project members: list, add an existing account, change a role, remove. */
import { Op } from 'sequelize';
import { projectRightsOf, ROLES, type Role } from '../auth/rights';
import { Membership } from '../db/models/membership.model';
import type { Project } from '../db/models/project.model';
import { User } from '../db/models/user.model';
import { conflict, notFound } from '../http/http-error';
import type { MemberAdd } from '../schemas/projects';
import { audit } from './audit.service';

export interface PublicMember {
  user: { id: number; email: string; name: string };
  role: Role;
  since: Date;
}

function publicMember(m: Membership, u: User): PublicMember {
  return { user: { id: u.id, email: u.email, name: u.name }, role: m.role, since: m.createdAt };
}

export async function listMembers(project: Project): Promise<PublicMember[]> {
  const rows = await Membership.findAll({
    where: { projectId: project.id }, include: [{ model: User, as: 'user' }], order: [['createdAt', 'ASC'], ['id', 'ASC']],
  });
  return rows.map((m) => publicMember(m, m.user!));
}

export async function addMember(actor: User, project: Project, input: MemberAdd): Promise<PublicMember> {
  const user = await User.findOne({ where: { email: input.email.toLowerCase() } });
  if (!user) throw notFound('user-not-found', 'No account has this email; send an invitation instead.');
  if (await Membership.findOne({ where: { userId: user.id, projectId: project.id } })) {
    throw conflict('already-member', 'This person is already a member of the project.');
  }
  const m = await Membership.create({ userId: user.id, projectId: project.id, role: input.role });
  await audit({ userId: actor.id, projectId: project.id, action: 'member.add', entity: 'user', entityId: user.id, details: { role: input.role } });
  return publicMember(m, user);
}

async function findMembership(project: Project, userIdText: string): Promise<Membership> {
  const userId = /^\d{1,10}$/.test(userIdText) ? Number(userIdText) : NaN;
  const m = Number.isNaN(userId) ? null : await Membership.findOne({
    where: { projectId: project.id, userId }, include: [{ model: User, as: 'user' }],
  });
  if (!m) throw notFound('member-not-found', 'This person is not a member of the project.');
  return m;
}

const ADMIN_ROLES = ROLES.filter((r) => projectRightsOf(r).has('project:admin'));

/** 409 when `m` is the project's last member who can administer it and would stop being one. */
async function keepOneAdmin(m: Membership, nextRole: Role | null): Promise<void> {
  if (!ADMIN_ROLES.includes(m.role) || (nextRole && ADMIN_ROLES.includes(nextRole))) return;
  const admins = await Membership.count({ where: { projectId: m.projectId, role: { [Op.in]: ADMIN_ROLES } } });
  if (admins <= 1) throw conflict('last-project-admin', 'The project needs at least one member who can administer it.');
}

export async function changeRole(actor: User, project: Project, userIdText: string, role: Role): Promise<PublicMember> {
  const m = await findMembership(project, userIdText);
  await keepOneAdmin(m, role);
  const from = m.role;
  await m.update({ role });
  await audit({ userId: actor.id, projectId: project.id, action: 'member.role', entity: 'user', entityId: m.userId, details: { from, to: role } });
  return publicMember(m, m.user!);
}

export async function removeMember(actor: User, project: Project, userIdText: string): Promise<void> {
  const m = await findMembership(project, userIdText);
  await keepOneAdmin(m, null);
  await m.destroy();
  await audit({ userId: actor.id, projectId: project.id, action: 'member.remove', entity: 'user', entityId: m.userId, details: { role: m.role } });
}
