/**
 * Insert one batch of variant rows inside the push's transaction. On MariaDB the rows go on the
 * transaction's own connection as one prepared INSERT executed over the whole batch (the
 * connector's `batch`, the server's bulk protocol): no SQL text of a megabyte to build and parse
 * per batch. Measured here (bench/push.bench.ts and its notes): ≈ 1.6× the rows per second of the
 * multi-row INSERT that Model.bulkCreate sends, the database being the bottleneck of a push.
 * Other dialects, or a connection without `batch`, get that INSERT (queryInterface.bulkInsert).
 */
import type { Transaction } from 'sequelize';
import { Variant } from '../db/models/variant.model';
import { conflict } from '../http/http-error';
import type { VariantRow } from './runs-push-rows';

/** Columns in the order of the prepared statement. */
const COLUMNS = [
  'runPk', 'index', 'variantId', 'params', 'status', 'joints', 'members', 'reactions', 'k', 's', 'critical',
  'peakTension', 'peakTensionMember', 'peakCompression', 'peakCompressionMember', 'maxDisplacement', 'spanOverDeflection',
  'weight', 'maxUtilisation', 'reason', 'p1', 'p2', 'p3', 'p4', 'p5', 'p6',
] as const satisfies readonly (keyof VariantRow)[];

const SQL = `INSERT INTO variants (${COLUMNS.map((c) => `\`${c}\``).join(', ')}) VALUES (${COLUMNS.map(() => '?').join(', ')})`;

interface BatchConnection {
  batch(sql: string, values: unknown[][]): Promise<unknown>;
}

/** The driver's errors that mean the rows clash with what is stored. */
function clash(e: unknown): Error | undefined {
  const errno = (e as { errno?: number }).errno;
  if (errno === 1062) return conflict('variant-exists', 'A variant of this push is already stored in the run (same index).');
  if (errno === 1452) return conflict('conflict', 'The run of this push no longer exists.');
  return undefined;
}

function values(r: VariantRow): unknown[] {
  return [
    r.runPk, r.index, r.variantId, JSON.stringify(r.params), r.status, r.joints, r.members, r.reactions, r.k, r.s, r.critical ? 1 : 0,
    r.peakTension ?? null, r.peakTensionMember ?? null, r.peakCompression ?? null, r.peakCompressionMember ?? null, r.maxDisplacement ?? null,
    r.spanOverDeflection ?? null, r.weight ?? null, r.maxUtilisation ?? null, r.reason ?? null,
    r.p1 ?? null, r.p2 ?? null, r.p3 ?? null, r.p4 ?? null, r.p5 ?? null, r.p6 ?? null,
  ];
}

/** A function that inserts one batch of rows in transaction `t`. */
export function variantInserter(t: Transaction): (rows: VariantRow[]) => Promise<void> {
  const sequelize = Variant.sequelize!;
  const conn = (t as unknown as { connection?: Partial<BatchConnection> }).connection;
  if (sequelize.getDialect() === 'mariadb' && typeof conn?.batch === 'function') {
    const batch = conn as BatchConnection;
    return async (rows) => {
      try {
        await batch.batch(SQL, rows.map(values));
      } catch (e) {
        throw clash(e) ?? e;
      }
    };
  }
  const qi = sequelize.getQueryInterface();
  const attributes = Variant.getAttributes();
  return async (rows) => {
    await qi.bulkInsert(Variant.getTableName(), rows as object[], { transaction: t }, attributes);
  };
}
