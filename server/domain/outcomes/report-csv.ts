/** Every report table as CSV (pure): money as plain decimals, rates as percents with one decimal. */
import type { DonationsReport, HoursReport, ReportSummary, SurvivalReport, TreesReport } from '../../../shared/schemas/report.schema.js';
import { csvText } from '../csv.js';
import { centsToDecimal } from './report-format.js';

const pct = (rate: number | null) => (rate === null ? '' : (rate * 100).toFixed(1));
const unit = (currency: string) => currency.toUpperCase();

export function summaryCsv(s: ReportSummary): string {
  return csvText(['Figure', 'Value'], [
    ['From', s.from], ['To', s.to], ['Site', s.siteId ?? 'all'], ['Checks up to', s.asOf],
    ['Volunteers', s.volunteers], ['Volunteer minutes', s.volunteerMinutes], ['Volunteer hours', s.volunteerHours],
    [`Volunteer time value (${unit(s.currency)})`, centsToDecimal(s.volunteerValueCents)],
    [`Value of one hour (${unit(s.currency)})`, centsToDecimal(s.volunteerHourValueCents)], ['Value source', s.volunteerHourValueSource],
    ['Trees planted', s.treesPlanted], ['Trees alive', s.treesAlive], ['Trees not yet checked', s.treesNotChecked], ['Survival rate (%)', pct(s.survivalRate)],
    [`Donations (${unit(s.currency)})`, centsToDecimal(s.donationsCents)], ['Donations (count)', s.donationsCount],
    ...s.notes.map((n) => ['Note', n]),
  ]);
}

export function hoursCsv(h: HoursReport): string {
  return csvText(['Period', 'Name', 'Workdays', 'Minutes', 'Hours', `Value (${unit(h.currency)})`],
    h.rows.map((r) => [r.period, r.name, r.workdays, r.minutes, r.hours.toFixed(2), centsToDecimal(r.valueCents)]));
}

export function treesCsv(t: TreesReport): string {
  return csvText(['Month', 'Site', 'Collected', 'Potted', 'Planted', 'Alive'], t.rows.map((r) => [r.month, r.siteName, r.collected, r.potted, r.planted, r.alive]));
}

/** One row per cohort and milestone, then the site totals (cohort "all"). */
export function survivalCsv(s: SurvivalReport): string {
  const header = ['Site', 'Cohort (planting month)', 'Planted', 'Months after planting', 'Reached', 'Checked', 'Alive', 'Survival rate (%)', 'Share reached (%)'];
  const cohorts = s.cohorts.flatMap((c) => c.cells.map((x) => [c.siteName, c.cohort, c.planted, x.months, x.reached, x.checked, x.alive, pct(x.survivalRate), '']));
  const sites = s.sites.flatMap((c) => c.cells.map((x) => [c.siteName, 'all', c.planted, x.months, x.reached, x.checked, x.alive, pct(x.survivalRate), pct(x.reachedShare)]));
  return csvText(header, [...cohorts, ...sites]);
}

export function donationsCsv(d: DonationsReport): string {
  return csvText(['Campaign', 'Gifts', `Amount (${unit(d.currency)})`, 'Trees sponsored'], d.rows.map((r) => [r.campaignName, r.count, centsToDecimal(r.amountCents), r.trees]));
}
