import { In, Not, type DataSource } from 'typeorm';
import type { BuildTripPlanBody, EditTripPlanBody, TripInstanceBody } from '../../shared/schemas/trips.schema.js';
import { Signup } from '../db/entities/signup.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { TripPlan } from '../db/entities/trip-plan.entity.js';
import { VolunteerProfile } from '../db/entities/volunteer-profile.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import {
  DEFAULT_STANDARD_PERSON_KG,
  instanceFromJson,
  runFromJson,
  validateTripPlan,
  type TripCraft,
  type TripInstanceJson,
  type TripPerson,
  type TripPlanJson,
  type TripRunJson,
} from '../domain/trips/index.js';
import { NotFoundError, ValidationError } from '../errors.js';
import type { FleetService } from './fleet.service.js';
import type { TripSolver } from './trip-plan-solver.js';

/** Defaults for a workday's plan when the coordinator gives none. */
export const TRIP_DEFAULTS = { loadMinutes: 10, unloadMinutes: 5, plantingMinutesPerTree: 20, potMassKg: 27, ownKayakSpeedKmh: 4 };

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

/** The plan after a hand edit: runs as given, loads recomputed, what stays ashore listed again. */
function editedPlan(instance: TripInstanceJson, previous: TripPlanJson, runs: TripRunJson[]): TripPlanJson {
  const weight = new Map(instance.people.map((p) => [p.id, p.weightKg ?? DEFAULT_STANDARD_PERSON_KG]));
  const craft = new Map(instance.craft.map((c) => [c.id, c]));
  const withLoads = runs.map((r) => {
    const loadKg = r.people.reduce((n, id) => n + (weight.get(id) ?? 0), 0) + r.pots * instance.pots.massKg;
    return { ...r, loadKg, loadShare: loadKg / (craft.get(r.craftId)?.maxLoadKg ?? 1) };
  });
  const pots = withLoads.reduce((n, r) => n + r.pots, 0);
  const aboard = new Set(withLoads.flatMap((r) => r.people));
  const landings = withLoads.filter((r) => r.pots > 0).map((r) => Date.parse(r.landAt));
  const ashore = instance.pots.count - pots;
  return {
    ...previous,
    status: 'feasible',
    runs: withLoads,
    lastLandingAt: landings.length ? new Date(Math.max(...landings)).toISOString() : null,
    unplaced: {
      pots: ashore,
      potReasons: ashore > 0 ? [{ count: ashore, reason: 'left-ashore', detail: 'not placed on a run in the edited plan' }] : [],
      people: instance.people.filter((p) => !aboard.has(p.id)).map((p) => ({ id: p.id, reason: 'left-ashore', detail: 'not placed on a run in the edited plan' })),
    },
    idleCraft: instance.craft.filter((c) => !withLoads.some((r) => r.craftId === c.id)).map((c) => ({ craftId: c.id, reason: 'not-needed', detail: 'no run in the edited plan' })),
    gap: undefined,
    potsUpperBound: undefined,
    warnings: ['edited by hand and checked against every rule; not proven optimal'],
  };
}

/** Trip plans: solve any instance, build and store a workday's plan, accept validated hand edits. */
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

  /** The workday's instance: its window, the active fleet plus own kayaks, the crew going out, the reserved trees. */
  async function buildInstance(w: Workday, body: BuildTripPlanBody): Promise<TripInstanceJson> {
    const signups = await deps.db.getRepository(Signup).find({ where: { workdayId: w.id, status: 'confirmed', role: Not('shore') }, order: { queuedAt: 'ASC' } });
    const userIds = signups.map((s) => s.userId);
    const profiles = userIds.length ? await deps.db.getRepository(VolunteerProfile).findBy({ userId: In(userIds) }) : [];
    const weightOf = new Map(profiles.map((p) => [p.userId, p.weightKg]));
    const fleet: TripCraft[] = (await deps.fleet.active()).map((c) => ({
      id: c.id, kind: c.kind, seats: c.seats, maxLoadKg: c.maxLoadKg, potSlots: c.potSlots, speedKmh: c.speedKmh, draftM: c.draftM, needsOperator: c.needsOperator,
    }));
    const own: TripCraft[] = signups.flatMap((s) => s.role === 'own-kayak' && s.ownCraft
      ? [{ id: `own-${s.userId}`, kind: s.ownCraft.kind, seats: s.ownCraft.seats, maxLoadKg: s.ownCraft.maxLoadKg, potSlots: 1, speedKmh: TRIP_DEFAULTS.ownKayakSpeedKmh, needsOperator: false, ownerId: s.userId }]
      : []);
    const people: TripPerson[] = signups.map((s) => ({
      id: s.userId,
      weightKg: weightOf.get(s.userId) ?? null,
      skills: s.role === 'operator' ? ['operator'] : s.role === 'own-kayak' || s.role === 'seat' ? ['paddler'] : [],
      guardianId: s.guardianUserId,
    }));
    const trees = await deps.db.getRepository(Tree).findBy({ reservedWorkdayId: w.id });
    const recorded = trees.map((t) => t.potMassKg).filter((m): m is number => typeof m === 'number' && m > 0);
    return {
      window: { start: w.startsAt.toISOString(), end: w.endsAt.toISOString() },
      route: body.route ?? { distanceKm: w.site.launchDistanceM / 1000, loadMinutes: TRIP_DEFAULTS.loadMinutes, unloadMinutes: TRIP_DEFAULTS.unloadMinutes },
      plantingMinutesPerTree: body.plantingMinutesPerTree ?? TRIP_DEFAULTS.plantingMinutesPerTree,
      craft: [...fleet, ...own],
      people,
      // The heaviest recorded pot stands for all, so no run is loaded past its margin.
      pots: { count: trees.length, massKg: body.potMassKg ?? (recorded.length ? Math.max(...recorded) : TRIP_DEFAULTS.potMassKg) },
    };
  }

  return {
    solve: (instance: TripInstanceBody): Promise<TripPlanJson> => deps.solver.solve(instance),

    async build(workdayId: string, body: BuildTripPlanBody, userId: string): Promise<StoredTripPlan> {
      const instance = await buildInstance(await workday(workdayId), body);
      const plan = await deps.solver.solve(instance);
      const row = { workdayId, instance: instance as unknown as Record<string, unknown>, plan: plan as unknown as Record<string, unknown>, source: 'solver', updatedById: userId };
      await plans.save(plans.create(row));
      return { instance, plan, source: 'solver' };
    },

    async get(workdayId: string): Promise<StoredTripPlan> {
      await workday(workdayId);
      return toStored(await stored(workdayId));
    },

    async edit(workdayId: string, body: EditTripPlanBody, userId: string): Promise<StoredTripPlan> {
      await workday(workdayId);
      const row = await stored(workdayId);
      const current = toStored(row);
      const runs: TripRunJson[] = body.runs.map((r) => ({ ...r, loadKg: r.loadKg ?? 0, loadShare: r.loadShare ?? 0 }));
      const violations = validateTripPlan(instanceFromJson(current.instance), { runs: runs.map(runFromJson) });
      if (violations.length) throw new ValidationError('The edited plan breaks a rule', { runs: violations.map((v) => v.message) });
      const plan = editedPlan(current.instance, current.plan, runs);
      Object.assign(row, { plan: plan as unknown as Record<string, unknown>, source: 'edited', updatedById: userId });
      await plans.save(row);
      return { instance: current.instance, plan, source: 'edited' };
    },
  };
}
export type TripPlanService = ReturnType<typeof createTripPlanService>;
