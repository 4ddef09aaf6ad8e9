/**
 * The variants of a page query as CSV, streamed: chunks of 5,000 rows read by keyset (after the
 * last row's sort value and id), so each chunk is an index range however deep the export goes.
 * Forces kN, displacement m, weight kN (the header says so).
 */
import { Readable } from 'node:stream';
import { Run } from '../db/models/run.model';
import type { ProjectAccess } from '../http/context';
import { findRun } from './runs.service';
import { shardsOf } from './runs-shards';
import { filterConditions, orderSql, QueryReader, readSort, type Sort } from './variants-query';
import { ITEM_COLUMNS, selectItems, type VariantItem } from './variants-sql';

const CHUNK = 5000;
const FIGURES = [
  'status', 'joints', 'members', 'reactions', 'k', 's', 'critical', 'peakTension_kN', 'peakTensionMember', 'peakCompression_kN',
  'peakCompressionMember', 'maxDisplacement_m', 'spanOverDeflection', 'weight_kN', 'maxUtilisation', 'reason',
] as const;

const cell = (v: unknown): string => {
  if (v === null || v === undefined) return '';
  const s = String(v);
  return /[",\n\r]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
};

function csvLine(i: VariantItem, paramNames: readonly string[]): string {
  const figures = [i.status, i.joints, i.members, i.reactions, i.k, i.s, i.critical, i.peakTension, i.peakTensionMember, i.peakCompression,
    i.peakCompressionMember, i.maxDisplacement, i.spanOverDeflection, i.weight, i.maxUtilisation, i.reason];
  return [i.index, i.variantId, ...paramNames.map((n) => i.params[n]), ...figures].map(cell).join(',') + '\n';
}

/** Rows strictly after `last` in the order of `s`. */
function after(s: Sort, last: { value: unknown; pk: number }): { sql: string; values: unknown[] } {
  const c = s.column;
  if (s.byIndex) return { sql: `${c} ${s.desc ? '<' : '>'} ?`, values: [last.value] };
  if (last.value === null) {
    return s.desc ? { sql: `(${c} IS NULL AND v.id < ?)`, values: [last.pk] } : { sql: `((${c} IS NULL AND v.id > ?) OR ${c} IS NOT NULL)`, values: [last.pk] };
  }
  const v = last.value;
  return s.desc
    ? { sql: `(${c} < ? OR (${c} = ? AND v.id < ?) OR ${c} IS NULL)`, values: [v, v, last.pk] }
    : { sql: `(${c} > ? OR (${c} = ? AND v.id > ?))`, values: [v, v, last.pk] };
}

/** Check the query, then give the CSV as a stream (the header first) and a file name. */
export async function variantsCsv(access: ProjectAccess, runId: string, query: Record<string, unknown>): Promise<{ filename: string; body: Readable }> {
  const run = await findRun(access, runId);
  const r = new QueryReader(query, run.paramColumns);
  r.onlyKeys(['sort']);
  const where = filterConditions(r, run.id);
  const sort = readSort(r);
  r.done();
  const paramNames = shardsOf(run.shards)[0]?.paramNames ?? [];
  const sequelize = Run.sequelize!;
  async function* lines(): AsyncGenerator<string> {
    yield ['index', 'id', ...paramNames, ...FIGURES].join(',') + '\n';
    let last: { value: unknown; pk: number } | undefined;
    for (;;) {
      const k = last ? after(sort, last) : { sql: '1 = 1', values: [] };
      const sql = `SELECT ${ITEM_COLUMNS}, ${sort.column} AS sortValue FROM variants v WHERE ${where.sql} AND ${k.sql} ORDER BY ${orderSql(sort)} LIMIT ${CHUNK}`;
      const rows = (await selectItems(sequelize, sql, [...where.values, ...k.values])) as (VariantItem & { sortValue: unknown })[];
      if (!rows.length) return;
      yield rows.map((i) => csvLine(i, paramNames)).join('');
      const end = rows[rows.length - 1];
      last = { value: end.sortValue, pk: end.pk };
      if (rows.length < CHUNK) return;
    }
  }
  const safe = run.runId.replace(/[^A-Za-z0-9-]+/g, '-');
  return { filename: `run-${safe}-variants.csv`, body: Readable.from(lines()) };
}
