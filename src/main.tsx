/**
 * Entry of the web companion: fonts (shipped, no CDN), styles, the API (the team server, or in
 * `VITE_FAKE_API=1 npx vite` an invented demo), providers, router.
 */
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import '@fontsource/jetbrains-mono/400.css';
import '@fontsource/jetbrains-mono/600.css';
import './styles.css';
import { createApiClient } from '@/lib/api-client';
import { createHttpApi, type PanelpointApi } from '@/lib/api';
import { AppProvider, createQueryClient } from './app/provider';
import { createAppRouter } from './app/router';
import { isPublicPath } from './app/public-paths';

const router = createAppRouter();

/** A 401 sends the user to sign in, except on pages that need no account. */
function onUnauthorized() {
  const here = `${window.location.pathname}${window.location.search}`;
  if (!isPublicPath(window.location.pathname)) void router.navigate(`/sign-in?next=${encodeURIComponent(here)}`);
}

async function chooseApi(): Promise<PanelpointApi> {
  // DEV is false in a production build, so the fake demo is never bundled there.
  if (import.meta.env.DEV && import.meta.env.VITE_FAKE_API === '1') {
    const { createFakeApi } = await import('./dev/fake-api/fake-api');
    return createFakeApi({ onUnauthorized });
  }
  return createHttpApi(createApiClient({ onUnauthorized }));
}

void chooseApi().then((api) => {
  createRoot(document.getElementById('root')!).render(
    <StrictMode>
      <AppProvider api={api} queryClient={createQueryClient()}>
        <RouterProvider router={router} />
      </AppProvider>
    </StrictMode>,
  );
});
