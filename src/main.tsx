/** Entry of the web companion: fonts (shipped, no CDN), styles, the API client, providers, router. */
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router-dom';
import '@fontsource/jetbrains-mono/400.css';
import '@fontsource/jetbrains-mono/600.css';
import './styles.css';
import { createApiClient } from '@/lib/api-client';
import { createHttpApi } from '@/lib/api';
import { AppProvider, createQueryClient } from './app/provider';
import { createAppRouter } from './app/router';

const router = createAppRouter();
const client = createApiClient({
  onUnauthorized: () => {
    const here = `${window.location.pathname}${window.location.search}`;
    if (!here.startsWith('/sign-in')) void router.navigate(`/sign-in?next=${encodeURIComponent(here)}`);
  },
});

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <AppProvider api={createHttpApi(client)} queryClient={createQueryClient()}>
      <RouterProvider router={router} />
    </AppProvider>
  </StrictMode>,
);
