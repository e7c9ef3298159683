/** Worker thread entry: solves one trip instance off the main event loop (see trip-plan-solver.ts). */
import { parentPort, workerData } from 'node:worker_threads';
import { instanceFromJson, planToJson, solveTripPlan, type TripInstanceJson } from '../domain/trips/index.js';

const { instance, timeLimitSeconds } = workerData as { instance: TripInstanceJson; timeLimitSeconds: number };
const plan = await solveTripPlan(instanceFromJson(instance), { timeLimitSeconds });
parentPort?.postMessage(planToJson(plan));
