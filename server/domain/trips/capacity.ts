/**
 * Capacity of a day: how many trees a window, a fleet and a planting rate allow, and how many
 * volunteers of each crew role that takes, to offer as the workday's per-role caps. Pure and
 * fast: it runs the greedy planner (no MILP) on stand-in people of the standard weight.
 *
 * Roles (common practice, no published source): each operator-required craft needs one
 * `operator`; each volunteer's own craft its owner (`own-kayak`); every other craft one paddler
 * (`seat`: a paddler who needs a craft); everyone else who rides out plants (`planter`), and
 * planters work in pairs; `shore` crew stay at the launch — by default 2: one to load pots for
 * the next runs, one to hold the float plan ashore (TRADE.md §2, float plan).
 */
import type { CrewRole } from '../../../shared/schemas/crew.schema.js';
import { buildContext, type TripContext } from './context.js';
import { draftArrivals, draftScore, type Draft } from './draft.js';
import { assignCrews } from './heuristic-crew.js';
import { fewerRuns, settlePots } from './heuristic-pots.js';
import { packCrews } from './heuristic-search.js';
import { heuristicDraft } from './heuristic.js';
import { plantingSlots } from './planting.js';
import type { LoadMargin, TripCraft, TripInstance, TripOptions, TripPerson } from './types.js';

export interface DayCapacityInput {
  window: { start: number; end: number };
  route: TripInstance['route'];
  craft: readonly TripCraft[];
  plantingMinutesPerTree: number;
  /** Mass of a pot with none recorded. */
  potMassKg: number;
  /** Recorded masses of the trees' pots (see `TripPots.masses`). */
  potMassesKg?: readonly number[];
  loadMargin?: LoadMargin;
  standardPersonKg?: number;
  /** Trees ready for the day; default: the recorded pots if any, else as many as the day can take. */
  treesAvailable?: number;
  /** Planters to assume; default: the number that plants the most trees (fewest on a tie). */
  planters?: number;
  /** Default 2. */
  shoreCrew?: number;
}

export interface DayCapacity {
  /** Trees the day can plant: what the runs can land and the crew can plant in time. */
  trees: number;
  /** Pots the runs could land if planting were no limit. */
  transportPots: number;
  /** Trees the crew at the site could plant if the pots were there. */
  plantingTrees: number;
  /** Volunteers needed per crew role: offer these as the workday's caps. */
  roles: Record<CrewRole, number>;
  /** Craft the day uses. */
  craftUsed: string[];
  /** Runs of the plan behind the figures. */
  runs: number;
  /** When its last pot lands (epoch ms); null when none can. */
  lastLandingAt: number | null;
}

/** One skipper per craft (owner, operator or paddler) and `planters` planters, all standard weight. */
function standIns(craft: readonly TripCraft[], planters: number): TripPerson[] {
  const skippers = craft.map((c, i): TripPerson => {
    if (c.ownerId) return { id: c.ownerId, skills: ['paddler', ...(c.needsOperator ? ['operator'] : [])] };
    return { id: `skipper-${i + 1}`, skills: [c.needsOperator ? 'operator' : 'paddler'] };
  });
  const unique = skippers.filter((p, i) => skippers.findIndex((q) => q.id === p.id) === i);
  return [...unique, ...Array.from({ length: planters }, (_, i) => ({ id: `planter-${i + 1}`, skills: [] }))];
}

function plan(input: DayCapacityInput, planters: number, options: TripOptions, thorough: boolean): { ctx: TripContext; draft: Draft } {
  const people = standIns(input.craft, planters);
  const transportMax = input.craft.reduce((n, c) => n + Math.max(0, c.potSlots) * 200, 0);
  const count = Math.min(input.treesAvailable ?? input.potMassesKg?.length ?? transportMax, transportMax);
  const masses = input.potMassesKg?.length ? { masses: input.potMassesKg } : {};
  const { window, route, craft, plantingMinutesPerTree, loadMargin, standardPersonKg } = input;
  const instance: TripInstance = { window, route, craft, plantingMinutesPerTree, loadMargin, standardPersonKg, people, pots: { count, massKg: input.potMassKg, ...masses } };
  const ctx = buildContext(instance, options);
  return { ctx, draft: thorough ? heuristicDraft(ctx) : fewerRuns(ctx, settlePots(ctx, packCrews(ctx, assignCrews(ctx)))) };
}

function roles(ctx: TripContext, draft: Draft, shore: number): { roles: Record<CrewRole, number>; craftUsed: string[] } {
  const out: Record<CrewRole, number> = { 'own-kayak': 0, seat: 0, operator: 0, shore, planter: 0 };
  const craftUsed: string[] = [];
  draft.crews.forEach((crew, c) => {
    const craft = ctx.crafts[c]?.craft;
    if (!crew || !craft) return;
    craftUsed.push(craft.id);
    out[craft.ownerId ? 'own-kayak' : craft.needsOperator ? 'operator' : 'seat'] += 1;
    out.planter += crew.passengers.length;
  });
  return { roles: out, craftUsed };
}

/**
 * Trees a day can plant and the crew it needs.
 * @example dayCapacity({ window, route, craft: fleet, plantingMinutesPerTree: 10, potMassKg: 25 })
 * // { trees: 120, transportPots: 164, plantingTrees: 190, roles: { operator: 2, seat: 10, … }, … }
 */
export function dayCapacity(input: DayCapacityInput, options: TripOptions = {}): DayCapacity {
  const best = bestPlan(input, options);
  const { ctx, draft } = best;
  const transport = buildContext({ ...ctx.instance, plantingMinutesPerTree: 0 }, options);
  const transportPots = draftScore(transport, settlePots(transport, { crews: draft.crews, pots: draft.pots, mix: draft.mix })).pots;
  const arrivals = draftArrivals(ctx, draft);
  const plantingTrees = arrivals.length ? plantingSlots(ctx, arrivals, Math.min(...arrivals)) : 0;
  const score = draftScore(ctx, draft);
  const crew = roles(ctx, draft, Math.max(0, input.shoreCrew ?? 2));
  return { trees: best.trees, transportPots, plantingTrees, ...crew, runs: score.runs, lastLandingAt: score.lastLandingAt };
}

/**
 * The planter count that plants the most trees (fewest planters on a tie): a quick plan for every
 * even count and the most that fit, then the full heuristic for the two best counts.
 */
function bestPlan(input: DayCapacityInput, options: TripOptions): { ctx: TripContext; draft: Draft; trees: number } {
  const seats = input.craft.reduce((n, c) => n + Math.max(0, c.seats - 1), 0);
  const tries = input.planters !== undefined ? [Math.max(0, Math.floor(input.planters))] : [...new Set([...Array.from({ length: Math.floor(seats / 2) + 1 }, (_, i) => 2 * i), seats])];
  const quick = tries.map((planters) => {
    const { ctx, draft } = plan(input, planters, options, false);
    return { planters, trees: draftScore(ctx, draft).pots };
  });
  quick.sort((a, b) => b.trees - a.trees || a.planters - b.planters);
  const full = quick.slice(0, 2).map(({ planters }) => {
    const { ctx, draft } = plan(input, planters, options, true);
    return { ctx, draft, trees: draftScore(ctx, draft).pots, planters };
  });
  full.sort((a, b) => b.trees - a.trees || a.planters - b.planters);
  const best = full[0];
  if (!best) throw new Error('dayCapacity: no planter count to try');
  return best;
}
