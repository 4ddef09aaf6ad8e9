import { acceptInvitationHandler, deleteInvitation, getInvitations, postInvitation } from '../controllers/invitations.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { validateBody } from '../middleware/validate-body';
import { InvitationAccept, InvitationCreate } from '../schemas/invitations';

export function invitationsRoutes(): ApiRouter {
  return new ApiRouter('invitations')
    .post('/projects/:slug/invitations', { summary: 'Invite someone by mail with a role', status: 201 },
      authenticate, requireRight('members:invite'), validateBody(InvitationCreate), postInvitation)
    .get('/projects/:slug/invitations', 'Pending invitations', authenticate, requireRight('members:invite'), getInvitations)
    .delete('/projects/:slug/invitations/:id', { summary: 'Withdraw an invitation', status: 204 }, authenticate, requireRight('members:invite'), deleteInvitation)
    .post('/invitations/accept', { summary: 'Accept an invitation (creating the account if needed); signs in', status: 201 },
      validateBody(InvitationAccept), acceptInvitationHandler);
}
