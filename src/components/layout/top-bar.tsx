/** The top bar: product name, project switcher (placeholder until the server lists projects), navigation, sign-in. */
import { Link, NavLink } from 'react-router-dom';

const NAV = [
  { to: '/projects', label: 'Projects' },
  { to: '/reference-cases', label: 'Reference cases' },
  { to: '/uploads', label: 'Uploads' },
  { to: '/examples', label: 'Examples' },
  { to: '/tokens', label: 'Tokens' },
  { to: '/admin', label: 'Admin' },
];

const link = ({ isActive }: { isActive: boolean }) =>
  `rounded px-2 py-1 text-sm ${isActive ? 'bg-white/12 text-white' : 'text-white/75 hover:text-white'}`;

export function TopBar() {
  return (
    <header className="bg-bar text-white">
      <div className="flex h-11 items-center gap-4 px-4">
        <Link to="/" className="num text-[15px] font-semibold tracking-tight text-white">Panelpoint</Link>
        <button type="button" disabled aria-disabled="true" title="Projects come with the team server"
          className="rounded border border-white/20 px-2 py-0.5 text-xs text-white/60">
          Project: <span className="italic">none yet</span> ▾
        </button>
        <nav aria-label="Main" className="flex min-w-0 flex-1 items-center gap-0.5 overflow-x-auto">
          {NAV.map((n) => <NavLink key={n.to} to={n.to} className={link}>{n.label}</NavLink>)}
        </nav>
        <NavLink to="/sign-in" className={link}>Sign in</NavLink>
      </div>
    </header>
  );
}
