/**
 * SMTP down: the row stays pending with attempts and last_error, and goes out once the server
 * is back. Runs on a database of its own, so the other test files' senders (all pointed at the
 * shared SMTP fake) cannot deliver this row for it.
 */
import { createServer } from 'node:net';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakes, type RunningFakes } from '../../fakes/index.js';
import { createSmtpMailer, type Mailer } from '../../server/adapters/email.js';
import { startBackground, type Background } from '../../server/background.js';
import { dropDatabase, ensureDatabase } from '../../server/cli/postgres.js';
import { loadConfig } from '../../server/config.js';
import { createDataSource } from '../../server/db/data-source.js';
import { OutboxMessage } from '../../server/db/entities/outbox-message.entity.js';
import { buildSignup } from '../factories/signup.factory.js';
import { buildUser } from '../factories/user.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { parseCalendar } from '../setup/ics.js';
import { attachmentText, eventually } from '../setup/mail-inbox.js';
import { TEST_PG_PORT } from '../setup/test-env.js';

const freePort = () =>
  new Promise<number>((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const addr = s.address();
      s.close(() => resolve(typeof addr === 'object' && addr ? addr.port : 0));
    });
  });

const dbName = `ebbroot_test_outbox_${process.pid}`;
const config = { ...loadConfig(), DATABASE_URL: `postgres://postgres@127.0.0.1:${TEST_PG_PORT}/${dbName}` };
let db: DataSource;
let mailer: Mailer;
let background: Background;
let fakes: RunningFakes | undefined;
let smtpPort: number;

beforeAll(async () => {
  await ensureDatabase(TEST_PG_PORT, dbName, true);
  db = await createDataSource(config.DATABASE_URL).initialize();
  await db.runMigrations({ transaction: 'each' });
  smtpPort = await freePort(); // nothing listens here until the test starts the fake
  mailer = createSmtpMailer({ host: '127.0.0.1', port: smtpPort, from: config.MAIL_FROM });
  background = await startBackground({ config: { ...config, SMTP_PORT: smtpPort }, db, mailer, log: () => undefined, sendRetry: { limit: 8, delaySeconds: 1 } });
});

afterAll(async () => {
  await background?.stop();
  mailer?.close();
  await fakes?.close();
  await db?.destroy();
  await dropDatabase(TEST_PG_PORT, dbName).catch(() => undefined);
});

describe('outbox while the SMTP server is down', () => {
  it('keeps the mail pending with attempts and last_error, then delivers it once when the server is back', async () => {
    const workday = await buildWorkday(db, { title: 'Outage day' });
    const user = await buildUser(db);
    const signup = await buildSignup(db, { workdayId: workday.id, userId: user.id });
    await db.transaction((tx) => background.notifier.signupConfirmed(tx, signup.id));
    await background.notifier.flush();

    const failed = await eventually(async () => {
      const row = await db.getRepository(OutboxMessage).findOneByOrFail({ dedupeKey: `confirmed:${signup.id}` });
      return row.attempts >= 1 ? row : undefined;
    }, 'a failed attempt');
    expect(failed.status).toBe('pending');
    expect(failed.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(failed.sentAt).toBeNull();

    fakes = await startFakes({ smtpPort, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
    const sent = await eventually(async () => {
      const row = await db.getRepository(OutboxMessage).findOneByOrFail({ id: failed.id });
      return row.status === 'sent' ? row : undefined;
    }, 'the retry to deliver', 30_000);
    expect(sent.attempts).toBeGreaterThanOrEqual(2);
    expect(sent.lastError).toBe('');

    const inspect = `http://127.0.0.1:${fakes.mailInspectPort}`;
    const messages = (await (await fetch(`${inspect}/messages?to=${encodeURIComponent(user.email)}`)).json()) as { id: string; subject: string; attachments: string[] }[];
    expect(messages).toHaveLength(1);
    expect(messages[0]!.subject).toMatch(/^You're on the crew: Outage day/);
    const { events } = parseCalendar((await attachmentText(inspect, messages[0]!.id)).text);
    expect(events).toHaveLength(1);
  });
});
