import type { Request, Response } from 'express';
import { currentProject, currentUser } from '../http/context';
import { bodyOf } from '../middleware/validate-body';
import { TokenCreate } from '../schemas/tokens';
import { createToken, listTokens, revokeToken } from '../services/tokens.service';

export async function postToken(req: Request, res: Response): Promise<void> {
  res.status(201).json(await createToken(currentUser(req), currentProject(req), bodyOf(req, TokenCreate)));
}

export async function getTokens(req: Request, res: Response): Promise<void> {
  res.json({ tokens: await listTokens(currentUser(req), currentProject(req)) });
}

export async function deleteToken(req: Request, res: Response): Promise<void> {
  await revokeToken(currentUser(req), currentProject(req), String(req.params.id));
  res.status(204).end();
}
