/** A failed query shown in place: the API's message, its details, and a retry. */
import { ApiError, errorMessage } from '@/lib/api-client';

export function ErrorPanel({ error, onRetry, what }: { error: unknown; onRetry?: () => void; what: string }) {
  const details = error instanceof ApiError ? error.details : [];
  return (
    <div role="alert" className="max-w-2xl rounded border border-bad/40 bg-sheet p-3 text-sm">
      <p className="m-0 font-medium text-bad">Could not load {what}.</p>
      <p className="mt-1 mb-0 text-ink">{errorMessage(error)}</p>
      {details.length > 0 && (
        <ul className="mt-1 mb-0 pl-4 text-xs text-ink-2">{details.map((d) => <li key={d.path + d.message}><span className="num">{d.path}</span> {d.message}</li>)}</ul>
      )}
      {onRetry && <button type="button" onClick={onRetry} className="mt-2 rounded border border-rule-strong px-2 py-0.5 text-xs">Try again</button>}
    </div>
  );
}
