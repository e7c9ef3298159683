import { http, HttpResponse, type JsonBodyType } from 'msw';
import type { DonationsReport, HoursReport, ReportSummary, SurvivalReport, TreesReport } from '@shared/schemas/report.schema';
import { server } from '../setup/client-setup';

/** Invented report answers for client tests; the figures are consistent with one another. */
const range = { from: '2025-01-01', to: '2025-12-31', siteId: null };

/**
 * TRADE.md §6 worked example (Independent Sector's 2022 national value of a volunteer hour,
 * $31.80, published April 2023): 14 volunteers × 4.5 h × $31.80 = $2,003.40.
 */
export const summary: ReportSummary = {
  ...range, asOf: '2025-06-10', volunteers: 14, volunteerMinutes: 14 * 270, volunteerHours: 63, volunteerValueCents: 200_340,
  volunteerHourValueCents: 3180, volunteerHourValueSource: 'Independent Sector, national value of a volunteer hour, 2022',
  treesPlanted: 40, treesAlive: 35, treesNotChecked: 20, survivalRate: 0.875, donationsCents: 66_800, donationsCount: 7, currency: 'usd',
  notes: ['Volunteer hours are the minutes credited at check-in and check-out.'],
};

export const hours: HoursReport = {
  ...range, period: 'month', currency: 'usd',
  rows: [{ period: '2025-05', userId: 'u1', name: 'Tamsin Okafor', workdays: 1, minutes: 270, hours: 4.5, valueCents: 14_310 }],
  totals: { volunteers: 1, minutes: 270, hours: 4.5, valueCents: 14_310 },
};

export const trees: TreesReport = {
  ...range, asOf: '2025-06-10',
  rows: [
    { month: '2025-01', siteId: null, siteName: 'Nursery', collected: 95, potted: 12, planted: 0, alive: 0 },
    { month: '2025-05', siteId: 's1', siteName: 'Heron Cove', collected: 0, potted: 0, planted: 12, alive: 9 },
  ],
};

const cell = (months: number, reached: number, checked: number, alive: number) => ({ months, reached, checked, alive, survivalRate: checked ? Math.round((alive / checked) * 10_000) / 10_000 : null });

export const survival: SurvivalReport = {
  ...range, asOf: '2025-06-10', toleranceDays: 14, milestones: [1, 3, 6, 12],
  cohorts: [{ siteId: 's1', siteName: 'Heron Cove', cohort: '2025-01', planted: 20, cells: [cell(1, 20, 20, 17), cell(3, 12, 12, 9), cell(6, 12, 12, 9), cell(12, 0, 0, 0)] }],
  sites: [{ siteId: 's1', siteName: 'Heron Cove', planted: 20, cells: [cell(1, 20, 20, 17), cell(3, 12, 12, 9), cell(6, 12, 12, 9), cell(12, 0, 0, 0)].map((c) => ({ ...c, reachedShare: c.reached / 20 })) }],
};

export const donations: DonationsReport = {
  ...range, currency: 'usd', notes: ['Paid gifts, less any refunded.'],
  rows: [{ campaignId: 'c1', campaignName: 'Heron Cove living shoreline', count: 7, amountCents: 66_800, trees: 26 }],
};

/** Answers every report route, recording each request's query by route name. */
export function mockReports(overrides: { summary?: () => Response } = {}): Record<string, URLSearchParams[]> {
  const seen: Record<string, URLSearchParams[]> = { summary: [], hours: [], trees: [], survival: [], donations: [] };
  const answer = (name: string, body: JsonBodyType) =>
    http.get(`/api/reports/${name}`, ({ request }) => {
      seen[name]!.push(new URL(request.url).searchParams);
      return name === 'summary' && overrides.summary ? overrides.summary() : HttpResponse.json(body);
    });
  server.use(answer('summary', summary), answer('hours', hours), answer('trees', trees), answer('survival', survival), answer('donations', donations));
  return seen;
}
