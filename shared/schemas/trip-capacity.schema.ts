import { z } from 'zod';
import type { CrewRole } from './crew.schema.js';
import { Instant, LoadMarginInput, Minutes, PotMass, StandardPersonKg, TripCraftInput, TripRoute, uniqueIds } from './trips.schema.js';

/**
 * Capacity of a day: how many trees a window, a fleet and a planting rate allow, and the crew
 * per role that takes — offered as a workday's per-role caps.
 */
const whole = (max: number) => z.number({ message: 'must be a number' }).int({ message: 'must be a whole number' }).min(0, { message: 'must be 0 or more' }).max(max, { message: `must be at most ${max}` });

/**
 * `POST /api/trip-plans/capacity`. Self-contained, or partly: a `siteId` gives the route (its
 * launch distance), a missing `craft` list means the organisation's active fleet, and anything
 * else left out comes from the organisation's trip settings.
 */
export const DayCapacityBody = z
  .object({
    window: z.object({ start: Instant, end: Instant }),
    siteId: z.uuid({ message: 'must be a site id' }).optional(),
    route: TripRoute.optional(),
    craft: z.array(TripCraftInput).max(60, { message: 'at most 60 craft' }).refine(uniqueIds, { message: 'craft ids must be unique' }).optional(),
    plantingMinutesPerTree: Minutes.optional(),
    /** Mass of a pot with none recorded. */
    potMassKg: PotMass.optional(),
    /** Recorded masses of the pots going out, one per tree. */
    potMassesKg: z.array(PotMass).max(2000).optional(),
    loadMargin: LoadMarginInput.optional(),
    standardPersonKg: StandardPersonKg.optional(),
    /** Trees ready for the day; default: the listed pot masses if any, else as many as the day can take. */
    treesAvailable: whole(2000).optional(),
    /** Planters to assume; default: the number that plants the most trees. */
    planters: whole(400).optional(),
    /** Shore crew (loading pots, holding the float plan); default 2. */
    shoreCrew: whole(50).optional(),
  })
  .strict()
  .refine((b) => Date.parse(b.window.end) > Date.parse(b.window.start), { message: 'must be after the start', path: ['window', 'end'] })
  .refine((b) => Date.parse(b.window.end) - Date.parse(b.window.start) <= 16 * 3_600_000, { message: 'a window may last at most 16 hours', path: ['window', 'end'] })
  .refine((b) => b.route !== undefined || b.siteId !== undefined, { message: 'give the route or the site it leaves from', path: ['route'] });
export type DayCapacityBody = z.infer<typeof DayCapacityBody>;

/** Volunteers needed per crew role (the names of the workday's role caps). */
const need = z.number().int();
export const RoleNeeds = z.object({ 'own-kayak': need, seat: need, operator: need, shore: need, planter: need } satisfies Record<CrewRole, typeof need>);
export type RoleNeeds = z.infer<typeof RoleNeeds>;

export const DayCapacity = z.object({
  window: z.object({ start: z.string(), end: z.string() }),
  /** Trees the day can plant: what the runs can land and the crew can plant in time. */
  trees: z.number().int(),
  /** Pots the runs could land if planting were no limit. */
  transportPots: z.number().int(),
  /** Trees the crew could plant if the pots were there; null when planting time is not counted. */
  plantingTrees: z.number().int().nullable(),
  /** People in charge of a craft: operators, paddlers needing a seat and own-kayak owners. */
  skippers: z.number().int(),
  /** People riding out only to plant. */
  planters: z.number().int(),
  /** Per crew role: offer these as the workday's caps. */
  roles: RoleNeeds,
  runs: z.number().int(),
  lastLandingAt: z.string().nullable(),
  craftUsed: z.array(z.string()),
  /** What the figures assume, in plain words. */
  notes: z.array(z.string()),
});
export type DayCapacity = z.infer<typeof DayCapacity>;
