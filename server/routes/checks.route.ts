import { getChecks, postChecks } from '../controllers/checks.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { validateBody } from '../middleware/validate-body';
import { CheckPush } from '../schemas/checks';

export function checksRoutes(): ApiRouter {
  return new ApiRouter('checks')
    .post('/projects/:slug/checks', {
      summary: 'Record check results (panelpoint check --push)', status: 201,
      description: "A case that starts failing (after a pass, or as its first result) mails the project's engineers once.",
    }, authenticate, requireRight('checks:push'), validateBody(CheckPush), postChecks)
    .get('/projects/:slug/checks', 'Check results, newest first (?case=NAME for one case, ?limit=)', authenticate, requireRight('project:read'), getChecks);
}
