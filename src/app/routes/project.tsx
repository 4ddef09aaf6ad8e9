/** /projects/:slug — a project's studies with their runs, and its other sections. */
import { Link } from 'react-router-dom';
import { StudiesWithRuns } from '@/features/runs/components/studies-with-runs';
import { PageHeader } from '@/components/panel';
import { QueryState } from '@/components/query-state';
import { LINK } from '@/components/ui';
import { projectPath } from '@/lib/paths';
import { useProjectPage } from '../use-project-page';

export function ProjectPage() {
  const { slug, project } = useProjectPage();
  return (
    <QueryState q={project} what="the project">
      {(p) => (
        <>
          <PageHeader context={<Link to="/projects" className="hover:underline">Projects</Link>} title={p.name}
            facts={<><span>{p.description}</span><span className="num">your role: {p.role ?? 'admin access'}</span></>}
            actions={<span className="flex gap-3 text-xs">
              <Link to={`${projectPath(slug)}/reference-cases`} className={LINK}>Reference cases</Link>
              <Link to={`${projectPath(slug)}/uploads`} className={LINK}>Uploads</Link>
              <Link to={`${projectPath(slug)}/tokens`} className={LINK}>API tokens</Link>
            </span>} />
          <StudiesWithRuns slug={slug} />
        </>
      )}
    </QueryState>
  );
}
