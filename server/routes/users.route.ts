import { getUser, getUsers, patchUser, postUser, removeUser } from '../controllers/users.controller';
import { ApiRouter } from '../http/api-router';
import { authenticate } from '../middleware/authenticate';
import { requireRight } from '../middleware/require-right';
import { validateBody } from '../middleware/validate-body';
import { UserCreate, UserUpdate } from '../schemas/users';

export function usersRoutes(): ApiRouter {
  return new ApiRouter('users')
    .get('/users', 'List accounts', authenticate, requireRight('users:admin'), getUsers)
    .post('/users', { summary: 'Create an account', description: 'Without a password, one is generated and returned once.', status: 201 },
      authenticate, requireRight('users:admin'), validateBody(UserCreate), postUser)
    .get('/users/:id', 'One account', authenticate, requireRight('users:admin'), getUser)
    .patch('/users/:id', 'Change name, global role, password or disable', authenticate, requireRight('users:admin'), validateBody(UserUpdate), patchUser)
    .delete('/users/:id', { summary: 'Delete an account', status: 204 }, authenticate, requireRight('users:admin'), removeUser);
}
