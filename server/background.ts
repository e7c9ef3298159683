/**
 * Background work in PostgreSQL (pg-boss): the mail outbox sender, the sweeper that re-queues
 * anything pending (after a crash between commit and enqueue, or an SMTP outage) and the
 * crew reminders. Every instance on the database runs the same workers; rows and jobs are
 * claimed in the database, so several instances share the work without sending twice.
 */
import type { DataSource } from 'typeorm';
import type { Config } from './config.js';
import type { Mailer } from './adapters/email.js';
import { createPgBossQueue, type JobQueue } from './adapters/job-queue.js';
import type { CrewNotifier } from './services/crew-notifier.js';
import { createCrewNotifier } from './services/crew-notifier.service.js';
import { createCrewReminders } from './services/crew-reminders.service.js';
import { createOutboxSender } from './services/outbox-sender.service.js';
import { createTideStationDirectory } from './adapters/tide-stations.js';
import { createSponsorNewsService } from './services/sponsor-news.service.js';

export const JOBS = { send: 'outbox-send', sweep: 'outbox-sweep', reminders: 'crew-reminders', sponsorNews: 'sponsor-news' } as const;

export interface BackgroundDeps {
  config: Config;
  db: DataSource;
  mailer: Mailer;
  clock?: () => Date;
  log: (s: string) => void;
  /** Retry policy of a failed send; tests shorten the delay. */
  sendRetry?: { limit: number; delaySeconds: number };
}

export interface Background {
  notifier: CrewNotifier;
  /** Queues a send for every pending outbox row without one and wakes the sender. */
  drain(): Promise<void>;
  /** Queues the reminders now due (the hourly job does the same); returns how many were new. */
  runReminders(): Promise<number>;
  /** Matches waiting gifts to free nursery trees and queues "your tree is planted" news (every 10 minutes); returns the mails queued. */
  runSponsorNews(): Promise<number>;
  stop(): Promise<void>;
}

const isOutboxJob = (d: object): d is { outboxId: string } => typeof (d as { outboxId?: unknown }).outboxId === 'string';

async function declareQueues(queue: JobQueue, retry: { limit: number; delaySeconds: number }) {
  await queue.createQueue({ name: JOBS.send, retryLimit: retry.limit, retryDelaySeconds: retry.delaySeconds, retryBackoff: true, expireInSeconds: 300 });
  await queue.createQueue({ name: JOBS.sweep, expireInSeconds: 120 });
  await queue.createQueue({ name: JOBS.reminders, expireInSeconds: 600 });
  await queue.createQueue({ name: JOBS.sponsorNews, expireInSeconds: 600 });
}

export async function startBackground(deps: BackgroundDeps): Promise<Background> {
  const clock = deps.clock ?? (() => new Date());
  const { config, db, log } = deps;
  const queue = createPgBossQueue({ connectionString: config.DATABASE_URL, log });
  const sender = createOutboxSender({ db, mailer: deps.mailer, clock, log });
  const settings = { appUrl: config.APP_URL, secret: config.SESSION_SECRET };
  const reminders = createCrewReminders({ ...settings, db, clock });
  const sponsorNews = createSponsorNewsService({ db, stations: createTideStationDirectory(), clock, appUrl: config.APP_URL });

  async function sweep(): Promise<void> {
    const [ids, live] = await Promise.all([sender.pendingIds(), queue.liveKeys(JOBS.send)]);
    for (const id of ids) if (!live.has(id)) await queue.send(JOBS.send, { outboxId: id }, { singletonKey: id });
    queue.wake(JOBS.send);
  }
  // A burst of sign-ups flushes hundreds of times at once. Every caller waits for a sweep that
  // starts after its call; callers arriving while one sweep runs share the single next one.
  let tail: Promise<void> = Promise.resolve();
  let next: Promise<void> | null = null;
  function drain(): Promise<void> {
    if (!next) {
      next = tail.then(() => {
        next = null;
        return sweep();
      });
      tail = next.catch(() => undefined);
    }
    return next;
  }
  async function runReminders(): Promise<number> {
    const queued = await reminders.run();
    if (queued > 0) await drain();
    return queued;
  }
  async function runSponsorNews(): Promise<number> {
    await sponsorNews.matchWaitingGifts();
    const queued = await sponsorNews.tellPlanted();
    if (queued > 0) await drain();
    return queued;
  }
  /** Start-up and flush must not fail the caller: the sweeper catches up within a minute. */
  const quietly = (what: string, fn: () => Promise<unknown>) => fn().then(
    () => undefined,
    (err: unknown) => log(`[jobs] ${what} failed: ${err instanceof Error ? err.message : String(err)}`),
  );

  await queue.start();
  await declareQueues(queue, deps.sendRetry ?? { limit: 8, delaySeconds: 20 });
  await queue.work(JOBS.send, { batchSize: 10, pollingIntervalSeconds: 1 }, async (data) => {
    if (isOutboxJob(data)) await sender.send(data.outboxId);
  });
  await queue.work(JOBS.sweep, { pollingIntervalSeconds: 5 }, drain);
  await queue.work(JOBS.reminders, { pollingIntervalSeconds: 5 }, async () => {
    await runReminders();
  });
  await queue.schedule(JOBS.sweep, '* * * * *');
  await queue.work(JOBS.sponsorNews, { pollingIntervalSeconds: 5 }, async () => {
    await runSponsorNews();
  });
  await queue.schedule(JOBS.reminders, '7 * * * *');
  await queue.schedule(JOBS.sponsorNews, '*/10 * * * *');
  await quietly('start-up sweep', drain);
  await quietly('start-up reminders', runReminders);

  const notifier = createCrewNotifier({ ...settings, clock, flush: () => quietly('outbox flush', drain) });
  return { notifier, drain, runReminders, runSponsorNews, stop: () => queue.stop() };
}
