/**
 * Outgoing mail. The app only knows this interface; the default logs that a message would have
 * been sent (recipient and subject only: bodies carry one-time links). A real transport
 * (nodemailer, a capture sink for development) is passed to createApp as `deps.mailer`.
 */
import type { Logger } from './logger';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(msg: MailMessage): Promise<void>;
}

/** A mailer that sends nothing and logs the recipient and subject. */
export function loggingMailer(logger: Logger): Mailer {
  return {
    async send(msg) {
      logger.warn('mail not sent: no mailer configured', { to: msg.to, subject: msg.subject });
    },
  };
}
