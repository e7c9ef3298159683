/**
 * A small pool of `node:worker_threads` workers that each answer one job at a time: at most
 * `size` workers, started when first needed and kept for the next job; jobs beyond them wait in
 * a queue. A worker that crashes, exits or overruns `timeoutMs` is terminated and its job gets
 * the caller's fallback; the next job starts a fresh worker. When the queue is full a job gets
 * its fallback at once rather than waiting behind a backlog. Idle workers are unref'd, so they
 * never keep the process alive.
 *
 * Protocol: the pool posts `{ id, input }`; the worker answers `{ id, output }` or `{ id, error }`.
 */
import type { Worker } from 'node:worker_threads';

export interface WorkerPoolOptions {
  size: number;
  spawn: () => Worker;
  /** How long one job may run on its worker before the worker is replaced. */
  timeoutMs: number;
  /** Jobs that may wait for a worker; more get their fallback at once. */
  maxQueue: number;
}

interface Job<I, O> {
  id: number;
  input: I;
  fallback: (why: string) => O;
  resolve: (output: O) => void;
}

interface Slot<I, O> {
  worker: Worker;
  job: Job<I, O> | null;
  timer: ReturnType<typeof setTimeout> | null;
  retired: boolean;
}

type Reply<O> = { id: number; output: O } | { id: number; error: string };

export interface WorkerPool<I, O> {
  /** Runs one job; resolves with the worker's output, or with `fallback(why)` when it could not. */
  run(input: I, fallback: (why: string) => O): Promise<O>;
  /** Workers alive and jobs waiting, for tests and the bench. */
  stats(): { workers: number; busy: number; queued: number; started: number };
  /** Answers waiting jobs with their fallback and stops every worker. */
  close(): Promise<void>;
}

export function createWorkerPool<I, O>(opts: WorkerPoolOptions): WorkerPool<I, O> {
  const slots: Slot<I, O>[] = [];
  const queue: Job<I, O>[] = [];
  let nextId = 1;
  let started = 0;
  let closed = false;

  function finish(slot: Slot<I, O>, output: (job: Job<I, O>) => O): void {
    const job = slot.job;
    if (slot.timer) clearTimeout(slot.timer);
    slot.job = null;
    slot.timer = null;
    if (!slot.retired) slot.worker.unref();
    if (job) job.resolve(output(job));
  }

  function retire(slot: Slot<I, O>, why: string): void {
    if (slot.retired) return;
    slot.retired = true;
    const at = slots.indexOf(slot);
    if (at >= 0) slots.splice(at, 1);
    finish(slot, (job) => job.fallback(why));
    void slot.worker.terminate();
    pump();
  }

  function start(): Slot<I, O> {
    const worker = opts.spawn();
    started += 1;
    const slot: Slot<I, O> = { worker, job: null, timer: null, retired: false };
    worker.on('message', (reply: Reply<O>) => {
      if (slot.job?.id !== reply.id) return;
      finish(slot, (job) => ('output' in reply ? reply.output : job.fallback(reply.error)));
      pump();
    });
    worker.on('error', (error) => retire(slot, error.message));
    worker.on('exit', (code) => retire(slot, `worker exited with code ${code}`));
    worker.unref();
    slots.push(slot);
    return slot;
  }

  function assign(slot: Slot<I, O>, job: Job<I, O>): void {
    slot.job = job;
    slot.worker.ref();
    slot.timer = setTimeout(() => retire(slot, 'time out'), opts.timeoutMs);
    slot.worker.postMessage({ id: job.id, input: job.input });
  }

  function pump(): void {
    while (!closed && queue.length > 0) {
      let slot = slots.find((s) => !s.job);
      if (!slot && slots.length < opts.size) {
        try {
          slot = start();
        } catch (error) {
          const job = queue.shift();
          job?.resolve(job.fallback(`no worker could start: ${error instanceof Error ? error.message : String(error)}`));
          continue;
        }
      }
      const job = slot && queue.shift();
      if (!slot || !job) return;
      assign(slot, job);
    }
  }

  return {
    run(input, fallback) {
      return new Promise<O>((resolve) => {
        if (closed) return resolve(fallback('the solver is shutting down'));
        const busy = slots.length >= opts.size && slots.every((s) => s.job);
        if (busy && queue.length >= opts.maxQueue) return resolve(fallback(`the solver is busy (${queue.length} plans waiting)`));
        queue.push({ id: nextId++, input, fallback, resolve });
        pump();
      });
    },
    stats: () => ({ workers: slots.length, busy: slots.filter((s) => s.job).length, queued: queue.length, started }),
    async close() {
      closed = true;
      for (const job of queue.splice(0)) job.resolve(job.fallback('the solver is shutting down'));
      await Promise.all([...slots].map(async (slot) => {
        slot.retired = true;
        finish(slot, (job) => job.fallback('the solver is shutting down'));
        await slot.worker.terminate();
      }));
      slots.splice(0);
    },
  };
}
