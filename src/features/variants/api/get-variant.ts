/** One variant of a run from the team server: its row, model, analysis JSON and the recompute check. */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PanelpointApi, RunRef } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const getVariant = (api: PanelpointApi, ref: RunRef, index: number, signal?: AbortSignal) => api.getVariant(ref, index, signal);

export const variantQueryOptions = (api: PanelpointApi, ref: RunRef, index: number) =>
  queryOptions({
    queryKey: ['variants', 'detail', { slug: ref.slug, runId: ref.runId, index }],
    queryFn: ({ signal }) => getVariant(api, ref, index, signal),
    enabled: Number.isInteger(index) && index >= 0,
  });

export const useVariant = (ref: RunRef, index: number) => useQuery(variantQueryOptions(useApi(), ref, index));
