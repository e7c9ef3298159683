import { beforeAll, describe, expect, it } from 'vitest';
import { heuristicTripPlan, initTripSolver, solveTripPlan, validateTripPlan } from '../../../server/domain/trips/index.js';
import { demoInstance, largeInstance } from './instances.js';

beforeAll(async () => {
  await initTripSolver();
});

describe('demo and large days', () => {
  it('proves the demo-size day (40 people, 120 pots, 15 craft) optimal', async () => {
    // Measured on a shared 2-core machine: 3–12 s wall, 3–6 s CPU (see the report); the issue's
    // target is 2 s. The generous limit keeps this a test of the proof, not of the machine.
    const instance = demoInstance();
    const plan = await solveTripPlan(instance, { timeLimitSeconds: 40 });
    expect(plan).toMatchObject({ status: 'optimal', solver: 'highs', gap: 0, potsUpperBound: 120 });
    expect(plan.runs.reduce((n, r) => n + r.pots, 0)).toBe(120);
    expect(validateTripPlan(instance, plan)).toEqual([]);
  }, 90_000);

  it('answers the large day (200 people, 600 pots, 40 craft) within a short limit, with its gap', async () => {
    const instance = largeInstance();
    const plan = await solveTripPlan(instance, { timeLimitSeconds: 2 });
    expect(validateTripPlan(instance, plan)).toEqual([]);
    expect(plan.status).not.toBe('infeasible');
    if (plan.status === 'feasible' && plan.solver === 'highs') expect(plan.gap).toBeGreaterThan(0);
    expect(plan.unplaced.people.every((p) => p.reason.length > 0)).toBe(true);
  }, 60_000);

  it('the heuristic is deterministic and valid on both', () => {
    for (const instance of [demoInstance(), largeInstance()]) {
      const a = heuristicTripPlan(instance);
      expect(heuristicTripPlan(instance)).toEqual(a);
      expect(validateTripPlan(instance, a)).toEqual([]);
      expect(a.unplaced.pots).toBe(instance.pots.count - a.runs.reduce((n, r) => n + r.pots, 0));
    }
  });
});
