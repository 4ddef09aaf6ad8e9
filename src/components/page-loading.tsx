/** A quiet loading line (no spinner) for pages and lazy routes. */
export function PageLoading({ what = 'page' }: { what?: string }) {
  return <p role="status" className="text-sm text-ink-3">Loading the {what}…</p>;
}
