/**
 * The fast greedy planner: always available, deterministic, and the MILP's starting point and
 * fallback. Crews first (`heuristic-crew.ts`), then pots earliest-first under the planting
 * deadline (`heuristic-pots.ts`), then fewer runs and even loads (`heuristic-polish.ts`).
 */
import { buildContext, type TripContext } from './context.js';
import { compareScores, draftScore, type Draft } from './draft.js';
import { assignCrews, type CraftOrder } from './heuristic-crew.js';
import { dropIdleCraft, levelLoads } from './heuristic-polish.js';
import { fewerRuns, settlePots, tuneRuns } from './heuristic-pots.js';
import { packCrews } from './heuristic-search.js';
import { assemblePlan } from './plan.js';
import type { TripInstance, TripOptions, TripPlan } from './types.js';

/** Crews from each craft order, packed and quickly filled; the best start goes on. */
function bestStart(ctx: TripContext): Draft {
  const orders: CraftOrder[] = ['owned-first', 'seats-first', 'volume-first'];
  const starts = orders.map((order) => settlePots(ctx, packCrews(ctx, assignCrews(ctx, order))));
  return starts.reduce((best, d) => (compareScores(draftScore(ctx, d), draftScore(ctx, best)) < 0 ? d : best));
}

/** The heuristic's draft for a prepared context. */
export function heuristicDraft(ctx: TripContext): Draft {
  const settled = fewerRuns(ctx, tuneRuns(ctx, bestStart(ctx)));
  return levelLoads(ctx, dropIdleCraft(ctx, settled));
}

/**
 * A valid trip plan from the greedy heuristic alone (never proven optimal).
 * @example heuristicTripPlan(instance).runs[0] // { craftId: 'skiff-1', run: 1, people: […], pots: 8, … }
 */
export function heuristicTripPlan(instance: TripInstance, options: TripOptions = {}): TripPlan {
  const ctx = buildContext(instance, options);
  return assemblePlan(ctx, heuristicDraft(ctx), { solver: 'heuristic', proven: false, warnings: [] });
}
