/**
 * The local stack shared by `npm start`, `npm run dev` and the browser tests: PostgreSQL on
 * loopback, the database and its migrations, the demo seed and the fakes.
 */
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { startFakes, type RunningFakes } from '../../fakes/index.js';
import type { Config } from '../config.js';
import { createDataSource } from '../db/data-source.js';
import { seedDemo } from '../db/seeds/demo.seed.js';
import { createTideStationDirectory } from '../adapters/tide-stations.js';
import { createPasswordHasher } from '../services/password-hasher.js';
import { ensureDatabase, startLocalPostgres, type LocalPostgres } from './postgres.js';

export const projectRoot = join(dirname(fileURLToPath(import.meta.url)), '..', '..');

const portOf = (url: string) => Number(new URL(url).port);

export interface LocalStack {
  postgres: LocalPostgres;
  fakes: RunningFakes;
  stop(): Promise<void>;
}

/** Brings up everything the app needs besides itself, in order; `stop` undoes it in reverse. */
export async function startLocalStack(config: Config, log: (s: string) => void, opts: { clusterName?: string; fast?: boolean } = {}): Promise<LocalStack> {
  const dbUrl = new URL(config.DATABASE_URL);
  const postgres = await startLocalPostgres({ projectRoot, name: opts.clusterName ?? 'pg', port: Number(dbUrl.port), fast: opts.fast, log });
  log(postgres.startedHere ? `PostgreSQL started on 127.0.0.1:${postgres.port} (data in ${postgres.dataDir})` : `PostgreSQL already answering on 127.0.0.1:${postgres.port}; reusing it`);
  let fakes: RunningFakes | undefined;
  try {
    await ensureDatabase(postgres.port, dbUrl.pathname.slice(1));
    const db = await createDataSource(config.DATABASE_URL).initialize();
    try {
      const ran = await db.runMigrations({ transaction: 'each' });
      if (ran.length > 0) log(`Ran ${ran.length} migration(s)`);
      const seeded = await seedDemo({ db, hasher: createPasswordHasher(config.PASSWORD_SCRYPT_LOG_N), now: new Date(), stations: createTideStationDirectory() });
      log(seeded.created + seeded.workdays + seeded.trees > 0 ? `Seeded the demo organisation (${seeded.created} people, ${seeded.workdays} workdays, ${seeded.trees} trees)` : 'Demo data already present');
    } finally {
      await db.destroy();
    }
    fakes = await startFakes({
      smtpPort: config.SMTP_PORT,
      mailInspectPort: portOf(config.MAIL_INSPECT_URL),
      oauthPort: portOf(config.GOOGLE_AUTH_URL),
      stripePort: portOf(config.STRIPE_API_URL),
      // Signed payment events go to the app's webhook route, as the hosted service would send them.
      stripeWebhook: { url: `${config.APP_URL.replace(/\/$/, '')}/api/webhooks/stripe`, secret: config.STRIPE_WEBHOOK_SECRET },
      log: (line) => log(`[fakes] ${line}`),
    });
  } catch (err) {
    postgres.stop();
    throw err;
  }
  const running = fakes;
  return {
    postgres,
    fakes: running,
    async stop() {
      await running.close();
      postgres.stop();
    },
  };
}
