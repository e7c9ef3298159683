/** Per-person rules of `validateTripPlan`: one way out, minors with their guardian, planting in time. */
import type { TripContext } from './context.js';
import { clock } from './format.js';
import { plantingShortfalls } from './planting.js';
import type { TripRun, TripViolation } from './types.js';

interface Seat {
  craftId: string;
  run: number;
}

function seatsByPerson(runs: readonly TripRun[]): Map<string, Seat[]> {
  const out = new Map<string, Seat[]>();
  for (const r of runs) for (const id of new Set(r.people)) out.set(id, [...(out.get(id) ?? []), { craftId: r.craftId, run: r.run }]);
  return out;
}

function lastRunOf(runs: readonly TripRun[]): Map<string, number> {
  const out = new Map<string, number>();
  for (const r of runs) out.set(r.craftId, Math.max(out.get(r.craftId) ?? 0, r.run));
  return out;
}

/**
 * A person rides out once and stays, or shuttles with a craft on every run from their first to
 * its last (then stays with it); anything else would leave them ashore or need a ride not planned.
 */
function checkOnce(id: string, seats: readonly Seat[], last: Map<string, number>, out: TripViolation[]): void {
  const crafts = [...new Set(seats.map((s) => s.craftId))];
  if (crafts.length > 1) {
    out.push({ rule: 'travels-once', personIds: [id], facts: { craftIds: crafts }, message: `${id} rides out in ${crafts.join(' and ')}; a person rides out once and comes back in the same craft` });
    return;
  }
  if (seats.length < 2) return;
  const runs = seats.map((s) => s.run).sort((a, b) => a - b);
  const first = runs[0] ?? 0;
  const end = last.get(crafts[0] ?? '') ?? 0;
  if (runs.length !== end - first + 1) {
    out.push({ rule: 'travels-once', personIds: [id], craftId: crafts[0], facts: { runs, limit: end }, message: `${id} rides runs ${runs.join(', ')} of ${crafts[0]}: someone on more than one run crews every run from their first to the craft's last (${first}–${end})` });
  }
}

function checkGuardian(ctx: TripContext, id: string, seats: readonly Seat[], byPerson: Map<string, Seat[]>, out: TripViolation[]): void {
  const guardian = ctx.personById.get(id)?.person.guardianId;
  if (!guardian) return;
  if (!ctx.personById.has(guardian)) {
    out.push({ rule: 'guardian', personIds: [id, guardian], message: `${id} is a minor whose guardian ${guardian} is not on the crew` });
    return;
  }
  const with_ = byPerson.get(guardian) ?? [];
  for (const s of seats) {
    if (!with_.some((g) => g.craftId === s.craftId && g.run === s.run)) {
      out.push({ rule: 'guardian', personIds: [id, guardian], craftId: s.craftId, run: s.run, message: `${id} is a minor on ${s.craftId} run ${s.run} without their guardian ${guardian}` });
    }
  }
}

function checkPlanting(ctx: TripContext, runs: readonly TripRun[], byPerson: Map<string, Seat[]>, out: TripViolation[]): void {
  const readyOf = new Map(runs.map((r) => [`${r.craftId}#${r.run}`, r.landAt + ctx.unloadMs]));
  const arrivals = [...byPerson.entries()]
    .filter(([id]) => ctx.personById.has(id))
    .map(([, seats]) => Math.max(...seats.map((s) => readyOf.get(`${s.craftId}#${s.run}`) ?? Infinity)));
  const drops = runs.map((r) => ({ readyAt: r.landAt + ctx.unloadMs, pots: Math.max(0, r.pots) }));
  for (const s of plantingShortfalls(ctx, arrivals, drops)) {
    out.push({
      rule: 'planting-time',
      facts: { count: s.pots, limit: s.capacity, pairs: s.pairs, at: s.readyAt, by: ctx.end },
      message: `${s.pots} pots are unloaded from ${clock(s.readyAt)} on, but the crew at the site (${s.pairs} pairs then) can plant only ${s.capacity} of them by ${clock(ctx.end)}`,
    });
  }
}

/** Checks one-way-out, guardians and the planting deadline. */
export function checkPeople(ctx: TripContext, runs: readonly TripRun[], out: TripViolation[]): void {
  const byPerson = seatsByPerson(runs);
  const last = lastRunOf(runs);
  for (const [id, seats] of byPerson) {
    checkOnce(id, seats, last, out);
    checkGuardian(ctx, id, seats, byPerson, out);
  }
  checkPlanting(ctx, runs, byPerson, out);
}
