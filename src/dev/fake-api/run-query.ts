/**
 * The variants queries of the fake server over a RunStore: filters, sort (nulls lowest, as the
 * server sorts), pages, columnar points and 2-D bins ([ix][iy], like the server's SQL).
 */
import type { Aggregate, MarkKind, Points } from '@/lib/run-types';
import type { AggregateQuery, PointsQuery } from '@/lib/api';
import type { VariantQuery } from '@/lib/variant-query';
import { ApiError } from '@/lib/api-client';
import { isNumericField, numberOf, statusOf, type RunStore } from './run-store';

export type MarksOf = (index: number) => MarkKind[];

function invalid(path: string, message: string): ApiError {
  return new ApiError(422, 'invalid-query', 'The query is not valid.', [{ path, message }]);
}

/** Row positions matching the filters of `q`. */
export function filtered(s: RunStore, q: Partial<VariantQuery>, marks: MarksOf): number[] {
  const status = q.status?.length ? new Set(q.status) : undefined;
  const ids = q.ids?.length ? new Set(q.ids) : undefined;
  const ranges = Object.entries(q.ranges ?? {});
  for (const [f] of ranges) if (!isNumericField(s, f)) throw invalid(`f.${f}.gte`, `unknown field '${f}'`);
  const out: number[] = [];
  for (let j = 0; j < s.n; j++) {
    if (status && !status.has(statusOf(s, j))) continue;
    if (q.critical !== undefined && (s.critical[j] === 1) !== q.critical) continue;
    if (ids && !ids.has(s.index[j])) continue;
    if (q.marked && !marks(s.index[j]).includes(q.marked)) continue;
    let ok = true;
    for (const [f, r] of ranges) {
      const v = numberOf(s, f, j);
      if (!Number.isFinite(v) || (r.gte !== undefined && v < r.gte) || (r.lte !== undefined && v > r.lte)) { ok = false; break; }
    }
    if (ok) out.push(j);
  }
  return out;
}

export function sorted(s: RunStore, rows: number[], sort: string | undefined): number[] {
  if (!sort || sort === 'index') return rows;
  const desc = sort.startsWith('-');
  const field = desc ? sort.slice(1) : sort;
  if (field !== 'status' && !isNumericField(s, field)) throw invalid('sort', `unknown field '${field}'`);
  const key = field === 'status' ? (j: number) => s.status[j] : (j: number) => {
    const v = numberOf(s, field, j);
    return Number.isFinite(v) ? v : -Infinity;
  };
  const dir = desc ? -1 : 1;
  return [...rows].sort((a, b) => (key(a) - key(b)) * dir || (a - b) * dir);
}

export function points(s: RunStore, q: PointsQuery): Points {
  for (const k of ['x', 'y', 'color'] as const) if (q[k] !== undefined && !isNumericField(s, q[k]!)) throw invalid(k, `'${q[k]}' is not a numeric field`);
  const limit = Math.min(q.limit ?? 200_000, 200_000);
  const n = Math.min(s.n, limit);
  const val = (f: string, j: number) => {
    const v = numberOf(s, f, j);
    return Number.isFinite(v) ? v : null;
  };
  const out: Points = { count: n, truncated: s.n > limit, x: [], y: [], index: [], status: [] };
  if (q.color) out.color = [];
  for (let j = 0; j < n; j++) {
    out.x.push(val(q.x, j));
    out.y.push(val(q.y, j));
    if (q.color) out.color!.push(val(q.color, j));
    out.index.push(s.index[j]);
    out.status.push(statusOf(s, j));
  }
  return out;
}

function axis(lo: number, hi: number, bins: number) {
  const n = hi > lo ? bins : 1;
  const w = hi > lo ? (hi - lo) / n : 1;
  return { n, lo, w, edges: Array.from({ length: n + 1 }, (_, i) => (i === n ? (hi > lo ? hi : lo) : lo + i * w)) };
}

export function aggregate(s: RunStore, q: AggregateQuery): Aggregate {
  for (const k of ['x', 'y', 'z'] as const) if (q[k] !== undefined && !isNumericField(s, q[k]!)) throw invalid(k, `'${q[k]}' is not a numeric field`);
  const bins = Math.min(Math.max(1, q.bins ?? 50), 200);
  const rows: number[] = [];
  let [x0, x1, y0, y1] = [Infinity, -Infinity, Infinity, -Infinity];
  for (let j = 0; j < s.n; j++) {
    const x = numberOf(s, q.x, j);
    const y = numberOf(s, q.y, j);
    if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
    rows.push(j);
    [x0, x1, y0, y1] = [Math.min(x0, x), Math.max(x1, x), Math.min(y0, y), Math.max(y1, y)];
  }
  if (!rows.length) return { xEdges: [], yEdges: [], count: [], min: [], max: [], ...(q.z ? { mean: [] } : {}) };
  const ax = axis(x0, x1, bins);
  const ay = axis(y0, y1, bins);
  const grid = <T>(v: T) => Array.from({ length: ax.n }, () => Array<T>(ay.n).fill(v));
  const count = grid(0);
  const min = grid<number | null>(null);
  const max = grid<number | null>(null);
  const sum = grid(0);
  const zn = grid(0);
  const bin = (v: number, a: typeof ax) => Math.min(Math.floor((v - a.lo) / a.w + 1e-9), a.n - 1);
  for (const j of rows) {
    const [i, k] = [bin(numberOf(s, q.x, j), ax), bin(numberOf(s, q.y, j), ay)];
    count[i][k]++;
    const v = numberOf(s, q.z ?? q.y, j);
    if (!Number.isFinite(v)) continue;
    min[i][k] = min[i][k] === null ? v : Math.min(min[i][k]!, v);
    max[i][k] = max[i][k] === null ? v : Math.max(max[i][k]!, v);
    sum[i][k] += v;
    zn[i][k]++;
  }
  const out: Aggregate = { xEdges: ax.edges, yEdges: ay.edges, count, min, max };
  if (q.z) out.mean = sum.map((r, i) => r.map((t, k) => (zn[i][k] ? t / zn[i][k] : null)));
  return out;
}
