/** Password reset by mailed link: ask for the link, then set a new password with its token. */
import { useMutation } from '@tanstack/react-query';
import { useApi } from '@/lib/api-context';

export function useRequestReset() {
  const api = useApi();
  return useMutation({ mutationFn: (email: string) => api.requestPasswordReset(email) });
}

export function useConfirmReset() {
  const api = useApi();
  return useMutation({ mutationFn: (input: { token: string; password: string }) => api.confirmPasswordReset(input) });
}
