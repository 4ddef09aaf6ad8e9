/** Sign in against the team server; on success the session cookie is set and everything account-bound is read again. */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { PanelpointApi } from '@/lib/api';
import { useApi } from '@/lib/api-context';

export const signIn = (api: PanelpointApi, input: { email: string; password: string }) => api.signIn(input);

export function useSignIn() {
  const api = useApi();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { email: string; password: string }) => signIn(api, input),
    // Another person may have been signed in: drop what was cached for them.
    onSuccess: () => qc.resetQueries(),
  });
}

export function useSignOut() {
  const api = useApi();
  const qc = useQueryClient();
  return useMutation({ mutationFn: () => api.signOut(), onSettled: () => qc.clear() });
}
