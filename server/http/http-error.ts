/** The one error type routes and services throw; the error handler turns it into JSON. */

/** One located problem, e.g. from ajv: `{ path: 'members[0].role', message: 'must be one of ...' }`. */
export interface ErrorDetail {
  path: string;
  message: string;
}

export class HttpError extends Error {
  override readonly name = 'HttpError';

  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly details: ErrorDetail[] = [],
  ) {
    super(message);
  }
}

export const unauthorized = (message = 'Sign in first.', code = 'not-signed-in') => new HttpError(401, code, message);
export const forbidden = (message = 'You are not allowed to do this.', code = 'forbidden') => new HttpError(403, code, message);
export const notFound = (code: string, message: string) => new HttpError(404, code, message);
export const conflict = (code: string, message: string) => new HttpError(409, code, message);

/** 404 for a project that does not exist or that the caller may not see (the two look the same). */
export const projectNotFound = () => notFound('project-not-found', 'No such project.');
