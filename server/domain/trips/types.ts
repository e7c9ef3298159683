/**
 * Shapes of the trip planner: a self-contained instance in, a trip plan out. Inside the domain
 * every instant is epoch milliseconds (`start`, `departAt`, …); the API speaks ISO strings and
 * converts at its edge (see `api.ts`).
 */
import type { CraftKind } from '../../../shared/schemas/crew.schema.js';

export type { CraftKind };

/** One craft of the fleet. `maxLoadKg` is the maker's rating or the capacity plate. */
export interface TripCraft {
  id: string;
  kind: CraftKind;
  seats: number;
  maxLoadKg: number;
  /** How many pots ride securely on one run. */
  potSlots: number;
  speedKmh: number;
  draftM?: number | null;
  needsOperator: boolean;
  /** A volunteer's own craft: only its owner paddles it. */
  ownerId?: string | null;
  /**
   * Whether `maxLoadKg` comes from a capacity plate (the plated margin applies) or from the
   * maker (the paddlecraft margin). Left out, skiffs and operator-run craft count as plated.
   */
  plated?: boolean | null;
}

/** One person going out to the site. Skills: `paddler`, `operator` (alias `boat-operator`), … */
export interface TripPerson {
  id: string;
  /** Only when the volunteer chose to give it; otherwise the standard assumed weight counts. */
  weightKg?: number | null;
  skills: readonly string[];
  /** Set for a minor: the adult they must ride with, out and back. */
  guardianId?: string | null;
}

/** Share of the rated maximum load the plan may use, by kind of rating. */
export interface LoadMargin {
  /** Kayaks and canoes (maker's figure): default 0.7. */
  paddlecraft: number;
  /** Craft rated by a capacity plate (by default skiffs and operator-run craft): default 1.0. */
  plated: number;
}

export interface TripInstance {
  /** The low-water window, epoch ms. */
  window: { start: number; end: number };
  route: { distanceKm: number; loadMinutes: number; unloadMinutes: number };
  /** Minutes one pair of planters needs per tree; 0 or less means planting is not limited. */
  plantingMinutesPerTree: number;
  loadMargin?: LoadMargin;
  /** Weight counted for a person who gave none; default `DEFAULT_STANDARD_PERSON_KG`. */
  standardPersonKg?: number;
  craft: readonly TripCraft[];
  people: readonly TripPerson[];
  pots: TripPots;
}

/**
 * The pots to take out. `masses` lists the recorded mass of individual pots (at most `count`
 * of them); every other pot weighs `massKg`. Without `masses` all `count` pots weigh `massKg`.
 * @example { count: 4, massKg: 27, masses: [31.5, 24] } // 31.5, 24, 27 and 27 kg
 */
export interface TripPots {
  count: number;
  massKg: number;
  masses?: readonly number[];
}

/** Tuning that is not part of the instance. */
export interface TripOptions {
  /** Weight counted for a person who gave none when the instance sets none; default `DEFAULT_STANDARD_PERSON_KG`. */
  standardPersonKg?: number;
  /** HiGHS wall-clock limit in seconds; default 1.5. */
  timeLimitSeconds?: number;
}

/** One leg from the launch to the site (and back). `people` lists everyone aboard on the way out. */
export interface TripRun {
  craftId: string;
  /** 1-based run number of this craft. */
  run: number;
  departAt: number;
  landAt: number;
  returnAt: number;
  people: string[];
  pots: number;
  /** The mass of each pot aboard, when the instance gives per-pot masses. */
  potMassesKg?: number[];
  /** People plus pots, kg, with each pot at its own mass. */
  loadKg: number;
  /** Load as a share of the rated maximum (`maxLoadKg`), not of the margin. */
  loadShare: number;
}

/** Why a person or pots stayed ashore, or why a craft stayed idle. */
export type UnplacedReason =
  | 'no-craft'
  | 'window-too-short'
  | 'no-operator'
  | 'no-paddler'
  | 'owner-absent'
  | 'no-seat'
  | 'over-load'
  | 'too-heavy'
  | 'guardian-not-aboard'
  | 'planting-time'
  | 'left-ashore';

/**
 * What a reason's `detail` names, so a reader can put names and local times in without parsing
 * the text: the craft and people it mentions by id and the instant it gives as a UTC clock time
 * (epoch ms here, ISO in the API).
 */
export interface ReasonRefs {
  craftIds?: string[];
  personIds?: string[];
  at?: number;
}

export interface UnplacedPerson {
  id: string;
  reason: UnplacedReason;
  detail: string;
  refs?: ReasonRefs;
}

export interface UnplacedPots {
  count: number;
  reason: UnplacedReason;
  detail: string;
  refs?: ReasonRefs;
}

export interface IdleCraft {
  craftId: string;
  reason: UnplacedReason | 'not-needed';
  detail: string;
  refs?: ReasonRefs;
}

export type TripPlanStatus = 'optimal' | 'feasible' | 'infeasible';

export interface TripPlan {
  status: TripPlanStatus;
  runs: TripRun[];
  /** When the last run carrying pots lands; null when no pot moves. */
  lastLandingAt: number | null;
  unplaced: { pots: number; potReasons: UnplacedPots[]; people: UnplacedPerson[] };
  /** Craft making no run, with the reason. */
  idleCraft: IdleCraft[];
  solver: 'highs' | 'heuristic';
  /**
   * HiGHS's relative MIP gap on the weighted objective; 0 when proven optimal. The weights make
   * even a small figure worth a pot or a landing slot: read `potsUpperBound` for the pots.
   */
  gap?: number;
  /** Most pots any valid plan could land, as far as the solver proved. */
  potsUpperBound?: number;
  warnings: string[];
}

/**
 * One broken rule found by `validateTripPlan`: where it is (craft, run, people), the figures
 * behind it and a plain message with ids, kg and UTC times (for logs and tests). People read
 * `violationText`'s version, with names, the organisation's units and its time zone.
 */
export interface TripViolation {
  rule: TripViolationRule;
  craftId?: string;
  run?: number;
  /** The people it is about (a minor first, then their guardian). */
  personIds?: string[];
  facts?: TripViolationFacts;
  message: string;
}

export type TripViolationRule =
  | 'unknown-craft'
  | 'unknown-person'
  | 'run-order'
  | 'timing'
  | 'seats'
  | 'load'
  | 'pot-slots'
  | 'pots-total'
  | 'skipper'
  | 'operator'
  | 'own-kayak'
  | 'paddler'
  | 'travels-once'
  | 'guardian'
  | 'return'
  | 'window'
  | 'planting-time';

/** Figures behind a violation: masses in kg, instants in epoch ms. Which ones are set depends on the rule. */
export interface TripViolationFacts {
  /** People, pots or runs counted (seats, pot slots, pots-total, planting-time). */
  count?: number;
  /** The limit that count breaks (seats, pot slots, ready pots, pots the crew can plant). */
  limit?: number;
  loadKg?: number;
  /** The load margin in kg (the share `marginShare` of `ratedKg`). */
  limitKg?: number;
  ratedKg?: number;
  marginShare?: number;
  /** The instant that breaks the rule, and the one it had to respect. */
  at?: number;
  by?: number;
  /** Run numbers involved (run order, travels-once). */
  runs?: number[];
  /** Craft involved beside `craftId` (a person riding out in two craft). */
  craftIds?: string[];
  /** Planting pairs at the site (planting-time). */
  pairs?: number;
  /** Speed of the craft in km/h (a landing time that does not match it). */
  speedKmh?: number;
  /** Which time of a run is off (timing). */
  which?: 'depart' | 'land' | 'return';
}
