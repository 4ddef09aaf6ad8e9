/**
 * SQL shared by the variant routes: the columns of an item, rows to API items, and queries on a
 * raw pooled connection for the large columnar answers (rows as arrays, no per-row objects).
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import type { Connection } from 'mariadb';
import { Mark } from '../db/models/mark.model';
import { User } from '../db/models/user.model';

/** The columns of one variant item, from `variants v`. */
export const ITEM_COLUMNS = [
  'v.id AS pk', 'v.`index`', 'v.variantId', 'v.params', 'v.status', 'v.joints', 'v.members', 'v.reactions', 'v.k', 'v.s', 'v.critical',
  'v.peakTension', 'v.peakTensionMember', 'v.peakCompression', 'v.peakCompressionMember', 'v.maxDisplacement', 'v.spanOverDeflection',
  'v.weight', 'v.maxUtilisation', 'v.reason',
].join(', ');

/** One variant as the API gives it. Forces kN, displacement m, weight kN. */
export interface VariantItem {
  pk: number;
  index: number;
  variantId: string;
  params: Record<string, number | string>;
  status: string;
  joints: number;
  members: number;
  reactions: number;
  k: number;
  s: number;
  critical: boolean;
  peakTension: number | null;
  peakTensionMember: string | null;
  peakCompression: number | null;
  peakCompressionMember: string | null;
  maxDisplacement: number | null;
  spanOverDeflection: number | null;
  weight: number | null;
  maxUtilisation: number | null;
  reason: string | null;
}

export interface PublicMark {
  kind: string;
  user: { id: number; name: string } | null;
  updatedAt: Date;
}

type RawItem = Omit<VariantItem, 'params' | 'critical'> & { params: unknown; critical: unknown };

export function toItem(r: RawItem): VariantItem {
  return { ...r, params: (typeof r.params === 'string' ? JSON.parse(r.params) : r.params) as VariantItem['params'], critical: Boolean(r.critical) };
}

export async function selectItems(sequelize: Sequelize, sql: string, values: unknown[]): Promise<VariantItem[]> {
  const rows = await sequelize.query<RawItem>(sql, { replacements: values, type: QueryTypes.SELECT });
  return rows.map(toItem);
}

/** Marks of the given variants by variant pk, each with its author. */
export async function marksOf(pks: readonly number[]): Promise<Map<number, PublicMark[]>> {
  const out = new Map<number, PublicMark[]>();
  if (!pks.length) return out;
  const marks = await Mark.findAll({ where: { variantPk: [...pks] }, include: [{ model: User, as: 'user', attributes: ['id', 'name'] }], order: [['updatedAt', 'ASC']] });
  for (const m of marks as (Mark & { user?: User | null })[]) {
    const list = out.get(m.variantPk) ?? [];
    list.push({ kind: m.kind, user: m.user ? { id: m.user.id, name: m.user.name } : null, updatedAt: m.updatedAt });
    out.set(m.variantPk, list);
  }
  return out;
}

/** Run one query on a pooled connection with rows as arrays (for answers of 100,000s of rows). */
export async function arrayRows(sequelize: Sequelize, sql: string, values: unknown[]): Promise<unknown[][]> {
  const cm = sequelize.connectionManager;
  const conn = (await cm.getConnection({ type: 'read' })) as unknown as Connection;
  try {
    return (await conn.query({ sql, rowsAsArray: true }, values)) as unknown[][];
  } finally {
    cm.releaseConnection(conn as never);
  }
}
