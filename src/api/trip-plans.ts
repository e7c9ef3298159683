import { z } from 'zod';
import { CraftKind } from '@shared/schemas/crew.schema';
import { TripViolationDto, type BuildTripPlanBody, type TripRunInput } from '@shared/schemas/trips.schema';
import { ApiError, get, post, put } from './http';

/*
 * The stored trip plan as the server sends it. The planner's own types live on the server, so
 * the client checks the parts it shows; unknown keys are dropped, so the server may add fields.
 */
const Instant = z.string();

export const TripRunDto = z.object({
  craftId: z.string(),
  run: z.number().int(),
  departAt: Instant,
  landAt: Instant,
  returnAt: Instant,
  people: z.array(z.string()),
  pots: z.number().int(),
  loadKg: z.number(),
  /** Load as a share of the rated maximum, not of the margin. */
  loadShare: z.number(),
});
export type TripRunDto = z.infer<typeof TripRunDto>;

/** `refs` name the craft, people and instant a reason is about, so screens can word it themselves. */
const Reasoned = {
  reason: z.string(),
  detail: z.string(),
  refs: z.object({ craftIds: z.array(z.string()).optional(), personIds: z.array(z.string()).optional(), at: Instant.optional() }).optional(),
};

export const TripPlanDto = z.object({
  status: z.enum(['optimal', 'feasible', 'infeasible']),
  runs: z.array(TripRunDto),
  lastLandingAt: Instant.nullable(),
  unplaced: z.object({
    pots: z.number().int(),
    potReasons: z.array(z.object({ count: z.number().int(), ...Reasoned })).default([]),
    people: z.array(z.object({ id: z.string(), ...Reasoned })),
  }),
  idleCraft: z.array(z.object({ craftId: z.string(), ...Reasoned })).default([]),
  solver: z.string(),
  gap: z.number().optional(),
  potsUpperBound: z.number().optional(),
  warnings: z.array(z.string()).default([]),
});
export type TripPlanDto = z.infer<typeof TripPlanDto>;

export const TripCraftDto = z.object({
  id: z.string(),
  kind: CraftKind,
  seats: z.number().int(),
  maxLoadKg: z.number(),
  potSlots: z.number().int(),
  speedKmh: z.number(),
  draftM: z.number().nullish(),
  needsOperator: z.boolean(),
  ownerId: z.string().nullish(),
  /** Whether the rating is a capacity plate; left out, skiffs and operator-run craft count as plated. */
  plated: z.boolean().nullish(),
});
export type TripCraftDto = z.infer<typeof TripCraftDto>;

export const TripInstanceDto = z.object({
  window: z.object({ start: Instant, end: Instant }),
  route: z.object({ distanceKm: z.number(), loadMinutes: z.number(), unloadMinutes: z.number() }),
  plantingMinutesPerTree: z.number(),
  loadMargin: z.object({ paddlecraft: z.number(), plated: z.number() }).optional(),
  craft: z.array(TripCraftDto),
  people: z.array(z.object({ id: z.string(), skills: z.array(z.string()), guardianId: z.string().nullish() })),
  pots: z.object({ count: z.number().int(), massKg: z.number() }),
});
export type TripInstanceDto = z.infer<typeof TripInstanceDto>;

export const StoredTripPlan = z.object({ instance: TripInstanceDto, plan: TripPlanDto, source: z.enum(['solver', 'edited']) });
export type StoredTripPlan = z.infer<typeof StoredTripPlan>;

function planPath(workdayId: string, file?: string): string {
  return `/api/workdays/${encodeURIComponent(workdayId)}/trip-plan${file ? `/${file}` : ''}`;
}

/** The workday's stored plan, or null while none has been built. Coordinators and admins. */
export async function fetchTripPlan(workdayId: string): Promise<StoredTripPlan | null> {
  try {
    return await get(planPath(workdayId), StoredTripPlan);
  } catch (err) {
    if (err instanceof ApiError && err.status === 404) return null;
    throw err;
  }
}

/** Builds (or rebuilds) the plan from the workday's crew, the active fleet and the reserved trees. */
export async function buildTripPlan(workdayId: string, body: BuildTripPlanBody = {}): Promise<StoredTripPlan> {
  return post(planPath(workdayId), body, StoredTripPlan);
}

/**
 * Saves hand-edited runs. The server checks them against every rule of the planner and answers
 * 400 `validation_failed`, storing nothing: each broken rule as a message under the body path it
 * concerns (`fields`) and as data in `violations` (read them with `refusalViolations`).
 */
export async function saveTripPlan(workdayId: string, runs: TripRunInput[]): Promise<StoredTripPlan> {
  return put(planPath(workdayId), { runs }, StoredTripPlan);
}

/** The broken rules of a refused edit, as data; [] for any other error. */
export function refusalViolations(err: unknown): TripViolationDto[] {
  if (!(err instanceof ApiError) || !err.violations) return [];
  const parsed = z.array(TripViolationDto).safeParse(err.violations);
  return parsed.success ? parsed.data : [];
}

/** Printable trip sheet (PDF), for a plain download link. */
export function tripSheetPath(workdayId: string): string {
  return planPath(workdayId, 'sheet.pdf');
}

/** Float plan (PDF) to leave with the shore contact, for a plain download link. */
export function floatPlanPath(workdayId: string): string {
  return planPath(workdayId, 'float-plan.pdf');
}
