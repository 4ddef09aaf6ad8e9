import type { Request, Response } from 'express';
import { SESSION_COOKIE, sessionCookieOptions } from '../auth/session';
import { appDeps, currentPrincipal } from '../http/context';
import { bodyOf } from '../middleware/validate-body';
import { PasswordResetConfirm, PasswordResetRequest, SignIn } from '../schemas/auth';
import { describeCaller, signIn } from '../services/auth.service';
import { confirmPasswordReset, requestPasswordReset } from '../services/password-reset.service';
import { publicUser } from '../services/users.service';

/** Session in an httpOnly cookie for the browser, and in the body for the CLI. */
export async function signInHandler(req: Request, res: Response): Promise<void> {
  const { config } = appDeps(req);
  const { email, password } = bodyOf(req, SignIn);
  const { user, token } = await signIn(email, password, config);
  res.cookie(SESSION_COOKIE, token, sessionCookieOptions(config));
  res.json({ user: publicUser(user), token, expiresIn: config.sessionTtlSeconds });
}

export function signOut(req: Request, res: Response): void {
  const { maxAge: _maxAge, ...options } = sessionCookieOptions(appDeps(req).config);
  res.clearCookie(SESSION_COOKIE, options);
  res.status(204).end();
}

export async function me(req: Request, res: Response): Promise<void> {
  res.json(await describeCaller(currentPrincipal(req)));
}

export async function requestReset(req: Request, res: Response): Promise<void> {
  await requestPasswordReset(bodyOf(req, PasswordResetRequest).email, appDeps(req));
  res.status(202).json({ message: 'If an account has this email, a reset link is on its way.' });
}

export async function confirmReset(req: Request, res: Response): Promise<void> {
  const { token, password } = bodyOf(req, PasswordResetConfirm);
  await confirmPasswordReset(token, password, appDeps(req).config);
  res.status(204).end();
}
