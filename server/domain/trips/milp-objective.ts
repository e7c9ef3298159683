/**
 * The MILP's lexicographic objective as one weighted sum (minimised). Every tier is a bounded
 * integer — M, the peak load share in steps of 5 % of the rated maximum, in [0, S = 20]; runs
 * in [0, U]; L, the rank of the last landing among the T distinct landing times, in [0, T − 1];
 * people out in [0, P] — and each weight exceeds the most all tiers below it can change
 * together, so no gain lower down can pay for one step lost higher up:
 *   share 1; runs S + 1 > S; last landing W4·U + S + 1 > W4·U + S;
 *   people W3·T + W4·U + S + 1 > W3(T − 1) + W4·U + S; pots W2(P + 1) + W3·T + W4·U + S + 1.
 * Ranks instead of times and 5 % steps instead of fractions keep the weights small and the
 * objective integral, so a gap below 1 is a proof. (Whole percent made the demo-size proof about
 * half again as slow for no visible gain.) All weights stay far below 2^53.
 */
import { runTiming, SHARE_STEPS, type TripContext } from './context.js';
import type { LpBuilder, Term } from './milp-lp.js';
import { crewTerms, key, termsOf, type MilpIndex } from './milp-index.js';

/** Weights for U modelled runs, T distinct landing times and P people. */
export function tierWeights(U: number, T: number, P: number): MilpIndex['weights'] {
  const share = 1;
  const runs = SHARE_STEPS * share + 1;
  const last = runs * U + SHARE_STEPS * share + 1;
  const people = last * T + runs * U + SHARE_STEPS * share + 1;
  const pots = people * (P + 1) + last * T + runs * U + SHARE_STEPS * share + 1;
  return { pots, people, last, runs, share };
}

/**
 * The last landing: binary z[r] = 1 when some run carrying pots lands at rank r or later
 * (monotone, z[1] ≥ z[2] ≥ …), so L = Σ z[r]. Linking each run's pots to its own z[rank]
 * (n ≤ room × z) keeps the LP bound close to the real horizon, where `L ≥ rank × u` would let
 * the relaxation spread pots thinly over many late runs at almost no cost.
 */
function addLastLanding(ctx: TripContext, lp: LpBuilder, ix: MilpIndex): number {
  const lands = [...new Set(ix.crafts.flatMap((c) => (ix.u.get(c) ?? []).map((_, k) => landAt(ctx, c, k + 1))))].sort((a, b) => a - b);
  lands.forEach((t, r) => ix.landRank.set(t, r));
  ix.z = lands.map((_, r) => (r === 0 ? -1 : lp.col(0, 1, true)));
  for (let r = 2; r < ix.z.length; r++) lp.row(-Infinity, 0, [[ix.z[r] ?? -1, 1], [ix.z[r - 1] ?? -1, -1]]);
  for (const c of ix.crafts) {
    const room = ix.room.get(c) ?? 0;
    (ix.u.get(c) ?? []).forEach((uk, k) => {
      const z = ix.z[ix.landRank.get(landAt(ctx, c, k + 1)) ?? 0] ?? -1;
      if (z < 0) return;
      lp.row(-Infinity, 0, [...termsOf(ix.n.get(c)?.[k] ?? [], 1), [z, -room]]);
      if (k > 0) lp.row(-Infinity, 0, [[uk, 1], [z, -1]]);
    });
  }
  return lands.length;
}

/**
 * The peak load share M (in 5 % steps of the rated maximum) is at least each used run's share.
 * Run 1 needs no big-M (an unused craft has no crew and no pots); later runs carry the skipper's
 * weight whether used or not, so their row gives back at most the heaviest skipper's share.
 */
function addPeakShare(ctx: TripContext, lp: LpBuilder, ix: MilpIndex): number {
  ix.M = lp.col(0, SHARE_STEPS, true);
  const mass = ctx.potClasses.map((cl) => cl.massKg);
  let U = 0;
  for (const c of ix.crafts) {
    const info = ctx.crafts[c];
    const u = ix.u.get(c) ?? [];
    if (!info) continue;
    U += u.length;
    const pct = SHARE_STEPS / info.craft.maxLoadKg;
    const heaviest = Math.max(0, ...ix.classes.map((cl, q) => (ix.s.has(key(q, c)) ? cl.rep.weightKg * pct : 0)));
    u.forEach((uk, k) => {
      const pots = (ix.n.get(c)?.[k] ?? []).map((col, j) => [col, -(mass[j] ?? 0) * pct] as const);
      const share: Term[] = [...crewTerms(ix, c, k === 0, -pct), ...pots];
      if (k === 0) lp.row(0, Infinity, [[ix.M, 1], ...share]);
      else lp.row(-heaviest, Infinity, [[ix.M, 1], ...share, [uk, -heaviest]]);
    });
  }
  return U;
}

/** Adds the last-landing and peak-share tiers, and sets every objective cost. */
export function addObjective(ctx: TripContext, lp: LpBuilder, ix: MilpIndex): void {
  const T = addLastLanding(ctx, lp, ix);
  const U = addPeakShare(ctx, lp, ix);
  ix.weights = tierWeights(U, T, ctx.people.length);
  setCosts(lp, ix);
}

function setCosts(lp: LpBuilder, ix: MilpIndex): void {
  const w = ix.weights;
  for (const c of ix.crafts) {
    for (const v of (ix.n.get(c) ?? []).flat()) lp.cost(v, -w.pots);
    for (const v of ix.u.get(c) ?? []) lp.cost(v, w.runs);
    ix.classes.forEach((_, q) => {
      for (const v of [ix.s.get(key(q, c)), ix.x.get(key(q, c))]) if (v !== undefined) lp.cost(v, -w.people);
    });
  }
  for (const z of ix.z) if (z >= 0) lp.cost(z, w.last);
  lp.cost(ix.M, w.share);
}

function landAt(ctx: TripContext, c: number, k: number): number {
  const info = ctx.crafts[c];
  return info ? runTiming(ctx, info, k, false).landAt : 0;
}
