import { ReferenceCase } from '../../shared/schemas/reference-case';
import { getCaseById, getCases, postCase } from '../controllers/cases.controller';
import { ApiRouter } from '../http/api-router';
import { tagHandler } from '../http/route-meta';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';

/** Documents the body in OpenAPI; the case is checked by createCase with the shared validator (422 with its paths). */
const caseBody = tagHandler((_req, _res, next) => next(), { body: ReferenceCase });

export function casesRoutes(): ApiRouter {
  return new ApiRouter('cases')
    .get('/projects/:slug/cases', 'Reference cases, each with its latest check result', authenticate, requireRight('project:read'), getCases)
    .post('/projects/:slug/cases', {
      summary: 'Keep a reference case on the server', status: 201,
      description: 'A reference case file with its model inline (or an inline study and variant): the server cannot read files beside it.',
    }, authenticate, requireRight('cases:freeze'), caseBody, postCase)
    .get('/projects/:slug/cases/:id', 'One reference case with its body', authenticate, requireRight('project:read'), getCaseById);
}
