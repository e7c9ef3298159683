/** Writes a draft out as a trip plan: runs with times and manifests, and what stays ashore. */
import type { TripContext } from './context.js';
import { crewKg, draftRuns, type Draft } from './draft.js';
import { exactPotMasses } from './pot-classes.js';
import { idleCraft } from './reasons-craft.js';
import { unplacedPeople, unplacedPots } from './reasons.js';
import type { TripPlan, TripRun } from './types.js';

export interface PlanMeta {
  solver: TripPlan['solver'];
  proven: boolean;
  gap?: number;
  potsUpperBound?: number;
  warnings: string[];
}

/**
 * With per-pot masses, each run's real pots (in departure order, heaviest of each class first)
 * and its load with them: never more than the planner counted, since each pot counted at the
 * heaviest of its class.
 */
function withRealPots(ctx: TripContext, draft: Draft, runs: TripRun[]): TripRun[] {
  if (!ctx.perPotMasses) return runs;
  const at = runs.map((r) => ({ c: ctx.craftById.get(r.craftId)?.index ?? -1, k: r.run }));
  const masses = exactPotMasses(ctx.potClasses, at.map(({ c, k }) => draft.mix[c]?.[k - 1] ?? []));
  return runs.map((r, i) => {
    const { c, k } = at[i] ?? { c: -1, k: 0 };
    const potMassesKg = masses[i] ?? [];
    const crew = draft.crews[c];
    const loadKg = (crew ? crewKg(ctx, crew, k) : 0) + potMassesKg.reduce((kg, m) => kg + m, 0);
    const rated = ctx.crafts[c]?.craft.maxLoadKg ?? 0;
    return { ...r, potMassesKg, loadKg, loadShare: rated > 0 ? loadKg / rated : 1 };
  });
}

/** The trip plan of a draft. Status is `infeasible` when not one pot or person moves. */
export function assemblePlan(ctx: TripContext, draft: Draft, meta: PlanMeta): TripPlan {
  const runs = withRealPots(ctx, draft, draftRuns(ctx, draft));
  const potRuns = runs.filter((r) => r.pots > 0);
  const idle = idleCraft(ctx, draft);
  const potReasons = unplacedPots(ctx, draft, idle);
  const plan: TripPlan = {
    status: runs.length === 0 ? 'infeasible' : meta.proven ? 'optimal' : 'feasible',
    runs,
    lastLandingAt: potRuns.length ? Math.max(...potRuns.map((r) => r.landAt)) : null,
    unplaced: { pots: potReasons.reduce((n, p) => n + p.count, 0), potReasons, people: unplacedPeople(ctx, draft, idle) },
    idleCraft: idle,
    solver: meta.solver,
    warnings: meta.warnings,
  };
  if (meta.gap !== undefined) plan.gap = meta.gap;
  if (meta.potsUpperBound !== undefined) plan.potsUpperBound = meta.potsUpperBound;
  return plan;
}
