/** Pages of a run's variants: filters, sort and paging from the query, each item with its marks. */
import { QueryTypes } from 'sequelize';
import { Run } from '../db/models/run.model';
import { Variant } from '../db/models/variant.model';
import type { ProjectAccess } from '../http/context';
import { notFound } from '../http/http-error';
import { findRun } from './runs.service';
import { filterConditions, orderSql, QueryReader, readSort } from './variants-query';
import { ITEM_COLUMNS, marksOf, selectItems, type PublicMark, type VariantItem } from './variants-sql';

/** Largest page. */
export const MAX_PAGE_SIZE = 500;

export interface VariantPage {
  total: number;
  page: number;
  pageSize: number;
  items: (VariantItem & { marks: PublicMark[] })[];
}

export async function listVariants(access: ProjectAccess, runId: string, query: Record<string, unknown>): Promise<VariantPage> {
  const run = await findRun(access, runId);
  const r = new QueryReader(query, run.paramColumns);
  r.onlyKeys(['page', 'pageSize', 'sort']);
  const page = r.int('page', 1, 1_000_000_000, 1);
  const pageSize = r.int('pageSize', 1, MAX_PAGE_SIZE, 50);
  const where = filterConditions(r, run.id);
  const order = orderSql(readSort(r));
  r.done();
  const sequelize = Run.sequelize!;
  const offset = (page - 1) * pageSize;
  const [items, total] = await Promise.all([
    selectItems(sequelize, `SELECT ${ITEM_COLUMNS} FROM variants v WHERE ${where.sql} ORDER BY ${order} LIMIT ${pageSize} OFFSET ${offset}`, where.values),
    where.values.length === 1 ? run.variantCount : countWhere(where.sql, where.values),
  ]);
  const marks = await marksOf(items.map((i) => i.pk));
  return { total, page, pageSize, items: items.map((i) => ({ ...i, marks: marks.get(i.pk) ?? [] })) };
}

async function countWhere(sql: string, values: unknown[]): Promise<number> {
  const [row] = await Run.sequelize!.query<{ n: number | bigint }>(`SELECT COUNT(*) AS n FROM variants v WHERE ${sql}`, { replacements: values, type: QueryTypes.SELECT });
  return Number(row.n);
}

/** The stored row of variant `indexText` of the run; 404 when the run or the variant is not there. */
export async function findVariantRow(access: ProjectAccess, runId: string, indexText: string): Promise<Variant> {
  const run = await findRun(access, runId);
  const index = /^\d{1,9}$/.test(indexText) ? Number(indexText) : -1;
  const v = index < 0 ? null : await Variant.findOne({ where: { runPk: run.id, index }, attributes: ['id', 'runPk', 'index'] });
  if (!v) throw notFound('variant-not-found', `Run ${run.runId} has no variant ${indexText}.`);
  return v;
}
