/** Pages that wait for the team server: what each will show and read (the API proposal in src/lib/api.ts). */
import type { PlannedPage } from '@/components/coming-with-server';

export const PLANNED = {
  projects: {
    title: 'Projects',
    summary: 'The projects you belong to, with their studies, latest runs and who can change them.',
    endpoints: ['GET /api/projects'],
  },
  project: {
    title: 'Project',
    summary: "A project's studies: family, parameter space and the runs pushed for each.",
    endpoints: ['GET /api/projects/:projectId', 'GET /api/projects/:projectId/studies'],
  },
  study: {
    title: 'Study runs',
    summary: 'The runs of a study: when, by whom, how many variants, how many failed and why.',
    endpoints: ['GET /api/studies/:studyId/runs'],
  },
  designSpace: {
    title: 'Design space',
    summary: 'Charts of a sweep run: each variant a point, parameters against weight, peak forces and utilisation; failed variants shown as their own points, with the reason.',
    endpoints: ['GET /api/runs/:runId', 'GET /api/runs/:runId/points'],
  },
  variants: {
    title: 'Variants',
    summary: 'The variants of a run as a sortable, filterable table: parameters, status, peak tension and compression, governing check.',
    endpoints: ['GET /api/runs/:runId/variants?page='],
  },
  compare: {
    title: 'Compare variants',
    summary: 'Two to four variants side by side: drawings at one scale, member forces and checks, and the differences.',
    endpoints: ['GET /api/runs/:runId/variants/:variantId (per variant)'],
  },
  referenceCases: {
    title: 'Reference cases',
    summary: 'Trusses with known answers (closed forms, published values) that every engine change is checked against, with their last result.',
    endpoints: ['GET /api/reference-cases'],
  },
  uploads: {
    title: 'Uploads',
    summary: 'Model and study files uploaded to a project, validated on arrival, with their issues by JSON path.',
    endpoints: ['GET /api/uploads', 'POST /api/uploads'],
  },
  tokens: {
    title: 'Access tokens',
    summary: 'Tokens that let the CLI push runs to a project: name, rights, last use; create and revoke.',
    endpoints: ['GET /api/tokens', 'POST /api/tokens', 'DELETE /api/tokens/:id'],
  },
  admin: {
    title: 'Administration',
    summary: 'Users, roles and their rights, and the audit of who changed what.',
    endpoints: ['GET /api/admin/users', 'GET /api/admin/audit'],
  },
} satisfies Record<string, PlannedPage>;
