/**
 * `solveTripPlan`: the heuristic plan, improved and if possible proven optimal by HiGHS within
 * the time limit. Any failure of the solver returns the heuristic plan, marked as such.
 */
import { buildContext, DEFAULT_TIME_LIMIT_SECONDS } from './context.js';
import { compareScores, draftScore } from './draft.js';
import { heuristicDraft } from './heuristic.js';
import { initTripSolver, runMilp, type MilpOutcome } from './milp-solve.js';
import { assemblePlan } from './plan.js';
import type { TripInstance, TripOptions, TripPlan } from './types.js';
import { validateTripPlan } from './validate.js';

async function milp(ctx: Parameters<typeof runMilp>[1], start: Parameters<typeof runMilp>[2], seconds: number): Promise<MilpOutcome> {
  try {
    return runMilp(await initTripSolver(), ctx, start, seconds);
  } catch (error) {
    return { draft: null, proven: false, warning: `HiGHS could not load: ${error instanceof Error ? error.message : String(error)}` };
  }
}

/**
 * Plans the runs of a workday: the best plan found, `status: 'optimal'` only when HiGHS proved
 * it for the whole lexicographic objective. Blocks the thread while HiGHS runs (up to about the
 * time limit); call it off the request path or in a worker for large fleets.
 * @example const plan = await solveTripPlan(instance, { timeLimitSeconds: 1.5 });
 */
export async function solveTripPlan(instance: TripInstance, options: TripOptions = {}): Promise<TripPlan> {
  const ctx = buildContext(instance, options);
  const start = heuristicDraft(ctx);
  const fallback = (warnings: string[]) => assemblePlan(ctx, start, { solver: 'heuristic', proven: false, warnings });
  const seconds = options.timeLimitSeconds && options.timeLimitSeconds > 0 ? options.timeLimitSeconds : DEFAULT_TIME_LIMIT_SECONDS;
  const out = await milp(ctx, start, seconds);
  if (!out.draft) return fallback(out.warning ? [out.warning] : []);
  const meta = { solver: 'highs' as const, proven: out.proven, gap: out.gap, potsUpperBound: out.potsUpperBound, warnings: [] };
  const plan = assemblePlan(ctx, out.draft, meta);
  const violations = validateTripPlan(instance, plan, options);
  if (violations.length) return fallback([`the solver's plan broke a rule (${violations[0]?.message}); showing the heuristic plan`]);
  if (compareScores(draftScore(ctx, out.draft), draftScore(ctx, start)) > 0) {
    return assemblePlan(ctx, start, { ...meta, solver: 'heuristic', proven: false, warnings: ['HiGHS stopped before matching the heuristic plan'] });
  }
  return plan;
}
