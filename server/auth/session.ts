/** Session JWTs: signed with HS256, carried in the httpOnly cookie or as a bearer token. */
import type { CookieOptions } from 'express';
import jwt from 'jsonwebtoken';
import type { ServerConfig } from '../config';

export const SESSION_COOKIE = 'pp_session';
const ISSUER = 'panelpoint';

export function issueSession(userId: number, config: ServerConfig): string {
  return jwt.sign({}, config.jwtSecret, {
    algorithm: 'HS256', subject: String(userId), issuer: ISSUER, expiresIn: config.sessionTtlSeconds,
  });
}

/** The user id in a valid, unexpired session token; undefined otherwise. */
export function verifySession(token: string, config: ServerConfig): number | undefined {
  try {
    const claims = jwt.verify(token, config.jwtSecret, { algorithms: ['HS256'], issuer: ISSUER });
    const id = typeof claims === 'object' ? Number(claims.sub) : NaN;
    return Number.isInteger(id) && id > 0 ? id : undefined;
  } catch {
    return undefined;
  }
}

export function sessionCookieOptions(config: ServerConfig): CookieOptions {
  return {
    httpOnly: true, sameSite: 'lax', secure: config.cookieSecure, path: '/',
    maxAge: config.sessionTtlSeconds * 1000,
  };
}
