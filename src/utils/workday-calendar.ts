import type { WorkdayDto, WorkdayKind } from '@shared/schemas/workday.schema';
import { monthGridKeys, monthOf, type MonthKey } from './window-calendar';
import { WORKDAY_KINDS } from './workday-kinds';
import { workdayDateKey } from './workday-format';
import type { DateKey } from './zoned-time';

/** The calendar's two views: a month (grid or day list) or every upcoming workday in a list. */
export type WorkdayCalendarMode = 'month' | 'list';

export interface WorkdayCalendarDay {
  key: DateKey;
  inMonth: boolean;
  isToday: boolean;
  /** Workdays whose start falls on this date at their own site, earliest first. */
  workdays: WorkdayDto[];
}

export interface WorkdayFilter {
  siteId: string;
  kind: WorkdayKind | '';
}

export interface SiteChoice {
  id: string;
  name: string;
}

export function isWorkdayKind(value: unknown): value is WorkdayKind {
  return typeof value === 'string' && (WORKDAY_KINDS as readonly string[]).includes(value);
}

/** The grid's dates, Monday to Sunday, each with the workdays on its date in their site's zone. */
export function buildWorkdayMonth(workdays: readonly WorkdayDto[], month: MonthKey, today: DateKey): WorkdayCalendarDay[] {
  const byDate = new Map<DateKey, WorkdayDto[]>();
  for (const w of workdays) {
    const key = workdayDateKey(w);
    byDate.set(key, [...(byDate.get(key) ?? []), w]);
  }
  return monthGridKeys(month).map((key) => ({
    key,
    inMonth: monthOf(key) === month,
    isToday: key === today,
    workdays: (byDate.get(key) ?? []).sort((a, b) => a.startsAt.localeCompare(b.startsAt)),
  }));
}

export function filterWorkdays(workdays: readonly WorkdayDto[], filter: WorkdayFilter): WorkdayDto[] {
  return workdays.filter((w) => (!filter.siteId || w.siteId === filter.siteId) && (!filter.kind || w.kind === filter.kind));
}

/** The sites the loaded workdays are at, by name, for the site filter (visitors can't list sites). */
export function siteChoices(workdays: readonly WorkdayDto[]): SiteChoice[] {
  const byId = new Map(workdays.map((w) => [w.siteId, { id: w.siteId, name: w.site.name }]));
  return [...byId.values()].sort((a, b) => a.name.localeCompare(b.name));
}
