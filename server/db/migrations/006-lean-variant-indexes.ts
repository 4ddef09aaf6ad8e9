/**
 * Fewer indexes on `variants`: every index costs each pushed row one more B-tree insert, and a
 * push was spending most of its time on them (bench/push.bench.ts: ≈ 1.5 µs per row per index).
 * Dropped are the ones no query needs or that rarely pay for themselves:
 *   - (runPk, variantId): no route looks a variant up, filters or sorts by its id;
 *   - (runPk, status): four values; the status filter rides on the sort's index or (runPk, index),
 *     and a sort by status sorts the run's rows, as k and s do;
 *   - (runPk, p5), (runPk, p6): the fifth and sixth numeric parameters, which most families do not
 *     have (a run without them still paid two index inserts per row for NULLs); a sort on them
 *     sorts the run's rows, filters on them still use another index or the run's range.
 * Kept: the unique (runPk, index), and (runPk, x) for each figure and p1..p4 the table and the
 * charts sort and filter on.
 */
import type { QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

/** Columns whose (runPk, column) index goes; the names are those of migration 002. */
export const DROPPED = ['variantId', 'status', 'p5', 'p6'] as const;

const nameOf = (column: string) => (column === 'variantId' ? 'variants_run_variant_id' : `variants_run_${column}`);

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const column of DROPPED) await qi.removeIndex('variants', nameOf(column));
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const column of DROPPED) await qi.addIndex('variants', ['runPk', column], { name: nameOf(column) });
};
