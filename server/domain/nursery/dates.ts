/** Calendar-date helpers for nursery schedules: dates are `YYYY-MM-DD` with no time zone. */
import { NurseryInputError } from './errors.js';

const DAY_MS = 86_400_000;
const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** Midnight UTC of a calendar date, after checking its form (throws `NurseryInputError` on `field`). */
export function dateMs(date: string, field = 'date'): number {
  const ms = ISO_DATE.test(date) ? Date.parse(`${date}T00:00:00Z`) : Number.NaN;
  if (Number.isNaN(ms) || new Date(ms).toISOString().slice(0, 10) !== date) {
    throw new NurseryInputError(field, `${field} must be a calendar date YYYY-MM-DD (got "${date}").`);
  }
  return ms;
}

/**
 * The calendar date `days` after `date` (before it when negative).
 * @example addDays('2026-02-27', 2) // '2026-03-01'
 */
export function addDays(date: string, days: number): string {
  return new Date(dateMs(date) + days * DAY_MS).toISOString().slice(0, 10);
}

/**
 * Whole days from `from` to `to` (negative when `to` is earlier).
 * @example daysBetween('2026-03-01', '2026-03-22') // 21
 */
export function daysBetween(from: string, to: string): number {
  return Math.round((dateMs(to) - dateMs(from)) / DAY_MS);
}
