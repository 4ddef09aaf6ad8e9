/**
 * The query of a run's variants (GET …/variants and …/variants.csv) as one value, and its
 * translation to the server's query string: sort=field|-field, status=a,b, critical, marked,
 * f.<field>.gte / .lte, ids=1,5,9, page, pageSize (≤ 500).
 */
import type { MarkKind, VariantStatus } from './run-types';

export interface RangeFilter {
  gte?: number;
  lte?: number;
}

export interface VariantQuery {
  /** 1-based. */
  page: number;
  pageSize: number;
  /** A field, with a leading '-' for descending. */
  sort?: string;
  status?: VariantStatus[];
  critical?: boolean;
  marked?: MarkKind;
  /** Numeric ranges by field (figures and numeric parameters), in the units the server stores. */
  ranges?: Record<string, RangeFilter>;
  /** Variant indices (a chart selection). */
  ids?: number[];
}

export const MAX_PAGE_SIZE = 500;
export const DEFAULT_QUERY: VariantQuery = { page: 1, pageSize: 50 };

export type QueryParams = Record<string, string>;

/** The filters and sort of a query, without paging (what the CSV export takes). */
export function filterParams(q: VariantQuery): QueryParams {
  const out: QueryParams = {};
  if (q.sort) out.sort = q.sort;
  if (q.status?.length) out.status = q.status.join(',');
  if (q.critical !== undefined) out.critical = String(q.critical);
  if (q.marked) out.marked = q.marked;
  for (const [field, r] of Object.entries(q.ranges ?? {}).sort(([a], [b]) => a.localeCompare(b))) {
    if (r.gte !== undefined && Number.isFinite(r.gte)) out[`f.${field}.gte`] = String(r.gte);
    if (r.lte !== undefined && Number.isFinite(r.lte)) out[`f.${field}.lte`] = String(r.lte);
  }
  if (q.ids?.length) out.ids = q.ids.join(',');
  return out;
}

/** Every parameter of the list request: filters, sort and the page. */
export function variantQueryParams(q: VariantQuery): QueryParams {
  const size = Math.min(Math.max(1, Math.round(q.pageSize)), MAX_PAGE_SIZE);
  return { ...filterParams(q), page: String(Math.max(1, Math.round(q.page))), pageSize: String(size) };
}

/** `?a=1&b=2` for a set of parameters ('' when empty). */
export function queryString(params: QueryParams): string {
  const s = new URLSearchParams(params).toString();
  return s ? `?${s}` : '';
}

/** True when the query filters anything (the table says "of N matching"). */
export function isFiltered(q: VariantQuery): boolean {
  const f = filterParams(q);
  delete f.sort;
  return Object.keys(f).length > 0;
}
