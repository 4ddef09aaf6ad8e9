/**
 * The value of the split parameter for every variant, by index. A numeric parameter comes from
 * …/points (as the colour column). The points endpoint takes numeric fields only, so a text
 * parameter (supports) is read from the variants list, 500 a page, for runs of up to
 * TEXT_SPLIT_LIMIT variants.
 */
import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PanelpointApi, RunRef } from '@/lib/api';
import type { RunDetail } from '@/lib/run-types';
import { useApi } from '@/lib/api-context';
import { MAX_PAGE_SIZE } from '@/lib/variant-query';
import { POINT_LIMIT } from './get-points';

export const TEXT_SPLIT_LIMIT = 10_000;
const PARALLEL = 4;

export type SplitValues = Map<number, string | number | null>;

export async function getSplitValues(api: PanelpointApi, ref: RunRef, param: string, numeric: boolean, signal?: AbortSignal): Promise<SplitValues> {
  if (numeric) {
    const p = await api.getPoints(ref, { x: 'index', y: 'index', color: param, limit: POINT_LIMIT }, signal);
    return new Map(p.index.map((ix, i) => [ix, p.color?.[i] ?? null]));
  }
  const out: SplitValues = new Map();
  const first = await api.getVariants(ref, { page: 1, pageSize: MAX_PAGE_SIZE, sort: 'index' }, signal);
  const take = (items: typeof first.items) => { for (const v of items) out.set(v.index, v.params[param] ?? null); };
  take(first.items);
  const pages = Math.ceil(Math.min(first.total, TEXT_SPLIT_LIMIT) / MAX_PAGE_SIZE);
  for (let start = 2; start <= pages; start += PARALLEL) {
    const batch = Array.from({ length: Math.min(PARALLEL, pages - start + 1) }, (_, k) =>
      api.getVariants(ref, { page: start + k, pageSize: MAX_PAGE_SIZE, sort: 'index' }, signal));
    for (const page of await Promise.all(batch)) take(page.items);
  }
  return out;
}

export const splitValuesQueryOptions = (api: PanelpointApi, ref: RunRef, param: string, numeric: boolean) =>
  queryOptions({
    queryKey: ['design-space', 'split', { slug: ref.slug, runId: ref.runId, param }],
    queryFn: ({ signal }) => getSplitValues(api, ref, param, numeric, signal),
    staleTime: 5 * 60_000,
  });

/** Whether a parameter can split the chart of this run, and why not. */
export function splitSupport(run: RunDetail, param: string): { ok: boolean; why?: string } {
  if (param in (run.paramColumns ?? {})) return { ok: true };
  if (run.variantCount <= TEXT_SPLIT_LIMIT) return { ok: true };
  return { ok: false, why: `Splitting by ${param} (a text parameter) reads every variant's row; this run has more than ${TEXT_SPLIT_LIMIT.toLocaleString('en')} variants.` };
}

export function useSplitValues(ref: RunRef, run: RunDetail, param: string, enabled: boolean) {
  const ok = !!param && splitSupport(run, param).ok;
  return useQuery({ ...splitValuesQueryOptions(useApi(), ref, param, param in (run.paramColumns ?? {})), enabled: enabled && ok });
}
