/** API tokens for the CLI: one project each, scoped, shown once, revocable. */
import { newApiToken } from '../auth/secrets';
import { TOKEN_SCOPES, type ProjectRight } from '../auth/rights';
import { ApiToken } from '../db/models/api-token.model';
import { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { forbidden, notFound } from '../http/http-error';
import type { TokenCreate } from '../schemas/tokens';
import { audit } from './audit.service';

export interface PublicToken {
  id: number;
  name: string;
  prefix: string;
  scopes: ProjectRight[];
  owner: { id: number; name: string };
  createdAt: Date;
  lastUsedAt: Date | null;
  revokedAt: Date | null;
}

function publicToken(t: ApiToken, owner: User): PublicToken {
  return {
    id: t.id, name: t.name, prefix: t.prefix, scopes: t.scopes, owner: { id: owner.id, name: owner.name },
    createdAt: t.createdAt, lastUsedAt: t.lastUsedAt, revokedAt: t.revokedAt,
  };
}

/** Create a token; `token` (the secret) is in this answer only. Scopes must be rights the creator holds. */
export async function createToken(actor: User, access: ProjectAccess, input: TokenCreate): Promise<PublicToken & { token: string }> {
  const held = TOKEN_SCOPES.filter((s) => access.rights.has(s));
  const scopes = input.scopes ?? held;
  const missing = scopes.filter((s) => !access.rights.has(s));
  if (missing.length) throw forbidden(`You cannot give a token rights you do not hold: ${missing.join(', ')}.`, 'scope-not-allowed');
  const { token, prefix, hash } = newApiToken();
  const row = await ApiToken.create({
    userId: actor.id, projectId: access.project.id, name: input.name, tokenHash: hash, prefix, scopes, lastUsedAt: null, revokedAt: null,
  });
  await audit({ userId: actor.id, projectId: access.project.id, action: 'token.create', entity: 'api-token', entityId: row.id, details: { name: row.name, prefix, scopes } });
  return { ...publicToken(row, actor), token };
}

/** The caller's tokens in the project; every member's with `project:admin`. */
export async function listTokens(actor: User, access: ProjectAccess): Promise<PublicToken[]> {
  const where = access.rights.has('project:admin') ? { projectId: access.project.id } : { projectId: access.project.id, userId: actor.id };
  const rows = await ApiToken.findAll({ where, include: [{ model: User, as: 'user' }], order: [['createdAt', 'DESC'], ['id', 'DESC']] });
  return rows.map((t) => publicToken(t, t.user!));
}

/** Revoke a token (idempotent); 404 for a token the caller may not manage. */
export async function revokeToken(actor: User, access: ProjectAccess, idText: string): Promise<void> {
  const id = /^\d{1,10}$/.test(idText) ? Number(idText) : NaN;
  const t = Number.isNaN(id) ? null : await ApiToken.findOne({ where: { id, projectId: access.project.id } });
  if (!t || (t.userId !== actor.id && !access.rights.has('project:admin'))) throw notFound('token-not-found', 'No such token.');
  if (t.revokedAt) return;
  await t.update({ revokedAt: new Date() });
  await audit({ userId: actor.id, projectId: access.project.id, action: 'token.revoke', entity: 'api-token', entityId: t.id, details: { prefix: t.prefix } });
}
