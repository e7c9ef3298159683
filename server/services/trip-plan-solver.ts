/**
 * Runs the trip solver on a pool of `node:worker_threads` workers (`trip-plan-solver-pool.ts`),
 * so HiGHS (synchronous, up to its time limit) never blocks the event loop and the Wasm is
 * loaded once per worker, not once per plan. Day-capacity estimates (a few hundred ms of greedy
 * planning) run there too. Compiled, the worker is the sibling `.js`; from source (tsx, vitest) a
 * tiny bootstrap registers tsx in the worker first. When a worker fails, overruns or the queue is
 * full, a plan falls back to the pure heuristic (with a warning saying so) and an estimate is
 * worked out on the main thread.
 */
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { dayCapacity, heuristicTripPlan, instanceFromJson, planToJson, type DayCapacity, type DayCapacityInput, type TripInstanceJson, type TripPlanJson } from '../domain/trips/index.js';
import { createWorkerPool } from './trip-plan-solver-pool.js';

const compiled = new URL('./trip-plan-solver.worker.js', import.meta.url);
const source = new URL('./trip-plan-solver.worker.ts', import.meta.url);
const TSX_BOOTSTRAP = `const { workerData } = require('node:worker_threads');
import('tsx/esm/api').then((m) => { m.register(); return import(workerData.entry); });`;

function startWorker(): Worker {
  if (existsSync(fileURLToPath(compiled))) return new Worker(compiled);
  return new Worker(TSX_BOOTSTRAP, { eval: true, workerData: { entry: source.href } });
}

function fallback(instance: TripInstanceJson, why: string): TripPlanJson {
  const plan = planToJson(heuristicTripPlan(instanceFromJson(instance)));
  return { ...plan, warnings: [...plan.warnings, `the solver did not answer (${why}); showing the heuristic plan`] };
}

/** What a worker receives: one plan to solve or one day to estimate. */
export type TripJob = { kind: 'solve'; instance: TripInstanceJson; timeLimitSeconds: number } | { kind: 'capacity'; input: DayCapacityInput };

/** What a worker answers. */
export type TripJobResult = { kind: 'solve'; plan: TripPlanJson } | { kind: 'capacity'; capacity: DayCapacity };

export interface TripSolver {
  solve(instance: TripInstanceJson): Promise<TripPlanJson>;
  /** `dayCapacity` off the main thread. */
  capacity(input: DayCapacityInput): Promise<DayCapacity>;
  /** Stops the workers; plans still waiting get the heuristic. */
  close(): Promise<void>;
}

export interface TripSolverOptions {
  /** HiGHS's limit per plan; a worker is replaced after twice that plus 20 s of slack. */
  timeLimitSeconds?: number;
  /** Workers at most; default min(2, cores): the solver is CPU-bound and requests must still be served. */
  size?: number;
  /** Plans that may wait for a worker; default 16. */
  maxQueue?: number;
}

export function createTripSolver(opts: TripSolverOptions = {}): TripSolver {
  const timeLimitSeconds = opts.timeLimitSeconds ?? 1.5;
  const pool = createWorkerPool<TripJob, TripJobResult>({
    size: Math.max(1, opts.size ?? Math.min(2, availableParallelism())),
    spawn: startWorker,
    timeoutMs: (timeLimitSeconds * 2 + 20) * 1000,
    maxQueue: opts.maxQueue ?? 16,
  });
  return {
    async solve(instance) {
      const out = await pool.run({ kind: 'solve', instance, timeLimitSeconds }, (why) => ({ kind: 'solve', plan: fallback(instance, why) }));
      return out.kind === 'solve' ? out.plan : fallback(instance, 'the worker answered something else');
    },
    async capacity(input) {
      const out = await pool.run({ kind: 'capacity', input }, () => ({ kind: 'capacity', capacity: dayCapacity(input) }));
      return out.kind === 'capacity' ? out.capacity : dayCapacity(input);
    },
    close: () => pool.close(),
  };
}
