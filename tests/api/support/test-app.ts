/**
 * An app for one test file: its own database, a fake mailer that keeps what it is sent, a
 * logger that keeps its lines, fast bcrypt. Plus helpers to make accounts and projects directly
 * and to call the API as someone.
 */
import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import type { Sequelize } from 'sequelize';
import request, { type Test } from 'supertest';
import { createApp } from '../../../server/app';
import type { Role } from '../../../server/auth/rights';
import { issueSession } from '../../../server/auth/session';
import { serverConfig, type ServerConfig } from '../../../server/config';
import { Membership } from '../../../server/db/models/membership.model';
import { Project } from '../../../server/db/models/project.model';
import type { User } from '../../../server/db/models/user.model';
import { createLogger } from '../../../server/services/logger';
import type { Mailer, MailMessage } from '../../../server/services/mailer';
import { createAccount } from '../../../server/services/users.service';
import { createTestDatabase } from './test-db';

export interface TestApp {
  app: Express;
  sequelize: Sequelize;
  config: ServerConfig;
  /** Every message the app asked the mailer to send. */
  mail: MailMessage[];
  /** The fake mailer; set `failing` to make it throw like a broken transport. */
  mailer: FakeMailer;
  /** Every log line, as written. */
  logs: string[];
  close(): Promise<void>;
}

export function testConfig(overrides: Partial<ServerConfig> = {}): ServerConfig {
  return serverConfig({ jwtSecret: randomBytes(32).toString('hex'), bcryptRounds: 4, publicUrl: 'http://app.test', ...overrides });
}

export interface FakeMailer extends Mailer {
  sent: MailMessage[];
  failing: boolean;
}

export function fakeMailer(): FakeMailer {
  const m: FakeMailer = {
    sent: [],
    failing: false,
    async send(msg) {
      if (m.failing) throw new Error('connect ECONNREFUSED 127.0.0.1:25');
      m.sent.push(msg);
    },
  };
  return m;
}

/** One per test file: the models are bound to one database per process (see server/db/init-models.ts). */
export async function startTestApp(options: { config?: Partial<ServerConfig> } = {}): Promise<TestApp> {
  const db = await createTestDatabase();
  const config = testConfig(options.config);
  const mailer = fakeMailer();
  const logs: string[] = [];
  const logger = createLogger({ level: 'debug', sink: (line) => logs.push(line) });
  const app = createApp({ sequelize: db.sequelize, config, mailer, logger });
  return { app, sequelize: db.sequelize, config, mail: mailer.sent, mailer, logs, close: db.drop };
}

export interface TestUser {
  user: User;
  email: string;
  password: string;
}

let serial = 0;
export const uniqueEmail = (label = 'user') => `${label}-${++serial}-${randomBytes(3).toString('hex')}@test.example`;
export const uniqueSlug = (label = 'project') => `${label}-${++serial}-${randomBytes(3).toString('hex')}`;

/** An account made directly (bcrypt rounds 4). */
export async function makeUser(role: Role, fields: { email?: string; name?: string; password?: string } = {}): Promise<TestUser> {
  const email = fields.email ?? uniqueEmail(role);
  const password = fields.password ?? `pw-${randomBytes(8).toString('hex')}`;
  const user = await createAccount({ email, name: fields.name ?? `Test ${role}`, role, password }, 4);
  return { user, email, password };
}

export async function makeProject(slug = uniqueSlug(), name = 'Test project'): Promise<Project> {
  return Project.create({ slug, name, description: '' });
}

export async function addMember(user: User, project: Project, role: Role): Promise<void> {
  await Membership.create({ userId: user.id, projectId: project.id, role });
}

/** A session JWT for `user`, as sign-in would give. */
export function sessionToken(user: User, config: ServerConfig): string {
  return issueSession(user.id, config);
}

export interface Client {
  get(url: string): Test;
  post(url: string): Test;
  put(url: string): Test;
  patch(url: string): Test;
  delete(url: string): Test;
}

/** Requests to `app`, with `Authorization: Bearer <token>` when a token is given. */
export function api(app: Express, token?: string): Client {
  const wrap = (method: keyof Client) => (url: string) => {
    const r = request(app)[method](url);
    return token ? r.set('Authorization', `Bearer ${token}`) : r;
  };
  return { get: wrap('get'), post: wrap('post'), put: wrap('put'), patch: wrap('patch'), delete: wrap('delete') };
}
