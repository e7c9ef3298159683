/**
 * Trip-planner part of `npm run bench`: the HiGHS Wasm load, then the invented demo-size day
 * (40 people, 120 pots, 15 craft; target: proven optimal in under 2 s) and a large day
 * (200 people, 600 pots, 40 craft; target: answered in under 10 s with the gap reported), plus
 * the day-capacity estimate. Prints figures only; people read the targets.
 */
import { performance } from 'node:perf_hooks';
import { dayCapacity, heuristicTripPlan, initTripSolver, solveTripPlan, type TripInstance, type TripPlan } from '../domain/trips/index.js';
import { demoInstance, largeInstance } from '../../tests/unit/trips/instances.js';

const fmt = (ms: number) => `${ms.toFixed(0)} ms`;

function summary(instance: TripInstance, plan: TripPlan): string {
  const pots = plan.runs.reduce((n, r) => n + r.pots, 0);
  const people = new Set(plan.runs.flatMap((r) => r.people)).size;
  const last = plan.lastLandingAt === null ? '—' : `+${((plan.lastLandingAt - instance.window.start) / 60_000).toFixed(0)} min`;
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

/** Prints load, demo-size and large-day figures for the trip planner. */
export async function benchTrips(log: (s: string) => void): Promise<void> {
  const load = await timed(() => initTripSolver());
  log(`trips: HiGHS ${load.value.version.string} (Wasm) loaded in ${fmt(load.ms)}`);
  await benchDay(log, 'demo (40 people, 120 pots, 15 craft)', demoInstance(), [1.5, 30]);
  await benchDay(log, 'large (200 people, 600 pots, 40 craft)', largeInstance(), [8]);
  const demo = demoInstance();
  const cap = await timed(() => dayCapacity({ ...demo, potMassKg: demo.pots.massKg }));
  log(`trips day capacity (demo fleet): ${fmt(cap.ms)} — ${cap.value.trees} trees, roles ${JSON.stringify(cap.value.roles)}`);
}
