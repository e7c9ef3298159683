/**
 * Capacity of a day for coordinators: for a saved workday (its window, site, fleet, own kayaks
 * signed up and reserved trees) or for a window and site still being chosen on the workday form.
 */
import type { DataSource } from 'typeorm';
import type { TripRules } from '../../shared/schemas/organisation.schema.js';
import type { DayCapacity as DayCapacityDto, DayCapacityBody } from '../../shared/schemas/trip-capacity.schema.js';
import { Site } from '../db/entities/site.entity.js';
import type { Workday } from '../db/entities/workday.entity.js';
import { DEFAULT_LOAD_MARGIN, DEFAULT_STANDARD_PERSON_KG, type DayCapacity, type DayCapacityInput } from '../domain/trips/index.js';
import { NotFoundError } from '../errors.js';
import type { FleetService } from './fleet.service.js';
import { crewGoingOut, fleetCraft, ownCraft, reservedPots } from './trip-plan-instance.js';
import { loadTripRules, marginNote, marginOf } from './trip-plan-rules.js';
import type { TripSolver } from './trip-plan-solver.js';

const iso = (ms: number) => new Date(ms).toISOString();

function notes(input: DayCapacityInput, cap: DayCapacity, limitedBy: string | null): string[] {
  const out = [
    marginNote(input.loadMargin ?? DEFAULT_LOAD_MARGIN),
    `Each person counts at ${input.standardPersonKg ?? DEFAULT_STANDARD_PERSON_KG} kg and each pot at ${input.potMassesKg?.length ? 'its recorded mass, or ' : ''}${input.potMassKg} kg.`,
    input.plantingMinutesPerTree > 0
      ? `Planting: one tree per ${input.plantingMinutesPerTree} min for each pair of planters, finished before the window closes.`
      : 'Planting time is not counted: every pot landed counts as planted.',
    `Shore crew: ${cap.roles.shore} — one to load pots for the next runs, one to hold the float plan ashore (common practice).`,
  ];
  if (limitedBy) out.push(limitedBy);
  if (cap.trees === 0) out.push('No tree can be planted: the window may be too short for one run and its planting, or no craft can carry a pot.');
  out.push("An estimate for setting the crew caps: the trip plan built from the actual crew is what goes on the water, and local rules, permits and the operators' judgement prevail.");
  return out;
}

function toDto(input: DayCapacityInput, cap: DayCapacity, limitedBy: string | null): DayCapacityDto {
  const { roles } = cap;
  return {
    window: { start: iso(input.window.start), end: iso(input.window.end) },
    trees: cap.trees,
    transportPots: cap.transportPots,
    plantingTrees: cap.plantingTrees >= Number.MAX_SAFE_INTEGER ? null : cap.plantingTrees,
    skippers: roles.operator + roles.seat + roles['own-kayak'],
    planters: roles.planter,
    roles,
    runs: cap.runs,
    lastLandingAt: cap.lastLandingAt === null ? null : iso(cap.lastLandingAt),
    craftUsed: cap.craftUsed,
    notes: notes(input, cap, limitedBy),
  };
}

/** Day-capacity use cases of the trip-plan service. */
export function createDayCapacity(deps: { db: DataSource; fleet: FleetService; solver: TripSolver; workday: (id: string) => Promise<Workday> }) {
  const route = (distanceM: number, rules: TripRules) => ({ distanceKm: distanceM / 1000, loadMinutes: rules.loadMinutes, unloadMinutes: rules.unloadMinutes });
  const base = (rules: TripRules) => ({ plantingMinutesPerTree: rules.plantingMinutesPerTree, potMassKg: rules.potMassKg, loadMargin: marginOf(rules), standardPersonKg: rules.standardPersonKg });

  return {
    /** The saved workday: its own kayaks signed up count, and its reserved trees cap the figure when there are any. */
    async ofWorkday(workdayId: string): Promise<DayCapacityDto> {
      const w = await deps.workday(workdayId);
      const [rules, fleet, signups] = await Promise.all([loadTripRules(deps.db), deps.fleet.active(), crewGoingOut(deps.db, w.id)]);
      const pots = await reservedPots(deps.db, w.id, rules.potMassKg);
      const input: DayCapacityInput = {
        ...base(rules),
        window: { start: w.startsAt.getTime(), end: w.endsAt.getTime() },
        route: route(w.site.launchDistanceM, rules),
        craft: [...fleetCraft(fleet), ...ownCraft(signups)],
        ...(pots.count > 0 ? { treesAvailable: pots.count, potMassesKg: pots.masses ?? [] } : {}),
      };
      const limitedBy = pots.count > 0 ? `At most the ${pots.count} trees reserved for this workday.` : null;
      return toDto(input, await deps.solver.capacity(input), limitedBy);
    },

    /** A window and site (or route) being planned; what the body leaves out comes from the settings and the active fleet. */
    async ofWindow(body: DayCapacityBody): Promise<DayCapacityDto> {
      const rules = await loadTripRules(deps.db);
      const site = body.siteId ? await deps.db.getRepository(Site).findOneBy({ id: body.siteId }) : null;
      if (body.siteId && !site) throw new NotFoundError('Site');
      const craft = body.craft ?? fleetCraft(await deps.fleet.active());
      const input: DayCapacityInput = {
        window: { start: Date.parse(body.window.start), end: Date.parse(body.window.end) },
        route: body.route ?? route(site?.launchDistanceM ?? 0, rules),
        craft,
        plantingMinutesPerTree: body.plantingMinutesPerTree ?? rules.plantingMinutesPerTree,
        potMassKg: body.potMassKg ?? rules.potMassKg,
        potMassesKg: body.potMassesKg,
        loadMargin: body.loadMargin ?? marginOf(rules),
        standardPersonKg: body.standardPersonKg ?? rules.standardPersonKg,
        treesAvailable: body.treesAvailable,
        planters: body.planters,
        shoreCrew: body.shoreCrew,
      };
      const limitedBy = body.treesAvailable !== undefined ? `At most the ${body.treesAvailable} trees available.` : null;
      return toDto(input, await deps.solver.capacity(input), limitedBy);
    },
  };
}
