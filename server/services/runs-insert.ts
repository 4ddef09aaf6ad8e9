/**
 * Insert one batch of variant rows inside the push's transaction. On MariaDB the rows go on the
 * transaction's own connection as one prepared INSERT executed over the whole batch (the
 * connector's `batch`, the server's bulk protocol): no SQL text of a megabyte to build and parse
 * per batch. Measured here (bench/push.bench.ts and its notes): ≈ 1.6× the rows per second of the
 * multi-row INSERT that Model.bulkCreate sends, and less work for the database than the same rows
 * as one multi-row prepared INSERT, the database being the bottleneck of a push.
 * Rows come as arrays of values in COLUMNS order, as the fast path of a push reads them
 * (runs-push-fast.ts) or rowValues() makes them from a row object.
 * A connection without `batch` (another connector) gets one multi-row INSERT with replacements.
 */
import { QueryTypes, type Transaction } from 'sequelize';
import { Variant } from '../db/models/variant.model';
import { conflict } from '../http/http-error';
import type { VariantRow } from './runs-push-rows';

/** Columns in the order of the prepared statement and of a row's values. */
export const COLUMNS = [
  'runPk', 'index', 'variantId', 'params', 'status', 'joints', 'members', 'reactions', 'k', 's', 'critical',
  'peakTension', 'peakTensionMember', 'peakCompression', 'peakCompressionMember', 'maxDisplacement', 'spanOverDeflection',
  'weight', 'maxUtilisation', 'reason', 'p1', 'p2', 'p3', 'p4', 'p5', 'p6',
] as const satisfies readonly (keyof VariantRow)[];

const TUPLE = `(${COLUMNS.map(() => '?').join(', ')})`;
const INTO = `INSERT INTO variants (${COLUMNS.map((c) => `\`${c}\``).join(', ')}) VALUES `;
/**
 * The bulk INSERT, without two per-row checks that cannot fail for a push's rows; MariaDB documents
 * switching checks off for bulk loads, and SET STATEMENT scopes the settings to this one statement,
 * so the pooled connection never keeps them, even when the statement fails.
 * - foreign_key_checks: every row carries the runPk of the run row that this same transaction
 *   created or locked FOR UPDATE (runs-push.service.ts), so that row exists until the transaction
 *   ends and the per-row lookup in `runs` could only succeed. The constraint stays declared
 *   (deleting a run still removes its variants).
 * - check_constraint_checks: the table's one CHECK is json_valid(params) (MariaDB's JSON type), and
 *   params is always JSON text made here: JSON.stringify of a parsed object, or bytes the fast path
 *   parsed as that same text. tests/api/runs-push.test.ts fails if variants gains another CHECK.
 * unique_checks stays on: the unique (runPk, index) is what refuses a variant stored twice (and with
 * both it and foreign_key_checks off, InnoDB would load an empty table in a mode that locks it).
 * Measured: ≈ 2 % less database time per pushed row for each.
 */
const BULK = `SET STATEMENT foreign_key_checks = 0, check_constraint_checks = 0 FOR ${INTO}${TUPLE}`;

interface BatchConnection {
  batch(sql: string, values: unknown[][]): Promise<unknown>;
}

/** The driver's errors that mean the rows clash with what is stored. */
function clash(e: unknown): Error | undefined {
  const errno = (e as { errno?: number; parent?: { errno?: number } }).errno ?? (e as { parent?: { errno?: number } }).parent?.errno;
  if (errno === 1062) return conflict('variant-exists', 'A variant of this push is already stored in the run (same index).');
  if (errno === 1452) return conflict('conflict', 'The run of this push no longer exists.');
  return undefined;
}

/** A row object's values in COLUMNS order (params as JSON text, critical as 0/1). */
export function rowValues(r: VariantRow): unknown[] {
  return [
    r.runPk, r.index, r.variantId, JSON.stringify(r.params), r.status, r.joints, r.members, r.reactions, r.k, r.s, r.critical ? 1 : 0,
    r.peakTension ?? null, r.peakTensionMember ?? null, r.peakCompression ?? null, r.peakCompressionMember ?? null, r.maxDisplacement ?? null,
    r.spanOverDeflection ?? null, r.weight ?? null, r.maxUtilisation ?? null, r.reason ?? null,
    r.p1 ?? null, r.p2 ?? null, r.p3 ?? null, r.p4 ?? null, r.p5 ?? null, r.p6 ?? null,
  ];
}

/** A function that inserts one batch of rows (values in COLUMNS order) in transaction `t`. */
export function variantInserter(t: Transaction): (rows: unknown[][]) => Promise<void> {
  const sequelize = Variant.sequelize!;
  const conn = (t as unknown as { connection?: Partial<BatchConnection> }).connection;
  const send: (rows: unknown[][]) => Promise<unknown> =
    sequelize.getDialect() === 'mariadb' && typeof conn?.batch === 'function'
      ? (rows) => (conn as BatchConnection).batch(BULK, rows)
      : (rows) => sequelize.query(INTO + rows.map(() => TUPLE).join(', '), { replacements: rows.flat(), transaction: t, type: QueryTypes.INSERT });
  return async (rows) => {
    try {
      await send(rows);
    } catch (e) {
      throw clash(e) ?? e;
    }
  };
}
