/**
 * Runs the trip solver in a `node:worker_threads` Worker, so HiGHS (synchronous, up to its time
 * limit) never blocks the event loop. Compiled, the worker is the sibling `.js`; from source
 * (tsx, vitest) a tiny bootstrap registers tsx in the worker first. If the worker fails or
 * overruns, the request gets the pure heuristic plan, with a warning saying so.
 */
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import { heuristicTripPlan, instanceFromJson, planToJson, type TripInstanceJson, type TripPlanJson } from '../domain/trips/index.js';

const compiled = new URL('./trip-plan-solver.worker.js', import.meta.url);
const source = new URL('./trip-plan-solver.worker.ts', import.meta.url);
const TSX_BOOTSTRAP = `const { workerData } = require('node:worker_threads');
import('tsx/esm/api').then((m) => { m.register(); return import(workerData.entry); });`;

function startWorker(instance: TripInstanceJson, timeLimitSeconds: number): Worker {
  const data = { instance, timeLimitSeconds };
  if (existsSync(fileURLToPath(compiled))) return new Worker(compiled, { workerData: data });
  return new Worker(TSX_BOOTSTRAP, { eval: true, workerData: { ...data, entry: source.href } });
}

function fallback(instance: TripInstanceJson, why: string): TripPlanJson {
  const plan = planToJson(heuristicTripPlan(instanceFromJson(instance)));
  return { ...plan, warnings: [...plan.warnings, `the solver did not answer (${why}); showing the heuristic plan`] };
}

export interface TripSolver {
  solve(instance: TripInstanceJson): Promise<TripPlanJson>;
}

/** `timeLimitSeconds`: HiGHS's limit; the worker is stopped after twice that plus 20 s of slack. */
export function createTripSolver(opts: { timeLimitSeconds?: number } = {}): TripSolver {
  const timeLimitSeconds = opts.timeLimitSeconds ?? 1.5;
  return {
    solve(instance) {
      return new Promise<TripPlanJson>((resolve) => {
        let settled = false;
        const worker = startWorker(instance, timeLimitSeconds);
        const finish = (plan: TripPlanJson) => {
          if (settled) return;
          settled = true;
          clearTimeout(timer);
          resolve(plan);
          void worker.terminate();
        };
        const timer = setTimeout(() => finish(fallback(instance, 'time out')), (timeLimitSeconds * 2 + 20) * 1000);
        worker.on('message', (plan: TripPlanJson) => finish(plan));
        worker.on('error', (error) => finish(fallback(instance, error.message)));
        worker.on('exit', (code) => finish(fallback(instance, `worker exited with code ${code}`)));
      });
    },
  };
}
