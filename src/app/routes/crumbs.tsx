/** The "where am I" line above a page title: Projects · project · run. */
import { Link } from 'react-router-dom';
import { projectPath, runPath, shortRun } from '@/lib/paths';

const link = 'underline-offset-2 hover:underline';

export function Crumbs({ slug, project, runId }: { slug: string; project?: string; runId?: string }) {
  return (
    <nav aria-label="Breadcrumb">
      <Link to="/projects" className={link}>Projects</Link>
      {' · '}<Link to={projectPath(slug)} className={link}>{project ?? slug}</Link>
      {runId && <>{' · '}<Link to={runPath(slug, runId)} className={`num ${link}`}>run {shortRun(runId)}</Link></>}
    </nav>
  );
}
