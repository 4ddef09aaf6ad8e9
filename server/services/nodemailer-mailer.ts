/**
 * The Mailer over nodemailer's SMTP transport: a real server (SMTP_HOST...) or the development
 * sink on loopback. Short timeouts: a request that sends mail must not hang on a dead server
 * (a failure becomes 503 'mail-unavailable' in send-mail.ts).
 */
import nodemailer from 'nodemailer';
import type { MailSettings } from '../config';
import type { Mailer } from './mailer';

export interface NodemailerMailer extends Mailer {
  close(): void;
}

export function nodemailerMailer(settings: MailSettings & { host: string }): NodemailerMailer {
  const loopback = settings.host === '127.0.0.1' || settings.host === 'localhost';
  const transport = nodemailer.createTransport({
    host: settings.host,
    port: settings.port,
    secure: settings.secure,
    // The sink on loopback speaks plain SMTP; a real server upgrades with STARTTLS when offered.
    ignoreTLS: loopback && !settings.secure,
    ...(settings.user ? { auth: { user: settings.user, pass: settings.pass ?? '' } } : {}),
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return {
    async send(msg) {
      await transport.sendMail({ from: settings.from, to: msg.to, subject: msg.subject, text: msg.text, ...(msg.html ? { html: msg.html } : {}) });
    },
    close: () => transport.close(),
  };
}
