/** A database of its own for one test file, migrated, dropped by `drop()`. */
import { randomBytes } from 'node:crypto';
import type { Sequelize } from 'sequelize';
import { inject } from 'vitest';
import { migrateUp } from '../../../server/db/migrator';
import { createSequelize } from '../../../server/db/sequelize';

export interface TestDatabase {
  sequelize: Sequelize;
  name: string;
  drop(): Promise<void>;
}

async function onServer(sql: string): Promise<void> {
  const s = createSequelize(inject('mariadb'));
  try {
    await s.query(sql);
  } finally {
    await s.close();
  }
}

export async function createTestDatabase(): Promise<TestDatabase> {
  // The name is generated here, never taken from input.
  const name = `pp_t_${randomBytes(6).toString('hex')}`;
  await onServer(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  const sequelize = createSequelize({ ...inject('mariadb'), database: name, poolMax: 5 });
  await migrateUp(sequelize);
  return {
    sequelize,
    name,
    async drop() {
      await sequelize.close();
      await onServer(`DROP DATABASE IF EXISTS \`${name}\``);
    },
  };
}
