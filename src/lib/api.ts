/**
 * The team server's endpoints as one interface, so pages depend on `PanelpointApi` and tests
 * or offline pages can hand in another implementation. `createHttpApi` is the real one.
 */
import type { ApiClient } from './api-client';
import type { Me, Page, ProjectSummary, RunSummary, StudySummary, VariantDetailDto, VariantRow } from './api-types';

export interface PanelpointApi {
  signIn(input: { email: string; password: string }): Promise<Me>;
  signOut(): Promise<void>;
  getMe(): Promise<Me>;
  getProjects(): Promise<ProjectSummary[]>;
  getStudies(projectId: string): Promise<StudySummary[]>;
  getRuns(studyId: string): Promise<RunSummary[]>;
  getVariant(runId: string, variantId: string, signal?: AbortSignal): Promise<VariantDetailDto>;
  getVariants(runId: string, page: number, signal?: AbortSignal): Promise<Page<VariantRow>>;
}

const seg = encodeURIComponent;

/** The HTTP implementation over the one client. Paths are the proposal in api-types.ts. */
export function createHttpApi(client: ApiClient): PanelpointApi {
  return {
    signIn: (input) => client.post('/auth/sign-in', input),
    signOut: () => client.post('/auth/sign-out'),
    getMe: () => client.get('/auth/me'),
    getProjects: () => client.get('/projects'),
    getStudies: (projectId) => client.get(`/projects/${seg(projectId)}/studies`),
    getRuns: (studyId) => client.get(`/studies/${seg(studyId)}/runs`),
    getVariant: (runId, variantId, signal) => client.get(`/runs/${seg(runId)}/variants/${seg(variantId)}`, { signal }),
    getVariants: (runId, page, signal) => client.get(`/runs/${seg(runId)}/variants`, { query: { page }, signal }),
  };
}
