/**
 * Wall-clock arithmetic in an IANA time zone with Intl.DateTimeFormat (no date library):
 * local date parts of an instant, and the instant of a local wall-clock time.
 */

/** Local calendar parts of an instant in a zone. `weekday`: 0 = Sunday … 6 = Saturday. */
export interface LocalParts {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
  weekday: number;
}

const formatters = new Map<string, Intl.DateTimeFormat>();
const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];

function formatter(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
      second: 'numeric',
      weekday: 'short',
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/**
 * Local date and time of an instant in `timeZone`.
 * @throws RangeError for an unknown zone.
 */
export function localParts(timeMs: number, timeZone: string): LocalParts {
  const parts: Record<string, string> = {};
  for (const p of formatter(timeZone).formatToParts(new Date(timeMs))) parts[p.type] = p.value;
  return {
    year: Number(parts.year),
    month: Number(parts.month),
    day: Number(parts.day),
    hour: Number(parts.hour),
    minute: Number(parts.minute),
    second: Number(parts.second),
    weekday: WEEKDAYS.indexOf(parts.weekday ?? ''),
  };
}

/** Minutes the zone is ahead of UTC at an instant (e.g. −300 for New York in winter). */
export function zoneOffsetMinutes(timeMs: number, timeZone: string): number {
  const p = localParts(timeMs, timeZone);
  const asUtc = Date.UTC(p.year, p.month - 1, p.day, p.hour, p.minute, p.second);
  return Math.round((asUtc - Math.floor(timeMs / 1000) * 1000) / 60_000);
}

/**
 * The instant at which clocks in `timeZone` show the given local time. In a fall-back overlap
 * it is the first occurrence; in a spring-forward gap, the time read with the offset in force
 * before the jump (02:30 on a New York spring-forward day gives 03:30 EDT).
 * @example zonedTimeToUtc('America/New_York', 2016, 1, 1, 12) // Date.parse('2016-01-01T17:00Z')
 */
export function zonedTimeToUtc(timeZone: string, year: number, month: number, day: number, hour = 0, minute = 0): number {
  const wall = Date.UTC(year, month - 1, day, hour, minute);
  const before = wall - zoneOffsetMinutes(wall - 86_400_000, timeZone) * 60_000;
  const after = wall - zoneOffsetMinutes(wall + 86_400_000, timeZone) * 60_000;
  const shows = (t: number) => t + zoneOffsetMinutes(t, timeZone) * 60_000 === wall;
  const matches = [before, after].filter(shows);
  return matches.length ? Math.min(...matches) : before;
}

/** `YYYY-MM-DD` of an instant's local date in `timeZone`. */
export function localDate(timeMs: number, timeZone: string): string {
  const p = localParts(timeMs, timeZone);
  return `${p.year}-${String(p.month).padStart(2, '0')}-${String(p.day).padStart(2, '0')}`;
}

/** Calendar dates `YYYY-MM-DD` from `first` to `last` inclusive. */
export function datesBetween(first: string, last: string): string[] {
  const out: string[] = [];
  const end = Date.parse(`${last}T00:00:00Z`);
  for (let t = Date.parse(`${first}T00:00:00Z`); t <= end; t += 86_400_000) out.push(new Date(t).toISOString().slice(0, 10));
  return out;
}
