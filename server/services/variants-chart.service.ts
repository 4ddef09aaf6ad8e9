/**
 * Chart data of a run, computed by the database: columnar points for scatter plots (WebGL), and
 * 2-D bins with GROUP BY on FLOOR((col − lo) / w), so no route ever pulls a whole run into Node.
 * Both take the filters of the variants route.
 */
import type { Sequelize } from 'sequelize';
import { Run } from '../db/models/run.model';
import type { ProjectAccess } from '../http/context';
import { findRun } from './runs.service';
import { filterConditions, QueryReader } from './variants-query';
import { arrayRows } from './variants-sql';

/** Most points in one answer. */
export const MAX_POINTS = 200_000;
/** Most bins per axis. */
export const MAX_BINS = 200;
/** Added to (x − lo) / w before FLOOR, so values on a grid that lands on an edge fall in the bin above it. */
export const EDGE_NUDGE = 1e-9;

type Num = number | null;
const num = (v: unknown): Num => (v === null || v === undefined ? null : Number(v));

async function prepare(access: ProjectAccess, runId: string, query: Record<string, unknown>, own: string[]) {
  const run = await findRun(access, runId);
  const r = new QueryReader(query, run.paramColumns);
  r.onlyKeys(own);
  const field = (key: string, required: boolean) => {
    const name = r.text(key);
    if (name === undefined) return required ? r.fail(key, `is required: one of ${r.fieldNames(true).join(', ')}`) : undefined;
    return r.column(key, name, true);
  };
  return { run, r, field };
}

export interface Points {
  count: number;
  truncated: boolean;
  x: Num[];
  y: Num[];
  color?: Num[];
  index: number[];
  status: string[];
}

/** Points of the run in index order: x, y (and color) of each variant; nulls where a figure is missing (unstable). */
export async function variantPoints(access: ProjectAccess, runId: string, query: Record<string, unknown>): Promise<Points> {
  const { run, r, field } = await prepare(access, runId, query, ['x', 'y', 'color', 'limit']);
  const x = field('x', true);
  const y = field('y', true);
  const color = field('color', false);
  const limit = r.int('limit', 1, MAX_POINTS, MAX_POINTS);
  const where = filterConditions(r, run.id);
  r.done();
  const cols = [x, y, color ?? 'NULL', 'v.`index`', 'v.status'].join(', ');
  const rows = await arrayRows(Run.sequelize!, `SELECT ${cols} FROM variants v WHERE ${where.sql} ORDER BY v.\`index\` LIMIT ${limit + 1}`, where.values);
  const truncated = rows.length > limit;
  const kept = truncated ? rows.slice(0, limit) : rows;
  const out: Points = { count: kept.length, truncated, x: [], y: [], index: [], status: [] };
  if (color) out.color = [];
  for (const row of kept) {
    out.x.push(num(row[0]));
    out.y.push(num(row[1]));
    out.color?.push(num(row[2]));
    out.index.push(Number(row[3]));
    out.status.push(String(row[4]));
  }
  return out;
}

export interface Bins {
  xEdges: number[];
  yEdges: number[];
  /** [ix][iy]: variants in the cell. */
  count: number[][];
  /** [ix][iy]: smallest and largest y in the cell (of z when z is given); null for an empty cell. */
  min: Num[][];
  max: Num[][];
  /** [ix][iy]: mean of z (with z only). */
  mean?: Num[][];
}

/** One axis: `n` bins of width `w` from `lo`; a single value makes one bin. */
function axis(lo: number, hi: number, bins: number) {
  const n = hi > lo ? bins : 1;
  const w = hi > lo ? (hi - lo) / n : 1;
  const edges = Array.from({ length: n + 1 }, (_, i) => (i === n ? (hi > lo ? hi : lo) : lo + i * w));
  return { n, lo, w, edges };
}

/** A number as a DOUBLE literal that reads back to the same value (computed here, never from the query). */
const lit = (v: number) => `(${v.toExponential()})`;
const binOf = (col: string, a: ReturnType<typeof axis>) => `LEAST(FLOOR((${col} - ${lit(a.lo)}) / ${lit(a.w)} + ${lit(EDGE_NUDGE)}), ${a.n - 1})`;
const grid = <T>(nx: number, ny: number, v: T): T[][] => Array.from({ length: nx }, () => Array<T>(ny).fill(v));

/** Counts and min/max (and mean of z) in `bins` × `bins` cells over x and y, in two SQL queries. */
export async function variantBins(access: ProjectAccess, runId: string, query: Record<string, unknown>): Promise<Bins> {
  const { run, r, field } = await prepare(access, runId, query, ['x', 'y', 'z', 'bins']);
  const x = field('x', true);
  const y = field('y', true);
  const z = field('z', false);
  const bins = r.int('bins', 1, MAX_BINS, 50);
  const where = filterConditions(r, run.id);
  r.done();
  const sequelize: Sequelize = Run.sequelize!;
  const base = `FROM variants v WHERE ${where.sql} AND ${x} IS NOT NULL AND ${y} IS NOT NULL`;
  const [range] = await arrayRows(sequelize, `SELECT MIN(${x}), MAX(${x}), MIN(${y}), MAX(${y}), COUNT(*) ${base}`, where.values);
  if (!Number(range[4])) return { xEdges: [], yEdges: [], count: [], min: [], max: [], ...(z ? { mean: [] } : {}) };
  const ax = axis(Number(range[0]), Number(range[1]), bins);
  const ay = axis(Number(range[2]), Number(range[3]), bins);
  const v = z ?? y;
  const sql = `SELECT ${binOf(x!, ax)} AS bx, ${binOf(y!, ay)} AS by_, COUNT(*), MIN(${v}), MAX(${v})${z ? `, AVG(${z})` : ''} ${base} GROUP BY bx, by_`;
  const out: Bins = { xEdges: ax.edges, yEdges: ay.edges, count: grid(ax.n, ay.n, 0), min: grid(ax.n, ay.n, null), max: grid(ax.n, ay.n, null) };
  if (z) out.mean = grid(ax.n, ay.n, null);
  for (const row of await arrayRows(sequelize, sql, where.values)) {
    const i = Number(row[0]);
    const j = Number(row[1]);
    out.count[i][j] = Number(row[2]);
    out.min[i][j] = num(row[3]);
    out.max[i][j] = num(row[4]);
    if (out.mean) out.mean[i][j] = num(row[5]);
  }
  return out;
}
