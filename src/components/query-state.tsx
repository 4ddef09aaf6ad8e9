/** Loading and error for a query, in place: `<QueryState q={q} what="the runs">{(data) => ...}</QueryState>`. */
import type { ReactNode } from 'react';
import type { UseQueryResult } from '@tanstack/react-query';
import { PageLoading } from './page-loading';
import { ErrorPanel } from './error-panel';

export function QueryState<T>({ q, what, children }: { q: UseQueryResult<T>; what: string; children: (data: T) => ReactNode }) {
  if (q.isPending) return <PageLoading what={what.replace(/^the /, '')} />;
  if (q.isError) return <ErrorPanel error={q.error} what={what} onRetry={() => void q.refetch()} />;
  return <>{children(q.data)}</>;
}
