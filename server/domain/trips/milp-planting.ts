/** The planting deadline in the MILP (see `milp-model.ts` and `planting.ts`). */
import { runTiming, type TripContext } from './context.js';
import type { LpBuilder, Term } from './milp-lp.js';
import { key, type MilpIndex } from './milp-index.js';

/** Per distinct unloading time: who arrives (+1 per person) and which pot columns are unloaded. */
function eventsByTime(ctx: TripContext, ix: MilpIndex): Map<number, { arrive: Term[]; drop: number[] }> {
  const out = new Map<number, { arrive: Term[]; drop: number[] }>();
  for (const c of ix.crafts) {
    const info = ctx.crafts[c];
    const u = ix.u.get(c) ?? [];
    const n = ix.n.get(c) ?? [];
    if (!info) continue;
    u.forEach((uk, k) => {
      const t = runTiming(ctx, info, k + 1, false).readyAt;
      const e = out.get(t) ?? { arrive: [], drop: [] };
      out.set(t, e);
      // The skipper arrives with the craft's last run: u[k] − u[k + 1] is 1 exactly there.
      e.arrive.push([uk, 1]);
      const after = u[k + 1];
      if (after !== undefined) e.arrive.push([after, -1]);
      e.drop.push(...(n[k] ?? []));
      if (k > 0) return;
      ix.classes.forEach((_, q) => {
        const x = ix.x.get(key(q, c));
        if (x !== undefined) e.arrive.push([x, 1]);
      });
    });
  }
  return out;
}

/**
 * Columns A[t] (people at the site), π[t] (pairs, ≤ A[t] / 2) and G[t] (pots unloaded from t on
 * minus planting slots from t on, ≤ 0) per distinct unloading time t, with their rows.
 */
export function addPlanting(ctx: TripContext, lp: LpBuilder, ix: MilpIndex): void {
  if (ctx.plantMs <= 0) return;
  const events = eventsByTime(ctx, ix);
  ix.times = [...events.keys()].sort((a, b) => a - b);
  const people = ctx.people.length;
  for (const _ of ix.times) {
    ix.A.push(lp.col(0, people, false));
    ix.pi.push(lp.col(0, Math.floor(people / 2), true));
    ix.G.push(lp.col(-Infinity, 0, false));
  }
  const slotsFrom = (t: number) => Math.floor((ctx.end - t) / ctx.plantMs + 1e-9);
  ix.times.forEach((t, i) => {
    const e = events.get(t) ?? { arrive: [], drop: [] };
    const A = ix.A[i];
    const pi = ix.pi[i];
    const G = ix.G[i];
    if (A === undefined || pi === undefined || G === undefined) return;
    const prevA = ix.A[i - 1];
    lp.row(0, 0, [[A, 1], ...(prevA === undefined ? [] : [[prevA, -1] as const]), ...e.arrive.map(([col, v]) => [col, -v] as const)]);
    lp.row(-Infinity, 0, [[pi, 2], [A, -1]]);
    const next = ix.times[i + 1];
    const nextG = ix.G[i + 1];
    const d = slotsFrom(t) - (next === undefined ? 0 : slotsFrom(next));
    lp.row(0, 0, [[G, 1], ...(nextG === undefined ? [] : [[nextG, -1] as const]), ...e.drop.map((col) => [col, -1] as const), [pi, d]]);
  });
}
