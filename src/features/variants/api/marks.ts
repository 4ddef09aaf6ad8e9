/** The caller's mark on a variant (candidate, rejected, or none); every variants query is read again after. */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RunRef } from '@/lib/api';
import type { MarkKind } from '@/lib/run-types';
import { useApi } from '@/lib/api-context';

export function useMarkVariant(ref: RunRef) {
  const api = useApi();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ index, kind }: { index: number; kind: MarkKind | null }) =>
      kind ? api.setMark(ref, index, kind) : api.clearMark(ref, index),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['variants'] }),
  });
}
