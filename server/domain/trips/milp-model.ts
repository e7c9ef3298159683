/**
 * The trip plan as a MILP, run-indexed. Per modelled craft c and run k (timing fixed: runs are
 * back to back, see `context.ts`): `u[c][k]` run used (binary, runs consecutive), `n[c][k][j]`
 * pots of mass class j (integer; all classes together ≤ pot slots and the load margin, each pot
 * at its class's rounded-up mass, see `pot-classes.ts`); per person class q (`milp-classes.ts`): `s[q,c]` skipper of c
 * (binary), `x[q,c]` passengers on run 1 of c (integer). Each class sends out at most its size;
 * a used craft has exactly one skipper; seats and margins hold on run 1 (the whole roster, so
 * also the ride back) and on later runs (skipper and pots); a minor rides only where their
 * guardian does; identical crafts are ordered by runs made (symmetry).
 *
 * The planting deadline (`planting.ts`) is linear: at each distinct unloading time t, `A[t]`
 * people are at the site (passengers from their run, skippers from their last run: u[c][k] −
 * u[c][k+1]), `π[t]` ≤ A[t] / 2 pairs (integer), and `G[t]` = pots unloaded from t on minus the
 * planting slots from t on (Σ_{t'≥t} π[t'] × (k(t') − k(next t'))) must stay ≤ 0.
 *
 * Objective (`milp-objective.ts`): a weighted sum whose weights make the tiers strictly
 * lexicographic: pots landed, then people out, then the last landing with pots, then runs, then
 * the peak load share.
 */
import { canSkipper, potRoom, runTiming, type TripContext } from './context.js';
import { lpBuilder, type LpBuilder, type SparseModel } from './milp-lp.js';
import { personClasses } from './milp-classes.js';
import { crewCols, crewTerms, key, termsOf, type MilpIndex } from './milp-index.js';
import { addObjective } from './milp-objective.js';
import { addPlanting } from './milp-planting.js';

function addColumns(ctx: TripContext, lp: LpBuilder, ix: MilpIndex, horizon: number): void {
  for (const info of ctx.crafts) {
    if (info.maxRuns < 1 || info.craft.seats < 1) continue;
    const skippers = ix.classes.flatMap((cl, q) => (canSkipper(cl.rep, info) ? [q] : []));
    if (skippers.length === 0) continue;
    const c = info.index;
    ix.crafts.push(c);
    for (const q of skippers) ix.s.set(key(q, c), lp.col(0, 1, true));
    const lightest = Math.min(...skippers.map((q) => ix.classes[q]?.rep.weightKg ?? 0));
    if (info.craft.seats >= 2) {
      ix.classes.forEach((cl, q) => {
        if (!cl.rep.minor && cl.rep.weightKg + lightest <= info.capKg) ix.x.set(key(q, c), lp.col(0, Math.min(cl.members.length, info.craft.seats - 1), true));
      });
    }
    const room = potRoom(ctx, info, lightest);
    ix.room.set(c, room);
    let runs = 1;
    while (runs < info.maxRuns && runTiming(ctx, info, runs + 1, false).landAt <= horizon) runs++;
    const inTime = runTiming(ctx, info, 1, false).landAt <= horizon;
    const classRoom = ctx.potClasses.map((cl) => Math.min(cl.count, potRoom(ctx, info, lightest, cl.massKg)));
    ix.u.set(c, Array.from({ length: runs }, () => lp.col(0, 1, true)));
    ix.n.set(c, Array.from({ length: runs }, (_, k) => classRoom.map((r) => lp.col(0, k === 0 && !inTime ? 0 : r, true))));
  }
  addMinorColumns(ctx, lp, ix);
}

/** A minor may ride on run 1 of a craft where their guardian can be. */
function addMinorColumns(ctx: TripContext, lp: LpBuilder, ix: MilpIndex): void {
  ix.classes.forEach((cl, q) => {
    const guardian = cl.rep.minor && cl.rep.person.guardianId ? ctx.personById.get(cl.rep.person.guardianId) : undefined;
    if (!guardian) return;
    const g = ix.classOf[guardian.index] ?? -1;
    for (const c of ix.crafts) {
      const info = ctx.crafts[c];
      const there = ix.s.has(key(g, c)) || ix.x.has(key(g, c));
      if (info && there && info.craft.seats >= 2 && cl.rep.weightKg + guardian.weightKg <= info.capKg) ix.x.set(key(q, c), lp.col(0, 1, true));
    }
  });
}

function peopleRows(ctx: TripContext, lp: LpBuilder, ix: MilpIndex): void {
  ix.classes.forEach((cl, q) => {
    const terms = termsOf(ix.crafts.flatMap((c) => crewCols(ix, q, c)), 1);
    if (terms.length) lp.row(-Infinity, cl.members.length, terms);
    const guardian = cl.rep.minor && cl.rep.person.guardianId ? ctx.personById.get(cl.rep.person.guardianId) : undefined;
    if (!guardian) return;
    const g = ix.classOf[guardian.index] ?? -1;
    for (const c of ix.crafts) {
      const xm = ix.x.get(key(q, c));
      if (xm === undefined) continue;
      lp.row(-Infinity, 0, [[xm, 1], ...termsOf(crewCols(ix, g, c), -1)]);
    }
  });
}

function craftRows(ctx: TripContext, lp: LpBuilder, ix: MilpIndex): void {
  const mass = ctx.potClasses.map((cl) => cl.massKg);
  for (const c of ix.crafts) {
    const info = ctx.crafts[c];
    const u = ix.u.get(c) ?? [];
    const n = ix.n.get(c) ?? [];
    const first = u[0];
    if (!info || first === undefined) continue;
    const seat = termsOf(ix.classes.flatMap((_, q) => crewCols(ix, q, c)), 1);
    lp.row(0, 0, [...termsOf(ix.classes.map((_, q) => ix.s.get(key(q, c))), 1), [first, -1]]);
    lp.row(-Infinity, 0, [...seat, [first, -info.craft.seats]]);
    const room = ix.room.get(c) ?? 0;
    u.forEach((uk, k) => {
      const before = u[k - 1];
      if (before !== undefined) lp.row(-Infinity, 0, [[uk, 1], [before, -1]]);
      const nk = n[k];
      if (nk === undefined) return;
      lp.row(-Infinity, 0, [...termsOf(nk, 1), [uk, -room]]);
      lp.row(-Infinity, info.capKg, [...crewTerms(ix, c, k === 0), ...nk.map((col, j) => [col, mass[j] ?? 0] as const)]);
    });
  }
  ctx.potClasses.forEach((cl, j) => lp.row(-Infinity, cl.count, termsOf(ix.crafts.flatMap((c) => (ix.n.get(c) ?? []).map((nk) => nk[j])), 1)));
}

/** Modelled crafts with the same figures and no owner, in model order: interchangeable. */
export function symmetryGroups(ctx: TripContext, ix: MilpIndex): number[][] {
  const groups = new Map<string, number[]>();
  for (const c of ix.crafts) {
    const info = ctx.crafts[c];
    const k = info?.craft;
    if (!k || k.ownerId) continue;
    const sig = [k.kind, k.seats, k.maxLoadKg, k.potSlots, k.speedKmh, k.needsOperator, info.plated].join('|');
    groups.set(sig, [...(groups.get(sig) ?? []), c]);
  }
  return [...groups.values()].filter((g) => g.length > 1);
}

/** Identical crafts are ordered by runs made (the warm start is put in the same order). */
function symmetryRows(ctx: TripContext, lp: LpBuilder, ix: MilpIndex): void {
  for (const group of symmetryGroups(ctx, ix)) {
    group.slice(1).forEach((c, i) => {
      const before = group[i] ?? -1;
      lp.row(0, Infinity, [...termsOf(ix.u.get(before) ?? [], 1), ...termsOf(ix.u.get(c) ?? [], -1)]);
    });
  }
}

/**
 * Builds the MILP of an instance. Runs landing after `horizon` (ms) are left out: pass the
 * heuristic's last landing when it already lands every pot and takes everyone who could go.
 */
export function buildMilp(ctx: TripContext, horizon = Infinity): { model: SparseModel; index: MilpIndex } {
  const lp = lpBuilder();
  const { classes, classOf } = personClasses(ctx);
  const ix: MilpIndex = {
    classes, classOf, crafts: [], s: new Map(), x: new Map(), u: new Map(), n: new Map(), room: new Map(),
    times: [], A: [], pi: [], G: [], z: [], M: -1, landRank: new Map(), weights: { pots: 0, people: 0, last: 0, runs: 0, share: 0 },
  };
  addColumns(ctx, lp, ix, horizon);
  peopleRows(ctx, lp, ix);
  craftRows(ctx, lp, ix);
  symmetryRows(ctx, lp, ix);
  addPlanting(ctx, lp, ix);
  addObjective(ctx, lp, ix);
  return { model: lp.build(), index: ix };
}
