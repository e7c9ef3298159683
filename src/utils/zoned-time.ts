/**
 * Calendar and clock arithmetic in a named IANA time zone, with Intl only (no library): tide times
 * travel as UTC instants and are shown in the site's zone, whatever zone the phone is set to.
 */

/** A calendar date as 'YYYY-MM-DD', meaning a day in some zone that the caller knows. */
export type DateKey = string;

type Instant = Date | string | number;

interface ZonedParts {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
}

const partFormats = new Map<string, Intl.DateTimeFormat>();

function partFormat(timeZone: string): Intl.DateTimeFormat {
  let format = partFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      second: '2-digit',
    });
    partFormats.set(timeZone, format);
  }
  return format;
}

function toDate(instant: Instant): Date {
  return instant instanceof Date ? instant : new Date(instant);
}

/** The wall-clock reading in `timeZone` at `instant`. */
export function zonedParts(instant: Instant, timeZone: string): ZonedParts {
  const parts: Record<string, number> = {};
  for (const part of partFormat(timeZone).formatToParts(toDate(instant))) {
    if (part.type !== 'literal') parts[part.type] = Number(part.value);
  }
  return { year: parts.year ?? 0, month: parts.month ?? 1, day: parts.day ?? 1, hour: (parts.hour ?? 0) % 24, minute: parts.minute ?? 0 };
}

function pad(n: number): string {
  return String(n).padStart(2, '0');
}

/** The local date in `timeZone` at `instant`, e.g. '2025-03-04'. */
export function localDateKey(instant: Instant, timeZone: string): DateKey {
  const { year, month, day } = zonedParts(instant, timeZone);
  return `${year}-${pad(month)}-${pad(day)}`;
}

/** Minutes the zone's clock is ahead of UTC at `instant` (New York in winter: −300). */
export function offsetMinutes(instant: Instant, timeZone: string): number {
  const date = toDate(instant);
  const p = zonedParts(date, timeZone);
  const asUtc = Date.UTC(p.year, p.month - 1, p.day, p.hour, p.minute);
  const wholeMinute = Math.floor(date.getTime() / 60_000) * 60_000;
  return Math.round((asUtc - wholeMinute) / 60_000);
}

export function isDateKey(value: unknown): value is DateKey {
  if (typeof value !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(value)) return false;
  const date = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().startsWith(value);
}

function keyToUtcMs(key: DateKey): number {
  const [y, m, d] = key.split('-').map(Number);
  return Date.UTC(y ?? 1970, (m ?? 1) - 1, d ?? 1);
}

/**
 * The instant the local clock in `timeZone` reads `hour`:`minute` on `key`. In a spring-forward gap
 * the later reading is used, so the result always exists.
 * @example zonedTime('2025-03-04', 'America/New_York').toISOString() // '2025-03-04T05:00:00.000Z'
 */
export function zonedTime(key: DateKey, timeZone: string, hour = 0, minute = 0): Date {
  const wall = keyToUtcMs(key) + (hour * 60 + minute) * 60_000;
  const first = wall - offsetMinutes(wall, timeZone) * 60_000;
  const second = wall - offsetMinutes(first, timeZone) * 60_000;
  return new Date(Math.max(first, second));
}

export function addDays(key: DateKey, days: number): DateKey {
  return new Date(keyToUtcMs(key) + days * 86_400_000).toISOString().slice(0, 10);
}

/** Monday is 0 and Sunday 6, as in the calendar grid. */
export function weekdayIndex(key: DateKey): number {
  return (new Date(keyToUtcMs(key)).getUTCDay() + 6) % 7;
}

/** The Monday on or before `key`. */
export function mondayOf(key: DateKey): DateKey {
  return addDays(key, -weekdayIndex(key));
}

/** A date key as words, e.g. 'Tue 4 Mar' (or with `year`, 'Tue 4 Mar 2025'); engines differ on commas, so none. */
export function formatDateKey(key: DateKey, options: { year?: boolean; weekday?: 'short' | 'long' } = {}): string {
  return new Intl.DateTimeFormat('en-GB', {
    timeZone: 'UTC',
    weekday: options.weekday ?? 'short',
    day: 'numeric',
    month: 'short',
    ...(options.year ? { year: 'numeric' } : {}),
  })
    .formatToParts(new Date(keyToUtcMs(key)))
    .filter((part) => part.type !== 'literal')
    .map((part) => part.value)
    .join(' ');
}

/** The local clock time, e.g. '06:42'. */
export function formatLocalTime(instant: Instant, timeZone: string): string {
  const { hour, minute } = zonedParts(instant, timeZone);
  return `${pad(hour)}:${pad(minute)}`;
}

/** The zone's short name at `instant`, e.g. 'EDT'; zones without one give an offset such as 'GMT+1'. */
export function zoneAbbreviation(instant: Instant, timeZone: string): string {
  const part = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'short' })
    .formatToParts(toDate(instant))
    .find((p) => p.type === 'timeZoneName');
  return part?.value ?? timeZone;
}

/** A local time range with the zone, e.g. '06:40–09:10 EDT'. */
export function formatLocalRange(start: Instant, end: Instant, timeZone: string): string {
  return `${formatLocalTime(start, timeZone)}\u2013${formatLocalTime(end, timeZone)} ${zoneAbbreviation(start, timeZone)}`;
}

/** Minutes past local midnight at `instant`, for placing a mark on a day's 24-hour track. */
export function localMinuteOfDay(instant: Instant, timeZone: string): number {
  const { hour, minute } = zonedParts(instant, timeZone);
  return hour * 60 + minute;
}
