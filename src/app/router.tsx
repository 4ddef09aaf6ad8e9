/**
 * The routes, as a table. Every page has its own error boundary; the pages that run the engine in
 * the browser (example and variant detail) load lazily so the rest of the app stays small.
 */
import { createBrowserRouter, Navigate, type RouteObject } from 'react-router-dom';
import { AppShell } from '@/components/layout/app-shell';
import { RouteError } from '@/components/route-error';
import { PageLoading } from '@/components/page-loading';
import { ComingWithServer, type PlannedPage } from '@/components/coming-with-server';
import { PLANNED } from './routes/planned-pages';
import { SignInPage } from './routes/sign-in';
import { ExamplesPage } from './routes/examples';
import { NotFoundPage } from './routes/not-found';

const page = (r: RouteObject): RouteObject => ({ errorElement: <RouteError />, ...r }) as RouteObject;
const soon = (path: string, p: PlannedPage) => page({ path, element: <ComingWithServer page={p} /> });

export const routes: RouteObject[] = [
  {
    path: '/',
    element: <AppShell />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <PageLoading />,
    children: [
      page({ index: true, element: <Navigate to="/projects" replace /> }),
      page({ path: 'sign-in', element: <SignInPage /> }),
      soon('projects', PLANNED.projects),
      soon('projects/:projectId', PLANNED.project),
      soon('projects/:projectId/studies/:studyId', PLANNED.study),
      soon('projects/:projectId/runs/:runId', PLANNED.designSpace),
      soon('projects/:projectId/runs/:runId/variants', PLANNED.variants),
      page({
        path: 'projects/:projectId/runs/:runId/variants/:variantId',
        lazy: async () => ({ Component: (await import('./routes/variant')).VariantPage }),
      }),
      soon('projects/:projectId/compare', PLANNED.compare),
      soon('reference-cases', PLANNED.referenceCases),
      soon('uploads', PLANNED.uploads),
      soon('tokens', PLANNED.tokens),
      soon('admin', PLANNED.admin),
      page({ path: 'examples', element: <ExamplesPage /> }),
      page({
        path: 'examples/:name',
        lazy: async () => ({ Component: (await import('./routes/example')).ExamplePage }),
      }),
      page({ path: '*', element: <NotFoundPage /> }),
    ],
  },
];

export const createAppRouter = () => createBrowserRouter(routes);
export type AppRouter = ReturnType<typeof createAppRouter>;
