/** Keeping and reading the sink's mail (captured_mails). */
import type { Sequelize } from 'sequelize';
import { notFound } from '../http/http-error';
import { parseMail } from './smtp-sink-parse';
import { bindCapturedMail, CapturedMail } from './smtp-sink-mail.model';

const cut = (s: string | undefined, n: number) => (s === undefined ? null : s.length > n ? s.slice(0, n) : s);

/** Parse and keep one received message. */
export async function storeCapturedMail(sequelize: Sequelize, raw: Buffer, sender: string | null, recipients: string[]): Promise<CapturedMail> {
  bindCapturedMail(sequelize);
  const m = parseMail(raw);
  return CapturedMail.create({
    messageId: cut(m.messageId, 255), sender: cut(sender ?? undefined, 320), recipients, toHeader: cut(m.to, 1000),
    subject: cut(m.subject, 1000) ?? '', text: m.text, html: m.html ?? null, raw, receivedAt: new Date(),
  });
}

export interface MailSummary {
  id: number;
  from: string | null;
  /** Envelope recipients (who the message was delivered to). */
  to: string[];
  subject: string;
  text: string;
  receivedAt: Date;
}

export interface MailDetail extends MailSummary {
  messageId: string | null;
  toHeader: string | null;
  html: string | null;
  headers: { name: string; value: string }[];
}

const summary = (m: CapturedMail): MailSummary => ({ id: m.id, from: m.sender, to: m.recipients, subject: m.subject, text: m.text, receivedAt: m.receivedAt });

export interface MailQuery {
  /** Only messages delivered to this address (case-insensitive). */
  to?: string;
  limit: number;
}

/** Newest first. */
export async function listCapturedMail(sequelize: Sequelize, q: MailQuery): Promise<MailSummary[]> {
  bindCapturedMail(sequelize);
  const rows = await CapturedMail.findAll({
    attributes: { exclude: ['raw', 'html'] },
    where: q.to ? sequelize.where(sequelize.fn('JSON_CONTAINS', sequelize.fn('LOWER', sequelize.col('recipients')), sequelize.fn('JSON_QUOTE', q.to.toLowerCase())), 1) : {},
    order: [['receivedAt', 'DESC'], ['id', 'DESC']],
    limit: q.limit,
  });
  return rows.map(summary);
}

export async function getCapturedMail(sequelize: Sequelize, idText: string): Promise<MailDetail> {
  bindCapturedMail(sequelize);
  const m = /^\d{1,10}$/.test(idText) ? await CapturedMail.findByPk(Number(idText)) : null;
  if (!m) throw notFound('mail-not-found', 'No such captured message.');
  const headers = parseMail(m.raw).headers.map(([name, value]) => ({ name, value }));
  return { ...summary(m), messageId: m.messageId, toHeader: m.toHeader, html: m.html, headers };
}
