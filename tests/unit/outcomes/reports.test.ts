import { describe, expect, it } from 'vitest';
import { donationsTable, hoursTable, periodOf, shareValueCents, summaryFigures, treesTable, volunteerValueCents, type AttendanceRecord, type DonationRecord, type PlantingRecord } from '../../../server/domain/outcomes/reports.js';
import { formatMoney } from '../../../server/domain/outcomes/report-format.js';

describe('volunteerValueCents', () => {
  it('values 14 volunteers × 4.5 h at $31.80 an hour at $2,003.40', () => {
    // Source: Independent Sector 2022 value via philanthropynewsdigest.org / globenewswire.com
    // ($31.80 a volunteer hour); worked example in TRADE.md §6: 14 × 4.5 h × $31.80 = $2,003.40.
    const minutes = 14 * 4.5 * 60;
    expect(volunteerValueCents(minutes, 3180)).toBe(200_340);
    expect(formatMoney(volunteerValueCents(minutes, 3180), 'usd')).toBe('$2,003.40');
  });

  it('rounds half a cent up, once, at the end', () => {
    // 1 minute at $0.30 an hour = 0.5 cent → 1 cent; 1 minute at $0.29 = 0.4833 cent → 0.
    expect(volunteerValueCents(1, 30)).toBe(1);
    expect(volunteerValueCents(1, 29)).toBe(0);
    // Six 1-minute rows at $31.90 an hour: 6 × 53.17 = 319 cents when rounded once; rounding each
    // row first (53 cents) would lose a cent.
    expect(volunteerValueCents(6, 3190)).toBe(319);
    expect(6 * volunteerValueCents(1, 3190)).toBe(318);
    expect(volunteerValueCents(0, 3180)).toBe(0);
  });
});

describe('periodOf', () => {
  it.each([
    ['2026-03-15', 'month', '2026-03'],
    ['2026-03-15', 'quarter', '2026-Q1'],
    ['2026-04-01', 'quarter', '2026-Q2'],
    ['2026-12-31', 'quarter', '2026-Q4'],
    ['2026-12-31', 'year', '2026'],
  ] as const)('%s by %s → %s', (day, period, key) => {
    expect(periodOf(day, period)).toBe(key);
  });
});

const range = { from: '2026-03-01', to: '2026-06-30' };
const att = (userId: string, day: string, minutes: number, siteId = 's1'): AttendanceRecord => ({ userId, name: `Person ${userId}`, siteId, day, minutes });
const attendance = [
  att('u1', '2026-03-14', 270), att('u2', '2026-03-14', 240), att('u3', '2026-03-14', 0),
  att('u1', '2026-04-18', 180, 's2'), att('u2', '2026-07-04', 300), att('u4', '2026-02-28', 200),
];
const planting = (treeId: string, siteId: string, plantedOn: string, latest: PlantingRecord['latest'], lostWithoutCheck = false): PlantingRecord => ({ treeId, siteId, siteName: siteId === 's1' ? 'Heron Reach' : 'Saltmarsh Point', plantedOn, latest, lostWithoutCheck });
const plantings = [
  planting('t1', 's1', '2026-03-14', 'alive'), planting('t2', 's1', '2026-03-14', 'lost'), planting('t3', 's1', '2026-03-14', 'missing'),
  planting('t4', 's1', '2026-03-14', null), planting('t5', 's2', '2026-04-18', null, true), planting('t6', 's2', '2026-07-04', 'alive'),
];
const gift = (campaignId: string | null, amountCents: number, treeCount: number, paidOn: string): DonationRecord => ({ campaignId, campaignName: campaignId ? `Campaign ${campaignId}` : null, amountCents, treeCount, paidOn });
const donations = [gift('c1', 2500, 1, '2026-03-02'), gift('c1', 5000, 2, '2026-06-30'), gift(null, 1000, 0, '2026-05-01'), gift('c1', 9900, 3, '2026-07-01')];

describe('summaryFigures', () => {
  it('counts only records in the range and adds up to the hand-worked figures', () => {
    // In range: u1 270 + u2 240 + u1 180 = 690 min by 2 people (u3 has 0 min; u2's July day and
    // u4's February day are outside) → 11.5 h → 690 × 3180 / 60 = 36,570 cents.
    // Trees: t1–t5 planted in range; alive t1 and t4 (not checked yet) → 2 of 5 = 0.4; t5 lost in the ledger.
    // Gifts: 2500 + 5000 + 1000 = 8,500 cents from 3 gifts (the 1 July one is outside).
    expect(summaryFigures({ attendance, plantings, donations }, range, 3180)).toEqual({
      volunteers: 2, volunteerMinutes: 690, volunteerHours: 11.5, volunteerValueCents: 36_570,
      treesPlanted: 5, treesAlive: 2, treesNotChecked: 1, survivalRate: 0.4, donationsCents: 8500, donationsCount: 3,
    });
  });

  it('filters people and trees by site, but never donations', () => {
    const s2 = summaryFigures({ attendance, plantings, donations }, { ...range, siteId: 's2' }, 3180);
    expect(s2).toMatchObject({ volunteers: 1, volunteerMinutes: 180, treesPlanted: 1, treesAlive: 0, survivalRate: 0, donationsCents: 8500 });
  });

  it('has no survival rate when nothing was planted', () => {
    expect(summaryFigures({ attendance: [], plantings: [], donations: [] }, range, 3180).survivalRate).toBeNull();
  });
});

describe('report tables', () => {
  it('gives hours per person and period whose minutes add up to the summary', () => {
    const rows = hoursTable(attendance, range, 'month', 3180);
    expect(rows).toEqual([
      { period: '2026-03', userId: 'u1', name: 'Person u1', workdays: 1, minutes: 270, hours: 4.5, valueCents: 14_310 },
      { period: '2026-03', userId: 'u2', name: 'Person u2', workdays: 1, minutes: 240, hours: 4, valueCents: 12_720 },
      { period: '2026-04', userId: 'u1', name: 'Person u1', workdays: 1, minutes: 180, hours: 3, valueCents: 9540 },
    ]);
    expect(hoursTable(attendance, range, 'quarter', 3180).map((r) => [r.period, r.name, r.minutes])).toEqual([['2026-Q1', 'Person u1', 270], ['2026-Q1', 'Person u2', 240], ['2026-Q2', 'Person u1', 180]]);
  });

  it('gives hour values that add up to the summary value to the cent', () => {
    // Six people, 1 minute each at $31.90 an hour: 53.17 cents each, 319 cents in all (rounded
    // once). Rounding each row alone gives 6 × 53 = 318; the rows share the 319 instead.
    const six = ['a', 'b', 'c', 'd', 'e', 'f'].map((u) => att(u, '2026-03-14', 1));
    const rows = hoursTable(six, range, 'month', 3190);
    const summary = summaryFigures({ attendance: six, plantings: [], donations: [] }, range, 3190);
    expect(summary.volunteerValueCents).toBe(319);
    expect(rows.reduce((a, r) => a + r.valueCents, 0)).toBe(319);
    expect(rows.map((r) => r.valueCents)).toEqual([54, 53, 53, 53, 53, 53]);
    // Largest remainder first: 100 min at $0.31 = 51.67 cents, 50 min = 25.83, 1 min = 0.52; total 78.02 → 78.
    expect(shareValueCents([100, 50, 1], 31)).toEqual([52, 26, 0]);
    expect(shareValueCents([270, 270], 3180)).toEqual([14_310, 14_310]);
    expect(shareValueCents([], 3180)).toEqual([]);
  });

  it('gives trees per site and month with nursery rows only when no site is asked for', () => {
    const input = { collected: [{ treeId: 'n1', day: '2026-03-02' }, { treeId: 'n2', day: '2026-01-02' }], potted: [{ treeId: 'n3', day: '2026-04-10' }], plantings };
    expect(treesTable(input, range)).toEqual([
      { month: '2026-03', siteId: null, siteName: 'Nursery', collected: 1, potted: 0, planted: 0, alive: 0 },
      { month: '2026-03', siteId: 's1', siteName: 'Heron Reach', collected: 0, potted: 0, planted: 4, alive: 2 },
      { month: '2026-04', siteId: null, siteName: 'Nursery', collected: 0, potted: 1, planted: 0, alive: 0 },
      { month: '2026-04', siteId: 's2', siteName: 'Saltmarsh Point', collected: 0, potted: 0, planted: 1, alive: 0 },
    ]);
    expect(treesTable(input, { ...range, siteId: 's2' }).map((r) => r.siteId)).toEqual(['s2']);
  });

  it('gives donations per campaign whose amounts add up to the summary', () => {
    expect(donationsTable(donations, range)).toEqual([
      { campaignId: 'c1', campaignName: 'Campaign c1', count: 2, amountCents: 7500, trees: 3 },
      { campaignId: null, campaignName: 'No campaign', count: 1, amountCents: 1000, trees: 0 },
    ]);
  });
});
