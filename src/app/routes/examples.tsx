/** The shipped example models, each a link to its analysis in the browser. */
import { Link } from 'react-router-dom';
import { useExamples } from '@/features/examples/api/list-examples';
import { PageLoading } from '@/components/page-loading';

export function ExamplesPage() {
  const { data } = useExamples();
  if (!data) return <PageLoading what="examples" />;
  return (
    <section aria-labelledby="examples-h" className="max-w-4xl">
      <h1 id="examples-h" className="mt-0 mb-1 text-lg font-semibold">Example trusses</h1>
      <p className="mt-0 mb-3 text-xs text-ink-2">Shipped in examples/models and analysed in this browser by the same engine as the CLI; no server needed.</p>
      <ul className="m-0 list-none divide-y divide-rule rounded border border-rule bg-sheet p-0">
        {data.map((e) => (
          <li key={e.name} className="px-3 py-2">
            <Link to={`/examples/${e.name}`} className="font-medium text-tension underline-offset-2 hover:underline">{e.title}</Link>
            <span className="num ml-2 text-xs text-ink-3">{e.name} · j {e.joints} · m {e.members}</span>
            {e.description && <p className="m-0 mt-0.5 text-xs text-ink-2">{e.description}</p>}
          </li>
        ))}
      </ul>
    </section>
  );
}
