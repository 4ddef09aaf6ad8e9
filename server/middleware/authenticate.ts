/**
 * Who is calling: `Authorization: Bearer <session JWT | pp_ API token>`, else the session cookie.
 * 401 when neither is present or valid. Handlers then read `currentUser(req)`.
 */
import type { Request, RequestHandler } from 'express';
import { looksLikeApiToken } from '../auth/secrets';
import { SESSION_COOKIE } from '../auth/session';
import { appDeps, setPrincipal, type Principal } from '../http/context';
import { unauthorized } from '../http/http-error';
import { tagHandler } from '../http/route-meta';
import { principalFromApiToken, principalFromSession } from '../services/auth.service';

async function principal(req: Request): Promise<Principal> {
  const { config } = appDeps(req);
  const header = req.get('authorization');
  if (header !== undefined) {
    const m = /^Bearer\s+(\S+)\s*$/i.exec(header);
    if (!m) throw unauthorized('Send "Authorization: Bearer <token>".', 'invalid-token');
    return looksLikeApiToken(m[1]) ? principalFromApiToken(m[1]) : principalFromSession(m[1], 'bearer', config);
  }
  const cookie: unknown = req.cookies?.[SESSION_COOKIE];
  if (typeof cookie !== 'string' || !cookie) throw unauthorized();
  return principalFromSession(cookie, 'cookie', config);
}

export const authenticate: RequestHandler = tagHandler(async (req, _res, next) => {
  setPrincipal(req, await principal(req));
  next();
}, { authenticates: true });
