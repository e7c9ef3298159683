/**
 * Monitoring milestones: the months after planting at which survival is checked, and the window
 * of monitoring dates that counts for each. Dates are calendar dates `YYYY-MM-DD` (no zone).
 *
 * Checks at 1, 3, 6 and 12 months, then once a year, are common practice for outplanted
 * mangroves (the schedule named in the product's design notes; no single standard prescribes it).
 */

const DAY_MS = 86_400_000;

/** The first year's checks, in months after planting; yearly after that. */
export const FIRST_YEAR_MILESTONES = [1, 3, 6, 12] as const;

/**
 * A visit up to this many days before a milestone date still counts for it (±2 weeks is common
 * practice: visits wait on low tides and weather, so they rarely fall on the exact day).
 */
export const DEFAULT_TOLERANCE_DAYS = 14;

/** Longest span the tables follow, in months (ten years). */
export const MAX_MILESTONE_MONTHS = 120;

export const dayNumber = (date: string): number => Math.round(Date.parse(`${date}T00:00:00Z`) / DAY_MS);
export const dateOfDay = (day: number): string => new Date(day * DAY_MS).toISOString().slice(0, 10);
export const addDays = (date: string, days: number): string => dateOfDay(dayNumber(date) + days);

/** `YYYY-MM` of a date. */
export const monthOf = (date: string): string => date.slice(0, 7);

/**
 * The same day `months` calendar months later, clamped to the end of a shorter month.
 * @example addMonths('2026-01-31', 1) // '2026-02-28'
 */
export function addMonths(date: string, months: number): string {
  const [y, m, d] = date.split('-').map(Number) as [number, number, number];
  const index = y * 12 + (m - 1) + months;
  const year = Math.floor(index / 12);
  const month = index - year * 12 + 1;
  const lastDay = new Date(Date.UTC(year, month, 0)).getUTCDate();
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(Math.min(d, lastDay)).padStart(2, '0')}`;
}

/**
 * Milestones up to `maxMonths`: 1, 3, 6, 12, then every 12 months; the first year's four are
 * always listed so tables keep their shape.
 * @example milestoneMonths(30) // [1, 3, 6, 12, 24]
 */
export function milestoneMonths(maxMonths: number): number[] {
  const out: number[] = [...FIRST_YEAR_MILESTONES];
  for (let m = 24; m <= Math.min(maxMonths, MAX_MILESTONE_MONTHS); m += 12) out.push(m);
  return out;
}

/** The milestone after `months` (12 → 24, 24 → 36). */
export function nextMilestone(months: number): number {
  const i = FIRST_YEAR_MILESTONES.indexOf(months as (typeof FIRST_YEAR_MILESTONES)[number]);
  return i >= 0 && i < FIRST_YEAR_MILESTONES.length - 1 ? FIRST_YEAR_MILESTONES[i + 1]! : months + 12;
}

export interface MilestoneWindow {
  months: number;
  /** Planting date + `months` calendar months. */
  dueOn: string;
  /** First visit date that counts: `dueOn` − tolerance. */
  opensOn: string;
  /** First visit date that no longer counts: the next milestone's `opensOn`. */
  closesBefore: string;
}

/**
 * The window of visit dates that counts for one milestone of a tree planted on `plantedOn`:
 * from `tolerance` days before the milestone date up to (not including) the day the next
 * milestone's window opens. Windows of successive milestones therefore touch and never overlap,
 * so every visit counts for exactly one milestone (visits in the first two weeks or so after
 * planting, before the 1-month window opens, count for none).
 * @example milestoneWindow('2026-03-10', 1, 14) // { months: 1, dueOn: '2026-04-10', opensOn: '2026-03-27', closesBefore: '2026-05-27' }
 */
export function milestoneWindow(plantedOn: string, months: number, toleranceDays: number): MilestoneWindow {
  const dueOn = addMonths(plantedOn, months);
  return {
    months,
    dueOn,
    opensOn: addDays(dueOn, -toleranceDays),
    closesBefore: addDays(addMonths(plantedOn, nextMilestone(months)), -toleranceDays),
  };
}

/** Whole months from `from` to `to` (by calendar, 0 when `to` is earlier). */
export function monthsBetween(from: string, to: string): number {
  const [fy, fm, fd] = from.split('-').map(Number) as [number, number, number];
  const [ty, tm, td] = to.split('-').map(Number) as [number, number, number];
  const months = (ty - fy) * 12 + (tm - fm) - (td < fd ? 1 : 0);
  return Math.max(0, months);
}
