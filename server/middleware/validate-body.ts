/**
 * `validateBody(Schema)`: checks req.body against a TypeBox schema with the shared Ajv and
 * answers 422 with one `{ path, message }` per problem (paths like `members[0].role`).
 */
import type { Request, RequestHandler } from 'express';
import type { Static, TSchema } from '@sinclair/typebox';
import { compileSchema } from '../../shared/schemas/validate';
import { HttpError } from '../http/http-error';
import { tagHandler } from '../http/route-meta';

export function validateBody<T extends TSchema>(schema: T): RequestHandler {
  const check = compileSchema(schema);
  return tagHandler((req, _res, next) => {
    const issues = check(req.body ?? {});
    if (issues.length) {
      throw new HttpError(422, 'invalid-body', 'The request body is not valid.', issues.map(({ path, message }) => ({ path, message })));
    }
    next();
  }, { body: schema });
}

/** req.body typed by the schema that `validateBody` checked earlier in the route. */
export function bodyOf<T extends TSchema>(req: Request, _schema: T): Static<T> {
  return req.body as Static<T>;
}
