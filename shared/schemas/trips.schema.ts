import { z } from 'zod';
import { CraftKind } from './crew.schema.js';

/**
 * The fleet (craft of the organisation) and trip plans: the solver's self-contained instance,
 * a workday's build options and a coordinator's edited runs. Instants are ISO 8601 strings.
 */
const positive = (max: number, unit: string) =>
  z.number({ message: 'must be a number' }).positive({ message: 'must be more than 0' }).max(max, { message: `must be at most ${max} ${unit}` });
const count = (min: number, max: number) =>
  z.number({ message: 'must be a number' }).int({ message: 'must be a whole number' }).min(min, { message: `must be at least ${min}` }).max(max, { message: `must be at most ${max}` });

/** Every field of a craft, without defaults (`.partial()` of defaults would fill them in, zod 4). */
export const CraftFields = z.object({
  name: z.string().trim().min(1, { message: 'is required' }).max(80),
  kind: CraftKind,
  seats: count(1, 50),
  /** Maker's rating or capacity plate, kg. */
  maxLoadKg: positive(20_000, 'kg'),
  hasCapacityPlate: z.boolean(),
  potSlots: count(0, 500),
  draftM: z.number().min(0).max(5, { message: 'must be at most 5 m' }).nullable(),
  speedKmh: positive(100, 'km/h'),
  needsOperator: z.boolean(),
  active: z.boolean(),
  notes: z.string().trim().max(2000),
});

export const CreateCraftBody = CraftFields.extend({
  hasCapacityPlate: z.boolean().default(false),
  potSlots: count(0, 500).default(0),
  draftM: CraftFields.shape.draftM.default(null),
  needsOperator: z.boolean().default(false),
  active: z.boolean().default(true),
  notes: CraftFields.shape.notes.default(''),
}).strict();
export type CreateCraftBody = z.infer<typeof CreateCraftBody>;

export const UpdateCraftBody = CraftFields.partial().strict();
export type UpdateCraftBody = z.infer<typeof UpdateCraftBody>;

export const CraftIdParams = z.object({ id: z.uuid({ message: 'must be a craft id' }) });

export const Craft = CraftFields.extend({ id: z.uuid(), createdAt: z.string(), updatedAt: z.string() });
export type Craft = z.infer<typeof Craft>;

export const RuleOfThumbQuery = z.object({
  lengthFt: z.coerce.number({ message: 'must be a number' }).positive({ message: 'must be more than 0' }).max(100),
  beamFt: z.coerce.number({ message: 'must be a number' }).positive({ message: 'must be more than 0' }).max(40),
});
export type RuleOfThumbQuery = z.infer<typeof RuleOfThumbQuery>;

export const RuleOfThumb = z.object({ persons: z.number().int(), note: z.string() });
export type RuleOfThumb = z.infer<typeof RuleOfThumb>;

export const Instant = z.iso.datetime({ offset: true, message: 'must be an ISO 8601 date-time' });
const Id = z.string().trim().min(1, { message: 'is required' }).max(100);

export const TripRoute = z.object({
  distanceKm: z.number({ message: 'must be a number' }).min(0).max(100, { message: 'must be at most 100 km' }),
  loadMinutes: z.number({ message: 'must be a number' }).min(0).max(240),
  unloadMinutes: z.number({ message: 'must be a number' }).min(0).max(240),
});
export type TripRoute = z.infer<typeof TripRoute>;

export const TripCraftInput = z.object({
  id: Id,
  kind: CraftKind,
  seats: count(1, 50),
  maxLoadKg: positive(20_000, 'kg'),
  potSlots: count(0, 500),
  speedKmh: positive(100, 'km/h'),
  draftM: z.number().min(0).max(5).nullable().optional(),
  needsOperator: z.boolean(),
  ownerId: Id.nullable().optional(),
  /**
   * Whether `maxLoadKg` is a capacity plate (the plated margin applies) or the maker's figure
   * (the paddlecraft margin). Left out, skiffs and operator-run craft count as plated.
   */
  plated: z.boolean().nullable().optional(),
});

export const TripPersonInput = z.object({
  id: Id,
  weightKg: z.number().min(10).max(400).nullable().optional(),
  skills: z.array(z.string().trim().min(1).max(40)).max(20),
  guardianId: Id.nullable().optional(),
});

export const uniqueIds = (items: readonly { id: string }[]) => new Set(items.map((i) => i.id)).size === items.length;

export const LoadMarginInput = z.object({
  paddlecraft: z.number().positive({ message: 'must be more than 0' }).max(1, { message: 'must be at most 1' }),
  plated: z.number().positive({ message: 'must be more than 0' }).max(1, { message: 'must be at most 1' }),
});

export const PotMass = positive(500, 'kg');
export const Minutes = z.number({ message: 'must be a number' }).min(0).max(600);
export const StandardPersonKg = z.number({ message: 'must be a number' }).min(40, { message: 'must be at least 40 kg' }).max(200, { message: 'must be at most 200 kg' });

/**
 * The pots to take out: `count` pots of `massKg` each, except that `masses` may list the
 * recorded mass of individual pots (at most `count`; e.g. each reserved tree's filled pot). The
 * planner groups masses into a few classes and counts each pot at the heaviest of its class, so
 * no run is loaded past its margin; each run then lists its pots' masses (`potMassesKg`).
 */
export const TripPotsInput = z
  .object({ count: count(0, 2000), massKg: PotMass, masses: z.array(PotMass).max(2000).optional() })
  .refine((p) => (p.masses?.length ?? 0) <= p.count, { message: 'lists more pot masses than pots', path: ['masses'] });

/** A self-contained instance for `POST /api/trip-plans/solve`. */
export const TripInstanceBody = z
  .object({
    window: z.object({ start: Instant, end: Instant }),
    route: TripRoute,
    /** Minutes one pair of planters needs per tree; 0 means planting is not limited. */
    plantingMinutesPerTree: Minutes,
    loadMargin: LoadMarginInput.optional(),
    /** Weight counted for a person who gave none; default 84 kg. */
    standardPersonKg: StandardPersonKg.optional(),
    craft: z.array(TripCraftInput).max(60, { message: 'at most 60 craft' }).refine(uniqueIds, { message: 'craft ids must be unique' }),
    people: z.array(TripPersonInput).max(400, { message: 'at most 400 people' }).refine(uniqueIds, { message: 'person ids must be unique' }),
    pots: TripPotsInput,
  })
  .refine((b) => Date.parse(b.window.end) > Date.parse(b.window.start), { message: 'must be after the start', path: ['window', 'end'] });
export type TripInstanceBody = z.infer<typeof TripInstanceBody>;

/**
 * `POST /api/workdays/:id/trip-plan`: anything left out comes from the site and the
 * organisation's trip settings. `potMassKg` is the mass of a pot whose tree has none recorded.
 */
export const BuildTripPlanBody = z
  .object({
    route: TripRoute.optional(),
    plantingMinutesPerTree: Minutes.optional(),
    potMassKg: PotMass.optional(),
  })
  .strict();
export type BuildTripPlanBody = z.infer<typeof BuildTripPlanBody>;

export const TripRunInput = z.object({
  craftId: Id,
  run: count(1, 1000),
  departAt: Instant,
  landAt: Instant,
  returnAt: Instant,
  people: z.array(Id).max(100),
  pots: count(0, 2000),
  /** The mass of each pot aboard; left out (or not one per pot), the server hands out the ready pots. */
  potMassesKg: z.array(PotMass).max(500).optional(),
  /** Informational: recomputed from the manifest when saved. */
  loadKg: z.number().optional(),
  loadShare: z.number().optional(),
});
export type TripRunInput = z.infer<typeof TripRunInput>;

/** `PUT /api/workdays/:id/trip-plan`: the coordinator's edited runs. */
export const EditTripPlanBody = z.object({ runs: z.array(TripRunInput).max(5000) }).strict();
export type EditTripPlanBody = z.infer<typeof EditTripPlanBody>;

export const WorkdayIdParams = z.object({ id: z.uuid({ message: 'must be a workday id' }) });

/**
 * One rule a refused `PUT /api/workdays/:id/trip-plan` breaks, in `error.violations` of its 400
 * (beside `error.fields`, see `TripPlanRefusal`). `rule` is one of: unknown-craft, unknown-person,
 * run-order, timing, seats, load, pot-slots, pots-total, skipper (nobody aboard every run),
 * operator, own-kayak, paddler, travels-once, guardian, return (the ride back at the close),
 * window (unloaded after it closes), planting-time. `craftId` and `run` say where it is (a
 * craft-wide rule has no run; a plan-wide one neither); `personIds` whom it is about (a minor,
 * then their guardian). `facts` holds its figures: masses in kg, instants as ISO strings.
 * `message` is for people: craft and people by name, masses in the organisation's unit (lb
 * where it works in feet, kg in metres), times on its zone's clock.
 */
export const TripViolationDto = z.object({
  rule: z.string(),
  craftId: z.string().optional(),
  run: z.number().int().optional(),
  personIds: z.array(z.string()).optional(),
  facts: z.record(z.string(), z.union([z.number(), z.string(), z.array(z.union([z.number(), z.string()]))])).optional(),
  message: z.string(),
});
export type TripViolationDto = z.infer<typeof TripViolationDto>;

/**
 * The 400 of a refused edit. `fields.runs` lists every message (as before); each message is also
 * under the body path it concerns, so a client can place it without reading the text:
 * `runs.<i>` for the i-th run sent, `runs.<i>.craftId` for a craft-wide rule (its first run sent),
 * `_` for the whole plan.
 */
export const TripPlanRefusal = z.object({
  error: z.object({
    code: z.literal('validation_failed'),
    message: z.string(),
    fields: z.record(z.string(), z.array(z.string())),
    violations: z.array(TripViolationDto),
  }),
});
export type TripPlanRefusal = z.infer<typeof TripPlanRefusal>;
