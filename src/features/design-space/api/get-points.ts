/** Columnar points of a run (GET …/points) for WebGL scatter charts, up to POINT_LIMIT variants. */
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { PanelpointApi, PointsQuery, RunRef } from '@/lib/api';
import { useApi } from '@/lib/api-context';

/** Beyond this many variants the chart is a heatmap from …/aggregate. */
export const POINT_LIMIT = 100_000;

export const getPoints = (api: PanelpointApi, ref: RunRef, q: PointsQuery, signal?: AbortSignal) => api.getPoints(ref, q, signal);

export const pointsQueryOptions = (api: PanelpointApi, ref: RunRef, q: PointsQuery) =>
  queryOptions({
    queryKey: ['design-space', 'points', { slug: ref.slug, runId: ref.runId, ...q }],
    queryFn: ({ signal }) => getPoints(api, ref, q, signal),
    staleTime: 5 * 60_000,
  });

export function usePoints(ref: RunRef, q: PointsQuery, enabled = true) {
  return useQuery({ ...pointsQueryOptions(useApi(), ref, q), enabled, placeholderData: keepPreviousData });
}
