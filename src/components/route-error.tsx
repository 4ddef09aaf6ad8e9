/** The error boundary of a route: a message, the status when there is one, and a way back. */
import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { ApiError, errorMessage } from '@/lib/api-client';

export function RouteError() {
  const err = useRouteError();
  const status = isRouteErrorResponse(err) ? err.status : err instanceof ApiError ? err.status : undefined;
  const message = isRouteErrorResponse(err) ? (err.status === 404 ? 'There is no page at this address.' : err.statusText) : errorMessage(err);
  return (
    <section role="alert" className="max-w-2xl rounded border border-bad/40 bg-sheet p-4">
      <h1 className="m-0 text-base font-semibold text-bad">{status === 404 ? 'Not found' : 'This page failed'}{status ? <span className="num ml-2 text-ink-3">{status}</span> : null}</h1>
      <p className="mt-1 text-sm text-ink">{message}</p>
      <Link to="/" className="text-sm text-tension underline">Back to the start</Link>
    </section>
  );
}
