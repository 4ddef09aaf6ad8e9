/**
 * An app with the real services behind it, for the tests of files and mail: uploads kept by the
 * ObjectStore in an s3rver on loopback (a temporary folder), mail sent by nodemailer to the
 * SMTP sink, which keeps it in this test file's database. `t.mail` still lists what the app
 * asked to send, so helpers of test-app.ts keep working.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createApp } from '../../../server/app';
import type { ServerConfig } from '../../../server/config';
import { createLogger } from '../../../server/services/logger';
import type { MailMessage } from '../../../server/services/mailer';
import { nodemailerMailer } from '../../../server/services/nodemailer-mailer';
import { ObjectStore } from '../../../server/services/object-store';
import { FAKE_S3_CREDENTIALS, startFakeS3, type FakeS3 } from '../../../server/services/object-store-fake';
import { startSmtpSink, type SmtpSink } from '../../../server/services/smtp-sink';
import { testConfig, type FakeMailer, type TestApp } from './test-app';
import { createTestDatabase } from './test-db';

process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';

export interface ServicesApp extends TestApp {
  store: ObjectStore;
  s3: FakeS3;
  /** Stop the sink (to see what a dead mail server does); `close` copes with it stopped. */
  sink: SmtpSink;
  stopSink(): Promise<void>;
}

export async function startServicesApp(options: { config?: Partial<ServerConfig> } = {}): Promise<ServicesApp> {
  const db = await createTestDatabase();
  const dir = mkdtempSync(join(tmpdir(), 'pp-s3-'));
  const config = testConfig(options.config);
  const logs: string[] = [];
  const logger = createLogger({ level: 'debug', sink: (line) => logs.push(line) });
  const s3 = await startFakeS3({ directory: dir });
  const store = new ObjectStore({ endpoint: s3.endpoint, bucket: 'panelpoint-test', region: 'us-east-1', ...FAKE_S3_CREDENTIALS });
  await store.ensureBucket();
  const sink = await startSmtpSink(db.sequelize, { logger });
  let sinkOpen = true;
  const real = nodemailerMailer({ host: '127.0.0.1', port: sink.port, secure: false, from: 'Panelpoint test <noreply@panelpoint.test>' });
  const sent: MailMessage[] = [];
  const mailer: FakeMailer = {
    sent,
    failing: false,
    async send(msg) {
      sent.push(msg);
      await real.send(msg);
    },
  };
  const app = createApp({ sequelize: db.sequelize, config, mailer, logger, storage: store });
  const stopSink = async () => {
    if (sinkOpen) await sink.close();
    sinkOpen = false;
  };
  return {
    app, sequelize: db.sequelize, config, mail: sent, mailer, logs, store, s3, sink, stopSink,
    async close() {
      real.close();
      store.close();
      await stopSink();
      await s3.close();
      rmSync(dir, { recursive: true, force: true });
      await db.drop();
    },
  };
}
