/**
 * Scores low-water windows for the coordinator and attaches plain cautions. Scores rank
 * options; they never say a time is safe.
 */
import { localParts } from './time-zone.js';
import { workableBand, type LowWaterWindow, type WindowDepths } from './windows.js';

/**
 * Relative weights of the score's parts (any non-negative numbers; they are normalised).
 * Defaults: duration 0.4, lowWater 0.2, weekend 0.25, startHour 0.15 — length matters most
 * because it sets how many trees a day can plant; weekends are when most volunteers come.
 */
export interface WindowWeights {
  /** Longer windows, full marks at `fullDurationMinutes`. */
  duration: number;
  /** Lower lowest water, relative to the workable band (full marks at its floor). */
  lowWater: number;
  /** Starts on a Saturday or Sunday in the site's zone. */
  weekend: number;
  /** Starts within the preferred hours, fading to zero `startHourFadeHours` outside them. */
  startHour: number;
}

/** The default weights (see `WindowWeights`). */
export const DEFAULT_WINDOW_WEIGHTS: WindowWeights = { duration: 0.4, lowWater: 0.2, weekend: 0.25, startHour: 0.15 };

/** Ranking settings besides the weights. */
export interface RankingOptions extends WindowDepths {
  timeZone: string;
  weights?: WindowWeights;
  /** Default 240: a four-hour window gets full marks for length. */
  fullDurationMinutes?: number;
  /** Local start hours with full marks, default [8, 11] (8:00 to 11:00). */
  preferredStartHours?: [number, number];
  /** Default 3. */
  startHourFadeHours?: number;
  /**
   * Lowest level below which the soft-mud caution shows; default 0 (the datum, e.g. MLLW).
   * `null` turns the caution off (a firm bed).
   */
  softMudBelow?: number | null;
}

/** Which caution applies; the client may word or style each one. */
export type CautionCode = 'pre-dawn' | 'after-sunset' | 'very-low-tide-soft-mud';

/** A caution with its plain text. */
export interface Caution {
  code: CautionCode;
  text: string;
}

/** A window with its score and cautions. */
export interface ScoredWindow extends LowWaterWindow {
  /** 0–100, higher is a better fit for a workday. */
  score: number;
  cautions: Caution[];
}

/** Plain caution texts: they defer to local knowledge and never call a time safe. */
export const CAUTION_TEXTS: Record<CautionCode, string> = {
  'pre-dawn': 'Starts before sunrise, in civil twilight: carry lights and check local rules for being on the water before sunrise. Local knowledge comes first.',
  'after-sunset': 'Runs past sunset, into civil twilight: plan the return while there is still light. Local knowledge comes first.',
  'very-low-tide-soft-mud': 'Very low water: wide soft-mud flats may be exposed and people can sink in soft mud. Ask crews who know this shore before stepping off the craft.',
};

const WEIGHT_KEYS = ['duration', 'lowWater', 'weekend', 'startHour'] as const;
const clamp01 = (x: number) => Math.min(1, Math.max(0, x));

/** How comfortable a local start hour (fractional) is: 1 inside the preferred hours, fading outside. */
export function startHourFit(hour: number, preferred: [number, number], fadeHours: number): number {
  const away = hour < preferred[0] ? preferred[0] - hour : hour > preferred[1] ? hour - preferred[1] : 0;
  return clamp01(1 - away / fadeHours);
}

/** Scores one window (0–100) and lists its cautions. */
export function scoreWindow(w: LowWaterWindow, o: RankingOptions): ScoredWindow {
  const weights = o.weights ?? DEFAULT_WINDOW_WEIGHTS;
  const local = localParts(w.startMs, o.timeZone);
  const { lo, hi } = workableBand(o);
  const parts: Record<keyof WindowWeights, number> = {
    duration: clamp01(w.durationMinutes / (o.fullDurationMinutes ?? 240)),
    lowWater: hi > lo ? clamp01((hi - w.lowestLevel) / (hi - lo)) : 0,
    weekend: local.weekday === 0 || local.weekday === 6 ? 1 : 0,
    startHour: startHourFit(local.hour + local.minute / 60, o.preferredStartHours ?? [8, 11], o.startHourFadeHours ?? 3),
  };
  let total = 0;
  let sum = 0;
  for (const key of WEIGHT_KEYS) {
    total += weights[key];
    sum += weights[key] * parts[key];
  }
  const score = total > 0 ? Math.round((1000 * sum) / total) / 10 : 0;
  return { ...w, score, cautions: cautionsFor(w, o.softMudBelow === undefined ? 0 : o.softMudBelow) };
}

function cautionsFor(w: LowWaterWindow, softMudBelow: number | null): Caution[] {
  const codes: CautionCode[] = [];
  if (w.sunriseMs !== null && w.startMs < w.sunriseMs) codes.push('pre-dawn');
  if (w.sunsetMs !== null && w.endMs > w.sunsetMs) codes.push('after-sunset');
  if (softMudBelow !== null && w.lowestLevel < softMudBelow) codes.push('very-low-tide-soft-mud');
  return codes.map((code) => ({ code, text: CAUTION_TEXTS[code] }));
}

/** Scores windows and orders them best first (ties: earlier first). */
export function rankWindows(windows: readonly LowWaterWindow[], o: RankingOptions): ScoredWindow[] {
  return windows.map((w) => scoreWindow(w, o)).sort((a, b) => b.score - a.score || a.startMs - b.startMs);
}
