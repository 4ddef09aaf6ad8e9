/** The app's frame with its top bar: the project picker and the account corner come from their features. */
import { useLocation, useMatch } from 'react-router-dom';
import { AppShell } from '@/components/layout/app-shell';
import { TopBar } from '@/components/layout/top-bar';
import { ProjectSwitcher } from '@/features/projects/components/project-switcher';
import { AccountMenu } from '@/features/auth/components/account-menu';
import { rememberedProject } from '@/lib/current-project';
import { isPublicPath } from './public-paths';
import { useMe } from '@/features/auth/api/get-me';

export function Shell() {
  const m = useMatch('/projects/:slug/*');
  const { pathname } = useLocation();
  const slug = m?.params.slug;
  const project = slug ?? rememberedProject();
  // Public pages (sign-in, reset, examples) do not ask the server who is signed in for the picker.
  const pub = isPublicPath(pathname);
  const me = useMe();
  const user = me.data?.user;
  return <AppShell bar={<TopBar project={project} signedIn={Boolean(user)} admin={user?.role === 'admin'} projectSwitcher={pub ? null : <ProjectSwitcher current={project} />} account={<AccountMenu />} />} />;
}
