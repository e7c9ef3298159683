/**
 * Facts the planner derives once from an instance: each craft's usable load, leg times and how
 * many runs fit the window; each person's counted weight and skills.
 *
 * Timing model (Ebbroot's choice): a craft is loaded at the launch before each departure, so the
 * first load happens before the window opens and run 1 departs at `window.start`. A run travels
 * `distanceKm / speedKmh`, lands (`landAt`), unloads for `unloadMinutes` (its pots and people are
 * at the site from then: "ready"), travels back, loads again for `loadMinutes` and departs again:
 * run k departs at `start + (k − 1) × (2 × travel + unload + load)`. A run counts only if it is
 * unloaded by `window.end`. A craft's last run does not come back at once: it waits at the site
 * and brings its whole roster back when the window closes, so its `returnAt` is
 * `max(end, ready) + travel`.
 */
import type { LoadMargin, TripCraft, TripInstance, TripOptions, TripPerson } from './types.js';

/**
 * Weight counted for a person who gave none: 84 kg ≈ 185 lb, the average adult weight the US
 * Coast Guard assumes for passenger-vessel stability since 2011 (from memory, unchecked; the
 * older figure was 160 lb, and the boater-education rule of thumb in TRADE.md §1 uses 150 lb).
 */
export const DEFAULT_STANDARD_PERSON_KG = 84;

/**
 * Plan to at most 70 % of a paddlecraft's rated load (paddlers' common advice; low-authority
 * sources, TRADE.md §1) and 100 % of a capacity plate. Margins above 1 are cut to 1: the plan
 * never goes above a rated maximum (DESIGN.md, Safety).
 */
export const DEFAULT_LOAD_MARGIN: LoadMargin = { paddlecraft: 0.7, plated: 1 };

export const DEFAULT_TIME_LIMIT_SECONDS = 1.5;

/** Load balance (the last objective tier) is judged in steps of 1/SHARE_STEPS = 5 % of the rated load. */
export const SHARE_STEPS = 20;

const MINUTE_MS = 60_000;
const HOUR_MS = 3_600_000;
/** No craft needs more runs than this in one window; keeps degenerate inputs bounded. */
const MAX_RUNS_PER_CRAFT = 200;

export interface CraftInfo {
  craft: TripCraft;
  index: number;
  /** Skiffs and operator-run craft carry a plate; the rest use the paddlecraft margin. */
  plated: boolean;
  /** margin × maxLoadKg. */
  capKg: number;
  travelMs: number;
  cycleMs: number;
  /** Runs that are unloaded before the window closes. */
  maxRuns: number;
}

export interface PersonInfo {
  person: TripPerson;
  index: number;
  weightKg: number;
  operator: boolean;
  paddler: boolean;
  minor: boolean;
}

export interface TripContext {
  instance: TripInstance;
  start: number;
  end: number;
  loadMs: number;
  unloadMs: number;
  /** Per tree per pair of planters; 0 = not limited. */
  plantMs: number;
  crafts: CraftInfo[];
  craftById: Map<string, CraftInfo>;
  people: PersonInfo[];
  personById: Map<string, PersonInfo>;
}

const positive = (n: number | null | undefined): n is number => typeof n === 'number' && Number.isFinite(n) && n > 0;

/** The load margin that applies to a craft (see `DEFAULT_LOAD_MARGIN`). */
export function marginFor(craft: TripCraft, margin: LoadMargin = DEFAULT_LOAD_MARGIN): number {
  const plated = craft.kind === 'skiff' || craft.needsOperator;
  return Math.min(1, Math.max(0, plated ? margin.plated : margin.paddlecraft));
}

/** Whether a person holds the operator skill (`operator`, or the sign-up form's `boat-operator`). */
export const hasOperatorSkill = (p: TripPerson) => p.skills.includes('operator') || p.skills.includes('boat-operator');

function craftInfo(instance: TripInstance, craft: TripCraft, index: number): CraftInfo {
  const margin = marginFor(craft, instance.loadMargin);
  const capKg = positive(craft.maxLoadKg) ? margin * craft.maxLoadKg : 0;
  const { distanceKm, loadMinutes, unloadMinutes } = instance.route;
  const travelMs = positive(craft.speedKmh) ? Math.round((Math.max(0, distanceKm) / craft.speedKmh) * HOUR_MS) : Infinity;
  const unloadMs = Math.max(0, unloadMinutes) * MINUTE_MS;
  const cycleMs = 2 * travelMs + unloadMs + Math.max(0, loadMinutes) * MINUTE_MS;
  const room = instance.window.end - instance.window.start - travelMs - unloadMs;
  let maxRuns = 0;
  if (Number.isFinite(room) && room >= 0) maxRuns = cycleMs > 0 ? Math.floor(room / cycleMs) + 1 : MAX_RUNS_PER_CRAFT;
  maxRuns = Math.min(maxRuns, MAX_RUNS_PER_CRAFT, instance.pots.count + 1);
  const plated = craft.kind === 'skiff' || craft.needsOperator;
  return { craft, index, plated, capKg, travelMs, cycleMs, maxRuns };
}

/** Precomputes craft and person facts; `options.standardPersonKg` fills missing weights. */
export function buildContext(instance: TripInstance, options: TripOptions = {}): TripContext {
  const standard = positive(options.standardPersonKg) ? options.standardPersonKg : DEFAULT_STANDARD_PERSON_KG;
  const crafts = instance.craft.map((c, i) => craftInfo(instance, c, i));
  const people = instance.people.map((person, index) => ({
    person,
    index,
    weightKg: positive(person.weightKg) ? person.weightKg : standard,
    operator: hasOperatorSkill(person),
    paddler: person.skills.includes('paddler'),
    minor: person.guardianId != null && person.guardianId !== '',
  }));
  return {
    instance,
    start: instance.window.start,
    end: instance.window.end,
    loadMs: Math.max(0, instance.route.loadMinutes) * MINUTE_MS,
    unloadMs: Math.max(0, instance.route.unloadMinutes) * MINUTE_MS,
    plantMs: positive(instance.plantingMinutesPerTree) ? instance.plantingMinutesPerTree * MINUTE_MS : 0,
    crafts,
    craftById: new Map(crafts.map((c) => [c.craft.id, c])),
    people,
    personById: new Map(people.map((p) => [p.person.id, p])),
  };
}

export interface RunTiming {
  departAt: number;
  landAt: number;
  /** Unloaded: pots and people are at the site. */
  readyAt: number;
  returnAt: number;
}

/** Times of run `k` (1-based) of a craft; `isLast` makes it wait at the site until the close. */
export function runTiming(ctx: TripContext, c: CraftInfo, k: number, isLast: boolean): RunTiming {
  const departAt = ctx.start + (k - 1) * c.cycleMs;
  const landAt = departAt + c.travelMs;
  const readyAt = landAt + ctx.unloadMs;
  const returnAt = (isLast ? Math.max(ctx.end, readyAt) : readyAt) + c.travelMs;
  return { departAt, landAt, readyAt, returnAt };
}

/**
 * Whether a person may be a craft's skipper, the one aboard every run who brings it back:
 * never a minor; on a volunteer's own craft only its owner; on an operator-required craft
 * someone with the operator skill; on any other craft someone with the paddler skill (an owner
 * needs no skill for their own kayak). The skipper alone must fit the load margin.
 */
export function canSkipper(p: PersonInfo, c: CraftInfo): boolean {
  if (p.minor || p.weightKg > c.capKg || c.craft.seats < 1) return false;
  const owner = c.craft.ownerId;
  if (owner != null && owner !== '' && owner !== p.person.id) return false;
  if (c.craft.needsOperator) return p.operator;
  return owner === p.person.id || p.paddler;
}

/** Pots that fit on one run beside `peopleKg` of people. */
export function potRoom(ctx: TripContext, c: CraftInfo, peopleKg: number): number {
  const mass = ctx.instance.pots.massKg;
  const byLoad = mass > 0 ? Math.floor((c.capKg - peopleKg) / mass + 1e-9) : Number.MAX_SAFE_INTEGER;
  return Math.max(0, Math.min(Math.max(0, Math.floor(c.craft.potSlots)), byLoad));
}
