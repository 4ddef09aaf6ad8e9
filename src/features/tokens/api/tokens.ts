/** API tokens of a project for the CLI: list, create (the secret comes back once), revoke. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PanelpointApi } from '@/lib/api';
import type { ProjectRight } from '@/lib/api-types';
import { useApi } from '@/lib/api-context';

export const getTokens = (api: PanelpointApi, slug: string) => api.getTokens(slug);

export const tokensQueryOptions = (api: PanelpointApi, slug: string) =>
  queryOptions({ queryKey: ['tokens', 'list', { slug }], queryFn: () => getTokens(api, slug) });

export const useTokens = (slug: string) => useQuery(tokensQueryOptions(useApi(), slug));

/** The created token (with its secret) is returned to the caller only: it is never put in the query cache. */
export function useCreateToken(slug: string) {
  const api = useApi();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { name: string; scopes?: ProjectRight[] }) => api.createToken(slug, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['tokens'] }),
  });
}

export function useRevokeToken(slug: string) {
  const api = useApi();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.revokeToken(slug, id),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['tokens'] }),
  });
}
