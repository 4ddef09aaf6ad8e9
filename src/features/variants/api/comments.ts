/** Comments on a variant: read and add. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PanelpointApi, RunRef } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const getComments = (api: PanelpointApi, ref: RunRef, index: number) => api.getComments(ref, index);

export const commentsQueryOptions = (api: PanelpointApi, ref: RunRef, index: number) =>
  queryOptions({ queryKey: ['variants', 'comments', { slug: ref.slug, runId: ref.runId, index }], queryFn: () => getComments(api, ref, index) });

export const useComments = (ref: RunRef, index: number) => useQuery(commentsQueryOptions(useApi(), ref, index));

export function useAddComment(ref: RunRef, index: number) {
  const api = useApi();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (body: string) => api.addComment(ref, index, body),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['variants', 'comments', { slug: ref.slug, runId: ref.runId, index }] }),
  });
}
