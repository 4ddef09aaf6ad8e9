/** The variants being compared, one request each (cached with the variant pages: same query keys). */
import { useQueries } from '@tanstack/react-query';
import type { PanelpointApi, RunRef } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const getComparedVariant = (api: PanelpointApi, ref: RunRef, index: number, signal?: AbortSignal) => api.getVariant(ref, index, signal);

export const comparedQueryOptions = (api: PanelpointApi, ref: RunRef, index: number) => ({
  queryKey: ['variants', 'detail', { slug: ref.slug, runId: ref.runId, index }] as const,
  queryFn: ({ signal }: { signal: AbortSignal }) => getComparedVariant(api, ref, index, signal),
});

export function useComparedVariants(ref: RunRef, indices: readonly number[]) {
  const api = useApi();
  return useQueries({ queries: indices.map((i) => comparedQueryOptions(api, ref, i)) });
}
