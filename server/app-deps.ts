/** What createApp needs from outside; route modules receive the resolved form. */
import type { Sequelize } from 'sequelize';
import type { ServerConfig } from './config';
import type { Logger } from './services/logger';
import type { Mailer } from './services/mailer';
import type { Storage } from './services/storage';

export interface AppDeps {
  sequelize: Sequelize;
  config: ServerConfig;
  /** Outgoing mail; a logging no-op when absent. */
  mailer?: Mailer;
  /** File storage for uploads; absent until the files feature provides one. */
  storage?: Storage;
  /** Structured logger; JSON lines on stderr when absent. */
  logger?: Logger;
}

/** AppDeps with the defaults filled in. */
export interface ResolvedDeps extends AppDeps {
  mailer: Mailer;
  logger: Logger;
}
