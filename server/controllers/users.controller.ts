import type { Request, Response } from 'express';
import { appDeps, currentUser } from '../http/context';
import { bodyOf } from '../middleware/validate-body';
import { UserCreate, UserUpdate } from '../schemas/users';
import { createUser, deleteUser, findUser, listUsers, publicUser, updateUser } from '../services/users.service';

export async function getUsers(_req: Request, res: Response): Promise<void> {
  res.json({ users: await listUsers() });
}

export async function postUser(req: Request, res: Response): Promise<void> {
  res.status(201).json(await createUser(currentUser(req), bodyOf(req, UserCreate), appDeps(req).config));
}

export async function getUser(req: Request, res: Response): Promise<void> {
  res.json({ user: publicUser(await findUser(String(req.params.id))) });
}

export async function patchUser(req: Request, res: Response): Promise<void> {
  const user = await updateUser(currentUser(req), String(req.params.id), bodyOf(req, UserUpdate), appDeps(req).config);
  res.json({ user });
}

export async function removeUser(req: Request, res: Response): Promise<void> {
  await deleteUser(currentUser(req), String(req.params.id));
  res.status(204).end();
}
