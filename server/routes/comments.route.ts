import { getComments, postComment } from '../controllers/comments.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { validateBody } from '../middleware/validate-body';
import { CommentCreate } from '../schemas/comments';

const comments = '/projects/:slug/runs/:runId/variants/:index/comments';

export function commentsRoutes(): ApiRouter {
  return new ApiRouter('comments')
    .get(comments, 'Comments on a variant, oldest first', authenticate, requireRight('project:read'), getComments)
    .post(comments, { summary: 'Comment on a variant', status: 201 }, authenticate, requireRight('comments:write'), validateBody(CommentCreate), postComment);
}
