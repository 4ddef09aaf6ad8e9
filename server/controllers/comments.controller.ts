import type { Request, Response } from 'express';
import { currentProject, currentUser } from '../http/context';
import { bodyOf } from '../middleware/validate-body';
import { CommentCreate } from '../schemas/comments';
import { addComment, listComments } from '../services/comments.service';

export async function getComments(req: Request, res: Response): Promise<void> {
  res.json(await listComments(currentProject(req), String(req.params.runId), String(req.params.index)));
}

export async function postComment(req: Request, res: Response): Promise<void> {
  const body = bodyOf(req, CommentCreate).body;
  res.status(201).json(await addComment(currentProject(req), currentUser(req), String(req.params.runId), String(req.params.index), body));
}
