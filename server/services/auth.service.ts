/** Signing in, and turning a session JWT or an API token back into a caller. */
import { checkPassword } from '../auth/passwords';
import { apiTokenPrefix, sameHash, sha256Hex } from '../auth/secrets';
import { issueSession, verifySession } from '../auth/session';
import type { ServerConfig } from '../config';
import { ApiToken } from '../db/models/api-token.model';
import { User } from '../db/models/user.model';
import type { Principal } from '../http/context';
import { forbidden, unauthorized } from '../http/http-error';
import { audit } from './audit.service';
import { listProjects, type PublicProject } from './projects.service';
import { publicUser, type PublicUser } from './users.service';

/** Check the password; on success return the user and a fresh session JWT. */
export async function signIn(email: string, password: string, config: ServerConfig): Promise<{ user: User; token: string }> {
  const user = await User.findOne({ where: { email: email.toLowerCase() } });
  const ok = await checkPassword(password, user?.passwordHash);
  if (!user || !ok) {
    await audit({ userId: user?.id ?? null, action: 'auth.sign-in-failed', entity: 'user', entityId: user?.id, details: { email: email.toLowerCase() } });
    throw unauthorized('Wrong email or password.', 'wrong-credentials');
  }
  if (user.disabled) throw forbidden('This account is disabled; ask an administrator.', 'account-disabled');
  await audit({ userId: user.id, action: 'auth.sign-in', entity: 'user', entityId: user.id });
  return { user, token: issueSession(user.id, config) };
}

/** The caller behind a session JWT (cookie or bearer); 401 when it is invalid, expired or the user is disabled. */
export async function principalFromSession(token: string, via: 'cookie' | 'bearer', config: ServerConfig): Promise<Principal> {
  const id = verifySession(token, config);
  const user = id === undefined ? null : await User.findByPk(id);
  if (!user || user.disabled) throw unauthorized('Your session is not valid or has ended; sign in again.', 'session-invalid');
  return { user, via };
}

const TOUCH_AFTER_MS = 60_000;

/** The caller behind an API token `pp_<prefix>_<secret>`; 401 when unknown, wrong or revoked. */
export async function principalFromApiToken(text: string): Promise<Principal> {
  const prefix = apiTokenPrefix(text);
  const token = prefix ? await ApiToken.findOne({ where: { prefix }, include: [{ model: User, as: 'user' }] }) : null;
  const user = token?.user;
  if (!token || token.revokedAt || !sameHash(token.tokenHash, sha256Hex(text)) || !user || user.disabled) {
    throw unauthorized('The API token is not valid or has been revoked.', 'invalid-token');
  }
  if (!token.lastUsedAt || Date.now() - token.lastUsedAt.getTime() > TOUCH_AFTER_MS) {
    await token.update({ lastUsedAt: new Date() });
  }
  return { user, via: 'api-token', token };
}

export interface CallerInfo {
  user: PublicUser;
  via: Principal['via'];
  projects: PublicProject[];
  /** For an API token: its name, prefix and scopes. */
  token?: { name: string; prefix: string; scopes: string[] };
}

/** What GET /api/auth/me answers. */
export async function describeCaller(p: Principal): Promise<CallerInfo> {
  const info: CallerInfo = { user: publicUser(p.user), via: p.via, projects: await listProjects(p) };
  if (p.token) info.token = { name: p.token.name, prefix: p.token.prefix, scopes: p.token.scopes };
  return info;
}
