/** Reference cases of a project, one case with its file, and the history of CI checks (pass, drift, invalid). */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PanelpointApi } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const getCases = (api: PanelpointApi, slug: string) => api.getCases(slug);
export const getCase = (api: PanelpointApi, slug: string, caseId: string) => api.getCase(slug, caseId);
export const getChecks = (api: PanelpointApi, slug: string, caseName?: string) => api.getChecks(slug, caseName);

export const casesQueryOptions = (api: PanelpointApi, slug: string) =>
  queryOptions({ queryKey: ['cases', 'list', { slug }], queryFn: () => getCases(api, slug) });
export const caseQueryOptions = (api: PanelpointApi, slug: string, caseId: string) =>
  queryOptions({ queryKey: ['cases', 'detail', { slug, caseId }], queryFn: () => getCase(api, slug, caseId) });
export const checksQueryOptions = (api: PanelpointApi, slug: string, caseName?: string) =>
  queryOptions({ queryKey: ['checks', 'list', { slug, caseName: caseName ?? null }], queryFn: () => getChecks(api, slug, caseName) });

export const useCases = (slug: string) => useQuery(casesQueryOptions(useApi(), slug));
export const useCase = (slug: string, caseId: string | undefined) => useQuery({ ...caseQueryOptions(useApi(), slug, caseId ?? ''), enabled: !!caseId });
export const useChecks = (slug: string, caseName?: string) => useQuery(checksQueryOptions(useApi(), slug, caseName));
