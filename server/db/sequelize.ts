/** The Sequelize instance for MariaDB (through the `mariadb` connector, pinned to 3.0.2). */
import { Sequelize } from 'sequelize';
import type { DbConfig } from '../config';

export interface SequelizeOptions {
  /** Receives each SQL statement (without bound values); off by default. */
  logSql?: (sql: string) => void;
}

export function createSequelize(db: DbConfig, options: SequelizeOptions = {}): Sequelize {
  return new Sequelize(db.database, db.user, db.password, {
    dialect: 'mariadb',
    host: db.host,
    port: db.port,
    logging: options.logSql ?? false,
    logQueryParameters: false,
    pool: { max: db.poolMax ?? 10, min: 0, acquire: 10_000, idle: 10_000 },
    dialectOptions: { connectTimeout: 5_000 },
    define: { charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
  });
}
