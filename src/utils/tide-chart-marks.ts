import type { DaylightDto, TideExtremeDto } from '@shared/schemas/tide.schema';
import { addDays, formatDateKey, localDateKey, zonedTime } from './zoned-time';

/** The time-based marks of the tide chart, kept apart so each is tested on its own. */

export type Span = [number, number];

/** Sunset to the next sunrise (and the week's edges), from one daylight entry per local date. */
export function nightIntervals(daylight: readonly DaylightDto[], from: number, to: number): Span[] {
  const days = daylight
    .flatMap((d): Span[] => (d.sunrise && d.sunset ? [[Date.parse(d.sunrise), Date.parse(d.sunset)]] : []))
    .sort((a, b) => a[0] - b[0]);
  const nights: Span[] = [];
  let cursor = from;
  for (const [rise, set] of days) {
    if (set <= cursor || rise >= to) continue;
    if (rise > cursor) nights.push([cursor, rise]);
    cursor = Math.max(cursor, set);
  }
  if (cursor < to) nights.push([cursor, to]);
  return nights;
}

/** Local midnights (tick marks) and noons (day labels) in the zone, inside [from, to]. */
export function dayMarks(from: number, to: number, timeZone: string): { midnights: number[]; noons: number[] } {
  const midnights: number[] = [];
  const noons: number[] = [];
  for (let key = localDateKey(from, timeZone); zonedTime(key, timeZone).getTime() <= to; key = addDays(key, 1)) {
    const midnight = zonedTime(key, timeZone).getTime();
    const noon = zonedTime(key, timeZone, 12).getTime();
    if (midnight >= from) midnights.push(midnight);
    if (noon >= from && noon <= to) noons.push(noon);
  }
  return { midnights, noons };
}

/** The extremes that get a label: all of them, or on phones only each local day's lowest low. */
export function labelledExtremes(extremes: readonly TideExtremeDto[], timeZone: string, compact: boolean): TideExtremeDto[] {
  if (!compact) return [...extremes];
  const lowest = new Map<string, TideExtremeDto>();
  for (const e of extremes) {
    if (e.type !== 'low') continue;
    const key = localDateKey(e.time, timeZone);
    const best = lowest.get(key);
    if (!best || e.height < best.height) lowest.set(key, e);
  }
  return [...lowest.values()];
}

/** The day label under each noon tick: 'Tue 4 Mar', or on phones 'Tue' over '4'. */
export function dayLabel(value: number, timeZone: string, compact: boolean): string {
  const key = localDateKey(value, timeZone);
  if (!compact) return formatDateKey(key);
  const [weekday = '', day = ''] = formatDateKey(key).split(' ');
  return `${weekday}\n${day}`;
}
