// A fake PanelpointApi for the component tests of the team pages: small invented data (a depot
// roof run of 12 variants), every method a vi.fn so tests read the queries the pages send.
import { vi } from 'vitest';
import { render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { routes } from '@/app/router';
import { AppProvider, createQueryClient } from '@/app/provider';
import type { PanelpointApi } from '@/lib/api';
import { ApiError } from '@/lib/api-client';
import type { Me, ProjectDetail, ProjectRight, Role } from '@/lib/api-types';
import type { Page, Points, RunDetail, VariantRow, VariantStatus } from '@/lib/run-types';
import type { VariantQuery } from '@/lib/variant-query';

export const SLUG = 'harrow-lane-depot';
export const RUN_ID = 'b7e3c1d2-4f5a-4e6b-9c8d-1a2b3c4d5e6f';
export const RUN_PATH = `/projects/${SLUG}/runs/${RUN_ID}`;

const RIGHTS: Record<Role, ProjectRight[]> = {
  admin: ['project:read', 'project:admin', 'tokens:manage', 'variants:mark', 'variants:reject', 'comments:write', 'uploads:write'],
  engineer: ['project:read', 'tokens:manage', 'runs:push', 'variants:mark', 'variants:reject', 'comments:write', 'uploads:write'],
  reviewer: ['project:read', 'variants:mark', 'comments:write'],
  viewer: ['project:read'],
};

export function meAs(role: Role): Me {
  return {
    user: { id: 7, email: `${role}@panelpoint.example`, name: `Test ${role}`, role, disabled: false, createdAt: '2025-01-01T00:00:00Z' },
    via: 'cookie', projects: [{ slug: SLUG, name: 'Harrow Lane depot roof', description: '', createdAt: '2025-01-01T00:00:00Z', role }],
  };
}

export const projectAs = (role: Role): ProjectDetail => ({ ...meAs(role).projects[0], rights: RIGHTS[role] });

/** 12 variants: spans 18 and 24, three depths, pin-roller and roller-roller (unstable, no forces); variant 5 critical. */
export function rows(): VariantRow[] {
  return Array.from({ length: 12 }, (_, i) => {
    const stable = i % 2 === 0;
    const status: VariantStatus = stable ? (i % 4 === 0 ? 'determinate' : 'indeterminate') : 'unstable';
    const span = i < 6 ? 18 : 24;
    const depth = 1.2 + 0.3 * (i % 3);
    return {
      pk: 100 + i, index: i, variantId: `${i}`.padStart(16, '0'), params: { span, depth, supports: stable ? 'pin-roller' : 'roller-roller' },
      status, joints: 14, members: 25, reactions: stable ? 3 : 2, k: stable ? 0 : 1, s: 0, critical: i === 5,
      peakTension: stable ? 100 + 10 * i : null, peakTensionMember: stable ? 'BC3' : null,
      peakCompression: stable ? -(120 + 10 * i) : null, peakCompressionMember: stable ? 'TC3' : null,
      maxDisplacement: stable ? 0.02 + i / 1000 : null, spanOverDeflection: stable ? span / (0.02 + i / 1000) : null,
      weight: stable ? 5 + i / 4 : null, maxUtilisation: stable ? 0.7 + i / 50 : null,
      reason: stable ? null : 'mechanism: no horizontal restraint', marks: i === 2 ? [{ kind: 'candidate', user: { id: 7, name: 'Test' } }] : [],
    };
  });
}

export function runDetail(): RunDetail {
  return {
    runId: RUN_ID, study: { id: 1, name: 'Depot roof, Pratt', family: 'pratt' }, pushedBy: { id: 2, name: 'Ellis Engineer' },
    pushedAt: '2025-02-14T16:42:00Z', cliVersion: '0.1.0', gitCommit: 'd2a85f16c0b1', status: 'complete', variantCount: 12,
    byStatus: { determinate: 3, indeterminate: 3, unstable: 6, error: 0 }, shards: [],
    summary: { objective: { figure: 'weight' as never, sense: 'minimize' }, evaluated: 12, filtered: 0, byStatus: { determinate: 3, indeterminate: 3, unstable: 6, error: 0 }, critical: 1, best: [], reasons: [] },
    paramNames: ['span', 'depth', 'supports'], paramColumns: { span: 'p1', depth: 'p2' }, combinations: [],
  };
}

export function pointsOf(list: VariantRow[], q: { x: string; y: string; color?: string }): Points {
  const v = (r: VariantRow, f: string) => {
    const x = f in r.params ? r.params[f] : (r as unknown as Record<string, number | null>)[f];
    return typeof x === 'number' ? x : null;
  };
  return {
    count: list.length, truncated: false, index: list.map((r) => r.index), status: list.map((r) => r.status),
    x: list.map((r) => v(r, q.x)), y: list.map((r) => v(r, q.y)), ...(q.color ? { color: list.map((r) => v(r, q.color!)) } : {}),
  };
}

export function pageOf(q: VariantQuery, list = rows()): Page<VariantRow> {
  let l = list;
  if (q.ids) l = l.filter((r) => q.ids!.includes(r.index));
  if (q.critical !== undefined) l = l.filter((r) => r.critical === q.critical);
  if (q.status) l = l.filter((r) => q.status!.includes(r.status));
  const start = (q.page - 1) * q.pageSize;
  return { total: l.length, page: q.page, pageSize: q.pageSize, items: l.slice(start, start + q.pageSize) };
}

const notHere = (name: string) => vi.fn(() => Promise.reject(new ApiError(500, 'not-in-test', `${name} is not part of this test`)));

/** The fake: a signed-in `role`, the run above; `over` replaces any method. */
export function fakeApi(role: Role = 'engineer', over: Partial<PanelpointApi> = {}): PanelpointApi {
  const data = rows();
  const base: Record<string, unknown> = {
    getMe: vi.fn(async () => meAs(role)),
    getProjects: vi.fn(async () => meAs(role).projects),
    getProject: vi.fn(async () => projectAs(role)),
    getRun: vi.fn(async () => runDetail()),
    getVariants: vi.fn(async (_ref, q: VariantQuery) => pageOf(q, data)),
    variantsCsvUrl: vi.fn(() => `/api${RUN_PATH}/variants.csv`),
    getPoints: vi.fn(async (_ref, q) => pointsOf(data, q)),
    getAggregate: vi.fn(async () => ({ xEdges: [1, 2, 3], yEdges: [18, 21, 24], count: [[1, 0], [0, 2]], min: [[5, null], [null, 6]], max: [[5, null], [null, 7]], mean: [[5, null], [null, 6.5]] })),
    setMark: vi.fn(async () => undefined),
    clearMark: vi.fn(async () => undefined),
  };
  const names = ['signIn', 'signOut', 'requestPasswordReset', 'confirmPasswordReset', 'acceptInvitation', 'getStudies', 'getStudy', 'getRuns',
    'getVariant', 'getComments', 'addComment', 'getCases', 'getCase', 'getChecks', 'getUploads', 'upload', 'uploadUrl', 'getTokens',
    'createToken', 'revokeToken', 'getUsers', 'updateUser', 'getMail', 'getMailMessage'];
  for (const n of names) base[n] ??= notHere(n);
  return { ...base, ...over } as unknown as PanelpointApi;
}

/** Render the app's routes at `path` with `api`; returns the router and the query client. */
export function renderAt(path: string, api: PanelpointApi) {
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  const queryClient = createQueryClient();
  render(<AppProvider api={api} queryClient={queryClient}><RouterProvider router={router} /></AppProvider>);
  return { router, queryClient };
}

/** The chart's own reading of the critical forms (500 a page by index), not a table query. */
const isCriticalScan = (q: VariantQuery) => q.critical === true && q.pageSize === 500 && q.sort === 'index';

/** The last query of the variants table that a vi.fn of getVariants received. */
export const lastQuery = (api: PanelpointApi): VariantQuery => {
  const calls = (api.getVariants as unknown as { mock: { calls: [unknown, VariantQuery][] } }).mock.calls;
  return calls.filter(([, q]) => !isCriticalScan(q)).at(-1)![1];
};
