/**
 * Runs the trip MILP in HiGHS (WebAssembly, from the `highs` package). Loading the Wasm is
 * asynchronous and happens once (`initTripSolver`); solving is synchronous. The package's own
 * Wasm load is the only I/O. highs-js has been seen to crash or hang on some large models, so:
 * HiGHS's `time_limit`, a MIP interrupt callback on HiGHS's own clock as a second stop, every
 * native error caught (the runtime is then reloaded on the next call), and the caller falls back
 * to the heuristic whenever no valid solution comes back.
 */
import loadHighs, { type Highs } from 'highs';
import { canSkipper, type TripContext } from './context.js';
import { draftScore, type Draft } from './draft.js';
import { buildMilp } from './milp-model.js';
import { decode, startVector } from './milp-start.js';

let loading: Promise<Highs> | null = null;

/** Loads the HiGHS runtime once; later calls share it. Rejects if the Wasm cannot load. */
export function initTripSolver(): Promise<Highs> {
  loading ??= loadHighs().catch((error: unknown) => {
    loading = null;
    throw error;
  });
  return loading;
}

export interface MilpOutcome {
  draft: Draft | null;
  proven: boolean;
  gap?: number;
  potsUpperBound?: number;
  warning?: string;
}

const num = (v: number | bigint) => Number(v);

/**
 * When the start already lands every pot and takes as many people as there are seats (or
 * people), no better plan can land later: runs after its last landing can be left out.
 */
function horizonOf(ctx: TripContext, start: Draft): number {
  const score = draftScore(ctx, start);
  const seats = ctx.crafts.reduce((n, c) => n + (c.maxRuns >= 1 && ctx.people.some((p) => canSkipper(p, c)) ? Math.max(0, c.craft.seats) : 0), 0);
  const allPots = score.pots >= Math.floor(ctx.instance.pots.count);
  const allPeople = score.people >= Math.min(ctx.people.length, seats);
  return allPots && allPeople && score.lastLandingAt !== null ? score.lastLandingAt : Infinity;
}

/** Solves the MILP from a warm start; never throws (native failures become a warning). */
export function runMilp(highs: Highs, ctx: TripContext, start: Draft, timeLimitSeconds: number): MilpOutcome {
  const { model, index } = buildMilp(ctx, horizonOf(ctx, start));
  if (index.crafts.length === 0) return { draft: null, proven: false };
  let handle: ReturnType<Highs['createModel']> | null = null;
  try {
    handle = highs.createModel({ ...model, sense: highs.constants.objectiveSense.minimize });
    handle.options.set({ output_flag: false, time_limit: timeLimitSeconds, mip_rel_gap: 0, mip_abs_gap: 0.5, random_seed: 0 });
    const warm = startVector(ctx, index, model.numCols, start);
    if (warm) handle.setSolution({ colValue: warm });
    const hardStop = timeLimitSeconds * 1.5 + 0.5;
    const run = handle.run({
      [highs.constants.callbackType.mipInterrupt](event) {
        if ((event.data.running_time ?? 0) > hardStop) event.interrupt();
      },
    });
    const feasible = num(handle.info.get('primal_solution_status')) === highs.constants.solutionStatus.feasible;
    if (!feasible) return { draft: null, proven: false, warning: `HiGHS found no solution (model status ${run.modelStatus})` };
    const proven = run.modelStatus === highs.constants.modelStatus.optimal;
    const dual = num(handle.info.get('mip_dual_bound'));
    const offset = index.weights.people * ctx.people.length;
    const bound = Math.ceil(1 - (dual + offset) / index.weights.pots - 1e-9) - 1;
    const potsUpperBound = Math.max(0, Math.min(Math.floor(ctx.instance.pots.count), Number.isFinite(bound) ? bound : Infinity));
    return { draft: decode(ctx, index, handle.getSolution().colValue), proven, gap: proven ? 0 : num(handle.info.get('mip_gap')), potsUpperBound };
  } catch (error) {
    loading = null;
    return { draft: null, proven: false, warning: `HiGHS failed: ${error instanceof Error ? error.message : String(error)}` };
  } finally {
    try {
      handle?.dispose();
    } catch {
      loading = null;
    }
  }
}
