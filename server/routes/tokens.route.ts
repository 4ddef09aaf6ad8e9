import { deleteToken, getTokens, postToken } from '../controllers/tokens.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { validateBody } from '../middleware/validate-body';
import { TokenCreate } from '../schemas/tokens';

export function tokensRoutes(): ApiRouter {
  return new ApiRouter('tokens')
    .post('/projects/:slug/tokens', { summary: 'Create an API token (the secret is shown once)', status: 201 },
      authenticate, requireRight('tokens:manage'), validateBody(TokenCreate), postToken)
    .get('/projects/:slug/tokens', "The caller's tokens (all, for a project admin)", authenticate, requireRight('tokens:manage'), getTokens)
    .delete('/projects/:slug/tokens/:id', { summary: 'Revoke a token', status: 204 }, authenticate, requireRight('tokens:manage'), deleteToken);
}
