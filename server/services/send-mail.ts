/** Send through deps.mailer; a failing transport becomes 503 'mail-unavailable'. */
import { HttpError } from '../http/http-error';
import type { Logger } from './logger';
import type { Mailer, MailMessage } from './mailer';

export async function sendMail(mailer: Mailer, logger: Logger, msg: MailMessage): Promise<void> {
  try {
    await mailer.send(msg);
  } catch (err) {
    logger.error('mail could not be sent', { to: msg.to, subject: msg.subject, error: err });
    throw new HttpError(503, 'mail-unavailable', 'The mail could not be sent; try again shortly.');
  }
}
