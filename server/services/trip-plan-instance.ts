/**
 * A workday's trip instance from the database: its window, the site's route, the active fleet
 * plus the own kayaks signed up, the crew going out, and the trees reserved for it, with the
 * organisation's trip settings filling in what the request leaves out.
 */
import { In, Not, type DataSource } from 'typeorm';
import type { TripRules } from '../../shared/schemas/organisation.schema.js';
import type { BuildTripPlanBody } from '../../shared/schemas/trips.schema.js';
import type { Craft } from '../db/entities/craft.entity.js';
import { Signup } from '../db/entities/signup.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { VolunteerProfile } from '../db/entities/volunteer-profile.entity.js';
import type { Workday } from '../db/entities/workday.entity.js';
import type { TripCraft, TripInstanceJson, TripPerson, TripPots } from '../domain/trips/index.js';
import { marginOf } from './trip-plan-rules.js';

/**
 * Cruising speed assumed for a volunteer's own kayak: 4 km/h ≈ 2.2 kn, between the 1.5–2 kn
 * planned when loaded and the 2.5 kn of a recreational paddler (TRADE.md §2, common practice).
 */
export const OWN_KAYAK_SPEED_KMH = 4;

/** The organisation's craft as the planner sees them; the capacity plate decides the margin. */
export const fleetCraft = (rows: readonly Craft[]): TripCraft[] =>
  rows.map((c) => ({
    id: c.id, kind: c.kind, seats: c.seats, maxLoadKg: c.maxLoadKg, potSlots: c.potSlots, speedKmh: c.speedKmh, draftM: c.draftM, needsOperator: c.needsOperator, plated: c.hasCapacityPlate,
  }));

/** Confirmed sign-ups going out (everyone but the shore crew), in sign-up order. */
export const crewGoingOut = (db: DataSource, workdayId: string) =>
  db.getRepository(Signup).find({ where: { workdayId, status: 'confirmed', role: Not('shore') }, order: { queuedAt: 'ASC' } });

/** Volunteers' own kayaks from their sign-ups: one pot slot, paddled by the owner only. */
export const ownCraft = (signups: readonly Signup[]): TripCraft[] =>
  signups.flatMap((s) => (s.role === 'own-kayak' && s.ownCraft
    ? [{ id: `own-${s.userId}`, kind: s.ownCraft.kind, seats: s.ownCraft.seats, maxLoadKg: s.ownCraft.maxLoadKg, potSlots: 1, speedKmh: OWN_KAYAK_SPEED_KMH, needsOperator: false, ownerId: s.userId }]
    : []));

async function people(db: DataSource, signups: readonly Signup[]): Promise<TripPerson[]> {
  const ids = signups.map((s) => s.userId);
  const profiles = ids.length ? await db.getRepository(VolunteerProfile).findBy({ userId: In(ids) }) : [];
  const weightOf = new Map(profiles.map((p) => [p.userId, p.weightKg]));
  return signups.map((s) => ({
    id: s.userId,
    weightKg: weightOf.get(s.userId) ?? null,
    skills: s.role === 'operator' ? ['operator'] : s.role === 'own-kayak' || s.role === 'seat' ? ['paddler'] : [],
    guardianId: s.guardianUserId,
  }));
}

/** The trees reserved for the workday: each pot at its recorded mass, the others at `defaultKg`. */
export async function reservedPots(db: DataSource, workdayId: string, defaultKg: number): Promise<TripPots> {
  const trees = await db.getRepository(Tree).find({ where: { reservedWorkdayId: workdayId }, order: { tag: 'ASC' } });
  const masses = trees.map((t) => t.potMassKg).filter((m): m is number => typeof m === 'number' && m > 0);
  return masses.length ? { count: trees.length, massKg: defaultKg, masses } : { count: trees.length, massKg: defaultKg };
}

/** The workday's instance; a value in `body` overrides the organisation's settings. */
export async function workdayInstance(db: DataSource, w: Workday, fleet: readonly Craft[], body: BuildTripPlanBody, rules: TripRules): Promise<TripInstanceJson> {
  const signups = await crewGoingOut(db, w.id);
  return {
    window: { start: w.startsAt.toISOString(), end: w.endsAt.toISOString() },
    route: body.route ?? { distanceKm: w.site.launchDistanceM / 1000, loadMinutes: rules.loadMinutes, unloadMinutes: rules.unloadMinutes },
    plantingMinutesPerTree: body.plantingMinutesPerTree ?? rules.plantingMinutesPerTree,
    loadMargin: marginOf(rules),
    standardPersonKg: rules.standardPersonKg,
    craft: [...fleetCraft(fleet), ...ownCraft(signups)],
    people: await people(db, signups),
    pots: await reservedPots(db, w.id, body.potMassKg ?? rules.potMassKg),
  };
}
