import type { CraftKind } from '@shared/schemas/crew.schema';
import type { StoredTripPlan, TripCraftDto, TripPlanDto, TripRunDto } from '@/api/trip-plans';
import { craftKindLabel } from './crew-labels';

/**
 * The planner's default load margins (the server's DEFAULT_LOAD_MARGIN, issue 6): plan to at most
 * 70 % of a paddlecraft's rated load (paddlers' common practice, TRADE.md §1) and 100 % of a
 * capacity plate. Used only to draw the margin line when the plan's instance names none.
 */
export const DEFAULT_LOAD_MARGIN = { paddlecraft: 0.7, plated: 1 } as const;

/** Whether the rating is a capacity plate: as the instance says, else skiffs and operator-run craft (the planner's rule). */
export function isPlated(craft: Pick<TripCraftDto, 'kind' | 'needsOperator' | 'plated'>): boolean {
  return craft.plated ?? (craft.kind === 'skiff' || craft.needsOperator);
}

/** The share of the rated maximum the plan may use on this craft; never above 1. */
export function craftMargin(craft: Pick<TripCraftDto, 'kind' | 'needsOperator' | 'plated'>, margin: { paddlecraft: number; plated: number } = DEFAULT_LOAD_MARGIN): number {
  return Math.min(1, Math.max(0, isPlated(craft) ? margin.plated : margin.paddlecraft));
}

export type LoadState = 'within' | 'above-margin' | 'above-rating';

/** Above the rating is never acceptable; above the margin breaks the plan's rule. */
export function loadState(share: number, margin: number): LoadState {
  if (share > 1 + 1e-9) return 'above-rating';
  return share > margin + 1e-9 ? 'above-margin' : 'within';
}

export interface TripNames {
  people: ReadonlyMap<string, string>;
  craft: ReadonlyMap<string, string>;
}

/** Names for the ids a plan speaks in: people from the roster, craft from the fleet, own kayaks by their owner. */
export function tripNames(
  instance: StoredTripPlan['instance'],
  roster: readonly { userId: string; name: string }[],
  fleet: readonly { id: string; name: string }[],
): TripNames {
  const people = new Map(roster.map((r) => [r.userId, r.name]));
  const fleetNames = new Map(fleet.map((c) => [c.id, c.name]));
  const craft = new Map(
    instance.craft.map((c) => {
      const owner = c.ownerId ? people.get(c.ownerId) : undefined;
      const name = fleetNames.get(c.id) ?? (owner ? `${owner}’s own ${kindNoun(c.kind)}` : craftKindLabel(c.kind));
      return [c.id, name];
    }),
  );
  return { people, craft };
}

function kindNoun(kind: CraftKind): string {
  return kind === 'other' ? 'craft' : craftKindLabel(kind).toLowerCase();
}

export const personName = (names: TripNames, id: string) => names.people.get(id) ?? 'A crew member';
export const craftName = (names: TripNames, id: string) => names.craft.get(id) ?? 'A craft';

/** The planner's messages name people and craft by id; this puts their names in. */
export function humanize(text: string, names: TripNames): string {
  const pairs = [...names.craft.entries(), ...names.people.entries()].sort((a, b) => b[0].length - a[0].length);
  return pairs.reduce((out, [id, name]) => out.split(id).join(name), text);
}

export interface TripLane {
  craft: TripCraftDto;
  name: string;
  margin: number;
  runs: TripRunDto[];
  /** Why the craft makes no run, in words. */
  idle: string | null;
}

/** One lane per craft: those going out first (by first departure), then the idle ones with their reason. */
export function tripLanes(stored: StoredTripPlan, names: TripNames): TripLane[] {
  const { instance, plan } = stored;
  const lanes = instance.craft.map((craft) => {
    const runs = plan.runs.filter((r) => r.craftId === craft.id).sort((a, b) => a.run - b.run);
    const idle = plan.idleCraft.find((i) => i.craftId === craft.id);
    return { craft, name: craftName(names, craft.id), margin: craftMargin(craft, instance.loadMargin), runs, idle: runs.length ? null : humanize(idle?.detail ?? 'makes no run in this plan', names) };
  });
  const first = (l: TripLane) => (l.runs[0] ? Date.parse(l.runs[0].departAt) : Infinity);
  return lanes.sort((a, b) => first(a) - first(b) || a.name.localeCompare(b.name));
}

export interface PlanStatus {
  label: string;
  tone: 'success' | 'info' | 'warning' | 'danger';
  text: string;
}

/** The plan's standing in plain words. Never "safe": it fits the planner's rules, and people decide on the water. */
export function planStatus(plan: TripPlanDto, source: StoredTripPlan['source']): PlanStatus {
  if (plan.status === 'infeasible') return { label: 'Nothing fits', tone: 'danger', text: 'No plan fits every rule with this crew, fleet and tide. See below what could not be placed and why.' };
  if (source === 'edited') return { label: 'Edited by hand', tone: 'info', text: 'Checked against every rule after each change, but not proven the best plan.' };
  if (plan.status === 'optimal') return { label: 'Proven best', tone: 'success', text: 'The solver proved that no plan lands more pots, sooner, with fewer runs.' };
  return { label: 'Workable', tone: 'warning', text: 'Fits every rule, but the solver stopped before proving it the best plan.' };
}

/** Everyone in the instance who is on no run. */
export function peopleAshore(stored: StoredTripPlan): string[] {
  const aboard = new Set(stored.plan.runs.flatMap((r) => r.people));
  return stored.instance.people.map((p) => p.id).filter((id) => !aboard.has(id));
}

/** Pots of the instance that no run carries. */
export function potsAshore(stored: StoredTripPlan): number {
  return Math.max(0, stored.instance.pots.count - stored.plan.runs.reduce((n, r) => n + r.pots, 0));
}

export interface PlacedViolation {
  text: string;
  /** `runKey` of the run it is about, when the message names one. */
  runKey?: string;
  craftId?: string;
}

const RUN_PATH = /^runs\.(\d+)(?:\.(.+))?$/;

/**
 * Puts each reason of a refused edit beside the run or craft it concerns. The server files each
 * message (already in names, the organisation's units and zone) under the body path it is about:
 * `runs.<i>` for the i-th run sent, `runs.<i>.craftId` for the craft of that run, `_` for the
 * whole plan; `runs` repeats them all and is read only when nothing else came.
 */
export function placeRefusal(fields: Readonly<Record<string, readonly string[]>>, sent: readonly TripRunDto[]): PlacedViolation[] {
  const placed = Object.entries(fields).filter(([path]) => path !== 'runs');
  if (placed.length === 0) return (fields.runs ?? []).map((text) => ({ text }));
  return placed.flatMap(([path, texts]) => {
    const m = RUN_PATH.exec(path);
    const run = m ? sent[Number(m[1])] : undefined;
    if (!run) return texts.map((text) => ({ text }));
    if (m?.[2] === 'craftId') return texts.map((text) => ({ text, craftId: run.craftId }));
    return texts.map((text) => ({ text, runKey: `${run.craftId}#${run.run}`, craftId: run.craftId }));
  });
}

/** Short facts the coordinator needs beside a name: skills the plan relies on, a minor's guardian, an own kayak. */
export function personTags(instance: StoredTripPlan['instance'], id: string, names: TripNames): string[] {
  const person = instance.people.find((p) => p.id === id);
  if (!person) return [];
  const tags: string[] = [];
  if (person.skills.includes('operator') || person.skills.includes('boat-operator')) tags.push('Boat operator');
  if (person.skills.includes('paddler')) tags.push('Paddler');
  if (instance.craft.some((c) => c.ownerId === id)) tags.push('Own kayak');
  if (person.guardianId) tags.push(`Minor, with ${personName(names, person.guardianId)}`);
  return tags;
}
