/** One variant of a run from the team server: its model and analysis JSON. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PanelpointApi } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const getVariant = (api: PanelpointApi, runId: string, variantId: string, signal?: AbortSignal) =>
  api.getVariant(runId, variantId, signal);

export const variantQueryOptions = (api: PanelpointApi, runId: string, variantId: string) =>
  queryOptions({
    queryKey: ['variants', 'detail', { runId, variantId }],
    queryFn: ({ signal }) => getVariant(api, runId, variantId, signal),
  });

export function useVariant(runId: string, variantId: string) {
  return useQuery(variantQueryOptions(useApi(), runId, variantId));
}
