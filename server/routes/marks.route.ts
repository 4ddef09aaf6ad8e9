import { deleteMyMark, putMyMark } from '../controllers/marks.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { validateBody } from '../middleware/validate-body';
import { MarkSet } from '../schemas/marks';

const mine = '/projects/:slug/runs/:runId/variants/:index/marks/me';
const RIGHTS = 'The right depends on the kind: variants:mark for candidate, variants:reject for rejected (403 without it).';

export function marksRoutes(): ApiRouter {
  return new ApiRouter('marks')
    .put(mine, { summary: "Set the caller's mark on a variant (candidate or rejected)", description: RIGHTS },
      authenticate, requireRight('project:read'), validateBody(MarkSet), putMyMark)
    .delete(mine, { summary: "Remove the caller's mark", description: 'Needs the right of the kind of the mark.', status: 204 },
      authenticate, requireRight('project:read'), deleteMyMark);
}
