import type { Request, Response } from 'express';
import { appDeps, currentProject, currentUser } from '../http/context';
import { bodyOf } from '../middleware/validate-body';
import { CheckPush } from '../schemas/checks';
import { checkHistory, recordChecks } from '../services/checks.service';
import { queryLimit, queryText } from './query-params';

export async function postChecks(req: Request, res: Response): Promise<void> {
  res.status(201).json(await recordChecks(appDeps(req), currentUser(req), currentProject(req), bodyOf(req, CheckPush)));
}

export async function getChecks(req: Request, res: Response): Promise<void> {
  res.json({ results: await checkHistory(currentProject(req), { case: queryText(req, 'case'), limit: queryLimit(req, 100, 1000) }) });
}
