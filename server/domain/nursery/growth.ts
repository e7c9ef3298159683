/**
 * "Ready by date X": when a tree will be tall enough, from its height measurements.
 *
 * Simplification: growth is taken as a straight line — the least-squares slope (cm/day) through
 * the last few measurements, carried forward from the latest measured height. Real seedlings grow
 * in flushes and slow in the cool months, so the date is a rough guide to re-check after each
 * measurement round, not a promise.
 */
import { addDays, daysBetween } from './dates.js';
import { roundTo } from './format.js';

export interface HeightMeasurement {
  date: string;
  heightCm: number;
}

export interface GrowthForecast {
  /** Fitted growth rate, cm/day (null with fewer than two measurement dates). */
  rateCmPerDay: number | null;
  /** Date the needed height is reached (the latest measurement's date if already there). */
  readyOn: string | null;
  /** Why there is no date. */
  reason?: 'too_few_measurements' | 'not_growing';
}

/** Measurements used for the rate, by default. */
export const GROWTH_DEFAULT_LAST_N = 4;

/** Least-squares slope of height against day number; null when all dates are the same. */
function slopePerDay(points: readonly HeightMeasurement[]): number | null {
  const first = points[0]!.date;
  const xs = points.map((p) => daysBetween(first, p.date));
  const ys = points.map((p) => p.heightCm);
  const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
  const my = ys.reduce((a, b) => a + b, 0) / ys.length;
  let sxy = 0;
  let sxx = 0;
  xs.forEach((x, i) => {
    sxy += (x - mx) * (ys[i]! - my);
    sxx += (x - mx) ** 2;
  });
  return sxx === 0 ? null : sxy / sxx;
}

/**
 * Forecasts when a tree reaches `neededHeightCm` (e.g. its height plus readiness's
 * `heightShortfallCm`).
 * @example growthForecast({ measurements: [{ date: '2026-01-01', heightCm: 30 }, { date: '2026-01-31', heightCm: 36 }], neededHeightCm: 45 })
 *   // { rateCmPerDay: 0.2, readyOn: '2026-03-17' }
 */
export function growthForecast(input: { measurements: readonly HeightMeasurement[]; neededHeightCm: number; lastN?: number }): GrowthForecast {
  const sorted = [...input.measurements].sort((a, b) => daysBetween(b.date, a.date));
  const recent = sorted.slice(-Math.max(2, input.lastN ?? GROWTH_DEFAULT_LAST_N));
  const latest = recent.at(-1);
  const rate = recent.length < 2 ? null : slopePerDay(recent);
  const rateCmPerDay = rate === null ? null : roundTo(rate, 3);
  if (latest && latest.heightCm >= input.neededHeightCm) return { rateCmPerDay, readyOn: latest.date };
  if (!latest || rate === null) return { rateCmPerDay, readyOn: null, reason: 'too_few_measurements' };
  if (rate <= 0) return { rateCmPerDay, readyOn: null, reason: 'not_growing' };
  const days = Math.ceil((input.neededHeightCm - latest.heightCm) / rate - 1e-9);
  return { rateCmPerDay, readyOn: addDays(latest.date, days) };
}
