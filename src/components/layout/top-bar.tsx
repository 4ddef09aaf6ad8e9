/** The top bar: product name, project picker, navigation (project sections go to the current project), account. */
import type { ReactNode } from 'react';
import { Link, NavLink } from 'react-router-dom';
import { projectPath } from '@/lib/paths';

const link = ({ isActive }: { isActive: boolean }) =>
  `whitespace-nowrap rounded px-2 py-1 text-sm ${isActive ? 'bg-white/12 text-white' : 'text-white/75 hover:text-white'}`;

interface Props {
  /** The project the sections link to (from the address, else the last one used). */
  project?: string;
  projectSwitcher?: ReactNode;
  account?: ReactNode;
  /** Someone is signed in: the project sections are shown. */
  signedIn?: boolean;
  /** The signed-in user is an administrator: the Admin page is shown. */
  admin?: boolean;
}

export function TopBar({ project, projectSwitcher, account, signedIn = true, admin = false }: Props) {
  const inProject = (section: string) => (project ? `${projectPath(project)}/${section}` : `/${section}`);
  const nav = [
    ...(signedIn ? [
      { to: '/projects', label: 'Projects', end: true },
      { to: inProject('reference-cases'), label: 'Reference cases' },
      { to: inProject('uploads'), label: 'Uploads' },
      { to: inProject('tokens'), label: 'Tokens' },
    ] : []),
    { to: '/examples', label: 'Examples' },
    ...(admin ? [{ to: '/admin', label: 'Admin' }] : []),
  ];
  return (
    <header className="bg-bar text-white">
      <div className="flex h-11 items-center gap-4 px-4">
        <Link to="/" className="num text-[15px] font-semibold tracking-tight text-white">Panelpoint</Link>
        {projectSwitcher}
        <nav aria-label="Main" className="flex min-w-0 flex-1 items-center gap-0.5 overflow-x-auto">
          {nav.map((n) => <NavLink key={n.label} to={n.to} end={n.end} className={link}>{n.label}</NavLink>)}
        </nav>
        {account}
      </div>
    </header>
  );
}
