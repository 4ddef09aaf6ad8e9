/** The page frame: skip link, the top bar (given by the app), and the routed page in <main>. */
import type { ReactNode } from 'react';
import { Outlet, useNavigation } from 'react-router-dom';

export function AppShell({ bar }: { bar: ReactNode }) {
  const nav = useNavigation();
  return (
    <div className="min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-40 focus:rounded focus:bg-sheet focus:px-2 focus:py-1">
        Skip to content
      </a>
      {bar}
      <div aria-hidden="true" className={`h-0.5 ${nav.state === 'loading' ? 'bg-focus/60' : 'bg-transparent'}`} />
      <main id="main" tabIndex={-1} className="px-4 py-4 focus:outline-none">
        <Outlet />
      </main>
    </div>
  );
}
