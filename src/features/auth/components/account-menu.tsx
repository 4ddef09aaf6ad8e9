/** The account corner of the top bar: who is signed in and their role, and sign out; or a sign-in link. */
import { Link, NavLink, useNavigate } from 'react-router-dom';
import { useMe } from '../api/get-me';
import { useSignOut } from '../api/sign-in';

const link = ({ isActive }: { isActive: boolean }) =>
  `rounded px-2 py-1 text-sm ${isActive ? 'bg-white/12 text-white' : 'text-white/75 hover:text-white'}`;

export function AccountMenu() {
  const me = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();
  if (!me.data) return <NavLink to="/sign-in" className={link}>Sign in</NavLink>;
  const { user } = me.data;
  return (
    <div className="flex items-center gap-2 text-xs text-white/75">
      <Link to="/projects" className="text-white/90 hover:text-white" title={user.email}>{user.name}</Link>
      <span className="num rounded border border-white/20 px-1 text-[11px]">{user.role}</span>
      <button type="button" className="rounded px-2 py-1 text-white/75 hover:text-white" disabled={signOut.isPending}
        onClick={() => signOut.mutate(undefined, { onSettled: () => navigate('/sign-in') })}>
        Sign out
      </button>
    </div>
  );
}
