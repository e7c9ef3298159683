/**
 * Once per Vitest project: the test PostgreSQL cluster (reused when `npm test` already started
 * it), a fresh database for this run with migrations applied, and the fakes on free ports.
 * Settings reach the test workers through process.env.
 */
import type { TestProject } from 'vitest/node';
import { startFakes } from '../../fakes/index.js';
import { dropDatabase, ensureDatabase, startLocalPostgres } from '../../server/cli/postgres.js';
import { projectRoot } from '../../server/cli/stack.js';
import { createDataSource } from '../../server/db/data-source.js';
import { TEST_PG_PORT } from './test-env.js';

export default async function setup(project: TestProject) {
  const log = (s: string) => console.log(`[setup ${project.name}] ${s}`);
  const postgres = await startLocalPostgres({ projectRoot, name: 'pg-test', port: TEST_PG_PORT, fast: true, log });
  const dbName = `ebbroot_test_${project.name}_${process.pid}`;
  await ensureDatabase(TEST_PG_PORT, dbName, true);
  const url = `postgres://postgres@127.0.0.1:${TEST_PG_PORT}/${dbName}`;
  const db = await createDataSource(url).initialize();
  await db.runMigrations({ transaction: 'each' });
  await db.destroy();

  const fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0, log: () => undefined });
  Object.assign(process.env, {
    NODE_ENV: 'test',
    DATABASE_URL: url,
    APP_URL: 'http://127.0.0.1:5180',
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(fakes.smtpPort),
    MAIL_INSPECT_URL: `http://127.0.0.1:${fakes.mailInspectPort}`,
    GOOGLE_AUTH_URL: `http://127.0.0.1:${fakes.oauthPort}/o/oauth2/v2/auth`,
    GOOGLE_TOKEN_URL: `http://127.0.0.1:${fakes.oauthPort}/token`,
    GOOGLE_USERINFO_URL: `http://127.0.0.1:${fakes.oauthPort}/userinfo`,
    STRIPE_API_URL: `http://127.0.0.1:${fakes.stripePort}`,
    PASSWORD_SCRYPT_LOG_N: '12',
    LOG_REQUESTS: 'false',
  });

  return async () => {
    await fakes.close();
    await dropDatabase(TEST_PG_PORT, dbName).catch(() => undefined);
    postgres.stop();
  };
}
