import PgBoss from 'pg-boss';

export interface QueueSpec {
  name: string;
  /** Attempts after the first failure. */
  retryLimit?: number;
  retryDelaySeconds?: number;
  /** Doubles the delay on each retry (with jitter). */
  retryBackoff?: boolean;
  /** A job running longer than this counts as failed (and is retried). */
  expireInSeconds?: number;
}

export interface WorkOptions {
  batchSize?: number;
  pollingIntervalSeconds?: number;
}

/** Background jobs kept in PostgreSQL, shared by every app instance on the database. */
export interface JobQueue {
  start(): Promise<void>;
  /** Waits (a few seconds at most) for running jobs, then closes the queue's connections. */
  stop(): Promise<void>;
  /** Declares a queue; a no-op when it exists. */
  createQueue(spec: QueueSpec): Promise<void>;
  /** Enqueues a job; with `singletonKey`, refused (null) while the key already waits in the queue. */
  send(name: string, data: object, opts?: { singletonKey?: string }): Promise<string | null>;
  /** Runs `handler` for each job (a batch side by side); a throw fails the job, retried per the queue's policy. */
  work<T extends object>(name: string, opts: WorkOptions, handler: (data: T) => Promise<void>): Promise<void>;
  /** Sends a job with `data` on a cron schedule (UTC); one job per tick across all instances. */
  schedule(name: string, cron: string, data?: object): Promise<void>;
  /** Singleton keys of the queue's jobs not finished yet (waiting, retrying or running). */
  liveKeys(name: string): Promise<Set<string>>;
  /** Makes this process' workers of the queue poll now instead of at their next interval. */
  wake(name: string): void;
}

const SCHEMA = 'pgboss';

/** pg-boss in its own schema, which it creates and migrates at start (safe to race between instances). */
export function createPgBossQueue(opts: { connectionString: string; log: (line: string) => void; maxConnections?: number }): JobQueue {
  const boss = new PgBoss({
    connectionString: opts.connectionString,
    schema: SCHEMA,
    max: opts.maxConnections ?? 4,
    application_name: 'ebbroot-jobs',
  });
  // An 'error' event without a listener would crash the process.
  boss.on('error', (err) => opts.log(`[jobs] ${err.message}`));
  const workers = new Map<string, string[]>();

  return {
    async start() {
      await boss.start();
    },
    async stop() {
      await boss.stop({ graceful: true, timeout: 5_000, wait: true });
    },
    async createQueue(spec) {
      await boss.createQueue(spec.name, {
        name: spec.name,
        // "short": at most one waiting job per singleton key.
        policy: 'short',
        retryLimit: spec.retryLimit ?? 0,
        retryDelay: spec.retryDelaySeconds ?? 0,
        retryBackoff: spec.retryBackoff ?? false,
        expireInSeconds: spec.expireInSeconds ?? 900,
      });
    },
    send(name, data, sendOpts = {}) {
      return boss.send(name, data, sendOpts.singletonKey ? { singletonKey: sendOpts.singletonKey } : {});
    },
    async work<T extends object>(name: string, workOpts: WorkOptions, handler: (data: T) => Promise<void>) {
      const batchSize = workOpts.batchSize ?? 1;
      let id = '';
      id = await boss.work<T>(name, { batchSize, pollingIntervalSeconds: workOpts.pollingIntervalSeconds ?? 2 }, async (jobs) => {
        // A full batch means more may be waiting: fetch again at once instead of after the interval.
        if (jobs.length >= batchSize) boss.notifyWorker(id);
        // The batch runs side by side; one failure fails (and retries) the whole batch, so handlers must be idempotent.
        const failed = (await Promise.allSettled(jobs.map((job) => handler(job.data)))).find((r) => r.status === 'rejected');
        if (failed) throw failed.reason;
      });
      workers.set(name, [...(workers.get(name) ?? []), id]);
    },
    async schedule(name, cron, data = {}) {
      await boss.schedule(name, cron, data, { tz: 'UTC' });
    },
    async liveKeys(name) {
      const { rows } = await boss
        .getDb()
        .executeSql(`SELECT DISTINCT singleton_key FROM ${SCHEMA}.job WHERE name = $1 AND state < 'completed' AND singleton_key IS NOT NULL`, [name]);
      return new Set(rows.map((r: { singleton_key: string }) => r.singleton_key));
    },
    wake(name) {
      for (const id of workers.get(name) ?? []) boss.notifyWorker(id);
    },
  };
}
