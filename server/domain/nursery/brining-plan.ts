/**
 * Brining plan: the steps that take a tank's water from its salinity to a site's, each step a
 * swap of tank water for stock water (sea water going up, fresh water going down), then a hold
 * at the site's salinity before the trees can be planted.
 */
import { addDays, dateMs, daysBetween } from './dates.js';
import { NurseryInputError, requirePpt, requireRange, requireWhole } from './errors.js';
import { formatPpt, roundTo } from './format.js';
import { replaceVolume } from './mixing.js';

/**
 * Defaults. The step size, interval and tolerance are common practice [CP]: TRADE.md §4 found no
 * published source ("about +5 ppt every 4–5 days … over 3–4 weeks"); the 21-day hold is the
 * issue's default for readiness; 35 ppt is open-ocean sea water (TRADE.md §4). The tolerance is
 * half a refractometer's 1-ppt scale division (the division size is from memory [MEM]).
 */
export const BRINING_DEFAULTS = {
  stockPpt: 35,
  freshPpt: 0,
  maxStepPpt: 5,
  intervalDays: 4,
  holdDays: 21,
  tolerancePpt: 0.5,
} as const;

export interface BriningPlanInput {
  currentPpt: number;
  targetPpt: number;
  volumeLitres: number;
  /** Salinity of the water used to raise it (sea water). */
  stockPpt?: number;
  /** Salinity of the water used to lower it (fresh or low-salinity water). */
  freshPpt?: number;
  maxStepPpt?: number;
  intervalDays?: number;
  holdDays?: number;
  /** Within this of the target counts as there already. */
  tolerancePpt?: number;
  /** The day of the first step, `YYYY-MM-DD` (usually today). */
  startDate: string;
  /** The workday the trees are wanted for, `YYYY-MM-DD`. */
  by?: string;
}

/** One water swap. `stockPpt` is the salinity of the water poured in (0 for fresh water). */
export interface BriningStep {
  date: string;
  fromPpt: number;
  toPpt: number;
  replaceLitres: number;
  stockPpt: number;
}

export interface PlanWarning {
  code: 'already_at_target' | 'workday_too_soon';
  message: string;
}

export interface BriningPlan {
  steps: BriningStep[];
  /** Date of the last step (or the start date when already there). */
  reachedOn: string;
  /** reachedOn + holdDays. */
  readyOn: string;
  /** With `by`: the latest start that is still ready on the workday. */
  latestStartOn?: string;
  warnings: PlanWarning[];
}

type Settings = Required<Omit<BriningPlanInput, 'by'>> & { by?: string };

function settingsOf(input: BriningPlanInput): Settings {
  const d = BRINING_DEFAULTS;
  const s: Settings = {
    ...input,
    stockPpt: input.stockPpt ?? d.stockPpt,
    freshPpt: input.freshPpt ?? d.freshPpt,
    maxStepPpt: input.maxStepPpt ?? d.maxStepPpt,
    intervalDays: input.intervalDays ?? d.intervalDays,
    holdDays: input.holdDays ?? d.holdDays,
    tolerancePpt: input.tolerancePpt ?? d.tolerancePpt,
  };
  for (const f of ['currentPpt', 'targetPpt', 'stockPpt', 'freshPpt'] as const) requirePpt(f, s[f]);
  requireRange('volumeLitres', s.volumeLitres, Number.MIN_VALUE, Number.MAX_VALUE, 'L');
  requireRange('maxStepPpt', s.maxStepPpt, 0.1, 45, 'ppt');
  requireRange('tolerancePpt', s.tolerancePpt, 0, 5, 'ppt');
  requireWhole('intervalDays', s.intervalDays, 1);
  requireWhole('holdDays', s.holdDays, 0);
  dateMs(s.startDate, 'startDate');
  if (s.by !== undefined) dateMs(s.by, 'by');
  return s;
}

/** Throws when the swap water cannot reach the target at all. */
function checkReachable(s: Settings): void {
  if (s.targetPpt > s.currentPpt && s.stockPpt < s.targetPpt) {
    throw new NurseryInputError('stockPpt', `Stock water at ${formatPpt(s.stockPpt)} cannot raise the tank to ${formatPpt(s.targetPpt)}; use stock of at least ${formatPpt(s.targetPpt)}.`);
  }
  if (s.targetPpt < s.currentPpt && s.freshPpt > s.targetPpt) {
    throw new NurseryInputError('freshPpt', `Water at ${formatPpt(s.freshPpt)} cannot lower the tank to ${formatPpt(s.targetPpt)}; use water of at most ${formatPpt(s.targetPpt)}.`);
  }
}

/**
 * Equal steps of at most `maxStepPpt`, one every `intervalDays` starting on `startDate`: the
 * number of steps is ⌈|target − current| / maxStep⌉ and the change is split evenly among them
 * (10 → 27 ppt at 5 ppt: 4 steps of 4.25 ppt).
 */
function buildSteps(s: Settings): BriningStep[] {
  const diff = s.targetPpt - s.currentPpt;
  const count = Math.ceil(Math.abs(diff) / s.maxStepPpt - 1e-9);
  const swapPpt = diff > 0 ? s.stockPpt : s.freshPpt;
  return Array.from({ length: count }, (_, i) => {
    const fromPpt = s.currentPpt + (diff * i) / count;
    const toPpt = i + 1 === count ? s.targetPpt : s.currentPpt + (diff * (i + 1)) / count;
    const litres = replaceVolume({ volumeLitres: s.volumeLitres, fromPpt, toPpt, stockPpt: swapPpt });
    return { date: addDays(s.startDate, i * s.intervalDays), fromPpt: roundTo(fromPpt, 2), toPpt: roundTo(toPpt, 2), replaceLitres: roundTo(litres, 2), stockPpt: swapPpt };
  });
}

/**
 * Plans the brining of one tank. The plan starts on `startDate` and finishes as early as the step
 * rules allow; with `by` (the workday) it says the latest start that still works and warns when
 * the trees would not be ready by then. The hold is counted from the last step; readiness counts
 * the real hold from the tank's readings.
 * @throws NurseryInputError for out-of-range input or a target the stock (or fresh) water cannot reach.
 * @example briningPlan({ currentPpt: 10, targetPpt: 27, volumeLitres: 100, startDate: '2026-03-01' })
 *   // 4 steps of 4.25 ppt on 03-01, 03-05, 03-09, 03-13; readyOn '2026-04-03'
 */
export function briningPlan(input: BriningPlanInput): BriningPlan {
  const s = settingsOf(input);
  const warnings: PlanWarning[] = [];
  let steps: BriningStep[] = [];
  if (Math.abs(s.targetPpt - s.currentPpt) <= s.tolerancePpt) {
    const message = `Already at target: the tank is at ${formatPpt(s.currentPpt)}, within ±${formatPpt(s.tolerancePpt)} of ${formatPpt(s.targetPpt)}.`;
    warnings.push({ code: 'already_at_target', message });
  } else {
    checkReachable(s);
    steps = buildSteps(s);
  }
  const reachedOn = steps.at(-1)?.date ?? s.startDate;
  const readyOn = addDays(reachedOn, s.holdDays);
  const plan: BriningPlan = { steps, reachedOn, readyOn, warnings };
  if (s.by === undefined) return plan;
  plan.latestStartOn = addDays(s.by, -daysBetween(s.startDate, readyOn));
  const late = daysBetween(s.by, readyOn);
  if (late > 0) {
    const message = `The workday is too soon: ready on ${readyOn}, ${late} ${late === 1 ? 'day' : 'days'} after it.`;
    warnings.push({ code: 'workday_too_soon', message });
  }
  return plan;
}
