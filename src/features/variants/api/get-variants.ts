/** A page of a run's variants (server-side sort, filters and paging). */
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { PanelpointApi, RunRef } from '@/lib/api';
import { useApi } from '@/lib/api-context';
import { variantQueryParams, type VariantQuery } from '@/lib/variant-query';

export const getVariants = (api: PanelpointApi, ref: RunRef, q: VariantQuery, signal?: AbortSignal) => api.getVariants(ref, q, signal);

export const variantsQueryOptions = (api: PanelpointApi, ref: RunRef, q: VariantQuery) =>
  queryOptions({
    // The key holds the request's own parameters, so equal queries share one cache entry.
    queryKey: ['variants', 'list', { slug: ref.slug, runId: ref.runId, ...variantQueryParams(q) }],
    queryFn: ({ signal }) => getVariants(api, ref, q, signal),
  });

export const useVariants = (ref: RunRef, q: VariantQuery) =>
  useQuery({ ...variantsQueryOptions(useApi(), ref, q), placeholderData: keepPreviousData });
