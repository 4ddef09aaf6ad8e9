/** Accept an invitation from its mailed token; the server signs the person in. */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApi } from '@/lib/api-context';

export function useAcceptInvitation() {
  const api = useApi();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { token: string; name?: string; password?: string }) => api.acceptInvitation(input),
    onSuccess: () => qc.resetQueries(),
  });
}
