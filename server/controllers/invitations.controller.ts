import type { Request, Response } from 'express';
import { SESSION_COOKIE, sessionCookieOptions } from '../auth/session';
import { appDeps, currentProject, currentUser } from '../http/context';
import { bodyOf } from '../middleware/validate-body';
import { InvitationAccept, InvitationCreate } from '../schemas/invitations';
import { acceptInvitation, createInvitation, listInvitations, revokeInvitation } from '../services/invitations.service';

export async function postInvitation(req: Request, res: Response): Promise<void> {
  const invitation = await createInvitation(currentUser(req), currentProject(req), bodyOf(req, InvitationCreate), appDeps(req));
  res.status(201).json({ invitation });
}

export async function getInvitations(req: Request, res: Response): Promise<void> {
  res.json({ invitations: await listInvitations(currentProject(req)) });
}

export async function deleteInvitation(req: Request, res: Response): Promise<void> {
  await revokeInvitation(currentUser(req), currentProject(req), String(req.params.id));
  res.status(204).end();
}

/** Joins the project (creating the account if needed) and signs the person in. */
export async function acceptInvitationHandler(req: Request, res: Response): Promise<void> {
  const { config } = appDeps(req);
  const accepted = await acceptInvitation(bodyOf(req, InvitationAccept), config);
  res.cookie(SESSION_COOKIE, accepted.token, sessionCookieOptions(config));
  res.status(201).json(accepted);
}
