/**
 * Greedy pots for the heuristic, given the crews. Earliest unloading first is optimal for the
 * number of pots under the planting deadline (its constraints are nested suffixes, see
 * `planting.ts`) and lands the last pot as early as the crews allow. A craft's skipper joins the
 * planters after its last run, so the fill is repeated with each craft cut to the runs it used
 * until that settles; then runs are dropped while pots and the last landing hold.
 */
import { runTiming, type TripContext } from './context.js';
import { compareScores, draftScore, runRoom, type Draft } from './draft.js';
import { fillPots } from './heuristic-fill.js';

export { fillPots };

/** Fill, then cut each craft to the runs it used and fill again, until nothing changes. */
function shrink(ctx: TripContext, draft: Draft, start: readonly number[]): Draft {
  let runs = [...start];
  let best = fillPots(ctx, draft, runs);
  for (let i = 0; i < 50; i++) {
    const used = best.pots.map((row) => row.length);
    if (used.every((n, c) => n === runs[c] || !draft.crews[c])) break;
    runs = used;
    const next = fillPots(ctx, draft, runs);
    if (compareScores(draftScore(ctx, next), draftScore(ctx, best)) <= 0) best = next;
  }
  return best;
}

/** Most horizons tried; beyond this the horizons are sampled evenly. */
const HORIZONS = 60;

/**
 * More runs carry more pots but keep their skippers from planting longer. Tries a common horizon
 * for every craft's last run (each distinct unloading time, sampled when there are many), settles
 * each, and keeps the best.
 */
export function settlePots(ctx: TripContext, draft: Draft): Draft {
  const used = ctx.crafts.filter((c) => draft.crews[c.index]);
  const times = [...new Set(used.flatMap((c) => Array.from({ length: c.maxRuns }, (_, k) => runTiming(ctx, c, k + 1, false).readyAt)))].sort((a, b) => a - b);
  const step = Math.max(1, Math.ceil(times.length / HORIZONS));
  const horizons = times.filter((_, i) => i % step === 0 || i === times.length - 1);
  let best = fillPots(ctx, draft, draft.pots.map((row) => row.length));
  for (const h of horizons) {
    const runs = ctx.crafts.map((c) => {
      if (!draft.crews[c.index]) return 0;
      let k = 1;
      while (k < c.maxRuns && runTiming(ctx, c, k + 1, false).readyAt <= h) k++;
      return k;
    });
    const next = shrink(ctx, draft, runs);
    if (compareScores(draftScore(ctx, next), draftScore(ctx, best)) < 0) best = next;
  }
  return best;
}

/** Run-count vectors next to `runs`: one craft's count changed, or one craft's run handed to a big craft. */
function* runMoves(ctx: TripContext, draft: Draft, runs: readonly number[]): Generator<number[]> {
  const used = ctx.crafts.filter((c) => draft.crews[c.index]);
  const with_ = (changes: [number, number][]) => runs.map((n, c) => changes.reduce((m, [i, d]) => (i === c ? m + d : m), n));
  for (const info of used) {
    for (let k = 1; k <= info.maxRuns; k++) if (k !== runs[info.index]) yield with_([[info.index, k - (runs[info.index] ?? 0)]]);
  }
  const big = [...used].sort((a, b) => runRoom(ctx, draft, b.index, 2) - runRoom(ctx, draft, a.index, 2) || a.index - b.index).slice(0, 6);
  for (const from of used) {
    for (const to of big) {
      const ok = from !== to && (runs[from.index] ?? 0) > 1 && (runs[to.index] ?? 0) < to.maxRuns;
      if (ok) yield with_([[from.index, -1], [to.index, 1]]);
    }
  }
}

/**
 * Local search on the number of runs per craft: one craft's count changed, or a run moved from
 * one craft to one of the biggest, keeping any refill that improves the objective, within a
 * budget of fills. This is what lets kayaks stop early (their paddlers plant) while skiffs go on.
 */
export function tuneRuns(ctx: TripContext, draft: Draft, budget = 600): Draft {
  let best = draft;
  let score = draftScore(ctx, best);
  let fills = 0;
  let improved = true;
  while (improved && fills < budget) {
    improved = false;
    for (const runs of runMoves(ctx, best, best.pots.map((row) => row.length))) {
      if (++fills > budget) break;
      const next = fillPots(ctx, best, runs);
      const nextScore = draftScore(ctx, next);
      if (compareScores(nextScore, score) < 0) {
        best = next;
        score = nextScore;
        improved = true;
        break;
      }
    }
  }
  return best;
}

/**
 * Fewest runs for the same last landing, greedily: every craft's first run, then the next run of
 * whichever craft carries most on it, until the pots are covered; refilled and kept if better.
 */
function biggestRunsFirst(ctx: TripContext, draft: Draft): Draft {
  const score = draftScore(ctx, draft);
  if (score.lastLandingAt === null) return draft;
  const runs: number[] = draft.crews.map((crew) => (crew ? 1 : 0));
  let left = Math.min(score.pots, Math.floor(ctx.instance.pots.count)) - runs.reduce((n, r, c) => n + (r ? runRoom(ctx, draft, c, 1) : 0), 0);
  while (left > 0) {
    let pick = -1;
    let room = 0;
    runs.forEach((n, c) => {
      const info = ctx.crafts[c];
      if (!n || !info || n >= info.maxRuns || runTiming(ctx, info, n + 1, false).landAt > (score.lastLandingAt ?? 0)) return;
      const r = runRoom(ctx, draft, c, n + 1);
      if (r > room) [pick, room] = [c, r];
    });
    if (pick < 0) break;
    runs[pick] = (runs[pick] ?? 0) + 1;
    left -= room;
  }
  const next = fillPots(ctx, draft, runs);
  return compareScores(draftScore(ctx, next), score) < 0 ? next : draft;
}

/** Drops a craft's last run whenever refilling without it keeps pots, people and the last landing. */
export function fewerRuns(ctx: TripContext, draft: Draft): Draft {
  let best = biggestRunsFirst(ctx, draft);
  let improved = true;
  while (improved) {
    improved = false;
    const score = draftScore(ctx, best);
    const order = best.pots
      .map((row, c) => ({ c, n: row.length, last: row[row.length - 1] ?? 0 }))
      .filter((x) => x.n > 1)
      .sort((a, b) => a.last - b.last || b.c - a.c);
    for (const { c } of order) {
      const runs = best.pots.map((row, i) => (i === c ? row.length - 1 : row.length));
      const next = fillPots(ctx, best, runs);
      if (compareScores(draftScore(ctx, next), score) < 0) {
        best = next;
        improved = true;
        break;
      }
    }
  }
  return best;
}
