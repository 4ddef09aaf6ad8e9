/** Sign in against the team server; on success the session cookie is set and "me" is cached. */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PanelpointApi } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const signIn = (api: PanelpointApi, input: { email: string; password: string }) => api.signIn(input);

export function useSignIn() {
  const api = useApi();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { email: string; password: string }) => signIn(api, input),
    onSuccess: (me) => qc.setQueryData(['auth', 'me'], me),
  });
}
