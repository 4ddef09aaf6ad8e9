/** Files uploaded to a project (studies, models, DXF): list, upload (multipart), download address. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { PanelpointApi } from '@/lib/api';
import type { UploadKind } from '@/lib/api-types';
import { useApi } from '@/lib/api-context';

export const getUploads = (api: PanelpointApi, slug: string) => api.getUploads(slug);

export const uploadsQueryOptions = (api: PanelpointApi, slug: string) =>
  queryOptions({ queryKey: ['uploads', 'list', { slug }], queryFn: () => getUploads(api, slug) });

export const useUploads = (slug: string) => useQuery(uploadsQueryOptions(useApi(), slug));

export function useUpload(slug: string) {
  const api = useApi();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (input: { file: File; kind: UploadKind }) => api.upload(slug, input),
    onSuccess: () => qc.invalidateQueries({ queryKey: ['uploads'] }),
  });
}
