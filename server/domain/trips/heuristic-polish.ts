/**
 * Last touches of the heuristic, each keeping the higher objective tiers: send home the crafts
 * that carry no pots when their crew fits elsewhere (fewer runs), then move single pots off the
 * most loaded runs (balance).
 */
import type { TripContext } from './context.js';
import { compareScores, crewKg, draftArrivals, draftDrops, draftRuns, draftScore, runPotKg, type Draft } from './draft.js';
import { plantingShortfalls } from './planting.js';
import type { TripRun } from './types.js';

const copy = (d: Draft): Draft => ({
  crews: d.crews.map((crew) => (crew ? { skipper: crew.skipper, passengers: [...crew.passengers] } : null)),
  pots: d.pots.map((row) => [...row]),
  mix: d.mix.map((row) => row.map((m) => [...m])),
});

const plantable = (ctx: TripContext, d: Draft) => plantingShortfalls(ctx, draftArrivals(ctx, d), draftDrops(ctx, d)).length === 0;

/** Moves a pot-less craft's crew into free seats of other crafts' first runs, without costing pots. */
function rehome(ctx: TripContext, d: Draft, idle: number): Draft | null {
  const next = copy(d);
  const crew = next.crews[idle];
  if (!crew) return null;
  next.crews[idle] = null;
  next.pots[idle] = [];
  next.mix[idle] = [];
  for (const p of [crew.skipper, ...crew.passengers]) {
    const kgP = ctx.people[p]?.weightKg ?? 0;
    const home = next.crews.findIndex((other, c) => {
      const info = ctx.crafts[c];
      if (!other || !info || other.passengers.length + 2 > info.craft.seats) return false;
      return crewKg(ctx, other, 1) + kgP + runPotKg(ctx, next, c, 1) <= info.capKg + 1e-9;
    });
    const target = next.crews[home];
    if (!target) return null;
    target.passengers.push(p);
  }
  return next;
}

/** Sends home crafts with no pots aboard when their whole crew fits elsewhere. */
export function dropIdleCraft(ctx: TripContext, draft: Draft): Draft {
  let best = draft;
  for (let c = draft.crews.length - 1; c >= 0; c--) {
    if (!best.crews[c] || (best.pots[c] ?? []).some((n) => n > 0)) continue;
    const next = rehome(ctx, best, c);
    if (next && plantable(ctx, next) && compareScores(draftScore(ctx, next), draftScore(ctx, best)) < 0) best = next;
  }
  return best;
}

const spread = (ctx: TripContext, d: Draft) => draftRuns(ctx, d).reduce((s, r) => s + r.loadShare * r.loadShare, 0);

/** The draft with one pot moved from one run to another: the heaviest class that fits there. */
function movePot(ctx: TripContext, draft: Draft, from: TripRun, to: TripRun): Draft | null {
  const src = ctx.craftById.get(from.craftId)?.index;
  const dst = ctx.craftById.get(to.craftId)?.index;
  const info = dst === undefined ? undefined : ctx.crafts[dst];
  const crew = dst === undefined ? undefined : draft.crews[dst];
  if (src === undefined || dst === undefined || !info || !crew || to.pots >= info.craft.potSlots) return null;
  const spare = info.capKg - crewKg(ctx, crew, to.run) - runPotKg(ctx, draft, dst, to.run);
  const fromMix = draft.mix[src]?.[from.run - 1] ?? [];
  let j = ctx.potClasses.length - 1;
  while (j >= 0 && !((fromMix[j] ?? 0) > 0 && (ctx.potClasses[j]?.massKg ?? Infinity) <= spare + 1e-9)) j--;
  if (j < 0) return null;
  const next = copy(draft);
  const out = next.mix[src]?.[from.run - 1];
  const into = next.mix[dst]?.[to.run - 1];
  const fromRow = next.pots[src];
  const toRow = next.pots[dst];
  if (!out || !into || !fromRow || !toRow) return null;
  out[j] = (out[j] ?? 0) - 1;
  into[j] = (into[j] ?? 0) + 1;
  fromRow[from.run - 1] = (fromRow[from.run - 1] ?? 0) - 1;
  toRow[to.run - 1] = (toRow[to.run - 1] ?? 0) + 1;
  return next;
}

/** Moves one pot at a time from the most loaded run to a lighter one while the loads even out. */
export function levelLoads(ctx: TripContext, draft: Draft): Draft {
  let best = draft;
  for (let step = 0; step < 4 * ctx.instance.pots.count + 10; step++) {
    const runs = draftRuns(ctx, best);
    const score = draftScore(ctx, best);
    const from = [...runs].sort((a, b) => b.loadShare - a.loadShare)[0];
    // A later run stays only while it carries a pot; run 1 carries the crew anyway.
    if (!from || from.pots < (from.run > 1 ? 2 : 1)) break;
    const before = spread(ctx, best);
    const moved = runs
      .filter((r) => r.loadShare < from.loadShare - 1e-9 && (score.lastLandingAt === null || r.landAt <= score.lastLandingAt))
      .sort((a, b) => a.loadShare - b.loadShare)
      .map((to) => movePot(ctx, best, from, to))
      .find((next) => next && plantable(ctx, next) && compareScores(draftScore(ctx, next), score) <= 0 && spread(ctx, next) < before - 1e-12);
    if (!moved) break;
    best = moved;
  }
  return best;
}
