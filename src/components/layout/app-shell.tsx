/** The page frame: skip link, top bar, and the routed page in <main>. */
import { Outlet, useNavigation } from 'react-router-dom';
import { TopBar } from './top-bar';

export function AppShell() {
  const nav = useNavigation();
  return (
    <div className="min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-10 focus:rounded focus:bg-sheet focus:px-2 focus:py-1">
        Skip to content
      </a>
      <TopBar />
      <div aria-hidden="true" className={`h-0.5 ${nav.state === 'loading' ? 'bg-focus/60' : 'bg-transparent'}`} />
      <main id="main" tabIndex={-1} className="px-4 py-4 focus:outline-none">
        <Outlet />
      </main>
    </div>
  );
}
