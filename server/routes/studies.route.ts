import { getStudies, getStudyById } from '../controllers/studies.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';

export function studiesRoutes(): ApiRouter {
  return new ApiRouter('studies')
    .get('/projects/:slug/studies', 'Studies of the project (one per distinct study body), newest first, with run counts',
      authenticate, requireRight('project:read'), getStudies)
    .get('/projects/:slug/studies/:id', 'One study with its body (the study file as pushed)', authenticate, requireRight('project:read'), getStudyById);
}
