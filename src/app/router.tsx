/**
 * The routes, as a table. Every page has its own error boundary; the pages that run the engine in
 * the browser (example, variant, compare) or draw charts (run: Plotly) load lazily, so the rest
 * of the app stays small.
 */
import { createBrowserRouter, Navigate, type RouteObject } from 'react-router-dom';
import { RouteError } from '@/components/route-error';
import { PageLoading } from '@/components/page-loading';
import { Shell } from './shell';
import { SignInPage } from './routes/sign-in';
import { ResetPasswordPage } from './routes/reset-password';
import { AcceptInvitationPage } from './routes/accept-invitation';
import { ProjectsPage } from './routes/projects';
import { ProjectPage } from './routes/project';
import { StudyPage } from './routes/study';
import { ReferenceCasesPage, SectionRedirect, TokensPage, UploadsPage } from './routes/project-section';
import { AdminPage } from './routes/admin';
import { ExamplesPage } from './routes/examples';
import { NotFoundPage } from './routes/not-found';

const page = (r: RouteObject): RouteObject => ({ errorElement: <RouteError />, ...r }) as RouteObject;

export const routes: RouteObject[] = [
  {
    path: '/',
    element: <Shell />,
    errorElement: <RouteError />,
    hydrateFallbackElement: <PageLoading />,
    children: [
      page({ index: true, element: <Navigate to="/projects" replace /> }),
      page({ path: 'sign-in', element: <SignInPage /> }),
      page({ path: 'reset-password', element: <ResetPasswordPage /> }),
      page({ path: 'invitations/accept', element: <AcceptInvitationPage /> }),
      page({ path: 'projects', element: <ProjectsPage /> }),
      page({ path: 'projects/:slug', element: <ProjectPage /> }),
      page({ path: 'projects/:slug/studies/:studyId', element: <StudyPage /> }),
      page({ path: 'projects/:slug/runs/:runId', lazy: async () => ({ Component: (await import('./routes/run')).RunPage }) }),
      page({ path: 'projects/:slug/runs/:runId/variants', lazy: async () => ({ Component: (await import('./routes/run')).VariantsPage }) }),
      page({ path: 'projects/:slug/runs/:runId/variants/:index', lazy: async () => ({ Component: (await import('./routes/variant')).VariantPage }) }),
      page({ path: 'projects/:slug/runs/:runId/compare', lazy: async () => ({ Component: (await import('./routes/compare')).ComparePage }) }),
      page({ path: 'projects/:slug/reference-cases', element: <ReferenceCasesPage /> }),
      page({ path: 'projects/:slug/uploads', element: <UploadsPage /> }),
      page({ path: 'projects/:slug/tokens', element: <TokensPage /> }),
      page({ path: 'reference-cases', element: <SectionRedirect section="reference-cases" /> }),
      page({ path: 'uploads', element: <SectionRedirect section="uploads" /> }),
      page({ path: 'tokens', element: <SectionRedirect section="tokens" /> }),
      page({ path: 'admin', element: <AdminPage /> }),
      page({ path: 'examples', element: <ExamplesPage /> }),
      page({ path: 'examples/:name', lazy: async () => ({ Component: (await import('./routes/example')).ExamplePage }) }),
      page({ path: '*', element: <NotFoundPage /> }),
    ],
  },
];

export const createAppRouter = () => createBrowserRouter(routes);
export type AppRouter = ReturnType<typeof createAppRouter>;
