/**
 * `requireRight(right)` after `authenticate`: for a project right, loads the project named by
 * `:slug` (404 when it is not visible to the caller) and checks the caller's rights there
 * (403); for a global right, checks the caller's global rights (403). Handlers then read
 * `currentProject(req)`.
 */
import type { RequestHandler } from 'express';
import { isProjectRight, type Right } from '../auth/rights';
import { currentPrincipal, setProjectAccess } from '../http/context';
import { forbidden } from '../http/http-error';
import { tagHandler } from '../http/route-meta';
import { globalRights, projectAccess } from '../services/access.service';

export function requireRight(right: Right): RequestHandler {
  return tagHandler(async (req, _res, next) => {
    const principal = currentPrincipal(req);
    if (isProjectRight(right)) {
      const access = await projectAccess(principal, String(req.params.slug));
      if (!access.rights.has(right)) throw forbidden(`You need the right ${right} in this project.`);
      setProjectAccess(req, access);
    } else if (!globalRights(principal).has(right)) {
      throw forbidden(`You need the right ${right}.`);
    }
    next();
  }, { right });
}
