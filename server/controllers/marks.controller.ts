import type { Request, Response } from 'express';
import { currentProject, currentUser } from '../http/context';
import { bodyOf } from '../middleware/validate-body';
import { MarkSet } from '../schemas/marks';
import { clearMyMark, setMyMark } from '../services/marks.service';

const at = (req: Request) => [String(req.params.runId), String(req.params.index)] as const;

export async function putMyMark(req: Request, res: Response): Promise<void> {
  res.json(await setMyMark(currentProject(req), currentUser(req), ...at(req), bodyOf(req, MarkSet).kind));
}

export async function deleteMyMark(req: Request, res: Response): Promise<void> {
  await clearMyMark(currentProject(req), currentUser(req), ...at(req));
  res.status(204).end();
}
