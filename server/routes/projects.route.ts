import { getProject, getProjects, patchProject, postProject, removeProject } from '../controllers/projects.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { validateBody } from '../middleware/validate-body';
import { ProjectCreate, ProjectUpdate } from '../schemas/projects';

export function projectsRoutes(): ApiRouter {
  return new ApiRouter('projects')
    .get('/projects', 'Projects the caller can see', authenticate, getProjects)
    .post('/projects', { summary: 'Create a project (the caller becomes its admin)', status: 201 },
      authenticate, requireRight('projects:create'), validateBody(ProjectCreate), postProject)
    .get('/projects/:slug', "A project, with the caller's role and rights", authenticate, requireRight('project:read'), getProject)
    .patch('/projects/:slug', 'Rename or describe a project', authenticate, requireRight('project:admin'), validateBody(ProjectUpdate), patchProject)
    .delete('/projects/:slug', { summary: 'Delete a project and everything in it', status: 204 }, authenticate, requireRight('project:admin'), removeProject);
}
