/**
 * The table's query from the address and the ways to change it. Every change of filters goes
 * back to page 1; a chart selection replaces the ids (or, too large for ids, becomes ranges).
 */
import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { VariantQuery } from '@/lib/variant-query';
import { queryFromParams, withQuery } from '../lib/table-state';

/** Most ids a selection sends; a larger box selection becomes ranges on its two fields. */
export const MAX_IDS = 1000;

export interface Selection {
  indices: number[];
  box?: { x: [number, number]; y: [number, number] };
}

export interface TableState {
  query: VariantQuery;
  /** Change the query; `keepPage` only for paging itself. */
  update: (patch: Partial<VariantQuery>, keepPage?: boolean) => void;
  select: (s: Selection | undefined, fields: { x: string; y: string }) => { note?: string };
}

export function useVariantTableState(): TableState {
  const [params, setParams] = useSearchParams();
  const query = useMemo(() => queryFromParams(params), [params]);
  const update = useCallback((patch: Partial<VariantQuery>, keepPage = false) => {
    setParams((p) => withQuery(p, { ...queryFromParams(p), ...patch, ...(keepPage ? {} : { page: 1 }) }));
  }, [setParams]);
  const select = useCallback((s: Selection | undefined, fields: { x: string; y: string }) => {
    if (!s) {
      update({ ids: undefined });
      return {};
    }
    if (s.indices.length <= MAX_IDS) {
      update({ ids: s.indices });
      return {};
    }
    if (s.box) {
      const ranges = { ...query.ranges, [fields.x]: { gte: s.box.x[0], lte: s.box.x[1] }, [fields.y]: { gte: s.box.y[0], lte: s.box.y[1] } };
      update({ ids: undefined, ranges });
      return { note: `${s.indices.length} variants selected: the table filters by the box's ranges of ${fields.x} and ${fields.y} instead of a list.` };
    }
    update({ ids: s.indices.slice(0, MAX_IDS) });
    return { note: `${s.indices.length} variants selected: the table lists the first ${MAX_IDS}. A box selection, or range filters, reach all of them.` };
  }, [update, query.ranges]);
  return { query, update, select };
}
