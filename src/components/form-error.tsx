/** A failed submit under a form: the server's message and its details by field path. */
import { ApiError, errorMessage } from '@/lib/api-client';

export function FormError({ id, error }: { id?: string; error: unknown }) {
  const details = error instanceof ApiError ? error.details : [];
  return (
    <div id={id} role="alert" className="mt-3 text-sm text-bad">
      <p className="m-0">{errorMessage(error)}</p>
      {details.length > 0 && (
        <ul className="mt-1 mb-0 pl-4 text-xs">{details.map((d) => <li key={d.path + d.message}>{d.path && <span className="num">{d.path} </span>}{d.message}</li>)}</ul>
      )}
    </div>
  );
}
