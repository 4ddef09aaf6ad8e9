import type { Request, Response } from 'express';
import { currentProject, currentUser } from '../http/context';
import { bodyOf } from '../middleware/validate-body';
import { MemberAdd, MemberUpdate } from '../schemas/projects';
import { addMember, changeRole, listMembers, removeMember } from '../services/members.service';

export async function getMembers(req: Request, res: Response): Promise<void> {
  res.json({ members: await listMembers(currentProject(req).project) });
}

export async function postMember(req: Request, res: Response): Promise<void> {
  res.status(201).json({ member: await addMember(currentUser(req), currentProject(req).project, bodyOf(req, MemberAdd)) });
}

export async function patchMember(req: Request, res: Response): Promise<void> {
  const { role } = bodyOf(req, MemberUpdate);
  res.json({ member: await changeRole(currentUser(req), currentProject(req).project, String(req.params.userId), role) });
}

export async function deleteMember(req: Request, res: Response): Promise<void> {
  await removeMember(currentUser(req), currentProject(req).project, String(req.params.userId));
  res.status(204).end();
}
