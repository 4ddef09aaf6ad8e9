/** The caller's projects: name, slug, their role and the description. */
import { Link } from 'react-router-dom';
import { useProjects } from '../api/get-projects';
import { QueryState } from '@/components/query-state';
import { LINK } from '@/components/ui';

export function ProjectList() {
  const q = useProjects();
  return (
    <QueryState q={q} what="the projects">
      {(projects) => projects.length === 0 ? (
        <p className="text-sm text-ink-2">You are not a member of any project yet. A project admin can invite you.</p>
      ) : (
        <ul className="m-0 list-none divide-y divide-rule rounded border border-rule bg-sheet p-0">
          {projects.map((p) => (
            <li key={p.slug} className="px-3 py-2">
              <div className="flex flex-wrap items-baseline gap-x-3">
                <Link to={`/projects/${p.slug}`} className={`font-medium ${LINK}`}>{p.name}</Link>
                <span className="num text-xs text-ink-3">{p.slug}</span>
                <span className="num ml-auto text-xs text-ink-2">{p.role ?? 'admin access'}</span>
              </div>
              {p.description && <p className="m-0 mt-0.5 max-w-4xl text-xs text-ink-2">{p.description}</p>}
            </li>
          ))}
        </ul>
      )}
    </QueryState>
  );
}
