import { addDays, type DateKey } from './zoned-time';

/** The periods "My hours" offers; `custom` uses the dates typed in. */
export type HoursPeriod = 'this-year' | 'last-year' | 'last-12-months' | 'all' | 'custom';

export const HOURS_PERIODS: readonly { id: HoursPeriod; label: string }[] = [
  { id: 'this-year', label: 'This year' },
  { id: 'last-year', label: 'Last year' },
  { id: 'last-12-months', label: 'Last 12 months' },
  { id: 'all', label: 'All time' },
  { id: 'custom', label: 'Choose dates' },
];

/**
 * The `from` (inclusive) and `to` (exclusive) dates to ask /api/me/hours for. Custom dates are
 * inclusive as typed, so `to` moves a day on; a blank end is left open.
 * @example hoursSpan('this-year', '2025-06-10') // { from: '2025-01-01', to: '2026-01-01' }
 */
export function hoursSpan(period: HoursPeriod, today: DateKey, custom: { from: string; to: string } = { from: '', to: '' }): { from?: DateKey; to?: DateKey } {
  const year = Number(today.slice(0, 4));
  switch (period) {
    case 'this-year':
      return { from: `${year}-01-01`, to: `${year + 1}-01-01` };
    case 'last-year':
      return { from: `${year - 1}-01-01`, to: `${year}-01-01` };
    case 'last-12-months':
      return { from: addDays(today, -365), to: addDays(today, 1) };
    case 'custom':
      return { ...(custom.from ? { from: custom.from } : {}), ...(custom.to ? { to: addDays(custom.to, 1) } : {}) };
    default:
      return {};
  }
}

/** @example formatHours(150) // '2.5 h' */
export function formatHours(minutes: number): string {
  const hours = Math.round((minutes / 60) * 10) / 10;
  return `${hours.toLocaleString('en-US', { maximumFractionDigits: 1 })} h`;
}
