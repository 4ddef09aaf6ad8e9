import type { Request, Response } from 'express';
import { appDeps } from '../http/context';

/** 200 when the database answers; 503 (through the error handler) when it does not. */
export async function health(req: Request, res: Response): Promise<void> {
  await appDeps(req).sequelize.authenticate();
  res.json({ status: 'ok' });
}

export function docs(req: Request, res: Response): void {
  res.json(req.app.locals.openapi);
}
