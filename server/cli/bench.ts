/**
 * `npm run bench`: prints speed and memory figures (no pass/fail; targets are read by people).
 * Runs against a throwaway database on the test cluster, on loopback only, bounded in count.
 */
import { performance } from 'node:perf_hooks';
import type { AddressInfo } from 'node:net';
import { createSmtpMailer } from '../adapters/email.js';
import { createApp } from '../app.js';
import { startBackground } from '../background.js';
import { loadConfig } from '../config.js';
import { createDataSource } from '../db/data-source.js';
import { createPasswordHasher } from '../services/password-hasher.js';
import { dropDatabase, ensureDatabase, startLocalPostgres } from './postgres.js';
import { projectRoot } from './stack.js';
import { TEST_PG_PORT } from '../../tests/setup/test-env.js';
import { benchTide } from './bench-tide.js';
import { benchTrips } from './bench-trips.js';

const quantile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] ?? 0;
const fmt = (ms: number) => `${ms.toFixed(1)} ms`;

async function timeRequests(url: string, total: number, concurrency: number) {
  const times: number[] = [];
  let next = 0;
  const started = performance.now();
  await Promise.all(
    Array.from({ length: concurrency }, async () => {
      while (next < total) {
        next++;
        const t0 = performance.now();
        const res = await fetch(url);
        await res.arrayBuffer();
        times.push(performance.now() - t0);
      }
    }),
  );
  const seconds = (performance.now() - started) / 1000;
  times.sort((a, b) => a - b);
  return { rps: total / seconds, p50: quantile(times, 0.5), p95: quantile(times, 0.95) };
}

const postgres = await startLocalPostgres({ projectRoot, name: 'pg-test', port: TEST_PG_PORT, fast: true, log: console.log });
const dbName = 'ebbroot_bench';
await ensureDatabase(TEST_PG_PORT, dbName, true);
const config = { ...loadConfig(), DATABASE_URL: `postgres://postgres@127.0.0.1:${TEST_PG_PORT}/${dbName}`, LOG_REQUESTS: 'false' as const };
const db = await createDataSource(config.DATABASE_URL).initialize();
await db.runMigrations();
const mailer = createSmtpMailer({ host: config.SMTP_HOST, port: config.SMTP_PORT, from: config.MAIL_FROM });
const background = await startBackground({ config, db, mailer, log: () => undefined });
const built = createApp({ config, db, mailer, log: () => undefined, notifier: background.notifier });
const server = built.app.listen(0, '127.0.0.1');
await new Promise((r) => server.once('listening', r));
const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

console.log('Ebbroot bench');
const hasher = createPasswordHasher(config.PASSWORD_SCRYPT_LOG_N);
const h0 = performance.now();
const hash = await hasher.hash('bench password');
const h1 = performance.now();
await hasher.verify('bench password', hash);
console.log(`password hash (scrypt N=2^${config.PASSWORD_SCRYPT_LOG_N}): hash ${fmt(h1 - h0)}, verify ${fmt(performance.now() - h1)}`);

await timeRequests(`${base}/api/health`, 100, 5);
const health = await timeRequests(`${base}/api/health`, 2000, 10);
console.log(`GET /api/health (DB round trip), 2000 requests × 10 concurrent: ${health.rps.toFixed(0)} req/s, p50 ${fmt(health.p50)}, p95 ${fmt(health.p95)}`);
const me = await timeRequests(`${base}/api/auth/me`, 2000, 10);
console.log(`GET /api/auth/me (signed out), 2000 requests × 10 concurrent: ${me.rps.toFixed(0)} req/s, p50 ${fmt(me.p50)}, p95 ${fmt(me.p95)}`);
console.log(`server process memory: rss ${(process.memoryUsage().rss / 2 ** 20).toFixed(0)} MiB, heap used ${(process.memoryUsage().heapUsed / 2 ** 20).toFixed(0)} MiB`);

await benchTide((line) => console.log(line));
await benchTrips((line) => console.log(line));

server.closeAllConnections();
server.close();
await built.close();
await background.stop();
mailer.close();
await db.destroy();
await dropDatabase(TEST_PG_PORT, dbName);
postgres.stop();
