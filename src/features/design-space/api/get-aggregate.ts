/** Binned statistics of a run (GET …/aggregate): counts per bin, and min / max / mean of z. */
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AggregateQuery, PanelpointApi, RunRef } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const getAggregate = (api: PanelpointApi, ref: RunRef, q: AggregateQuery, signal?: AbortSignal) => api.getAggregate(ref, q, signal);

export const aggregateQueryOptions = (api: PanelpointApi, ref: RunRef, q: AggregateQuery) =>
  queryOptions({
    queryKey: ['design-space', 'aggregate', { slug: ref.slug, runId: ref.runId, ...q }],
    queryFn: ({ signal }) => getAggregate(api, ref, q, signal),
    staleTime: 5 * 60_000,
  });

export function useAggregate(ref: RunRef, q: AggregateQuery, enabled = true) {
  return useQuery({ ...aggregateQueryOptions(useApi(), ref, q), enabled, placeholderData: keepPreviousData });
}
