/** Per-craft rules of `validateTripPlan`: run numbering and timing, the skipper, the ride back. */
import { canSkipper, type CraftInfo, type TripContext } from './context.js';
import type { TripRun, TripViolation } from './types.js';
import { clock, kg } from './format.js';

/** Clock slack when comparing times a client sent back (rounding, serialisation). */
const SLACK_MS = 1000;

function checkTiming(ctx: TripContext, info: CraftInfo, runs: readonly TripRun[], out: TripViolation[]): void {
  const id = info.craft.id;
  runs.forEach((r, i) => {
    const at = { rule: 'timing' as const, craftId: id, run: r.run };
    const prev = runs[i - 1];
    const earliest = prev ? prev.landAt + ctx.unloadMs + info.travelMs + ctx.loadMs : ctx.start;
    if (r.departAt < earliest - SLACK_MS) {
      const why = prev ? `run ${prev.run} is back and loaded` : 'the window opens';
      out.push({ ...at, facts: { which: 'depart', at: r.departAt, by: earliest, ...(prev ? { runs: [prev.run] } : {}) }, message: `${id} run ${r.run} departs at ${clock(r.departAt)}, before ${why} (${clock(earliest)})` });
    }
    if (Math.abs(r.landAt - r.departAt - info.travelMs) > SLACK_MS) {
      out.push({ ...at, facts: { which: 'land', at: r.landAt, by: r.departAt + info.travelMs, speedKmh: info.craft.speedKmh }, message: `${id} run ${r.run} lands at ${clock(r.landAt)}; at ${info.craft.speedKmh} km/h it lands at ${clock(r.departAt + info.travelMs)}` });
    }
    const ready = r.landAt + ctx.unloadMs;
    const back = (i === runs.length - 1 ? Math.max(ctx.end, ready) : ready) + info.travelMs;
    if (Math.abs(r.returnAt - back) > SLACK_MS) {
      out.push({ ...at, facts: { which: 'return', at: r.returnAt, by: back }, message: `${id} run ${r.run} returns at ${clock(r.returnAt)}; it is back at ${clock(back)}` });
    }
  });
}

/** Which skipper rule the craft breaks, with its message. */
function skipperViolation(ctx: TripContext, info: CraftInfo, aboardAll: readonly string[]): TripViolation {
  const craftId = info.craft.id;
  const owner = info.craft.ownerId;
  if (owner) return { rule: 'own-kayak', craftId, personIds: [owner], message: `${craftId} belongs to ${owner}: only ${owner} may paddle it, aboard every run` };
  if (aboardAll.length === 0) return { rule: 'skipper', craftId, message: `nobody is aboard every run of ${craftId} to bring it back between runs` };
  if (info.craft.needsOperator) return { rule: 'operator', craftId, message: `${craftId} needs someone with the operator skill aboard every run; none is` };
  const heavy = aboardAll.filter((p) => (ctx.personById.get(p)?.weightKg ?? 0) > info.capKg);
  if (heavy.length > 0) {
    return { rule: 'paddler', craftId, personIds: heavy, facts: { limitKg: info.capKg }, message: `${craftId}: its paddler alone is over the load margin (${kg(info.capKg)})` };
  }
  return { rule: 'paddler', craftId, message: `${craftId} needs an adult with the paddler skill aboard every run; none is` };
}

function checkSkipper(ctx: TripContext, info: CraftInfo, runs: readonly TripRun[], out: TripViolation[]): void {
  const first = runs[0]?.people ?? [];
  const aboardAll = first.filter((p) => runs.every((r) => r.people.includes(p)));
  const ok = aboardAll.some((p) => {
    const person = ctx.personById.get(p);
    return person !== undefined && canSkipper(person, info);
  });
  if (!ok) out.push(skipperViolation(ctx, info, aboardAll));
}

function checkReturn(ctx: TripContext, info: CraftInfo, runs: readonly TripRun[], out: TripViolation[]): void {
  const roster = [...new Set(runs.flatMap((r) => r.people))];
  const id = info.craft.id;
  const last = runs[runs.length - 1]?.run;
  if (roster.length > info.craft.seats) {
    out.push({ rule: 'return', craftId: id, run: last, personIds: roster, facts: { count: roster.length, limit: info.craft.seats }, message: `${id} brings its ${roster.length} people back at the close but has ${info.craft.seats} seats` });
  }
  const load = roster.reduce((w, p) => w + (ctx.personById.get(p)?.weightKg ?? 0), 0);
  if (load > info.capKg + 1e-6) {
    out.push({ rule: 'return', craftId: id, run: last, personIds: roster, facts: { loadKg: load, limitKg: info.capKg }, message: `${id} brings ${kg(load)} of people back at the close, over its margin of ${kg(info.capKg)}` });
  }
}

/** Checks the runs of one craft (all naming a known craft). */
export function checkCraftRuns(ctx: TripContext, craftId: string, runs: readonly TripRun[], out: TripViolation[]): void {
  const info = ctx.craftById.get(craftId);
  if (!info) return;
  const sorted = [...runs].sort((a, b) => a.run - b.run);
  const numbers = sorted.map((r) => r.run);
  if (numbers.some((n, i) => n !== i + 1)) {
    out.push({ rule: 'run-order', craftId, facts: { runs: numbers }, message: `${craftId}'s runs are numbered ${numbers.join(', ')}; they must be 1 to ${numbers.length}` });
  }
  checkTiming(ctx, info, sorted, out);
  checkSkipper(ctx, info, sorted, out);
  checkReturn(ctx, info, sorted, out);
}
