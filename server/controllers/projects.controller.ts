import type { Request, Response } from 'express';
import { currentPrincipal, currentProject, currentUser } from '../http/context';
import { bodyOf } from '../middleware/validate-body';
import { ProjectCreate, ProjectUpdate } from '../schemas/projects';
import { createProject, deleteProject, describeProject, listProjects, updateProject } from '../services/projects.service';

export async function getProjects(req: Request, res: Response): Promise<void> {
  res.json({ projects: await listProjects(currentPrincipal(req)) });
}

export async function postProject(req: Request, res: Response): Promise<void> {
  res.status(201).json({ project: await createProject(currentUser(req), bodyOf(req, ProjectCreate)) });
}

export function getProject(req: Request, res: Response): void {
  res.json({ project: describeProject(currentProject(req)) });
}

export async function patchProject(req: Request, res: Response): Promise<void> {
  res.json({ project: await updateProject(currentUser(req), currentProject(req), bodyOf(req, ProjectUpdate)) });
}

export async function removeProject(req: Request, res: Response): Promise<void> {
  await deleteProject(currentUser(req), currentProject(req));
  res.status(204).end();
}
