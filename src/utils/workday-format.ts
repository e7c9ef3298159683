import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { addDays, formatDateKey, formatLocalRange, localDateKey, zonedTime, type DateKey } from './zoned-time';

/** The times of a workday and the zone of its site, which is how every workday time is shown. */
export type WorkdayTimes = Pick<WorkdayDto, 'startsAt' | 'endsAt'> & { site: Pick<WorkdayDto['site'], 'timeZone'> };

/** The workday's date at its site, e.g. '2025-03-15'. */
export function workdayDateKey(w: WorkdayTimes): DateKey {
  return localDateKey(w.startsAt, w.site.timeZone);
}

/** @example workdayDate(w) // 'Sat 15 Mar 2025' (in the site's zone) */
export function workdayDate(w: WorkdayTimes, options: { weekday?: 'short' | 'long'; year?: boolean } = {}): string {
  return formatDateKey(workdayDateKey(w), { year: options.year ?? true, weekday: options.weekday });
}

/** @example workdayHours(w) // '07:30–11:00 EDT' */
export function workdayHours(w: WorkdayTimes): string {
  return formatLocalRange(w.startsAt, w.endsAt, w.site.timeZone);
}

/** @example workdayWhen(w) // 'Sat 15 Mar 2025, 07:30–11:00 EDT' */
export function workdayWhen(w: WorkdayTimes): string {
  return `${workdayDate(w)}, ${workdayHours(w)}`;
}

/** Local midnight to local midnight of the workday's date at its site, for the day's tide. */
export function workdayDaySpan(w: WorkdayTimes): { from: string; to: string } {
  const key = workdayDateKey(w);
  const tz = w.site.timeZone;
  return { from: zonedTime(key, tz).toISOString(), to: zonedTime(addDays(key, 1), tz).toISOString() };
}

/** The "what to bring" text as list items, one per line (a leading dash or bullet is dropped). */
export function bringList(text: string): string[] {
  return text
    .split(/\r?\n/)
    .map((line) => line.replace(/^\s*[-*\u2022]\s*/, '').trim())
    .filter((line) => line.length > 0);
}
