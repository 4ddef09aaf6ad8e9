import { deleteMember, getMembers, patchMember, postMember } from '../controllers/members.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { validateBody } from '../middleware/validate-body';
import { MemberAdd, MemberUpdate } from '../schemas/projects';

export function membersRoutes(): ApiRouter {
  return new ApiRouter('members')
    .get('/projects/:slug/members', 'Members and their roles', authenticate, requireRight('project:read'), getMembers)
    .post('/projects/:slug/members', { summary: 'Add an existing account', status: 201 },
      authenticate, requireRight('project:admin'), validateBody(MemberAdd), postMember)
    .patch('/projects/:slug/members/:userId', "Change a member's role", authenticate, requireRight('project:admin'), validateBody(MemberUpdate), patchMember)
    .delete('/projects/:slug/members/:userId', { summary: 'Remove a member', status: 204 }, authenticate, requireRight('project:admin'), deleteMember);
}
