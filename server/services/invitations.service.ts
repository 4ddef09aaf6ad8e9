/** Invitations to a project by mailed link; accepting creates the account when there is none. */
import { Op } from 'sequelize';
import type { ResolvedDeps } from '../app-deps';
import { canGrantRole, type Role } from '../auth/rights';
import { newSecret, sha256Hex } from '../auth/secrets';
import { issueSession } from '../auth/session';
import type { ServerConfig } from '../config';
import { Invitation } from '../db/models/invitation.model';
import { Membership } from '../db/models/membership.model';
import { Project } from '../db/models/project.model';
import { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { conflict, forbidden, HttpError, notFound } from '../http/http-error';
import type { InvitationAccept, InvitationCreate } from '../schemas/invitations';
import { audit } from './audit.service';
import { invitationMail } from './mail-templates';
import { invalidLink } from './password-reset.service';
import { sendMail } from './send-mail';
import { createAccount, publicUser, type PublicUser } from './users.service';

export interface PublicInvitation {
  id: number;
  email: string;
  role: Role;
  expiresAt: Date;
  createdAt: Date;
}

const publicInvitation = (i: Invitation): PublicInvitation => ({ id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt, createdAt: i.createdAt });

/** Invite `email` with `role` (which must not exceed the inviter's rights) and mail the link. */
export async function createInvitation(actor: User, access: ProjectAccess, input: InvitationCreate, deps: ResolvedDeps): Promise<PublicInvitation> {
  const { project } = access;
  const email = input.email.toLowerCase();
  if (!canGrantRole(access.rights, input.role)) throw forbidden(`You cannot invite someone as ${input.role}.`, 'role-not-allowed');
  const existing = await User.findOne({ where: { email } });
  if (existing && (await Membership.findOne({ where: { userId: existing.id, projectId: project.id } }))) {
    throw conflict('already-member', 'This person is already a member of the project.');
  }
  const { secret, hash } = newSecret();
  const expiresAt = new Date(Date.now() + deps.config.invitationTtlDays * 86_400_000);
  await Invitation.destroy({ where: { projectId: project.id, email, usedAt: null } });
  const inv = await Invitation.create({ projectId: project.id, email, role: input.role, tokenHash: hash, invitedBy: actor.id, expiresAt, usedAt: null });
  await audit({ userId: actor.id, projectId: project.id, action: 'invitation.create', entity: 'invitation', entityId: inv.id, details: { email, role: input.role } });
  const link = `${deps.config.publicUrl}/invitations/accept?token=${encodeURIComponent(secret)}`;
  await sendMail(deps.mailer, deps.logger, invitationMail(email, link, project.name, actor.name, input.role, deps.config.invitationTtlDays));
  return publicInvitation(inv);
}

export async function listInvitations(access: ProjectAccess): Promise<PublicInvitation[]> {
  const rows = await Invitation.findAll({
    where: { projectId: access.project.id, usedAt: null, expiresAt: { [Op.gt]: new Date() } }, order: [['createdAt', 'DESC']],
  });
  return rows.map(publicInvitation);
}

export async function revokeInvitation(actor: User, access: ProjectAccess, idText: string): Promise<void> {
  const id = /^\d{1,10}$/.test(idText) ? Number(idText) : NaN;
  const inv = Number.isNaN(id) ? null : await Invitation.findOne({ where: { id, projectId: access.project.id, usedAt: null } });
  if (!inv) throw notFound('invitation-not-found', 'No such pending invitation.');
  await inv.destroy();
  await audit({ userId: actor.id, projectId: access.project.id, action: 'invitation.revoke', entity: 'invitation', entityId: inv.id, details: { email: inv.email } });
}

export interface Accepted {
  user: PublicUser;
  project: { slug: string; name: string };
  role: Role;
  /** A session for the accepting user (they are signed in). */
  token: string;
}

const needsAccount = () => new HttpError(422, 'invalid-body', 'A new account needs a name and a password.', [
  { path: '', message: 'name and password are needed: no account has the invited email yet' },
]);

export async function acceptInvitation(input: InvitationAccept, config: ServerConfig): Promise<Accepted> {
  const inv = await Invitation.findOne({
    where: { tokenHash: sha256Hex(input.token), usedAt: null, expiresAt: { [Op.gt]: new Date() } },
    include: [{ model: Project, as: 'project' }],
  });
  if (!inv || !inv.project) throw invalidLink('invitation');
  const project = inv.project;
  let user = await User.findOne({ where: { email: inv.email } });
  if (user?.disabled) throw forbidden('This account is disabled; ask an administrator.', 'account-disabled');
  if (!user && (!input.name || !input.password)) throw needsAccount();
  user = await User.sequelize!.transaction(async (transaction) => {
    const u = user ?? (await createAccount({ email: inv.email, name: input.name!, role: 'viewer', password: input.password! }, config.bcryptRounds, transaction));
    const [, created] = await Membership.findOrCreate({ where: { userId: u.id, projectId: project.id }, defaults: { userId: u.id, projectId: project.id, role: inv.role }, transaction });
    await inv.update({ usedAt: new Date() }, { transaction });
    await audit({ userId: u.id, projectId: project.id, action: 'invitation.accept', entity: 'invitation', entityId: inv.id }, transaction);
    if (created) await audit({ userId: inv.invitedBy, projectId: project.id, action: 'member.add', entity: 'user', entityId: u.id, details: { role: inv.role, via: 'invitation' } }, transaction);
    return u;
  });
  return { user: publicUser(user), project: { slug: project.slug, name: project.name }, role: inv.role, token: issueSession(user.id, config) };
}
