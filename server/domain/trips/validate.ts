/**
 * `validateTripPlan`: checks every rule of a trip plan, whether the planner made it or a
 * coordinator edited it by hand, and says precisely what is wrong. Pure.
 *
 * Rules (see `context.ts` for the timing model and `planting.ts` for the planting deadline):
 * runs of a craft are numbered 1, 2, … and follow its schedule; seats, pot slots and the load
 * margin hold on every run; every run is unloaded before the window closes; someone who may
 * skipper the craft is aboard every run of it (kayaks don't move themselves; operator-required
 * craft need the operator skill; an owned craft its owner); each person rides out once (or, as
 * a shuttling crew member, on every run from their first to the craft's last) and comes back
 * with that craft at the close, so a craft's whole roster must fit its seats and margin on the
 * way back; a minor is on every run their guardian is not missing from; the pots fit the count
 * (and a run that lists its pots' masses lists ready pots, see `validate-pots.ts`, which also
 * decides each run's pots for the load check); and the crew at the site can plant every pot
 * before the close.
 */
import { buildContext, type TripContext } from './context.js';
import { checkPeople } from './validate-people.js';
import { checkCraftRuns } from './validate-craft.js';
import { resolvePotMasses } from './validate-pots.js';
import { clock, kg } from './format.js';
import type { TripInstance, TripOptions, TripRun, TripViolation } from './types.js';

/** Ids listed more than once. */
const twice = (ids: readonly string[]) => [...new Set(ids.filter((id, i) => ids.indexOf(id) !== i))];

function checkRun(ctx: TripContext, r: TripRun, potKg: number, out: TripViolation[]): void {
  const info = ctx.craftById.get(r.craftId);
  const at = { craftId: r.craftId, run: r.run };
  if (!info) {
    out.push({ rule: 'unknown-craft', ...at, message: `run ${r.run} names craft ${r.craftId}, which is not in the fleet` });
    return;
  }
  const name = `${r.craftId} run ${r.run}`;
  let peopleKg = 0;
  for (const id of r.people) {
    const p = ctx.personById.get(id);
    if (!p) out.push({ rule: 'unknown-person', ...at, personIds: [id], message: `${name} lists ${id}, who is not on the crew` });
    peopleKg += p?.weightKg ?? 0;
  }
  if (new Set(r.people).size !== r.people.length) out.push({ rule: 'travels-once', ...at, personIds: twice(r.people), message: `${name} lists someone twice` });
  if (r.people.length > info.craft.seats) {
    out.push({ rule: 'seats', ...at, facts: { count: r.people.length, limit: info.craft.seats }, message: `${name} carries ${r.people.length} people but has ${info.craft.seats} seats` });
  }
  if (!Number.isInteger(r.pots) || r.pots < 0 || r.pots > info.craft.potSlots) {
    out.push({ rule: 'pot-slots', ...at, facts: { count: r.pots, limit: info.craft.potSlots }, message: `${name} carries ${r.pots} pots but has ${info.craft.potSlots} pot slots` });
  }
  const load = peopleKg + potKg;
  if (load > info.capKg + 1e-6) {
    const marginShare = info.capKg / info.craft.maxLoadKg;
    const pct = Math.round(marginShare * 100);
    const facts = { loadKg: load, limitKg: info.capKg, ratedKg: info.craft.maxLoadKg, marginShare };
    out.push({ rule: 'load', ...at, facts, message: `${name} loads ${kg(load)}, over ${pct} % of its rated ${kg(info.craft.maxLoadKg)} (${kg(info.capKg)})` });
  }
  if (r.landAt + ctx.unloadMs > ctx.end) {
    out.push({ rule: 'window', ...at, facts: { at: r.landAt + ctx.unloadMs, by: ctx.end }, message: `${name} is unloaded at ${clock(r.landAt + ctx.unloadMs)}, after the window closes at ${clock(ctx.end)}` });
  }
}

/**
 * Every rule a trip plan breaks; an empty list means the plan is valid.
 * @example validateTripPlan(instance, { runs: [{ craftId: 'canoe-1', run: 1, …, people: ['ann'], pots: 9 }] })
 * // [{ rule: 'pot-slots', craftId: 'canoe-1', run: 1, facts: { count: 9, limit: 6 }, message: 'canoe-1 run 1 carries 9 pots but has 6 pot slots' }]
 */
export function validateTripPlan(instance: TripInstance, plan: { runs: readonly TripRun[] }, options: TripOptions = {}): TripViolation[] {
  const ctx = buildContext(instance, options);
  const pots = resolvePotMasses(ctx, plan.runs);
  const out: TripViolation[] = [];
  plan.runs.forEach((r, i) => checkRun(ctx, r, (pots.masses[i] ?? []).reduce((w, m) => w + m, 0), out));
  out.push(...pots.violations);
  const byCraft = new Map<string, TripRun[]>();
  for (const r of plan.runs) if (ctx.craftById.has(r.craftId)) byCraft.set(r.craftId, [...(byCraft.get(r.craftId) ?? []), r]);
  for (const [id, runs] of byCraft) checkCraftRuns(ctx, id, runs, out);
  checkPeople(ctx, plan.runs, out);
  const total = plan.runs.reduce((n, r) => n + Math.max(0, r.pots), 0);
  if (total > instance.pots.count) {
    out.push({ rule: 'pots-total', facts: { count: total, limit: instance.pots.count }, message: `the runs carry ${total} pots but only ${instance.pots.count} are ready` });
  }
  return out;
}

/**
 * The mass of each pot aboard each run, as `validateTripPlan` counts them (see `validate-pots.ts`).
 * @example potsAboard(instance, runs) // [[31.5, 27], [27, 27, 24]]
 */
export function potsAboard(instance: TripInstance, runs: readonly TripRun[], options: TripOptions = {}): number[][] {
  return resolvePotMasses(buildContext(instance, options), runs).masses;
}
