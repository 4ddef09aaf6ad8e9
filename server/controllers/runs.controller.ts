import type { Request, Response } from 'express';
import { currentProject, currentUser } from '../http/context';
import { HttpError } from '../http/http-error';
import { pushRun } from '../services/runs-push.service';
import { listRuns, runDetail } from '../services/runs.service';

/** The push is streamed: no JSON body parser has read it (see runs-push.service.ts). */
export async function postRun(req: Request, res: Response): Promise<void> {
  if (req.is('application/x-ndjson') !== 'application/x-ndjson') throw new HttpError(415, 'unsupported-media-type', 'Send a push as application/x-ndjson: the run line, then variants lines.');
  const { status, answer } = await pushRun(req, currentProject(req), currentUser(req));
  res.status(status).json(answer);
}

export async function getRuns(req: Request, res: Response): Promise<void> {
  res.json(await listRuns(currentProject(req), req.query.study));
}

export async function getRun(req: Request, res: Response): Promise<void> {
  res.json(await runDetail(currentProject(req), String(req.params.runId)));
}
