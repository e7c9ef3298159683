/**
 * Which pots ride on which run, for checking a plan's loads. A run that lists its pots' masses
 * (`potMassesKg`, one per pot) keeps them, and they must be among the ready pots. The pots of runs
 * that list none (say, a coordinator moved a count on the trip board) are handed out from what is
 * left: the lightest pots to the run with the least spare load per pot, then the next. That is a
 * fair rule, not a search, so an edit it rejects might still fit another way; listing the masses
 * settles it.
 */
import type { TripContext } from './context.js';
import { kg } from './format.js';
import { potMasses } from './pot-classes.js';
import type { TripRun, TripViolation } from './types.js';

const TOLERANCE_KG = 1e-6;

export interface ResolvedPots {
  /** By run (in the order given): the mass of each pot aboard. */
  masses: number[][];
  violations: TripViolation[];
}

const listsItsPots = (r: TripRun) => Array.isArray(r.potMassesKg) && r.potMassesKg.length === r.pots;

function peopleKg(ctx: TripContext, r: TripRun): number {
  return r.people.reduce((w, id) => w + (ctx.personById.get(id)?.weightKg ?? 0), 0);
}

/** Takes one pot of mass `m` out of the sorted pool; false when none is left. */
function takeOut(pool: number[], m: number): boolean {
  const i = pool.findIndex((x) => Math.abs(x - m) <= TOLERANCE_KG);
  if (i < 0) return false;
  pool.splice(i, 1);
  return true;
}

/** The pots aboard each run, and any listed pot that is not ready (or listed twice). */
export function resolvePotMasses(ctx: TripContext, runs: readonly TripRun[]): ResolvedPots {
  const pool = potMasses(ctx.instance.pots).sort((a, b) => a - b);
  const heaviest = pool[pool.length - 1] ?? ctx.instance.pots.massKg;
  const masses: number[][] = runs.map(() => []);
  const violations: TripViolation[] = [];
  runs.forEach((r, i) => {
    if (!listsItsPots(r)) return;
    for (const m of r.potMassesKg ?? []) {
      if (takeOut(pool, m)) masses[i]?.push(m);
      else {
        violations.push({ rule: 'pots-total', craftId: r.craftId, run: r.run, facts: { loadKg: m }, message: `${r.craftId} run ${r.run} lists a ${kg(m)} pot, but no such pot is ready (or another run lists it)` });
        masses[i]?.push(m);
      }
    }
  });
  const open = runs
    .map((r, i) => ({ r, i, spare: (ctx.craftById.get(r.craftId)?.capKg ?? Infinity) - peopleKg(ctx, r) }))
    .filter(({ r }) => !listsItsPots(r) && r.pots > 0)
    .sort((a, b) => a.spare / a.r.pots - b.spare / b.r.pots || a.i - b.i);
  for (const { r, i } of open) {
    const n = Math.max(0, Math.floor(r.pots));
    // Past the ready pots the count check reports it; meanwhile count each missing pot as the heaviest.
    const taken = pool.splice(0, n);
    masses[i] = [...taken, ...new Array<number>(n - taken.length).fill(heaviest)];
  }
  return { masses, violations };
}
