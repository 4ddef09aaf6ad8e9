/**
 * The schema's history, applied by umzug. To change the schema, add
 * `migrations/NNN-name.ts` (export `up` and `down`) and one line to MIGRATIONS; never edit a
 * migration that has shipped, and never `sync()` outside tests.
 */
import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug, type MigrationFn } from 'umzug';
import * as m001 from './migrations/001-accounts';
import * as m002 from './migrations/002-studies-runs';
import * as m003 from './migrations/003-review-files';
import * as m004 from './migrations/004-captured-mail';
import * as m005 from './migrations/005-run-queries';
import * as m006 from './migrations/006-lean-variant-indexes';

interface MigrationModule {
  up: MigrationFn<QueryInterface>;
  down: MigrationFn<QueryInterface>;
}

const MIGRATIONS: [string, MigrationModule][] = [
  ['001-accounts', m001],
  ['002-studies-runs', m002],
  ['003-review-files', m003],
  ['004-captured-mail', m004],
  ['005-run-queries', m005],
  ['006-lean-variant-indexes', m006],
];

export function createMigrator(sequelize: Sequelize): Umzug<QueryInterface> {
  return new Umzug({
    migrations: MIGRATIONS.map(([name, m]) => ({ name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/** Apply every pending migration; returns the names applied. */
export async function migrateUp(sequelize: Sequelize): Promise<string[]> {
  const done = await createMigrator(sequelize).up();
  return done.map((m) => m.name);
}
