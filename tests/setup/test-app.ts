/** The Express app wired to the test database and the fakes, plus signed-in agents per role. */
import request from 'supertest';
import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import type { Role } from '../../shared/schemas/user.schema.js';
import { createSmtpMailer } from '../../server/adapters/email.js';
import { createApp } from '../../server/app.js';
import { startBackground, type Background } from '../../server/background.js';
import { loadConfig, type Config } from '../../server/config.js';
import { createDataSource } from '../../server/db/data-source.js';
import { dropDatabase, ensureDatabase } from '../../server/cli/postgres.js';
import { TEST_PG_PORT } from './test-env.js';
import { buildUser, TEST_PASSWORD } from '../factories/user.factory.js';

export interface TestApp {
  app: Express;
  db: DataSource;
  config: Config;
  /** The job queue side: outbox sender, sweeper, reminders. */
  background: Background;
  close(): Promise<void>;
}

/**
 * `ownDatabase`: a fresh, migrated database for tests that change organisation-wide state
 * (settings), so they cannot disturb test files running in parallel; dropped on close.
 */
export async function createTestApp(opts: { clock?: () => Date; ownDatabase?: string } = {}): Promise<TestApp> {
  const shared = loadConfig();
  const ownName = opts.ownDatabase ? `${new URL(shared.DATABASE_URL).pathname.slice(1)}_${opts.ownDatabase}` : undefined;
  const config = ownName ? { ...shared, DATABASE_URL: `postgres://postgres@127.0.0.1:${TEST_PG_PORT}/${ownName}` } : shared;
  if (ownName) await ensureDatabase(TEST_PG_PORT, ownName, true);
  const db = await createDataSource(config.DATABASE_URL).initialize();
  if (ownName) await db.runMigrations({ transaction: 'each' });
  const mailer = createSmtpMailer({ host: config.SMTP_HOST, port: config.SMTP_PORT, from: config.MAIL_FROM });
  const background = await startBackground({ config, db, mailer, clock: opts.clock, log: () => undefined });
  const built = createApp({ config, db, mailer, clock: opts.clock, log: () => undefined, notifier: background.notifier });
  return {
    app: built.app,
    db,
    config,
    background,
    async close() {
      await built.close();
      await background.stop();
      mailer.close();
      await db.destroy();
      if (ownName) await dropDatabase(TEST_PG_PORT, ownName);
    },
  };
}

export type Agent = ReturnType<typeof request.agent>;

/** An agent holding a session cookie and the session's CSRF token. */
export async function csrfAgent(app: Express): Promise<{ agent: Agent; token: string }> {
  const agent = request.agent(app);
  const res = await agent.get('/api/auth/csrf').expect(200);
  return { agent, token: (res.body as { token: string }).token };
}

/** Signs a fresh user of the role in; returns the agent, its CSRF token and the user. */
export async function authAgentFor(t: TestApp, role: Role) {
  const user = await buildUser(t.db, { role });
  const { agent, token } = await csrfAgent(t.app);
  await agent.post('/api/auth/login').set('X-CSRF-Token', token).send({ email: user.email, password: TEST_PASSWORD }).expect(200);
  const fresh = await agent.get('/api/auth/csrf').expect(200);
  return { agent, token: (fresh.body as { token: string }).token, user };
}

/** Messages the SMTP fake received for an address, newest first. */
export async function mailTo(config: Config, address: string) {
  const res = await fetch(`${config.MAIL_INSPECT_URL}/messages?to=${encodeURIComponent(address)}`);
  return (await res.json()) as { id: string; to: string[]; subject: string; text: string; html: string; attachments: string[] }[];
}
