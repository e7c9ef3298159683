/** Worker thread entry: solves trip plans and estimates days one at a time off the main event loop (see trip-plan-solver.ts). */
import { parentPort } from 'node:worker_threads';
import { dayCapacity, initTripSolver, instanceFromJson, planToJson, solveTripPlan, warmUpInstance } from '../domain/trips/index.js';
import type { TripJob, TripJobResult } from './trip-plan-solver.js';

// Load the HiGHS Wasm and solve a small day once while waiting for the first plan, so the first
// coordinator's time limit isn't spent compiling (see warm-up.ts); a failure shows up on that plan.
const warm = initTripSolver()
  .then(() => solveTripPlan(warmUpInstance(), { timeLimitSeconds: 2 }))
  .catch(() => undefined);

async function answer(job: TripJob): Promise<TripJobResult> {
  if (job.kind === 'capacity') return { kind: 'capacity', capacity: dayCapacity(job.input) };
  await warm;
  const plan = await solveTripPlan(instanceFromJson(job.instance), { timeLimitSeconds: job.timeLimitSeconds });
  return { kind: 'solve', plan: planToJson(plan) };
}

parentPort?.on('message', async ({ id, input }: { id: number; input: TripJob }) => {
  try {
    parentPort?.postMessage({ id, output: await answer(input) });
  } catch (error) {
    parentPort?.postMessage({ id, error: error instanceof Error ? error.message : String(error) });
  }
});
