/** Words and numbers for the reports screen (pure). */
import type { DateKey } from './zoned-time';

/** Where a report range starts and ends by default: the calendar year of `today`. */
export function thisYear(today: DateKey): { from: DateKey; to: DateKey } {
  const year = today.slice(0, 4);
  return { from: `${year}-01-01`, to: `${year}-12-31` };
}

/**
 * A rate 0–1 as a percentage with at most one decimal; a dash when there is nothing to divide.
 * @example formatRate(0.875) // '87.5 %'; formatRate(null) // '—'
 */
export function formatRate(rate: number | null): string {
  if (rate === null) return '\u2014';
  return `${(Math.round(rate * 1000) / 10).toLocaleString('en-US', { maximumFractionDigits: 1 })} %`;
}

/** @example formatReportHours(56.85) // '56.85 h' (the server already rounds to 2 decimals) */
export function formatReportHours(hours: number): string {
  return `${hours.toLocaleString('en-US', { maximumFractionDigits: 2 })} h`;
}

/**
 * A survival milestone in words.
 * @example milestoneLabel(1) // '1 month'; milestoneLabel(12) // '12 months'; milestoneLabel(24) // '2 years'
 */
export function milestoneLabel(months: number): string {
  if (months > 12 && months % 12 === 0) return `${months / 12} years`;
  return `${months} ${months === 1 ? 'month' : 'months'}`;
}

/** '2026-05' → 'May 2026'; a quarter ('2026-Q2') or a year ('2026') is shown as it is. */
export function formatPeriod(period: string): string {
  const m = /^(\d{4})-(\d{2})$/.exec(period);
  if (!m) return period.replace('-', ' ');
  const name = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, 1)).toLocaleString('en-US', { month: 'short', timeZone: 'UTC' });
  return `${name} ${m[1]}`;
}

/** A survival cell as table text: the rate, and the counts behind it so every figure can be traced. */
export function survivalCellParts(cell: { reached: number; checked: number; alive: number; survivalRate: number | null }): { main: string; detail: string } {
  if (cell.reached === 0) return { main: 'not reached', detail: '' };
  if (cell.checked === 0) return { main: 'not checked', detail: `${cell.reached} reached` };
  return { main: formatRate(cell.survivalRate), detail: `${cell.alive} of ${cell.checked} alive` };
}
