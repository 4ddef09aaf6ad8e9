import { docs, health } from '../controllers/system.controller';
import { ApiRouter } from '../http/api-router';

export function systemRoutes(): ApiRouter {
  return new ApiRouter('system')
    .get('/health', 'Whether the server and its database answer', health)
    .get('/docs', 'This OpenAPI 3.1 description', docs);
}
