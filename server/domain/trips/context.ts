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
import { hasPotMasses, potClasses, type PotClass } from './pot-classes.js';
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
  /** Rated by a capacity plate (see `isPlated`); else the paddlecraft margin applies. */
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
  /** Pot mass classes, lightest first (see `pot-classes.ts`); one class when all pots weigh the same. */
  potClasses: PotClass[];
  /** Whether the instance gives per-pot masses (runs then list their pots' masses). */
  perPotMasses: boolean;
}

const positive = (n: number | null | undefined): n is number => typeof n === 'number' && Number.isFinite(n) && n > 0;

/**
 * Whether a craft's rating is a capacity plate: as the craft says when it says (the fleet's
 * `hasCapacityPlate`); otherwise skiffs and operator-run craft are taken to carry one.
 */
export const isPlated = (craft: TripCraft) => (typeof craft.plated === 'boolean' ? craft.plated : craft.kind === 'skiff' || craft.needsOperator);

/** The load margin that applies to a craft (see `DEFAULT_LOAD_MARGIN`). */
export function marginFor(craft: TripCraft, margin: LoadMargin = DEFAULT_LOAD_MARGIN): number {
  return Math.min(1, Math.max(0, isPlated(craft) ? margin.plated : margin.paddlecraft));
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
  maxRuns = Math.min(maxRuns, MAX_RUNS_PER_CRAFT, Math.max(0, Math.floor(instance.pots.count)) + 1);
  return { craft, index, plated: isPlated(craft), capKg, travelMs, cycleMs, maxRuns };
}

/** The weight counted for a person who gave none: the instance's, else the options', else the default. */
export function standardWeight(instance: TripInstance, options: TripOptions = {}): number {
  if (positive(instance.standardPersonKg)) return instance.standardPersonKg;
  return positive(options.standardPersonKg) ? options.standardPersonKg : DEFAULT_STANDARD_PERSON_KG;
}

/** Precomputes craft, person and pot facts; `standardWeight` fills missing weights. */
export function buildContext(instance: TripInstance, options: TripOptions = {}): TripContext {
  const standard = standardWeight(instance, options);
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
    potClasses: potClasses(instance.pots),
    perPotMasses: hasPotMasses(instance.pots),
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

/** The lightest pot class's mass (every pot's when they all weigh the same). */
export const lightestPotKg = (ctx: TripContext) => ctx.potClasses[0]?.massKg ?? ctx.instance.pots.massKg;

/**
 * Pots of `massKg` (default: the lightest class) that fit on one run beside `peopleKg` of
 * people. With several pot classes this is an upper bound: heavier pots fit fewer.
 */
export function potRoom(ctx: TripContext, c: CraftInfo, peopleKg: number, massKg = lightestPotKg(ctx)): number {
  const byLoad = massKg > 0 ? Math.floor((c.capKg - peopleKg) / massKg + 1e-9) : Number.MAX_SAFE_INTEGER;
  return Math.max(0, Math.min(Math.max(0, Math.floor(c.craft.potSlots)), byLoad));
}

