/**
 * Indexes for the runs feature: the two figures 002 does not index with runPk (span/deflection,
 * utilisation), marks found by kind for the `marked` filter, and each study body (by hash) held
 * once per project, so concurrent pushes of one study cannot store it twice. k and s (small
 * counts, rarely sorted on) stay unindexed: every index costs each pushed row an insert.
 */
import type { QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

const VARIANT_SORTS = ['spanOverDeflection', 'maxUtilisation'];

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const column of VARIANT_SORTS) await qi.addIndex('variants', ['runPk', column], { name: `variants_run_${column}` });
  await qi.addIndex('marks', ['kind', 'variantPk'], { name: 'marks_kind_variant' });
  await qi.addIndex('studies', ['projectId', 'hash'], { unique: true, name: 'studies_project_hash_unique' });
  await qi.removeIndex('studies', 'studies_project_hash');
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.addIndex('studies', ['projectId', 'hash'], { name: 'studies_project_hash' });
  await qi.removeIndex('studies', 'studies_project_hash_unique');
  await qi.removeIndex('marks', 'marks_kind_variant');
  for (const column of VARIANT_SORTS) await qi.removeIndex('variants', `variants_run_${column}`);
};
