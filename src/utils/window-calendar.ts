import type { LengthUnit } from '@shared/schemas/organisation.schema';
import type { LowWaterWindowDto } from '@shared/schemas/tide.schema';
import { formatLevel } from './tide-format';
import { addDays, formatDateKey, formatLocalRange, formatLocalTime, localDateKey, localMinuteOfDay, mondayOf, type DateKey } from './zoned-time';

/** A month as 'YYYY-MM'. */
export type MonthKey = string;

export interface CalendarSite {
  id: string;
  name: string;
  timeZone: string;
}

/** One window on a day's 24-hour track, in minutes past the site's local midnight. */
export interface CalendarWindow {
  start: string;
  end: string;
  startMinute: number;
  endMinute: number;
  durationMinutes: number;
}

export interface CalendarSiteDay {
  site: CalendarSite;
  /** 1-based, matching the legend. */
  number: number;
  windows: CalendarWindow[];
  lowest: { level: number; time: string } | null;
}

export interface CalendarDay {
  key: DateKey;
  inMonth: boolean;
  isToday: boolean;
  sites: CalendarSiteDay[];
}

export interface CalendarData {
  sites: readonly CalendarSite[];
  windows: readonly LowWaterWindowDto[];
  lowest: readonly { siteId: string; date: string; level: number; time: string }[];
}

export function isMonthKey(value: unknown): value is MonthKey {
  return typeof value === 'string' && /^\d{4}-(0[1-9]|1[0-2])$/.test(value);
}

export function monthOf(key: DateKey): MonthKey {
  return key.slice(0, 7);
}

export function shiftMonth(month: MonthKey, by: number): MonthKey {
  const [y, m] = month.split('-').map(Number);
  const date = new Date(Date.UTC(y ?? 1970, (m ?? 1) - 1 + by, 1));
  return date.toISOString().slice(0, 7);
}

/** 'March 2025'. */
export function formatMonth(month: MonthKey): string {
  return new Date(`${month}-01T00:00:00Z`).toLocaleDateString('en-GB', { timeZone: 'UTC', month: 'long', year: 'numeric' });
}

/** The grid's dates, Monday to Sunday, whole weeks covering the month. */
export function monthGridKeys(month: MonthKey): DateKey[] {
  const first = `${month}-01`;
  const last = addDays(`${shiftMonth(month, 1)}-01`, -1);
  const keys: DateKey[] = [];
  for (let key = mondayOf(first); key <= last || keys.length % 7 !== 0; key = addDays(key, 1)) keys.push(key);
  return keys;
}

/**
 * The instants to ask for: the grid's first and last dates with a day's margin either side, so
 * every site's local dates are covered whatever its zone (the days are then bucketed per zone).
 */
export function calendarQuerySpan(month: MonthKey): { from: string; to: string } {
  const keys = monthGridKeys(month);
  return { from: `${addDays(keys[0] ?? `${month}-01`, -1)}T00:00:00Z`, to: `${addDays(keys[keys.length - 1] ?? `${month}-28`, 2)}T00:00:00Z` };
}

function toCalendarWindow(w: LowWaterWindowDto, timeZone: string): CalendarWindow {
  const startMinute = localMinuteOfDay(w.start, timeZone);
  const sameDay = localDateKey(w.start, timeZone) === localDateKey(w.end, timeZone);
  return { start: w.start, end: w.end, startMinute, endMinute: sameDay ? localMinuteOfDay(w.end, timeZone) : 1440, durationMinutes: w.durationMinutes };
}

/** Each grid date with, per site, its windows (on the site's local date of their start) and lowest water. */
export function buildCalendarDays(data: CalendarData, month: MonthKey, today: DateKey): CalendarDay[] {
  const siteById = new Map(data.sites.map((site) => [site.id, site]));
  const windows = new Map<string, CalendarWindow[]>();
  for (const w of data.windows) {
    const site = siteById.get(w.siteId);
    if (!site) continue;
    const id = `${w.siteId}|${localDateKey(w.start, site.timeZone)}`;
    windows.set(id, [...(windows.get(id) ?? []), toCalendarWindow(w, site.timeZone)]);
  }
  const lowest = new Map(data.lowest.map((l) => [`${l.siteId}|${l.date}`, { level: l.level, time: l.time }]));
  return monthGridKeys(month).map((key) => ({
    key,
    inMonth: monthOf(key) === month,
    isToday: key === today,
    sites: data.sites.map((site, index) => ({
      site,
      number: index + 1,
      windows: (windows.get(`${site.id}|${key}`) ?? []).sort((a, b) => a.start.localeCompare(b.start)),
      lowest: lowest.get(`${site.id}|${key}`) ?? null,
    })),
  }));
}

/** The sites a click on this day could mean: those with windows, or every site when none has one. */
export function sitesToOffer(day: CalendarDay): CalendarSite[] {
  const withWindows = day.sites.filter((s) => s.windows.length > 0).map((s) => s.site);
  return withWindows.length > 0 ? withWindows : day.sites.map((s) => s.site);
}

/** How a day reads aloud (and in the phone list): each site's windows and lowest water. */
export function describeSiteDay(s: CalendarSiteDay, units: LengthUnit): string {
  const windows =
    s.windows.length === 0
      ? 'no window'
      : s.windows.map((w) => formatLocalRange(w.start, w.end, s.site.timeZone)).join(' and ');
  const lowest = s.lowest ? `, lowest ${formatLevel(s.lowest.level, units)} at ${formatLocalTime(s.lowest.time, s.site.timeZone)}` : '';
  return `${s.site.name}: ${windows}${lowest}`;
}

/** @example describeDay(day, 'ft') // 'Tue 4 Mar: Mangrove Point: 06:40–09:10 EDT, lowest −0.6 ft at 07:55' */
export function describeDay(day: CalendarDay, units: LengthUnit): string {
  return [formatDateKey(day.key), ...day.sites.map((s) => describeSiteDay(s, units))].join('; ');
}
