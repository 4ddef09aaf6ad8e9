/**
 * The indices of a run's critical forms (unstable although the count is met), to draw them with
 * their own marker: the points endpoint gives a status but not the critical flag. Read from the
 * variants list (critical=true), 500 a page, up to CRITICAL_LIMIT.
 */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PanelpointApi, RunRef } from '@/lib/api';
import { useApi } from '@/lib/api-context';
import { MAX_PAGE_SIZE, type VariantQuery } from '@/lib/variant-query';

export const CRITICAL_LIMIT = 10_000;
const PARALLEL = 4;

export async function getCriticalIndices(api: PanelpointApi, ref: RunRef, signal?: AbortSignal): Promise<{ indices: Set<number>; total: number }> {
  const q = (page: number): VariantQuery => ({ page, pageSize: MAX_PAGE_SIZE, critical: true, sort: 'index' });
  const first = await api.getVariants(ref, q(1), signal);
  const indices = new Set(first.items.map((v) => v.index));
  const pages = Math.ceil(Math.min(first.total, CRITICAL_LIMIT) / MAX_PAGE_SIZE);
  for (let start = 2; start <= pages; start += PARALLEL) {
    const batch = Array.from({ length: Math.min(PARALLEL, pages - start + 1) }, (_, k) => api.getVariants(ref, q(start + k), signal));
    for (const page of await Promise.all(batch)) for (const v of page.items) indices.add(v.index);
  }
  return { indices, total: first.total };
}

export const criticalQueryOptions = (api: PanelpointApi, ref: RunRef) =>
  queryOptions({
    queryKey: ['design-space', 'critical', { slug: ref.slug, runId: ref.runId }],
    queryFn: ({ signal }) => getCriticalIndices(api, ref, signal),
    staleTime: 5 * 60_000,
  });

export const useCriticalIndices = (ref: RunRef, enabled: boolean) => useQuery({ ...criticalQueryOptions(useApi(), ref), enabled });
