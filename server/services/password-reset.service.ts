/** Password reset by mailed link: request (always answers the same), then confirm with the token. */
import { Op } from 'sequelize';
import type { ResolvedDeps } from '../app-deps';
import { hashPassword } from '../auth/passwords';
import { newSecret, sha256Hex } from '../auth/secrets';
import type { ServerConfig } from '../config';
import { PasswordReset } from '../db/models/password-reset.model';
import { User } from '../db/models/user.model';
import { HttpError } from '../http/http-error';
import { audit } from './audit.service';
import { passwordResetMail } from './mail-templates';
import { sendMail } from './send-mail';

/** Mail a reset link when an active account has `email`; says nothing either way. */
export async function requestPasswordReset(email: string, deps: ResolvedDeps): Promise<void> {
  const { config } = deps;
  const user = await User.findOne({ where: { email: email.toLowerCase() } });
  if (!user || user.disabled) return;
  const { secret, hash } = newSecret();
  const expiresAt = new Date(Date.now() + config.passwordResetTtlMinutes * 60_000);
  await PasswordReset.create({ userId: user.id, email: user.email, tokenHash: hash, expiresAt, usedAt: null });
  await audit({ userId: user.id, action: 'user.password-reset-request', entity: 'user', entityId: user.id });
  const link = `${config.publicUrl}/reset-password?token=${encodeURIComponent(secret)}`;
  await sendMail(deps.mailer, deps.logger, passwordResetMail(user.email, link, config.passwordResetTtlMinutes));
}

export const invalidLink = (what: string) =>
  new HttpError(400, 'link-invalid', `This ${what} link is not valid, was already used or has expired; ask for a new one.`);

/** Set a new password with a reset token; every outstanding reset of the account is spent. */
export async function confirmPasswordReset(token: string, password: string, config: ServerConfig): Promise<void> {
  const reset = await PasswordReset.findOne({ where: { tokenHash: sha256Hex(token), usedAt: null, expiresAt: { [Op.gt]: new Date() } } });
  const user = reset ? await User.findByPk(reset.userId) : null;
  if (!reset || !user || user.disabled) throw invalidLink('password reset');
  const passwordHash = await hashPassword(password, config.bcryptRounds);
  await User.sequelize!.transaction(async (transaction) => {
    await user.update({ passwordHash }, { transaction });
    await PasswordReset.update({ usedAt: new Date() }, { where: { userId: user.id, usedAt: null }, transaction });
    await audit({ userId: user.id, action: 'user.password-reset', entity: 'user', entityId: user.id }, transaction);
  });
}
