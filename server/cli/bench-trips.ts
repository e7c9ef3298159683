/**
 * Trip-planner part of `npm run bench`: the HiGHS Wasm load, then the invented demo-size day
 * (40 people, 120 pots, 15 craft; target: proven optimal in under 2 s), the same day with a
 * pot mass per tree, a large day (200 people, 600 pots, 40 craft; target: answered in under
 * 10 s with the gap reported), six plans at once through the worker pool, and the day-capacity
 * estimate. Prints figures only; people read the targets. Runs alone too:
 * `node --import tsx server/cli/bench-trips.ts`.
 */
import { performance } from 'node:perf_hooks';
import { pathToFileURL } from 'node:url';
import { dayCapacity, heuristicTripPlan, initTripSolver, solveTripPlan, warmUpInstance, type TripInstance, type TripPlan, type TripPlanJson } from '../domain/trips/index.js';
import { createTripSolver } from '../services/trip-plan-solver.js';
import { demoInstance, demoInstanceWithPotMasses, largeInstance } from '../../tests/unit/trips/instances.js';

const fmt = (ms: number) => `${ms.toFixed(0)} ms`;

function summary(instance: TripInstance, plan: TripPlan): string {
  const pots = plan.runs.reduce((n, r) => n + r.pots, 0);
  const people = new Set(plan.runs.flatMap((r) => r.people)).size;
  const last = plan.lastLandingAt === null ? '—' : `+${((plan.lastLandingAt - instance.window.start) / 60_000).toFixed(1)} min`;
  const gap = plan.gap === undefined ? '' : `, gap ${plan.gap.toExponential(1)}`;
  const bound = plan.potsUpperBound === undefined ? '' : `, pots ≤ ${plan.potsUpperBound} proven`;
  return `${plan.status} (${plan.solver}${gap}${bound}): ${pots}/${instance.pots.count} pots, ${people}/${instance.people.length} people, last landing ${last}, ${plan.runs.length} runs`;
}

async function timed<T>(run: () => Promise<T> | T): Promise<{ value: T; ms: number; cpuMs: number }> {
  const cpu = process.cpuUsage();
  const t = performance.now();
  const value = await run();
  const used = process.cpuUsage(cpu);
  return { value, ms: performance.now() - t, cpuMs: (used.user + used.system) / 1000 };
}

async function benchDay(log: (s: string) => void, name: string, instance: TripInstance, limits: number[]): Promise<void> {
  const h = await timed(() => heuristicTripPlan(instance));
  log(`trips ${name}, heuristic: ${fmt(h.ms)} — ${summary(instance, h.value)}`);
  for (const seconds of limits) {
    const s = await timed(() => solveTripPlan(instance, { timeLimitSeconds: seconds }));
    log(`trips ${name}, HiGHS limit ${seconds} s: ${fmt(s.ms)} (cpu ${fmt(s.cpuMs)}) — ${summary(instance, s.value)}`);
  }
}

/** Six demo-size plans sent at once to the worker pool (min(2, cores) workers, HiGHS limit 1.5 s each). */
async function benchPool(log: (s: string) => void): Promise<void> {
  const solver = createTripSolver({ timeLimitSeconds: 1.5 });
  const demo = demoInstance();
  const json = { ...demo, window: { start: new Date(demo.window.start).toISOString(), end: new Date(demo.window.end).toISOString() } };
  const warm = await timed(() => solver.solve(json));
  const all = await timed(() => Promise.all(Array.from({ length: 6 }, () => solver.solve(json))));
  await solver.close();
  const by = (plans: TripPlanJson[], key: (p: TripPlanJson) => string) => [...new Set(plans.map(key))].map((k) => `${plans.filter((p) => key(p) === k).length} ${k}`).join(', ');
  log(`trips worker pool: first plan (workers starting) ${fmt(warm.ms)}; 6 demo-size plans at once ${fmt(all.ms)} — ${by(all.value, (p) => `${p.status} (${p.solver})`)}`);
}

/** Prints load, demo-size and large-day figures for the trip planner. */
export async function benchTrips(log: (s: string) => void): Promise<void> {
  const load = await timed(() => initTripSolver());
  log(`trips: HiGHS ${load.value.version.string} (Wasm) loaded in ${fmt(load.ms)}`);
  // The first MILP in a thread also pays for compiling HiGHS's Wasm code paths; each pool worker
  // solves the same small warm-up day when it starts, so the figures below are for a warm solver.
  const warm = await timed(() => solveTripPlan(warmUpInstance(), { timeLimitSeconds: 2 }));
  log(`trips: warm-up day (${warmUpInstance().people.length} people, ${warmUpInstance().pots.count} pots), cold solver: ${fmt(warm.ms)} — ${warm.value.status}`);
  await benchDay(log, 'demo (40 people, 120 pots, 15 craft)', demoInstance(), [1.5, 30]);
  await benchDay(log, 'demo, a pot mass per tree (22–33.9 kg, 4 classes)', demoInstanceWithPotMasses(), [1.5, 30]);
  await benchDay(log, 'large (200 people, 600 pots, 40 craft)', largeInstance(), [8]);
  await benchPool(log);
  const demo = demoInstance();
  const cap = await timed(() => dayCapacity({ ...demo, potMassKg: demo.pots.massKg }));
  log(`trips day capacity (demo fleet): ${fmt(cap.ms)} — ${cap.value.trees} trees, ${cap.value.runs} runs, roles ${JSON.stringify(cap.value.roles)}`);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) await benchTrips((line) => console.log(line));
