/**
 * Local search over crews for the heuristic. Later runs carry the skipper alone, so crews matter
 * mostly through run 1: the more pots the first runs can take beside their people, the fewer
 * and earlier the later runs. The search swaps and moves passengers and skippers between crafts
 * to maximise the pots all first runs can carry; ties go to the arrangement whose spare
 * kilograms are gathered in fewer crafts (the square of each craft's spare), which is what lets
 * a later move complete one more pot. Moves never change who goes out. Deterministic, bounded.
 */
import { canSkipper, lightestPotKg, potRoom, type TripContext } from './context.js';
import { crewKg, type Crew, type Draft } from './draft.js';

type Crews = (Crew | null)[];

interface Value {
  room: number;
  spread: number;
}

function craftValue(ctx: TripContext, crews: Crews, c: number): Value | null {
  const crew = crews[c];
  const info = ctx.crafts[c];
  if (!crew || !info) return { room: 0, spread: 0 };
  const skipper = ctx.people[crew.skipper];
  const kg = crewKg(ctx, crew, 1);
  if (!skipper || !canSkipper(skipper, info) || crew.passengers.length + 1 > info.craft.seats || kg > info.capKg + 1e-9) return null;
  const room = potRoom(ctx, info, kg);
  const mass = lightestPotKg(ctx);
  const spare = room < info.craft.potSlots && mass > 0 ? info.capKg - kg - room * mass : 0;
  return { room, spread: spare * spare };
}

/** People whose seat is tied to someone else's (minors, guardians with minors aboard) stay put. */
function movable(ctx: TripContext): (p: number) => boolean {
  const tied = new Set<number>();
  for (const p of ctx.people) {
    const g = p.person.guardianId ? ctx.personById.get(p.person.guardianId) : undefined;
    if (p.minor) tied.add(p.index);
    if (p.minor && g) tied.add(g.index);
  }
  return (p) => !tied.has(p);
}

interface Spot {
  c: number;
  /** −1 for the skipper, else the passenger's position. */
  at: number;
}

const who = (crews: Crews, s: Spot) => (s.at < 0 ? crews[s.c]?.skipper : crews[s.c]?.passengers[s.at]) ?? -1;

function put(crews: Crews, s: Spot, p: number): void {
  const crew = crews[s.c];
  if (crew && s.at < 0) crew.skipper = p;
  else if (crew) crew.passengers[s.at] = p;
}

/** Gain of swapping the people at two spots (null when the swap breaks a rule). */
function swapGain(ctx: TripContext, crews: Crews, a: Spot, b: Spot): Value | null {
  const pa = who(crews, a);
  const pb = who(crews, b);
  const before = [craftValue(ctx, crews, a.c), a.c === b.c ? { room: 0, spread: 0 } : craftValue(ctx, crews, b.c)];
  put(crews, a, pb);
  put(crews, b, pa);
  const after = [craftValue(ctx, crews, a.c), a.c === b.c ? { room: 0, spread: 0 } : craftValue(ctx, crews, b.c)];
  put(crews, a, pa);
  put(crews, b, pb);
  if (after.some((v) => v === null)) return null;
  const sum = (vs: (Value | null)[], k: keyof Value) => vs.reduce((n, v) => n + (v?.[k] ?? 0), 0);
  return { room: sum(after, 'room') - sum(before, 'room'), spread: sum(after, 'spread') - sum(before, 'spread') };
}

/** Swaps people aboard with lighter people left ashore (when seats, not people, ran out). */
function lighterAshore(ctx: TripContext, crews: Crews, free: (p: number) => boolean): boolean {
  const aboard = new Set(crews.flatMap((c) => (c ? [c.skipper, ...c.passengers] : [])));
  const ashore = ctx.people.filter((p) => !aboard.has(p.index) && free(p.index)).sort((a, b) => a.weightKg - b.weightKg || a.index - b.index);
  let improved = false;
  crews.forEach((crew, c) => {
    if (!crew) return;
    for (let at = -1; at < crew.passengers.length; at++) {
      const spot = { c, at };
      const p = who(crews, spot);
      const swap = ashore.find((q) => q.weightKg < (ctx.people[p]?.weightKg ?? 0) && free(p) && !aboard.has(q.index));
      if (!swap) continue;
      put(crews, spot, swap.index);
      if (craftValue(ctx, crews, c) === null) {
        put(crews, spot, p);
        continue;
      }
      aboard.delete(p);
      aboard.add(swap.index);
      ashore.splice(ashore.indexOf(swap), 1, ...(ctx.people[p] ? [ctx.people[p]] : []));
      ashore.sort((a, b) => a.weightKg - b.weightKg || a.index - b.index);
      improved = true;
    }
  });
  return improved;
}

/** Improves the crews of a draft (pots are refilled by the caller) within `passes` sweeps. */
export function packCrews(ctx: TripContext, draft: Draft, passes = 50): Draft {
  const crews: Crews = draft.crews.map((c) => (c ? { skipper: c.skipper, passengers: [...c.passengers] } : null));
  const free = movable(ctx);
  for (let pass = 0; pass < passes; pass++) {
    let improved = lighterAshore(ctx, crews, free);
    const spots: Spot[] = crews.flatMap((crew, c) => (crew ? [{ c, at: -1 }, ...crew.passengers.map((_, at) => ({ c, at }))] : []));
    for (const a of spots) {
      for (const b of spots) {
        if (a.c === b.c && (a.at >= 0) === (b.at >= 0)) continue;
        const pa = who(crews, a);
        const pb = who(crews, b);
        if (!free(pa) || !free(pb) || ctx.people[pa]?.weightKg === ctx.people[pb]?.weightKg) continue;
        const gain = swapGain(ctx, crews, a, b);
        if (!gain || gain.room < 0 || (gain.room === 0 && gain.spread <= 1e-9)) continue;
        put(crews, a, pb);
        put(crews, b, pa);
        improved = true;
      }
    }
    if (!improved) break;
  }
  return { crews, pots: draft.pots, mix: draft.mix };
}
