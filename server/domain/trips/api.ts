/**
 * The API's edge of the planner: instants are ISO 8601 strings there and epoch milliseconds
 * inside the domain. Parsing assumes strings the route's schema already checked.
 */
import type { IdleCraft, ReasonRefs, TripInstance, TripPlan, TripRun, UnplacedPerson, UnplacedPots } from './types.js';

export type TripInstanceJson = Omit<TripInstance, 'window'> & { window: { start: string; end: string } };

export type TripRunJson = Omit<TripRun, 'departAt' | 'landAt' | 'returnAt'> & { departAt: string; landAt: string; returnAt: string };

/** A reason's references with the instant as an ISO string. */
export type ReasonRefsJson = Omit<ReasonRefs, 'at'> & { at?: string };
type WithRefsJson<T> = Omit<T, 'refs'> & { refs?: ReasonRefsJson };

export type TripPlanJson = Omit<TripPlan, 'runs' | 'lastLandingAt' | 'unplaced' | 'idleCraft'> & {
  runs: TripRunJson[];
  lastLandingAt: string | null;
  unplaced: { pots: number; potReasons: WithRefsJson<UnplacedPots>[]; people: WithRefsJson<UnplacedPerson>[] };
  idleCraft: WithRefsJson<IdleCraft>[];
};

const iso = (ms: number) => new Date(ms).toISOString();

/** An API instance with epoch-ms times. */
export function instanceFromJson(json: TripInstanceJson): TripInstance {
  return { ...json, window: { start: Date.parse(json.window.start), end: Date.parse(json.window.end) } };
}

/** A run with ISO times. */
export const runToJson = (r: TripRun): TripRunJson => ({ ...r, departAt: iso(r.departAt), landAt: iso(r.landAt), returnAt: iso(r.returnAt) });

/** A run from the API (for example a coordinator's edit) with epoch-ms times. */
export const runFromJson = (r: TripRunJson): TripRun => ({ ...r, departAt: Date.parse(r.departAt), landAt: Date.parse(r.landAt), returnAt: Date.parse(r.returnAt) });

/** A plan with ISO times, as the API sends it. */
export function planToJson(plan: TripPlan): TripPlanJson {
  const { unplaced } = plan;
  return {
    ...plan,
    runs: plan.runs.map(runToJson),
    lastLandingAt: plan.lastLandingAt === null ? null : iso(plan.lastLandingAt),
    unplaced: { ...unplaced, potReasons: unplaced.potReasons.map(refsToJson), people: unplaced.people.map(refsToJson) },
    idleCraft: plan.idleCraft.map(refsToJson),
  };
}

function refsToJson<T extends { refs?: ReasonRefs }>(item: T): WithRefsJson<T> {
  const { refs, ...rest } = item;
  if (!refs) return rest;
  const { at, ...ids } = refs;
  return { ...rest, refs: { ...ids, ...(at === undefined ? {} : { at: iso(at) }) } };
}
