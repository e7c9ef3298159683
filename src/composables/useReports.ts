import { reactive, ref, type Ref } from 'vue';
import type { Site } from '@shared/schemas/site.schema';
import {
  fetchDonationsReport,
  fetchHoursReport,
  fetchReportSummary,
  fetchSurvivalReport,
  fetchTreesReport,
  type DonationsReport,
  type HoursReport,
  type ReportFilters,
  type ReportPeriod,
  type ReportSummary,
  type SurvivalReport,
  type TreesReport,
} from '@/api/reports';
import { listSites } from '@/api/sites';
import { errorMessage } from '@/utils/error-message';
import { thisYear } from '@/utils/report-format';

export interface Reports {
  filters: ReportFilters;
  period: Ref<ReportPeriod>;
  sites: Ref<Site[]>;
  summary: Ref<ReportSummary | null>;
  hours: Ref<HoursReport | null>;
  trees: Ref<TreesReport | null>;
  survival: Ref<SurvivalReport | null>;
  donations: Ref<DonationsReport | null>;
  loading: Ref<boolean>;
  error: Ref<string | null>;
  /** Every table for the current filters. */
  load: () => Promise<void>;
  /** The hours table alone, after its period changes. */
  loadHours: () => Promise<void>;
}

const MESSAGES = { validation_failed: 'Check the dates: the first must not be after the second, and a report covers at most 20 years.', not_found: 'That site was not found.' };

/** The reports screen: filters (this year and every site by default) and every table computed from them. */
export function useReports(today: () => string): Reports {
  const filters = reactive<ReportFilters>({ ...thisYear(today()), siteId: '' });
  const period = ref<ReportPeriod>('month');
  const sites = ref<Site[]>([]);
  const summary = ref<ReportSummary | null>(null);
  const hours = ref<HoursReport | null>(null);
  const trees = ref<TreesReport | null>(null);
  const survival = ref<SurvivalReport | null>(null);
  const donations = ref<DonationsReport | null>(null);
  const loading = ref(false);
  const error = ref<string | null>(null);
  let latest = 0;

  async function load(): Promise<void> {
    const ticket = ++latest;
    const f = { ...filters };
    loading.value = true;
    error.value = null;
    if (sites.value.length === 0) sites.value = await listSites().catch(() => []);
    try {
      const all = await Promise.all([fetchReportSummary(f), fetchHoursReport(f, period.value), fetchTreesReport(f), fetchSurvivalReport(f), fetchDonationsReport(f)]);
      // A slower answer for older filters must not replace a newer one.
      if (ticket !== latest) return;
      [summary.value, hours.value, trees.value, survival.value, donations.value] = all;
    } catch (err) {
      if (ticket === latest) error.value = errorMessage(err, MESSAGES);
    } finally {
      if (ticket === latest) loading.value = false;
    }
  }

  async function loadHours(): Promise<void> {
    try {
      hours.value = await fetchHoursReport({ ...filters }, period.value);
    } catch (err) {
      error.value = errorMessage(err, MESSAGES);
    }
  }

  return { filters, period, sites, summary, hours, trees, survival, donations, loading, error, load, loadHours };
}
