/** Why people and pots stay ashore: every one of them gets a reason. */
import { lightestPotKg, runTiming, type PersonInfo, type TripContext } from './context.js';
import { crewKg, draftArrivals, draftDrops, runPotKg, runRoom, type Draft } from './draft.js';
import { clock, kg } from './format.js';
import { plantingSlots } from './planting.js';
import type { IdleCraft, ReasonRefs, UnplacedPerson, UnplacedPots, UnplacedReason } from './types.js';

/** Every id and the instant (the same window close) the reasons name. */
function mergeRefs(all: readonly (ReasonRefs | undefined)[]): ReasonRefs {
  const craftIds = [...new Set(all.flatMap((r) => r?.craftIds ?? []))];
  const personIds = [...new Set(all.flatMap((r) => r?.personIds ?? []))];
  const at = all.find((r) => r?.at !== undefined)?.at;
  return { ...(craftIds.length ? { craftIds } : {}), ...(personIds.length ? { personIds } : {}), ...(at === undefined ? {} : { at }) };
}

/** When nothing goes out: the crafts' shared reason, or `no-craft` with each craft's. */
function fleetReason(idle: readonly IdleCraft[]): { reason: UnplacedReason; detail: string; refs: ReasonRefs } {
  const reasons = [...new Set(idle.map((i) => i.reason))];
  const only = reasons.length === 1 ? reasons[0] : undefined;
  const detail = idle.length ? `no craft can go out: ${idle.map((i) => i.detail).join('; ')}` : 'the fleet is empty';
  return { reason: only && only !== 'not-needed' ? only : 'no-craft', detail, refs: mergeRefs(idle.map((i) => i.refs)) };
}

function seatReason(ctx: TripContext, draft: Draft, group: readonly PersonInfo[]): { reason: UnplacedReason; detail: string; refs?: ReasonRefs } {
  const groupKg = group.reduce((w, p) => w + p.weightKg, 0);
  const open = draft.crews.flatMap((crew, c) => {
    const info = ctx.crafts[c];
    return crew && info && info.craft.seats - 1 - crew.passengers.length >= group.length ? [{ crew, info, c }] : [];
  });
  const who = group.length > 1 ? `${group.length} seats together (with their minors)` : 'a seat';
  if (open.length === 0) return { reason: 'no-seat', detail: `no craft going out has ${who} left` };
  const light = open.filter((o) => crewKg(ctx, o.crew, 1) + groupKg <= o.info.capKg + 1e-9);
  if (light.length === 0) return { reason: 'over-load', detail: `no craft with ${who} free can take another ${kg(groupKg)} within its load margin` };
  const withPots = light.filter((o) => crewKg(ctx, o.crew, 1) + groupKg + runPotKg(ctx, draft, o.c, 1) <= o.info.capKg + 1e-9);
  if (withPots.length === 0) return { reason: 'over-load', refs: { craftIds: light.map((o) => o.info.craft.id) }, detail: `a seat is free on ${light.map((o) => o.info.craft.id).join(', ')}, but ${kg(groupKg)} more would displace pots from its first run` };
  return { reason: 'left-ashore', refs: { craftIds: withPots.slice(0, 1).map((o) => o.info.craft.id) }, detail: `the plan leaves them ashore although ${withPots[0]?.info.craft.id} has room (the solver stopped early)` };
}

function personReason(ctx: TripContext, draft: Draft, p: PersonInfo, aboard: Set<number>, none: boolean, idle: readonly IdleCraft[]) {
  const g = p.person.guardianId;
  if (p.minor && g && !ctx.personById.has(g)) return { reason: 'guardian-not-aboard' as const, refs: { personIds: [g] }, detail: `their guardian ${g} is not on the crew` };
  const guardian = g ? ctx.personById.get(g) : undefined;
  if (none) return fleetReason(idle);
  if (p.minor && guardian && !aboard.has(guardian.index)) return { reason: 'guardian-not-aboard' as const, refs: { personIds: [guardian.person.id] }, detail: `their guardian ${g} is not going out` };
  if (p.minor && guardian) {
    const c = draft.crews.findIndex((crew) => crew && (crew.skipper === guardian.index || crew.passengers.includes(guardian.index)));
    const solo: Draft = { crews: draft.crews.map((crew, i) => (i === c ? crew : null)), pots: draft.pots, mix: draft.mix };
    return seatReason(ctx, solo, [p]);
  }
  const minors = ctx.people.filter((m) => m.minor && m.person.guardianId === p.person.id && !aboard.has(m.index));
  return seatReason(ctx, draft, [p, ...minors]);
}

/** Each person the draft leaves ashore, with the reason. */
export function unplacedPeople(ctx: TripContext, draft: Draft, idle: readonly IdleCraft[]): UnplacedPerson[] {
  const aboard = new Set(draft.crews.flatMap((crew) => (crew ? [crew.skipper, ...crew.passengers] : [])));
  const none = draft.crews.every((crew) => !crew);
  return ctx.people.filter((p) => !aboard.has(p.index)).map((p) => ({ id: p.person.id, ...personReason(ctx, draft, p, aboard, none, idle) }));
}

/** Pots of each class the draft leaves ashore. */
const potsLeft = (ctx: TripContext, draft: Draft) =>
  ctx.potClasses.map((cl, j) => cl.count - draft.mix.flat().reduce((n, mix) => n + (mix[j] ?? 0), 0));

/** Whether every run with room for another pot is blocked by the planting deadline. */
function plantingBinds(ctx: TripContext, draft: Draft, left: readonly number[]): boolean {
  const arrivals = draftArrivals(ctx, draft);
  const drops = draftDrops(ctx, draft);
  const blockedFrom = (t: number) => plantingSlots(ctx, arrivals, t) <= drops.reduce((n, d) => (d.readyAt >= t ? n + d.pots : n), 0);
  const lightest = Math.min(...ctx.potClasses.filter((_, j) => (left[j] ?? 0) > 0).map((cl) => cl.massKg));
  const times: { readyAt: number; room: boolean }[] = [];
  draft.crews.forEach((crew, c) => {
    const info = ctx.crafts[c];
    for (let k = 1; crew && info && k <= info.maxRuns; k++) {
      const spare = info.capKg - crewKg(ctx, crew, k) - runPotKg(ctx, draft, c, k);
      const room = (draft.pots[c]?.[k - 1] ?? 0) < info.craft.potSlots && spare + 1e-9 >= lightest;
      times.push({ readyAt: runTiming(ctx, info, k, false).readyAt, room });
    }
  });
  return times.filter((t) => t.room).every((t) => times.some((u) => u.readyAt <= t.readyAt && blockedFrom(u.readyAt)));
}

/** Pots left ashore that are heavier than any run of the craft going out could take beside its crew. */
function tooHeavy(ctx: TripContext, draft: Draft, left: readonly number[]): { count: number; spareKg: number } {
  let spareKg = -Infinity;
  draft.crews.forEach((crew, c) => {
    const info = ctx.crafts[c];
    for (let k = 1; crew && info && k <= Math.min(2, info.maxRuns); k++) if (info.craft.potSlots > 0) spareKg = Math.max(spareKg, info.capKg - crewKg(ctx, crew, k));
  });
  const count = ctx.potClasses.reduce((n, cl, j) => (cl.massKg > spareKg + 1e-9 ? n + (left[j] ?? 0) : n), 0);
  return { count, spareKg };
}

/** The pots the draft leaves ashore, split by reason: too heavy, transport, then planting time. */
export function unplacedPots(ctx: TripContext, draft: Draft, idle: readonly IdleCraft[]): UnplacedPots[] {
  const count = Math.max(0, Math.floor(ctx.instance.pots.count));
  const placed = draft.pots.flat().reduce((n, x) => n + x, 0);
  if (placed >= count) return [];
  if (draft.crews.every((crew) => !crew)) return [{ count: count - placed, ...fleetReason(idle) }];
  let transport = 0;
  draft.crews.forEach((crew, c) => {
    for (let k = 1; crew && k <= (ctx.crafts[c]?.maxRuns ?? 0); k++) transport += runRoom(ctx, draft, c, k);
  });
  const out: UnplacedPots[] = [];
  if (transport === 0) return [{ count: count - placed, reason: 'too-heavy', detail: `no craft going out has a free pot slot and ${kg(lightestPotKg(ctx))} to spare beside its crew` }];
  const left = potsLeft(ctx, draft);
  const heavy = tooHeavy(ctx, draft, left);
  if (heavy.count > 0) out.push({ count: heavy.count, reason: 'too-heavy', detail: `${heavy.count} pots weigh more than the ${kg(heavy.spareKg)} any craft going out can take beside its crew` });
  const movable = count - heavy.count;
  if (transport < movable) {
    out.push({ count: movable - Math.max(transport, placed), reason: 'window-too-short', refs: { at: ctx.end }, detail: `the runs that can be unloaded before the window closes at ${clock(ctx.end)} carry at most ${transport} pots` });
  }
  const rest = Math.min(movable, transport) - placed;
  if (rest <= 0) return out;
  const tight = plantingBinds(ctx, draft, left);
  const people = draftArrivals(ctx, draft).length;
  const detail = tight
    ? `the crew at the site (${people} ${people === 1 ? 'person' : 'people'}, planting in pairs) cannot plant more than ${placed} pots before the window closes at ${clock(ctx.end)}`
    : 'the solver stopped before finding room for them';
  out.push({ count: rest, reason: tight ? 'planting-time' : 'left-ashore', detail, ...(tight ? { refs: { at: ctx.end } } : {}) });
  return out;
}
