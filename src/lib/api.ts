/**
 * The team server's endpoints as one interface, so pages depend on `PanelpointApi` and tests
 * or the fake demo (VITE_FAKE_API=1) can hand in another implementation. `createHttpApi` is the
 * real one, over the one API client.
 */
import type { ApiClient } from './api-client';
import type { ApiTokenInfo, CapturedMail, CapturedMailDetail, CheckRecord, CreatedUpload, CreatedToken, InvitationAccepted, Me, ProjectDetail, ProjectRight, PublicProject, PublicUser, ReferenceCaseDetail, ReferenceCaseSummary, SignInResult, UploadInfo, UploadKind, UserPatch } from './api-types';
import type { Aggregate, MarkKind, Page, Points, RunDetail, RunSummary, StudyDetail, StudySummary, VariantComment, VariantDetailDto, VariantRow } from './run-types';
import { filterParams, variantQueryParams, type VariantQuery } from './variant-query';

/** A run of a project. */
export interface RunRef {
  slug: string;
  runId: string;
}

export interface PointsQuery {
  x: string;
  y: string;
  color?: string;
  /** At most 200,000 on the server. */
  limit?: number;
}

export interface AggregateQuery {
  x: string;
  y: string;
  bins?: number;
  z?: string;
}

export interface PanelpointApi {
  signIn(input: { email: string; password: string }): Promise<SignInResult>;
  signOut(): Promise<void>;
  getMe(): Promise<Me>;
  requestPasswordReset(email: string): Promise<{ message: string }>;
  confirmPasswordReset(input: { token: string; password: string }): Promise<void>;
  acceptInvitation(input: { token: string; name?: string; password?: string }): Promise<InvitationAccepted>;

  getProjects(): Promise<PublicProject[]>;
  getProject(slug: string): Promise<ProjectDetail>;
  getStudies(slug: string): Promise<StudySummary[]>;
  getStudy(slug: string, studyId: string): Promise<StudyDetail>;
  getRuns(slug: string, filter?: { study?: string }): Promise<RunSummary[]>;
  getRun(ref: RunRef): Promise<RunDetail>;

  getVariants(ref: RunRef, query: VariantQuery, signal?: AbortSignal): Promise<Page<VariantRow>>;
  /** The address of the CSV of every variant matching the query's filters and sort. */
  variantsCsvUrl(ref: RunRef, query: VariantQuery): string;
  getPoints(ref: RunRef, query: PointsQuery, signal?: AbortSignal): Promise<Points>;
  getAggregate(ref: RunRef, query: AggregateQuery, signal?: AbortSignal): Promise<Aggregate>;
  getVariant(ref: RunRef, index: number, signal?: AbortSignal): Promise<VariantDetailDto>;
  setMark(ref: RunRef, index: number, kind: MarkKind): Promise<void>;
  clearMark(ref: RunRef, index: number): Promise<void>;
  getComments(ref: RunRef, index: number): Promise<VariantComment[]>;
  addComment(ref: RunRef, index: number, body: string): Promise<VariantComment>;

  getCases(slug: string): Promise<ReferenceCaseSummary[]>;
  getCase(slug: string, caseId: string): Promise<ReferenceCaseDetail>;
  /** Newest first; `caseName` narrows to one case. */
  getChecks(slug: string, caseName?: string): Promise<CheckRecord[]>;

  getUploads(slug: string): Promise<UploadInfo[]>;
  upload(slug: string, input: { file: File; kind: UploadKind }): Promise<CreatedUpload>;
  uploadUrl(slug: string, id: number): string;

  getTokens(slug: string): Promise<ApiTokenInfo[]>;
  createToken(slug: string, input: { name: string; scopes?: ProjectRight[] }): Promise<CreatedToken>;
  revokeToken(slug: string, id: number): Promise<void>;

  getUsers(): Promise<PublicUser[]>;
  updateUser(id: number, patch: UserPatch): Promise<PublicUser>;
  getMail(): Promise<CapturedMail[]>;
  getMailMessage(id: number): Promise<CapturedMailDetail>;
}

const seg = encodeURIComponent;

/**
 * A list as the server answers it: the account routes wrap lists (`{ projects: [...] }`), the
 * runs contract answers bare arrays; accept both so either side can settle on one.
 */
export function listOf<T>(answer: unknown, key: string): T[] {
  if (Array.isArray(answer)) return answer as T[];
  const inner = (answer as Record<string, unknown> | null)?.[key];
  return Array.isArray(inner) ? (inner as T[]) : [];
}

/** One object, bare or wrapped (`{ project: {...} }`). */
export function oneOf<T>(answer: unknown, key: string): T {
  const inner = (answer as Record<string, unknown> | null)?.[key];
  return (inner && typeof inner === 'object' ? inner : answer) as T;
}

/** The HTTP implementation over the one client. */
export function createHttpApi(client: ApiClient): PanelpointApi {
  const project = (slug: string) => `/projects/${seg(slug)}`;
  const run = (r: RunRef) => `${project(r.slug)}/runs/${seg(r.runId)}`;
  const variant = (r: RunRef, index: number) => `${run(r)}/variants/${index}`;
  return {
    signIn: (input) => client.post('/auth/sign-in', input),
    signOut: () => client.post('/auth/sign-out'),
    getMe: () => client.get('/auth/me'),
    requestPasswordReset: (email) => client.post('/auth/password-reset', { email }),
    confirmPasswordReset: (input) => client.post('/auth/password-reset/confirm', input),
    acceptInvitation: (input) => client.post('/invitations/accept', input),

    getProjects: async () => listOf(await client.get('/projects'), 'projects'),
    getProject: async (slug) => oneOf(await client.get(project(slug)), 'project'),
    getStudies: async (slug) => listOf(await client.get(`${project(slug)}/studies`), 'studies'),
    getStudy: async (slug, id) => oneOf(await client.get(`${project(slug)}/studies/${seg(id)}`), 'study'),
    getRuns: async (slug, f) => listOf(await client.get(`${project(slug)}/runs`, { query: { study: f?.study } }), 'runs'),
    getRun: async (r) => oneOf(await client.get(run(r)), 'run'),

    getVariants: (r, q, signal) => client.get(`${run(r)}/variants`, { query: variantQueryParams(q), signal }),
    variantsCsvUrl: (r, q) => client.url(`${run(r)}/variants.csv`, filterParams(q)),
    getPoints: (r, q, signal) => client.get(`${run(r)}/points`, { query: { ...q }, signal }),
    getAggregate: (r, q, signal) => client.get(`${run(r)}/aggregate`, { query: { ...q }, signal }),
    getVariant: (r, index, signal) => client.get(variant(r, index), { signal }),
    setMark: (r, index, kind) => client.put(`${variant(r, index)}/marks/me`, { kind }),
    clearMark: (r, index) => client.delete(`${variant(r, index)}/marks/me`),
    getComments: async (r, index) => listOf(await client.get(`${variant(r, index)}/comments`), 'comments'),
    addComment: async (r, index, body) => oneOf(await client.post(`${variant(r, index)}/comments`, { body }), 'comment'),

    getCases: async (slug) => listOf(await client.get(`${project(slug)}/cases`), 'cases'),
    getCase: async (slug, id) => oneOf(await client.get(`${project(slug)}/cases/${seg(id)}`), 'case'),
    getChecks: async (slug, caseName) => listOf(await client.get(`${project(slug)}/checks`, { query: { case: caseName } }), 'results'),

    getUploads: async (slug) => listOf(await client.get(`${project(slug)}/uploads`), 'uploads'),
    upload: async (slug, { file, kind }) => {
      const form = new FormData();
      form.set('kind', kind);
      form.set('file', file, file.name);
      return client.post(`${project(slug)}/uploads`, form);
    },
    uploadUrl: (slug, id) => client.url(`${project(slug)}/uploads/${id}`),

    getTokens: async (slug) => listOf(await client.get(`${project(slug)}/tokens`), 'tokens'),
    createToken: (slug, input) => client.post(`${project(slug)}/tokens`, input),
    revokeToken: (slug, id) => client.delete(`${project(slug)}/tokens/${id}`),

    getUsers: async () => listOf(await client.get('/users'), 'users'),
    updateUser: async (id, patch) => oneOf(await client.patch(`/users/${id}`, patch), 'user'),
    getMail: async () => listOf(await client.get('/admin/mail'), 'messages'),
    getMailMessage: async (id) => oneOf(await client.get(`/admin/mail/${id}`), 'message'),
  };
}
