/**
 * The warm-up day each solver thread solves at start must be a real, valid day (so it exercises
 * the same MILP code paths as a coordinator's plan) and small enough to finish quickly.
 */
import { describe, expect, it } from 'vitest';
import { solveTripPlan, validateTripPlan, warmUpInstance } from '../../../server/domain/trips/index.js';

describe('warmUpInstance', () => {
  it('is a valid day the solver plans completely: every pot on a run, every rule kept', async () => {
    const instance = warmUpInstance();
    const plan = await solveTripPlan(instance, { timeLimitSeconds: 10 });
    expect(plan.status).not.toBe('infeasible');
    expect(plan.runs.reduce((n, r) => n + r.pots, 0)).toBe(instance.pots.count);
    expect(validateTripPlan(instance, plan)).toEqual([]);
  }, 30_000);
});
