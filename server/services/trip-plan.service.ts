import type { DataSource } from 'typeorm';
import type { DayCapacityBody } from '../../shared/schemas/trip-capacity.schema.js';
import type { BuildTripPlanBody, EditTripPlanBody, TripInstanceBody } from '../../shared/schemas/trips.schema.js';
import { TripPlan } from '../db/entities/trip-plan.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import { instanceFromJson, runFromJson, validateTripPlan, type TripInstanceJson, type TripPlanJson, type TripRunJson } from '../domain/trips/index.js';
import { NotFoundError } from '../errors.js';
import type { FleetService } from './fleet.service.js';
import { createDayCapacity } from './trip-plan-capacity.js';
import { editedPlan } from './trip-plan-edit.js';
import { refusal } from './trip-plan-refusal.js';
import { workdayInstance } from './trip-plan-instance.js';
import { loadTripRules } from './trip-plan-rules.js';
import type { TripSolver } from './trip-plan-solver.js';

export interface StoredTripPlan {
  instance: TripInstanceJson;
  plan: TripPlanJson;
  source: 'solver' | 'edited';
}

const toStored = (row: TripPlan): StoredTripPlan => ({
  instance: row.instance as unknown as TripInstanceJson,
  plan: row.plan as unknown as TripPlanJson,
  source: row.source === 'edited' ? 'edited' : 'solver',
});

/**
 * Trip plans: solve any instance, build and store a workday's plan (with the organisation's trip
 * settings), accept validated hand edits, and estimate the capacity of a day.
 */
export function createTripPlanService(deps: { db: DataSource; fleet: FleetService; solver: TripSolver }) {
  const plans = deps.db.getRepository(TripPlan);

  async function workday(id: string): Promise<Workday> {
    const w = await deps.db.getRepository(Workday).findOne({ where: { id }, relations: { site: true } });
    if (!w) throw new NotFoundError('Workday');
    return w;
  }
  async function stored(workdayId: string): Promise<TripPlan> {
    const row = await plans.findOneBy({ workdayId });
    if (!row) throw new NotFoundError('Trip plan');
    return row;
  }
  const capacity = createDayCapacity({ db: deps.db, fleet: deps.fleet, solver: deps.solver, workday });

  return {
    solve: (instance: TripInstanceBody): Promise<TripPlanJson> => deps.solver.solve(instance),

    async build(workdayId: string, body: BuildTripPlanBody, userId: string): Promise<StoredTripPlan> {
      const w = await workday(workdayId);
      const [rules, fleet] = await Promise.all([loadTripRules(deps.db), deps.fleet.active()]);
      const instance = await workdayInstance(deps.db, w, fleet, body, rules);
      const plan = await deps.solver.solve(instance);
      const row = { workdayId, instance: instance as unknown as Record<string, unknown>, plan: plan as unknown as Record<string, unknown>, source: 'solver', updatedById: userId };
      // The workday row's lock makes two rebuilds at once store one after the other (no duplicate-key failure).
      await deps.db.transaction(async (tx) => {
        await tx.getRepository(Workday).findOne({ where: { id: workdayId }, lock: { mode: 'pessimistic_write' } });
        await tx.getRepository(TripPlan).save(tx.getRepository(TripPlan).create(row));
      });
      return { instance, plan, source: 'solver' };
    },

    async get(workdayId: string): Promise<StoredTripPlan> {
      await workday(workdayId);
      return toStored(await stored(workdayId));
    },

    /** Validated against the stored instance under a row lock, so a rebuild meanwhile cannot pair it with another instance. */
    async edit(workdayId: string, body: EditTripPlanBody, userId: string): Promise<StoredTripPlan> {
      await workday(workdayId);
      const runs: TripRunJson[] = body.runs.map((r) => ({ ...r, loadKg: r.loadKg ?? 0, loadShare: r.loadShare ?? 0 }));
      const outcome = await deps.db.transaction(async (tx) => {
        const repo = tx.getRepository(TripPlan);
        const row = await repo.findOne({ where: { workdayId }, lock: { mode: 'pessimistic_write' } });
        if (!row) throw new NotFoundError('Trip plan');
        const current = toStored(row);
        const violations = validateTripPlan(instanceFromJson(current.instance), { runs: runs.map(runFromJson) });
        if (violations.length) return { refused: true as const, instance: current.instance, violations };
        const plan = editedPlan(current.instance, current.plan, runs);
        Object.assign(row, { plan: plan as unknown as Record<string, unknown>, source: 'edited', updatedById: userId });
        await repo.save(row);
        return { refused: false as const, saved: { instance: current.instance, plan, source: 'edited' as const } };
      });
      // Names for the messages are read after the lock is released: nothing was written.
      if (outcome.refused) throw await refusal(deps.db, workdayId, outcome.instance, runs, outcome.violations);
      return outcome.saved;
    },

    /** Trees a saved workday can plant and the crew per role it needs. */
    capacityOfWorkday: (workdayId: string) => capacity.ofWorkday(workdayId),
    /** The same for a window and site (or a whole self-contained day) still being planned. */
    capacity: (body: DayCapacityBody) => capacity.ofWindow(body),
  };
}
export type TripPlanService = ReturnType<typeof createTripPlanService>;
