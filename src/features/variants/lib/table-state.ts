/**
 * The variants table's query in the page address (shareable, survives reloads): the server's own
 * parameter names (sort, status, critical, marked, f.<field>.gte|lte, ids), with page and size.
 */
import type { MarkKind, VariantStatus } from '@/lib/run-types';
import { STATUSES } from '@/lib/figures';
import { DEFAULT_QUERY, filterParams, MAX_PAGE_SIZE, type RangeFilter, type VariantQuery } from '@/lib/variant-query';

const PLAIN_KEYS = ['page', 'size', 'sort', 'status', 'critical', 'marked', 'ids'];
const RANGE_KEY = /^f\.(.+)\.(gte|lte)$/;

const int = (s: string | null, fallback: number) => {
  const n = s === null ? NaN : Number(s);
  return Number.isInteger(n) && n > 0 ? n : fallback;
};

export function queryFromParams(p: URLSearchParams): VariantQuery {
  const q: VariantQuery = { page: int(p.get('page'), 1), pageSize: Math.min(int(p.get('size'), DEFAULT_QUERY.pageSize), MAX_PAGE_SIZE) };
  const sort = p.get('sort');
  if (sort) q.sort = sort;
  const status = (p.get('status') ?? '').split(',').filter((s): s is VariantStatus => (STATUSES as string[]).includes(s));
  if (status.length) q.status = status;
  const critical = p.get('critical');
  if (critical === 'true' || critical === 'false') q.critical = critical === 'true';
  const marked = p.get('marked');
  if (marked === 'candidate' || marked === 'rejected') q.marked = marked as MarkKind;
  const ranges: Record<string, RangeFilter> = {};
  for (const [k, v] of p) {
    const m = RANGE_KEY.exec(k);
    const n = Number(v);
    if (m && v.trim() !== '' && Number.isFinite(n)) ranges[m[1]] = { ...ranges[m[1]], [m[2]]: n };
  }
  if (Object.keys(ranges).length) q.ranges = ranges;
  const ids = (p.get('ids') ?? '').split(',').filter((s) => s !== '').map(Number).filter((n) => Number.isInteger(n) && n >= 0);
  if (ids.length) q.ids = ids;
  return q;
}

/** `p` with the table's keys replaced by those of `q` (other keys, such as the chart's, are kept). */
export function withQuery(p: URLSearchParams, q: VariantQuery): URLSearchParams {
  const next = new URLSearchParams(p);
  for (const k of [...next.keys()]) if (PLAIN_KEYS.includes(k) || RANGE_KEY.test(k)) next.delete(k);
  for (const [k, v] of Object.entries(filterParams(q))) next.set(k, v);
  if (q.page > 1) next.set('page', String(q.page));
  if (q.pageSize !== DEFAULT_QUERY.pageSize) next.set('size', String(q.pageSize));
  return next;
}

/** The next sort when a column header is pressed: ascending, then descending, then ascending again. */
export function nextSort(current: string | undefined, field: string): string {
  return current === field ? `-${field}` : field;
}

export function sortOf(sort: string | undefined): { field?: string; dir: 'ascending' | 'descending' } {
  if (!sort) return { dir: 'ascending' };
  return sort.startsWith('-') ? { field: sort.slice(1), dir: 'descending' } : { field: sort, dir: 'ascending' };
}
