/** The panel of a page that needs the team server: what it will show and what it will read, no fake data. */
import { Link } from 'react-router-dom';

export interface PlannedPage {
  title: string;
  /** What the page will show, one or two sentences. */
  summary: string;
  /** The endpoints it will read (proposal, see src/lib/api.ts). */
  endpoints: string[];
}

export function ComingWithServer({ page }: { page: PlannedPage }) {
  return (
    <section aria-labelledby="coming-h" className="max-w-3xl">
      <h1 id="coming-h" className="m-0 text-lg font-semibold text-ink">{page.title}</h1>
      <div className="mt-3 rounded border border-dashed border-rule-strong bg-sheet p-4">
        <p className="m-0 text-xs font-semibold uppercase tracking-wide text-note">Coming with the team server</p>
        <p className="mt-1.5 mb-0 text-sm text-ink">{page.summary}</p>
        <p className="mt-3 mb-1 text-xs text-ink-2">It will read:</p>
        <ul className="m-0 list-none p-0">
          {page.endpoints.map((e) => <li key={e} className="num text-xs text-ink-2">{e}</li>)}
        </ul>
        <p className="mt-3 mb-0 text-xs text-ink-2">
          Nothing here is made up while the server is being built. Meanwhile the <Link to="/examples" className="text-tension underline">example trusses</Link> are analysed in the browser.
        </p>
      </div>
    </section>
  );
}
