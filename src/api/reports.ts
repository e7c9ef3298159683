import {
  DonationsReport,
  HoursReport,
  ReportSummary,
  SurvivalReport,
  TreesReport,
  type ReportPeriod,
} from '@shared/schemas/report.schema';
import { get, queryString } from './http';

export type { DonationsReport, HoursReport, ReportPeriod, ReportSummary, SurvivalReport, TreesReport };

/** A report's filters: calendar dates 'YYYY-MM-DD' (both included) and a site ('' for every site). */
export interface ReportFilters {
  from: string;
  to: string;
  siteId: string;
}

export type ReportTable = 'summary' | 'hours' | 'trees' | 'survival' | 'donations';

const search = (f: ReportFilters, extra: Record<string, string | undefined> = {}) => queryString({ from: f.from, to: f.to, siteId: f.siteId, ...extra });

/** Coordinators and admins: the headline figures, computed from the records. */
export function fetchReportSummary(f: ReportFilters): Promise<ReportSummary> {
  return get(`/api/reports/summary${search(f)}`, ReportSummary);
}

/** Coordinators and admins: hours per person per month, quarter or year. */
export function fetchHoursReport(f: ReportFilters, period: ReportPeriod): Promise<HoursReport> {
  return get(`/api/reports/hours${search(f, { period })}`, HoursReport);
}

/** Coordinators and admins: trees collected, potted, planted and alive per site and month. */
export function fetchTreesReport(f: ReportFilters): Promise<TreesReport> {
  return get(`/api/reports/trees${search(f)}`, TreesReport);
}

/** Coordinators and admins: survival by site and cohort at months since planting. */
export function fetchSurvivalReport(f: ReportFilters): Promise<SurvivalReport> {
  return get(`/api/reports/survival${search(f)}`, SurvivalReport);
}

/** Coordinators and admins: paid gifts per campaign (the site filter does not apply). */
export function fetchDonationsReport(f: ReportFilters): Promise<DonationsReport> {
  return get(`/api/reports/donations${search(f)}`, DonationsReport);
}

/** A table as a CSV download: a plain link, so the browser saves the file under the server's name. */
export function reportCsvPath(table: ReportTable, f: ReportFilters, period?: ReportPeriod): string {
  return `/api/reports/${table}.csv${search(f, { period })}`;
}

/** The printable report for a funder or the permitting agency (PDF). */
export function reportPdfPath(f: ReportFilters): string {
  return `/api/reports/report.pdf${search(f)}`;
}
