import type { ResolvedDeps } from '../app-deps';
import { confirmReset, me, requestReset, signInHandler, signOut } from '../controllers/auth.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { attemptLimit } from '../middleware/rate-limit';
import { validateBody } from '../middleware/validate-body';
import { PasswordResetConfirm, PasswordResetRequest, SignIn } from '../schemas/auth';

export function authRoutes({ config }: ResolvedDeps): ApiRouter {
  const signInLimit = attemptLimit(config, { what: 'sign-in', onlyFailures: true });
  const resetLimit = attemptLimit(config, { what: 'password reset', onlyFailures: false });
  return new ApiRouter('auth')
    .post('/auth/sign-in', 'Sign in: session cookie, and the token in the body', validateBody(SignIn), signInLimit, signInHandler)
    .post('/auth/sign-out', { summary: 'Sign out (clear the session cookie)', status: 204 }, signOut)
    .get('/auth/me', 'The caller, how they signed in, and their projects', authenticate, me)
    .post('/auth/password-reset', { summary: 'Mail a password reset link', status: 202 }, validateBody(PasswordResetRequest), resetLimit, requestReset)
    .post('/auth/password-reset/confirm', { summary: 'Set a new password with the mailed token', status: 204 }, validateBody(PasswordResetConfirm), confirmReset);
}
