/**
 * Start the team server: read the environment, migrate the database, listen on 127.0.0.1.
 *   PORT (8080), DB_HOST, DB_PORT, DB_NAME, DB_USER, DB_PASSWORD, JWT_SECRET, PUBLIC_URL, NODE_ENV
 */
import { createApp } from './app';
import { ConfigError, loadConfig } from './config';
import { migrateUp } from './db/migrator';
import { createSequelize } from './db/sequelize';
import { createLogger } from './services/logger';

const HOST = '127.0.0.1';

function loud(message: string): void {
  const bar = '!'.repeat(Math.min(100, message.length + 4));
  process.stderr.write(`\n${bar}\n! ${message}\n${bar}\n\n`);
}

async function main(): Promise<void> {
  const { server: config, db, port, warnings } = loadConfig(process.env);
  warnings.forEach(loud);
  const logger = createLogger({ level: config.production ? 'info' : 'debug' });
  const sequelize = createSequelize(db);
  const applied = await migrateUp(sequelize);
  if (applied.length) logger.info('migrations applied', { applied });
  const app = createApp({ sequelize, config, logger });
  const listener = app.listen(port, HOST, () => logger.info('listening', { url: `http://${HOST}:${port}` }));
  const stop = () => {
    listener.close(() => void sequelize.close().then(() => process.exit(0)));
    setTimeout(() => process.exit(0), 5000).unref();
  };
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}

main().catch((err: unknown) => {
  if (err instanceof ConfigError) loud(err.message);
  else process.stderr.write(`panelpoint server: ${err instanceof Error ? err.stack : String(err)}\n`);
  process.exit(1);
});
