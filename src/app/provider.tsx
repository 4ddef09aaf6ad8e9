/** Providers of the app: the API and TanStack Query (no retries on 4xx, calm refetching). */
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import type { PanelpointApi } from '@/lib/api';
import { ApiProvider } from '@/lib/api-context';
import { ApiError } from '@/lib/api-client';

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: (count, err) => !(err instanceof ApiError && err.status >= 400 && err.status < 500) && count < 2,
      },
    },
  });
}

export function AppProvider({ api, queryClient, children }: { api: PanelpointApi; queryClient: QueryClient; children: ReactNode }) {
  return (
    <ApiProvider api={api}>
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </ApiProvider>
  );
}
