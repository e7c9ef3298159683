/** Writes a draft out as a trip plan: runs with times and manifests, and what stays ashore. */
import type { TripContext } from './context.js';
import { draftRuns, type Draft } from './draft.js';
import { idleCraft } from './reasons-craft.js';
import { unplacedPeople, unplacedPots } from './reasons.js';
import type { TripPlan } from './types.js';

export interface PlanMeta {
  solver: TripPlan['solver'];
  proven: boolean;
  gap?: number;
  potsUpperBound?: number;
  warnings: string[];
}

/** The trip plan of a draft. Status is `infeasible` when not one pot or person moves. */
export function assemblePlan(ctx: TripContext, draft: Draft, meta: PlanMeta): TripPlan {
  const runs = draftRuns(ctx, draft);
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
