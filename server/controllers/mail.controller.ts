import type { Request, Response } from 'express';
import { appDeps } from '../http/context';
import { getCapturedMail, listCapturedMail } from '../services/smtp-sink-store';
import { queryLimit, queryText } from './query-params';

export async function getMailList(req: Request, res: Response): Promise<void> {
  res.json({ messages: await listCapturedMail(appDeps(req).sequelize, { to: queryText(req, 'to'), limit: queryLimit(req, 50, 500) }) });
}

export async function getMailMessage(req: Request, res: Response): Promise<void> {
  res.json({ message: await getCapturedMail(appDeps(req).sequelize, String(req.params.id)) });
}
