/** Studies and runs of a project, and one run with its summary and parameter names. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PanelpointApi, RunRef } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const getStudies = (api: PanelpointApi, slug: string) => api.getStudies(slug);
export const getStudy = (api: PanelpointApi, slug: string, studyId: string) => api.getStudy(slug, studyId);
export const getRuns = (api: PanelpointApi, slug: string, study?: string) => api.getRuns(slug, study ? { study } : undefined);
export const getRun = (api: PanelpointApi, ref: RunRef) => api.getRun(ref);

export const studiesQueryOptions = (api: PanelpointApi, slug: string) =>
  queryOptions({ queryKey: ['studies', 'list', { slug }], queryFn: () => getStudies(api, slug) });

export const studyQueryOptions = (api: PanelpointApi, slug: string, studyId: string) =>
  queryOptions({ queryKey: ['studies', 'detail', { slug, studyId }], queryFn: () => getStudy(api, slug, studyId) });

export const runsQueryOptions = (api: PanelpointApi, slug: string, study?: string) =>
  queryOptions({ queryKey: ['runs', 'list', { slug, study: study ?? null }], queryFn: () => getRuns(api, slug, study) });

export const runQueryOptions = (api: PanelpointApi, ref: RunRef) =>
  queryOptions({ queryKey: ['runs', 'detail', { slug: ref.slug, runId: ref.runId }], queryFn: () => getRun(api, ref) });

export const useStudies = (slug: string) => useQuery(studiesQueryOptions(useApi(), slug));
export const useStudy = (slug: string, studyId: string) => useQuery(studyQueryOptions(useApi(), slug, studyId));
export const useRuns = (slug: string, study?: string) => useQuery(runsQueryOptions(useApi(), slug, study));
export const useRun = (ref: RunRef) => useQuery(runQueryOptions(useApi(), ref));
