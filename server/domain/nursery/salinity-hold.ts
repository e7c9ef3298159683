/** How long a tank has been held at a site's salinity, from its reading history. */
import { daysBetween } from './dates.js';

/** One salinity reading of the tank a tree stands in. */
export interface SalinityReading {
  date: string;
  ppt: number;
}

export interface SalinityHold {
  /** The latest reading on or before `today`, if any. */
  latestPpt: number | null;
  /** First reading within tolerance after the last one outside it (null when the latest is outside). */
  holdStart: string | null;
  /** Days from `holdStart` to `today` (0 without a hold). */
  heldDays: number;
}

/**
 * The current hold at `sitePpt` ± `tolerancePpt`: it starts at the first reading within tolerance
 * after the last reading outside it, and lasts until `today`. Readings after `today` are ignored;
 * readings on the same day keep their given order (the last is the latest).
 * @example salinityHold([{ date: '2026-03-01', ppt: 26 }, { date: '2026-03-05', ppt: 31 }], 32, 2, '2026-03-17')
 *   // { latestPpt: 31, holdStart: '2026-03-05', heldDays: 12 }
 */
export function salinityHold(readings: readonly SalinityReading[], sitePpt: number, tolerancePpt: number, today: string): SalinityHold {
  const past = readings
    .map((r, i) => ({ ...r, i }))
    .filter((r) => daysBetween(r.date, today) >= 0)
    .sort((a, b) => daysBetween(b.date, a.date) || a.i - b.i);
  const within = (ppt: number) => Math.abs(ppt - sitePpt) <= tolerancePpt + 1e-9;
  const latest = past.at(-1);
  if (!latest) return { latestPpt: null, holdStart: null, heldDays: 0 };
  if (!within(latest.ppt)) return { latestPpt: latest.ppt, holdStart: null, heldDays: 0 };
  let start = past.length - 1;
  while (start > 0 && within(past[start - 1]!.ppt)) start--;
  const holdStart = past[start]!.date;
  return { latestPpt: latest.ppt, holdStart, heldDays: daysBetween(holdStart, today) };
}
