/**
 * Report figures from records (pure): nothing is stored, every total is recomputed from the
 * rows it summarises, so a figure can always be traced back to them.
 *
 * Ranges are calendar dates, `from` and `to` both included. Each record carries its own date:
 * attendance the workday's local date at its site, plantings `plantedOn`, donations the local
 * date they were paid, nursery events the local date they happened.
 */
import { hoursFromMinutes } from '../crew/hours.js';
import type { Condition } from './survival.js';
import { countsAlive } from './tree-condition.js';

export type Period = 'month' | 'quarter' | 'year';

export interface ReportRange {
  from: string;
  to: string;
  siteId?: string;
}

/** Minutes credited to one person for one workday (see `minutesWorked`). */
export interface AttendanceRecord {
  userId: string;
  name: string;
  siteId: string;
  day: string;
  minutes: number;
}

export interface PlantingRecord {
  treeId: string;
  siteId: string;
  siteName: string;
  plantedOn: string;
  /** Condition at the tree's latest check up to the report's end (null: not checked yet). */
  latest: Condition | null;
  lostWithoutCheck: boolean;
}

export interface DonationRecord {
  campaignId: string | null;
  campaignName: string | null;
  amountCents: number;
  treeCount: number;
  paidOn: string;
}

/** A nursery event with no site: a tree collected, or moved into a grow-out pot. */
export interface NurseryRecord {
  treeId: string;
  day: string;
}

export const inRange = (day: string, r: ReportRange) => day >= r.from && day <= r.to;
const atSite = (siteId: string, r: ReportRange) => r.siteId === undefined || r.siteId === siteId;
const sum = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);
const cmp = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/**
 * Value of volunteer time in cents: minutes × hourly value ÷ 60, rounded half up once, at the
 * end (integer arithmetic, so no float drift).
 * @example volunteerValueCents(14 * 270, 3180) // 200340 ($2,003.40, TRADE.md §6 worked example)
 */
export function volunteerValueCents(minutes: number, hourValueCents: number): number {
  return Math.floor((2 * minutes * hourValueCents + 60) / 120);
}

/**
 * Splits the value of the summed minutes, rounded once, among rows: each row gets its own value
 * rounded down or up (largest remainder first, ties in row order), so the rows add up to the total
 * to the cent — a table of per-row roundings would drift from the total by up to half a cent a row.
 * @example shareValueCents([1, 1, 1, 1, 1, 1], 3190) // [54, 53, 53, 53, 53, 53] (total 319)
 */
export function shareValueCents(minutesPerRow: readonly number[], hourValueCents: number): number[] {
  const exact = minutesPerRow.map((m) => m * hourValueCents); // sixtieths of a cent
  const floors = exact.map((x) => Math.floor(x / 60));
  let left = volunteerValueCents(sum(minutesPerRow), hourValueCents) - sum(floors);
  const byRemainder = exact.map((x, i) => ({ i, rest: x % 60 })).sort((a, b) => b.rest - a.rest || a.i - b.i);
  for (const { i } of byRemainder) {
    if (left <= 0) break;
    floors[i]! += 1;
    left -= 1;
  }
  return floors;
}

/** The period a date falls in: `2026-03`, `2026-Q1` or `2026`. */
export function periodOf(day: string, period: Period): string {
  if (period === 'year') return day.slice(0, 4);
  if (period === 'quarter') return `${day.slice(0, 4)}-Q${Math.ceil(Number(day.slice(5, 7)) / 3)}`;
  return day.slice(0, 7);
}

const attended = (rows: readonly AttendanceRecord[], r: ReportRange) => rows.filter((a) => a.minutes > 0 && inRange(a.day, r) && atSite(a.siteId, r));
const plantedIn = (rows: readonly PlantingRecord[], r: ReportRange) => rows.filter((p) => inRange(p.plantedOn, r) && atSite(p.siteId, r));
const paidIn = (rows: readonly DonationRecord[], r: ReportRange) => rows.filter((d) => inRange(d.paidOn, r));

export interface SummaryFigures {
  volunteers: number;
  volunteerMinutes: number;
  volunteerHours: number;
  volunteerValueCents: number;
  treesPlanted: number;
  treesAlive: number;
  treesNotChecked: number;
  survivalRate: number | null;
  donationsCents: number;
  donationsCount: number;
}

/**
 * The headline figures. volunteers: distinct people with attended minutes; hours from the sum of
 * minutes (two decimals); value from the summed minutes; treesPlanted: `plantedOn` in range;
 * treesAlive: of those, `countsAlive`; survivalRate = alive / planted (4 decimals, null when
 * none); donations: every record given (the caller passes paid, not refunded, gifts) paid in
 * range. The site filter applies to everything but donations, which belong to no site.
 */
export function summaryFigures(input: { attendance: readonly AttendanceRecord[]; plantings: readonly PlantingRecord[]; donations: readonly DonationRecord[] }, r: ReportRange, hourValueCents: number): SummaryFigures {
  const att = attended(input.attendance, r);
  const minutes = sum(att.map((a) => a.minutes));
  const planted = plantedIn(input.plantings, r);
  const alive = planted.filter(countsAlive).length;
  const gifts = paidIn(input.donations, r);
  return {
    volunteers: new Set(att.map((a) => a.userId)).size,
    volunteerMinutes: minutes,
    volunteerHours: hoursFromMinutes(minutes),
    volunteerValueCents: volunteerValueCents(minutes, hourValueCents),
    treesPlanted: planted.length,
    treesAlive: alive,
    treesNotChecked: planted.filter((p) => p.latest === null && !p.lostWithoutCheck).length,
    survivalRate: planted.length === 0 ? null : Math.round((alive / planted.length) * 10_000) / 10_000,
    donationsCents: sum(gifts.map((d) => d.amountCents)),
    donationsCount: gifts.length,
  };
}

export interface HoursRow {
  period: string;
  userId: string;
  name: string;
  workdays: number;
  minutes: number;
  hours: number;
  valueCents: number;
}

/**
 * Hours per person and period (people with attended minutes only), by period then name. Row
 * values share the rounded total (`shareValueCents`), so they add up to the summary's value.
 */
export function hoursTable(attendance: readonly AttendanceRecord[], r: ReportRange, period: Period, hourValueCents: number): HoursRow[] {
  const rows = new Map<string, HoursRow>();
  for (const a of attended(attendance, r)) {
    const p = periodOf(a.day, period);
    const key = `${p}|${a.userId}`;
    const row = rows.get(key) ?? { period: p, userId: a.userId, name: a.name, workdays: 0, minutes: 0, hours: 0, valueCents: 0 };
    row.workdays += 1;
    row.minutes += a.minutes;
    rows.set(key, row);
  }
  const sorted = [...rows.values()].sort((a, b) => cmp(a.period, b.period) || cmp(a.name, b.name) || cmp(a.userId, b.userId));
  const values = shareValueCents(sorted.map((row) => row.minutes), hourValueCents);
  return sorted.map((row, i) => ({ ...row, hours: hoursFromMinutes(row.minutes), valueCents: values[i]! }));
}

export interface TreesRow {
  month: string;
  /** null for the nursery (collected and potted trees stand at no site yet). */
  siteId: string | null;
  siteName: string;
  collected: number;
  potted: number;
  planted: number;
  alive: number;
}

export const NURSERY_NAME = 'Nursery';

/**
 * Trees per site and month: collected and potted (nursery rows, left out when a site is asked
 * for), planted (`plantedOn` in that month) and alive (of those planted, `countsAlive`).
 */
export function treesTable(input: { collected: readonly NurseryRecord[]; potted: readonly NurseryRecord[]; plantings: readonly PlantingRecord[] }, r: ReportRange): TreesRow[] {
  const rows = new Map<string, TreesRow>();
  const row = (month: string, siteId: string | null, siteName: string) => {
    const key = `${month}|${siteId ?? ''}`;
    const found = rows.get(key) ?? { month, siteId, siteName, collected: 0, potted: 0, planted: 0, alive: 0 };
    rows.set(key, found);
    return found;
  };
  if (r.siteId === undefined) {
    for (const c of input.collected.filter((x) => inRange(x.day, r))) row(c.day.slice(0, 7), null, NURSERY_NAME).collected += 1;
    for (const p of input.potted.filter((x) => inRange(x.day, r))) row(p.day.slice(0, 7), null, NURSERY_NAME).potted += 1;
  }
  for (const p of plantedIn(input.plantings, r)) {
    const found = row(p.plantedOn.slice(0, 7), p.siteId, p.siteName);
    found.planted += 1;
    if (countsAlive(p)) found.alive += 1;
  }
  return [...rows.values()].sort((a, b) => cmp(a.month, b.month) || (a.siteId === null ? -1 : b.siteId === null ? 1 : cmp(a.siteName, b.siteName)));
}

export interface DonationsRow {
  campaignId: string | null;
  campaignName: string;
  count: number;
  amountCents: number;
  trees: number;
}

/** Paid gifts per campaign (gifts without one under "No campaign"), by name. */
export function donationsTable(donations: readonly DonationRecord[], r: ReportRange): DonationsRow[] {
  const rows = new Map<string, DonationsRow>();
  for (const d of paidIn(donations, r)) {
    const key = d.campaignId ?? '';
    const row = rows.get(key) ?? { campaignId: d.campaignId, campaignName: d.campaignName ?? 'No campaign', count: 0, amountCents: 0, trees: 0 };
    row.count += 1;
    row.amountCents += d.amountCents;
    row.trees += d.treeCount;
    rows.set(key, row);
  }
  return [...rows.values()].sort((a, b) => cmp(a.campaignName, b.campaignName));
}
