/** Who is signed in, how, and their projects (GET /api/auth/me). A 401 means nobody: no retry. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PanelpointApi } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const getMe = (api: PanelpointApi) => api.getMe();

export const meQueryOptions = (api: PanelpointApi) =>
  queryOptions({ queryKey: ['auth', 'me'], queryFn: () => getMe(api), retry: false, staleTime: 60_000 });

export const useMe = () => useQuery(meQueryOptions(useApi()));
