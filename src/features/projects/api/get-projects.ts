/** The projects the caller can see, and one project with the caller's rights in it. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PanelpointApi } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const getProjects = (api: PanelpointApi) => api.getProjects();
export const getProject = (api: PanelpointApi, slug: string) => api.getProject(slug);

export const projectsQueryOptions = (api: PanelpointApi) =>
  queryOptions({ queryKey: ['projects', 'list'], queryFn: () => getProjects(api) });

export const projectQueryOptions = (api: PanelpointApi, slug: string) =>
  queryOptions({ queryKey: ['projects', 'detail', slug], queryFn: () => getProject(api, slug), enabled: !!slug });

export const useProjects = () => useQuery(projectsQueryOptions(useApi()));
export const useProject = (slug: string) => useQuery(projectQueryOptions(useApi(), slug));
