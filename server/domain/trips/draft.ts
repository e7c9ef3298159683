/**
 * A plan in the planner's own terms, before times and manifests are written out. Each used
 * craft has a crew: its skipper (aboard every run) and its passengers, who ride out on run 1
 * and come back with the craft at the close. `pots[c][k − 1]` is how many pots run k of craft c
 * carries (the number of entries is the number of runs) and `mix[c][k − 1]` how many of each
 * pot class (`pot-classes.ts`); the two always agree.
 */
import { potRoom, runTiming, SHARE_STEPS, type TripContext } from './context.js';
import { mixKg } from './pot-classes.js';
import type { PotDrop } from './planting.js';
import type { TripRun } from './types.js';

export interface Crew {
  skipper: number;
  passengers: number[];
}

export interface Draft {
  /** By craft index; null when the craft stays ashore. */
  crews: (Crew | null)[];
  /** By craft index: pots per run. */
  pots: number[][];
  /** By craft index and run: pots per class, lightest class first. */
  mix: number[][][];
}

/** The lexicographic objective, best first: pots, people, last landing, runs, peak load share. */
export interface DraftScore {
  pots: number;
  people: number;
  lastLandingAt: number | null;
  runs: number;
  maxShare: number;
}

export const emptyDraft = (ctx: TripContext): Draft => ({ crews: ctx.crafts.map(() => null), pots: ctx.crafts.map(() => []), mix: ctx.crafts.map(() => []) });

/** No pots of any class. */
export const noPots = (ctx: TripContext) => ctx.potClasses.map(() => 0);

/** Kilograms of pots on run k (1-based) of craft c, at their classes' masses. */
export const runPotKg = (ctx: TripContext, draft: Draft, c: number, k: number) => mixKg(ctx.potClasses, draft.mix[c]?.[k - 1]);

/** Kilograms of people aboard run k (1-based) of craft c. */
export function crewKg(ctx: TripContext, crew: Crew, k: number): number {
  const skipper = ctx.people[crew.skipper]?.weightKg ?? 0;
  if (k > 1) return skipper;
  return crew.passengers.reduce((kg, p) => kg + (ctx.people[p]?.weightKg ?? 0), skipper);
}

/** Pots run k of craft c could carry beside its crew (of the lightest class: an upper bound). */
export function runRoom(ctx: TripContext, draft: Draft, c: number, k: number): number {
  const crew = draft.crews[c];
  const info = ctx.crafts[c];
  return crew && info ? potRoom(ctx, info, crewKg(ctx, crew, k)) : 0;
}

/** When each person who rode out is at the site (ms). */
export function draftArrivals(ctx: TripContext, draft: Draft): number[] {
  const out: number[] = [];
  draft.crews.forEach((crew, c) => {
    const info = ctx.crafts[c];
    if (!crew || !info) return;
    const runs = Math.max(1, draft.pots[c]?.length ?? 0);
    out.push(runTiming(ctx, info, runs, true).readyAt);
    for (let i = 0; i < crew.passengers.length; i++) out.push(runTiming(ctx, info, 1, false).readyAt);
  });
  return out;
}

/** Pots unloaded per run. */
export function draftDrops(ctx: TripContext, draft: Draft): PotDrop[] {
  const out: PotDrop[] = [];
  draft.pots.forEach((runs, c) => {
    const info = ctx.crafts[c];
    if (info) runs.forEach((pots, i) => out.push({ readyAt: runTiming(ctx, info, i + 1, false).readyAt, pots }));
  });
  return out;
}

/** The runs of a draft, in departure order, with manifests and loads. */
export function draftRuns(ctx: TripContext, draft: Draft): TripRun[] {
  const runs: { run: TripRun; c: number }[] = [];
  draft.crews.forEach((crew, c) => {
    const info = ctx.crafts[c];
    if (!crew || !info) return;
    const count = Math.max(1, draft.pots[c]?.length ?? 0);
    for (let k = 1; k <= count; k++) {
      const t = runTiming(ctx, info, k, k === count);
      const ids = (k === 1 ? [crew.skipper, ...crew.passengers] : [crew.skipper]).map((p) => ctx.people[p]?.person.id ?? '');
      const pots = draft.pots[c]?.[k - 1] ?? 0;
      const loadKg = crewKg(ctx, crew, k) + runPotKg(ctx, draft, c, k);
      const loadShare = info.craft.maxLoadKg > 0 ? loadKg / info.craft.maxLoadKg : 1;
      runs.push({ c, run: { craftId: info.craft.id, run: k, departAt: t.departAt, landAt: t.landAt, returnAt: t.returnAt, people: ids, pots, loadKg, loadShare } });
    }
  });
  runs.sort((a, b) => a.run.departAt - b.run.departAt || a.c - b.c || a.run.run - b.run.run);
  return runs.map((r) => r.run);
}

/** The objective tiers of a draft. */
export function draftScore(ctx: TripContext, draft: Draft): DraftScore {
  const runs = draftRuns(ctx, draft);
  const potRuns = runs.filter((r) => r.pots > 0);
  return {
    pots: potRuns.reduce((n, r) => n + r.pots, 0),
    people: new Set(runs.flatMap((r) => r.people)).size,
    lastLandingAt: potRuns.length ? Math.max(...potRuns.map((r) => r.landAt)) : null,
    runs: runs.length,
    maxShare: runs.reduce((m, r) => Math.max(m, r.loadShare), 0),
  };
}

/** A load share in whole steps of 5 %, rounded up. */
export const shareSteps = (share: number) => Math.ceil(share * SHARE_STEPS - 1e-9);

/** Negative when `a` is the better plan under the lexicographic objective. */
export function compareScores(a: DraftScore, b: DraftScore): number {
  if (a.pots !== b.pots) return b.pots - a.pots;
  if (a.people !== b.people) return b.people - a.people;
  const la = a.lastLandingAt ?? -Infinity;
  const lb = b.lastLandingAt ?? -Infinity;
  if (la !== lb) return la < lb ? -1 : 1;
  if (a.runs !== b.runs) return a.runs - b.runs;
  return shareSteps(a.maxShare) - shareSteps(b.maxShare);
}
