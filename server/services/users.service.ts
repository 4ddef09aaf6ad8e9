/** User accounts: created by admins, by invitations and by the demo seed. */
import type { Transaction } from 'sequelize';
import { generatePassword, hashPassword } from '../auth/passwords';
import type { Role } from '../auth/rights';
import type { ServerConfig } from '../config';
import { User } from '../db/models/user.model';
import { conflict, notFound } from '../http/http-error';
import type { UserCreate, UserUpdate } from '../schemas/users';
import { audit } from './audit.service';

export interface PublicUser {
  id: number;
  email: string;
  name: string;
  role: Role;
  disabled: boolean;
  createdAt: Date;
}

export function publicUser(u: User): PublicUser {
  return { id: u.id, email: u.email, name: u.name, role: u.role, disabled: u.disabled, createdAt: u.createdAt };
}

export interface AccountInput {
  email: string;
  name: string;
  role: Role;
  password: string;
}

/** Create an account (email stored lower case); 409 when the email is taken. */
export async function createAccount(input: AccountInput, bcryptRounds: number, transaction?: Transaction): Promise<User> {
  const email = input.email.toLowerCase();
  if (await User.findOne({ where: { email }, transaction })) throw conflict('email-taken', 'An account with this email already exists.');
  const passwordHash = await hashPassword(input.password, bcryptRounds);
  return User.create({ email, name: input.name, role: input.role, passwordHash }, { transaction });
}

export async function listUsers(): Promise<PublicUser[]> {
  return (await User.findAll({ order: [['name', 'ASC'], ['id', 'ASC']] })).map(publicUser);
}

/** The user with id `idText` (a path parameter); 404 when there is none. */
export async function findUser(idText: string): Promise<User> {
  const id = /^\d{1,10}$/.test(idText) ? Number(idText) : NaN;
  const user = Number.isNaN(id) ? null : await User.findByPk(id);
  if (!user) throw notFound('user-not-found', 'No such user.');
  return user;
}

/** Create an account for someone; a password is generated and returned once when none is given. */
export async function createUser(actor: User, input: UserCreate, config: ServerConfig): Promise<{ user: PublicUser; password?: string }> {
  const password = input.password ?? generatePassword();
  const user = await createAccount({ ...input, password }, config.bcryptRounds);
  await audit({ userId: actor.id, action: 'user.create', entity: 'user', entityId: user.id, details: { email: user.email, role: user.role } });
  return { user: publicUser(user), ...(input.password ? {} : { password }) };
}

export async function updateUser(actor: User, idText: string, patch: UserUpdate, config: ServerConfig): Promise<PublicUser> {
  const user = await findUser(idText);
  if (user.id === actor.id && ((patch.role && patch.role !== user.role) || patch.disabled)) {
    throw conflict('cannot-change-self', 'You cannot change your own role or disable your own account.');
  }
  const details: Record<string, unknown> = { changed: Object.keys(patch) };
  if (patch.role && patch.role !== user.role) details.role = { from: user.role, to: patch.role };
  if (patch.disabled !== undefined) details.disabled = patch.disabled;
  const { password, ...rest } = patch;
  await user.update({ ...rest, ...(password ? { passwordHash: await hashPassword(password, config.bcryptRounds) } : {}) });
  await audit({ userId: actor.id, action: details.role ? 'user.role' : 'user.update', entity: 'user', entityId: user.id, details });
  return publicUser(user);
}

export async function deleteUser(actor: User, idText: string): Promise<void> {
  const user = await findUser(idText);
  if (user.id === actor.id) throw conflict('cannot-change-self', 'You cannot delete your own account.');
  await user.destroy();
  await audit({ userId: actor.id, action: 'user.delete', entity: 'user', entityId: user.id, details: { email: user.email } });
}
