import { Worker } from 'node:worker_threads';
import { afterEach, describe, expect, it } from 'vitest';
import { createWorkerPool, type WorkerPool } from '../../../server/services/trip-plan-solver-pool.js';

/**
 * A stand-in worker speaking the pool's protocol: doubles a number after 30 ms; 'crash' exits,
 * 'hang' spins forever, 'fail' answers with an error.
 */
const FAKE = `const { parentPort, threadId } = require('node:worker_threads');
parentPort.on('message', ({ id, input }) => {
  if (input === 'crash') process.exit(3);
  if (input === 'hang') for (;;) {}
  if (input === 'fail') return parentPort.postMessage({ id, error: 'no plan' });
  setTimeout(() => parentPort.postMessage({ id, output: { value: input * 2, threadId } }), 30);
});`;

type Out = { value: number; threadId: number } | { fallback: string };
const fallback = (why: string): Out => ({ fallback: why });

let pool: WorkerPool<number | string, Out> | null = null;
function makePool(over: { size?: number; timeoutMs?: number; maxQueue?: number } = {}) {
  pool = createWorkerPool<number | string, Out>({ size: 2, timeoutMs: 5_000, maxQueue: 16, spawn: () => new Worker(FAKE, { eval: true }), ...over });
  return pool;
}

afterEach(async () => {
  await pool?.close();
  pool = null;
});

describe('the solver worker pool', () => {
  it('answers eight jobs at once with two workers, reusing them', async () => {
    const p = makePool();
    const outs = await Promise.all([1, 2, 3, 4, 5, 6, 7, 8].map((n) => p.run(n, fallback)));
    expect(outs.map((o) => ('value' in o ? o.value : o.fallback))).toEqual([2, 4, 6, 8, 10, 12, 14, 16]);
    expect(new Set(outs.map((o) => ('threadId' in o ? o.threadId : 0))).size).toBe(2);
    expect(p.stats()).toEqual({ workers: 2, busy: 0, queued: 0, started: 2 });
  });

  it('replaces a worker that crashes; the crashed job gets its fallback, the next an answer', async () => {
    const p = makePool({ size: 1 });
    const first = await p.run(1, fallback);
    expect(await p.run('crash', fallback)).toEqual({ fallback: 'worker exited with code 3' });
    const after = await p.run(2, fallback);
    expect(after).toMatchObject({ value: 4 });
    expect('threadId' in after && 'threadId' in first && after.threadId !== first.threadId).toBe(true);
    expect(p.stats().started).toBe(2);
  });

  it('replaces a worker that overruns its time, and passes on a worker’s error as the reason', async () => {
    // The limit counts from the job's start, a fresh worker's start-up included: leave it room.
    const p = makePool({ size: 1, timeoutMs: 1_500 });
    const [hung, queued] = await Promise.all([p.run('hang', fallback), p.run(3, fallback)]);
    expect(hung).toEqual({ fallback: 'time out' });
    expect(queued).toMatchObject({ value: 6 });
    expect(await p.run('fail', fallback)).toEqual({ fallback: 'no plan' });
  });

  it('answers at once with the fallback when the queue is full', async () => {
    const p = makePool({ size: 1, maxQueue: 1 });
    const outs = await Promise.all([1, 2, 3].map((n) => p.run(n, fallback)));
    expect(outs).toEqual([expect.objectContaining({ value: 2 }), expect.objectContaining({ value: 4 }), { fallback: 'the solver is busy (1 plans waiting)' }]);
  });

  it('gives waiting jobs their fallback when closed', async () => {
    const p = makePool({ size: 1 });
    const running = p.run(1, fallback);
    const waiting = p.run(2, fallback);
    await p.close();
    expect(await running).toEqual({ fallback: 'the solver is shutting down' });
    expect(await waiting).toEqual({ fallback: 'the solver is shutting down' });
  });
});
