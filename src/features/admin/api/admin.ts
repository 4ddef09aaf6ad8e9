/** Accounts and roles (users:admin), and the mail the development sink caught (mail:read). */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PanelpointApi } from '@/lib/api';
import type { UserPatch } from '@/lib/api-types';
import { useApi } from '@/lib/api-context';

export const getUsers = (api: PanelpointApi) => api.getUsers();
export const getMail = (api: PanelpointApi) => api.getMail();
export const getMailMessage = (api: PanelpointApi, id: number) => api.getMailMessage(id);

export const usersQueryOptions = (api: PanelpointApi) => queryOptions({ queryKey: ['users', 'list'], queryFn: () => getUsers(api) });
export const mailQueryOptions = (api: PanelpointApi) => queryOptions({ queryKey: ['mail', 'list'], queryFn: () => getMail(api), staleTime: 5_000 });
export const mailMessageQueryOptions = (api: PanelpointApi, id: number) =>
  queryOptions({ queryKey: ['mail', 'detail', id], queryFn: () => getMailMessage(api, id), staleTime: Infinity });

export const useUsers = () => useQuery(usersQueryOptions(useApi()));
export const useMail = () => useQuery(mailQueryOptions(useApi()));
export const useMailMessage = (id: number | undefined) => useQuery({ ...mailMessageQueryOptions(useApi(), id ?? -1), enabled: id !== undefined });

export function useUpdateUser() {
  const api = useApi();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: number; patch: UserPatch }) => api.updateUser(id, patch),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['users'] }),
  });
}
