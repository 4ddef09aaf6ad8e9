import type { Request, Response } from 'express';
import { currentProject } from '../http/context';
import { getStudy, listStudies } from '../services/studies.service';

export async function getStudies(req: Request, res: Response): Promise<void> {
  res.json(await listStudies(currentProject(req)));
}

export async function getStudyById(req: Request, res: Response): Promise<void> {
  res.json(await getStudy(currentProject(req), String(req.params.id)));
}
