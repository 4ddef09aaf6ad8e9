import { Link } from 'react-router-dom';

export function NotFoundPage() {
  return (
    <section className="max-w-2xl">
      <h1 className="mt-0 text-lg font-semibold">Not found</h1>
      <p className="text-sm text-ink-2">There is no page at this address. <Link to="/" className="text-tension underline">Back to the start</Link>.</p>
    </section>
  );
}
