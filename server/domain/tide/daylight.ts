/**
 * Sunrise, sunset and civil twilight (sun 6° below the horizon) from suncalc, per local date
 * in the site's time zone, and the daylight intervals over a span.
 */
import * as SunCalc from 'suncalc';
import { datesBetween, localDate, zonedTimeToUtc, zoneOffsetMinutes } from './time-zone.js';
import type { TimeInterval } from './types.js';

/** Sun times of one local date as UTC instants; `null` when the event does not happen. */
export interface SunDay {
  /** Local date `YYYY-MM-DD` in the site's zone. */
  date: string;
  civilDawnMs: number | null;
  sunriseMs: number | null;
  sunsetMs: number | null;
  civilDuskMs: number | null;
  /** Polar day or night (sun never crosses the horizon that day). */
  alwaysUp: boolean;
  alwaysDown: boolean;
}

/** A span of workable light, with the day's sunrise and sunset for display and cautions. */
export interface DaylightInterval extends TimeInterval {
  date: string;
  sunriseMs: number | null;
  sunsetMs: number | null;
}

const ms = (d: Date | null) => (d ? d.getTime() : null);

/**
 * Sun times for a local date at a place. suncalc solves for the solar day containing the
 * instant it is given, so it is handed (about) local noon of that date; an hour off does not
 * change the day, so the zone offset at 12:00 UTC is good enough and costs one lookup.
 * @example sunDay('2020-12-21', 27.9506, -82.4572, 'America/New_York').sunriseMs
 */
export function sunDay(date: string, latitude: number, longitude: number, timeZone: string): SunDay {
  const utcNoon = Date.parse(`${date}T12:00:00Z`);
  const noon = utcNoon - zoneOffsetMinutes(utcNoon, timeZone) * 60_000;
  const t = SunCalc.getTimes(new Date(noon), latitude, longitude);
  return {
    date,
    civilDawnMs: ms(t.dawn),
    sunriseMs: ms(t.sunrise),
    sunsetMs: ms(t.sunset),
    civilDuskMs: ms(t.dusk),
    alwaysUp: t.alwaysUp === true,
    alwaysDown: t.alwaysDown === true,
  };
}

/** Options for `daylightIntervals`. */
export interface DaylightOptions {
  fromMs: number;
  toMs: number;
  latitude: number;
  longitude: number;
  timeZone: string;
  /** Count civil twilight (dawn to dusk) as workable light; default false (sunrise to sunset). */
  includeCivilTwilight?: boolean;
}

/**
 * One interval of light per local date touching [fromMs, toMs], clipped to the span: sunrise
 * to sunset, or civil dawn to civil dusk when twilight counts. A polar day gives the whole
 * local day; a polar night gives nothing.
 */
export function daylightIntervals(o: DaylightOptions): DaylightInterval[] {
  const out: DaylightInterval[] = [];
  for (const date of datesBetween(localDate(o.fromMs, o.timeZone), localDate(o.toMs, o.timeZone))) {
    const day = sunDay(date, o.latitude, o.longitude, o.timeZone);
    const span = lightSpan(day, o.timeZone, o.includeCivilTwilight === true);
    if (!span) continue;
    const startMs = Math.max(span.startMs, o.fromMs);
    const endMs = Math.min(span.endMs, o.toMs);
    if (endMs > startMs) out.push({ date, startMs, endMs, sunriseMs: day.sunriseMs, sunsetMs: day.sunsetMs });
  }
  return out;
}

function lightSpan(day: SunDay, timeZone: string, twilight: boolean): TimeInterval | null {
  const start = twilight ? day.civilDawnMs ?? day.sunriseMs : day.sunriseMs;
  const end = twilight ? day.civilDuskMs ?? day.sunsetMs : day.sunsetMs;
  if (start !== null && end !== null) return { startMs: start, endMs: end };
  if (!day.alwaysUp) return null;
  const [y, m, d] = day.date.split('-').map(Number);
  const midnight = zonedTimeToUtc(timeZone, y ?? 0, m ?? 1, d ?? 1);
  return { startMs: midnight, endMs: midnight + 86_400_000 };
}
