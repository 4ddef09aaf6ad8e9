/**
 * The development SMTP sink: an smtp-server on 127.0.0.1 that accepts every message (no TLS, no
 * auth: loopback only) and keeps it in captured_mails, where GET /api/admin/mail shows it.
 * server/main.ts starts it when SMTP_HOST is not set and points the nodemailer Mailer at it, so
 * invitations, password resets and notices travel the same path as with a real mail server.
 */
import type { AddressInfo } from 'node:net';
import type { Sequelize } from 'sequelize';
import { SMTPServer } from 'smtp-server';
import type { Logger } from './logger';
import { storeCapturedMail } from './smtp-sink-store';

/** Largest message the sink takes, bytes. */
const MAX_MESSAGE = 10 * 1024 * 1024;

export interface SmtpSink {
  port: number;
  close(): Promise<void>;
}

/** Start the sink; `port` 0 picks a free one. A message that cannot be stored is refused (451). */
export async function startSmtpSink(sequelize: Sequelize, options: { port?: number; logger?: Logger } = {}): Promise<SmtpSink> {
  const server = new SMTPServer({
    banner: 'Panelpoint development mail sink',
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    logger: false,
    size: MAX_MESSAGE,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('end', () => {
        if ((stream as { sizeExceeded?: boolean }).sizeExceeded) return callback(Object.assign(new Error('message too large'), { responseCode: 552 }));
        const envelope = session.envelope;
        const sender = envelope.mailFrom ? envelope.mailFrom.address : null;
        storeCapturedMail(sequelize, Buffer.concat(chunks), sender, envelope.rcptTo.map((r) => r.address)).then(
          () => callback(),
          (err: unknown) => {
            options.logger?.error('mail sink could not store a message', { error: err });
            callback(Object.assign(new Error('could not store the message'), { responseCode: 451 }));
          },
        );
      });
    },
  });
  server.on('error', (err) => options.logger?.warn('mail sink error', { error: err }));
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 0, '127.0.0.1', () => {
      server.off('error', reject);
      resolve();
    });
  });
  const port = (server.server.address() as AddressInfo).port;
  return { port, close: () => new Promise<void>((resolve) => server.close(() => resolve())) };
}
