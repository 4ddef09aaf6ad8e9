import type { Request, Response } from 'express';
import { currentProject, currentUser } from '../http/context';
import { createCase, getCase, listCases } from '../services/cases.service';

export async function getCases(req: Request, res: Response): Promise<void> {
  res.json({ cases: await listCases(currentProject(req)) });
}

export async function postCase(req: Request, res: Response): Promise<void> {
  res.status(201).json({ case: await createCase(currentUser(req), currentProject(req), req.body) });
}

export async function getCaseById(req: Request, res: Response): Promise<void> {
  res.json({ case: await getCase(currentProject(req), String(req.params.id)) });
}
