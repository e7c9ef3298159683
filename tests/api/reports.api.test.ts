import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DonationsReport, HoursReport, ReportSummary, SurvivalReport, TreesReport } from '../../shared/schemas/report.schema.js';
import { buildSignup } from '../factories/signup.factory.js';
import { buildSite } from '../factories/site.factory.js';
import { buildUser } from '../factories/user.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';
import { buildReportRecords } from './reports-fixture.js';

let t: TestApp;
let staff: Awaited<ReturnType<typeof authAgentFor>>;
let fx: Awaited<ReturnType<typeof buildReportRecords>>;
beforeAll(async () => {
  // "Today" is 15 June 2026, so checks are read up to then even though the range runs to 30 June.
  t = await createTestApp({ ownDatabase: 'reports', clock: () => new Date('2026-06-15T16:00:00Z') });
  staff = await authAgentFor(t, 'coordinator');
  fx = await buildReportRecords(t.db);
});
afterAll(() => t.close());

const range = { from: '2026-03-01', to: '2026-06-30' };
const get = (path: string, query: object = range) => staff.agent.get(path).query(query);
const total = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);

describe('GET /api/reports/summary', () => {
  it('computes the hand-worked figures from the records', async () => {
    // Minutes: Ada 270 + Ben 240 (14 March) + Ada 180 (18 April) = 690 → 11.5 h by 2 people;
    // value 690 × $31.80 / 60 = $365.70. Trees: 6 planted; alive: 2 at Heron (lost and missing do
    // not count) + 1 checked and 1 not yet checked at Salt = 4 → 4/6. Gifts: 25 + 50 + 10 = $85 (3).
    const res = await get('/api/reports/summary');
    expect(res.status).toBe(200);
    expect(ReportSummary.parse(res.body)).toMatchObject({
      asOf: '2026-06-15', volunteers: 2, volunteerMinutes: 690, volunteerHours: 11.5, volunteerValueCents: 36_570,
      volunteerHourValueCents: 3180, volunteerHourValueSource: 'Independent Sector, national value of a volunteer hour, 2022',
      treesPlanted: 6, treesAlive: 4, treesNotChecked: 1, survivalRate: 0.6667, donationsCents: 8500, donationsCount: 3, currency: 'usd',
    });
  });

  it('equals the sums of the underlying report rows', async () => {
    const summary = ReportSummary.parse((await get('/api/reports/summary')).body);
    const hours = HoursReport.parse((await get('/api/reports/hours', { ...range, period: 'quarter' })).body);
    const trees = TreesReport.parse((await get('/api/reports/trees')).body);
    const gifts = DonationsReport.parse((await get('/api/reports/donations')).body);
    expect(total(hours.rows.map((r) => r.minutes))).toBe(summary.volunteerMinutes);
    expect(new Set(hours.rows.map((r) => r.userId)).size).toBe(summary.volunteers);
    expect(hours.totals).toEqual({ volunteers: 2, minutes: 690, hours: 11.5, valueCents: summary.volunteerValueCents });
    expect(total(hours.rows.map((r) => r.valueCents))).toBe(summary.volunteerValueCents);
    expect(total(trees.rows.map((r) => r.planted))).toBe(summary.treesPlanted);
    expect(total(trees.rows.map((r) => r.alive))).toBe(summary.treesAlive);
    expect(total(gifts.rows.map((r) => r.amountCents))).toBe(summary.donationsCents);
    expect(total(gifts.rows.map((r) => r.count))).toBe(summary.donationsCount);
  });

  it('filters people and trees by site but says donations are not', async () => {
    const res = ReportSummary.parse((await get('/api/reports/summary', { ...range, siteId: fx.heron.id })).body);
    expect(res).toMatchObject({ volunteers: 2, volunteerMinutes: 510, treesPlanted: 4, treesAlive: 2, survivalRate: 0.5, donationsCents: 8500 });
    expect(res.notes.join(' ')).toContain('the site filter does not apply to them');
  });

  it('values 14 volunteers × 4.5 h at $2,003.40', async () => {
    // Source: Independent Sector 2022 value via philanthropynewsdigest.org / globenewswire.com
    // ($31.80 an hour); TRADE.md §6 worked example 14 × 4.5 h × $31.80 = $2,003.40.
    const site = await buildSite(t.db);
    const workday = await buildWorkday(t.db, { siteId: site.id, status: 'completed', startsAt: new Date('2026-01-17T14:00:00Z'), endsAt: new Date('2026-01-17T18:30:00Z') });
    for (let i = 0; i < 14; i++) {
      const user = await buildUser(t.db);
      await buildSignup(t.db, { workdayId: workday.id, userId: user.id, checkedInAt: workday.startsAt, checkedOutAt: workday.endsAt });
    }
    const res = ReportSummary.parse((await get('/api/reports/summary', { from: '2026-01-01', to: '2026-01-31' })).body);
    expect(res).toMatchObject({ volunteers: 14, volunteerHours: 63, volunteerValueCents: 200_340 });
  });

  it.each([
    ['no dates', {}],
    ['to before from', { from: '2026-06-30', to: '2026-03-01' }],
    ['a malformed date', { from: '2026-3-1', to: '2026-06-30' }],
    ['a malformed site', { ...range, siteId: 'heron' }],
  ])('answers 400 for %s', async (_name, query) => {
    expect((await get('/api/reports/summary', query)).status).toBe(400);
  });

  it('answers 404 for an unknown site', async () => {
    expect((await get('/api/reports/summary', { ...range, siteId: '00000000-0000-4000-8000-000000000000' })).status).toBe(404);
  });
});

describe('report tables', () => {
  it('gives hours per person and month', async () => {
    const res = HoursReport.parse((await get('/api/reports/hours', { ...range, period: 'month' })).body);
    expect(res.rows.map((r) => [r.period, r.name, r.minutes, r.valueCents])).toEqual([
      ['2026-03', 'Ada Marsh', 270, 14_310], ['2026-03', 'Ben Creek', 240, 12_720], ['2026-04', 'Ada Marsh', 180, 9540],
    ]);
  });

  it('gives trees per site and month, nursery included', async () => {
    const res = TreesReport.parse((await get('/api/reports/trees')).body);
    expect(res.rows.map((r) => [r.month, r.siteName, r.collected, r.potted, r.planted, r.alive])).toEqual([
      ['2026-03', 'Nursery', 3, 0, 0, 0], ['2026-03', 'Heron Test Reach', 0, 0, 4, 2],
      ['2026-04', 'Nursery', 0, 1, 0, 0], ['2026-04', 'Salt Test Point', 0, 0, 2, 2],
    ]);
  });

  it('gives the survival table by cohort and site', async () => {
    // Heron, March cohort: 1 month (14 April) → 2 alive of 4 checked; 3 months (14 June, window
    // open since 31 May) → only the lost tree counts, 0 of 1. Salt, April cohort: 1 month (18 May) → 1 of 1.
    const res = SurvivalReport.parse((await get('/api/reports/survival')).body);
    expect(res.milestones).toEqual([1, 3, 6, 12]);
    expect(res.cohorts.map((c) => [c.siteName, c.cohort, c.planted, c.cells[0]!.survivalRate, c.cells[1]!.checked])).toEqual([
      ['Heron Test Reach', '2026-03', 4, 0.5, 1], ['Salt Test Point', '2026-04', 2, 1, 0],
    ]);
    expect(res.sites[0]!.cells[1]).toEqual({ months: 3, reached: 4, checked: 1, alive: 0, survivalRate: 0, reachedShare: 1 });
  });

  it('gives donations per campaign, refunds left out', async () => {
    const res = DonationsReport.parse((await get('/api/reports/donations')).body);
    expect(res.rows).toEqual([
      { campaignId: null, campaignName: 'No campaign', count: 1, amountCents: 1000, trees: 0 },
      { campaignId: fx.campaign.id, campaignName: 'Spring shoreline', count: 2, amountCents: 7500, trees: 3 },
    ]);
  });
});

describe('CSV exports', () => {
  it.each([
    ['summary', 'Figure,Value', 'Volunteer time value (USD),365.70'],
    ['hours', 'Period,Name,Workdays,Minutes,Hours,Value (USD)', '2026-03,Ada Marsh,1,270,4.50,143.10'],
    ['trees', 'Month,Site,Collected,Potted,Planted,Alive', '2026-03,Heron Test Reach,0,0,4,2'],
    ['survival', 'Site,Cohort (planting month),Planted,Months after planting,Reached,Checked,Alive,Survival rate (%),Share reached (%)', 'Heron Test Reach,2026-03,4,1,4,4,2,50.0,'],
    ['donations', 'Campaign,Gifts,Amount (USD),Trees sponsored', 'Spring shoreline,2,75.00,3'],
  ])('%s.csv has its header and rows', async (name, header, row) => {
    const res = await get(`/api/reports/${name}.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toContain(`.csv`);
    const lines = res.text.split('\r\n');
    expect(lines[0]).toBe(header);
    expect(lines).toContain(row);
  });
});

describe('GET /api/reports/report.pdf', () => {
  it('prints the figures, planting elevations with their datum, survival and the methods', async () => {
    const res = await get('/api/reports/report.pdf').buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdfjs = await import('pdfjs-dist/legacy/build/pdf.mjs');
    const doc = await pdfjs.getDocument({ data: new Uint8Array(res.body as Buffer) }).promise;
    let text = '';
    for (let p = 1; p <= doc.numPages; p++) {
      const content = await (await doc.getPage(p)).getTextContent();
      text += content.items.map((i) => ('str' in i ? i.str : '')).join(' ') + '\n';
    }
    const flat = text.replace(/\s+/g, ' ');
    for (const phrase of [
      'Outcomes report', 'Restoration program', '2026-03-01 to 2026-06-30', '$365.70', '11.50', '66.7%', '$85.00 from 3 gifts',
      // Heron: mean 0.30 m = 0.98 ft, 0.25 m = 0.82 ft, 0.35 m = 1.15 ft (0.3048 m to the foot).
      'Heron Test Reach', '2026-03-14', '0.98 ft mean, 0.82–1.15 ft', 'MLLW, NOAA station 8726738', 'MLLW, NOAA station 8726520',
      '50.0% (2/4)', 'Trees planted and alive', 'Independent Sector, national value of a volunteer hour, 2022', 'Missing trees count as not alive',
    ]) expect(flat).toContain(phrase);
  });
});
