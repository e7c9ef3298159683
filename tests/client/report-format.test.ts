import { describe, expect, it } from 'vitest';
import { formatPeriod, formatRate, milestoneLabel, survivalCellParts, thisYear } from '@/utils/report-format';
import { buildSurvivalChartOption } from '@/utils/report-survival-chart';

describe('report-format', () => {
  it.each([
    [0.875, '87.5 %'],
    [0.9167, '91.7 %'],
    [1, '100 %'],
    [0, '0 %'],
    [null, '\u2014'],
  ])('formatRate(%s) is %s', (rate, text) => {
    expect(formatRate(rate)).toBe(text);
  });

  it.each([
    [1, '1 month'],
    [3, '3 months'],
    [12, '12 months'],
    [24, '2 years'],
  ])('milestoneLabel(%i) is %s', (months, text) => {
    expect(milestoneLabel(months)).toBe(text);
  });

  it('names months, and leaves quarters and years readable', () => {
    expect(formatPeriod('2026-09')).toBe('Sep 2026');
    expect(formatPeriod('2026-Q2')).toBe('2026 Q2');
    expect(formatPeriod('2026')).toBe('2026');
  });

  it('opens on the calendar year of today', () => {
    expect(thisYear('2026-12-01')).toEqual({ from: '2026-01-01', to: '2026-12-31' });
  });

  it('keeps the counts beside each survival rate, so a figure can be traced', () => {
    expect(survivalCellParts({ reached: 20, checked: 20, alive: 17, survivalRate: 0.85 })).toEqual({ main: '85 %', detail: '17 of 20 alive' });
    expect(survivalCellParts({ reached: 12, checked: 0, alive: 0, survivalRate: null })).toEqual({ main: 'not checked', detail: '12 reached' });
    expect(survivalCellParts({ reached: 0, checked: 0, alive: 0, survivalRate: null })).toEqual({ main: 'not reached', detail: '' });
  });

  it('charts one line per site, with a gap where nobody has checked yet', () => {
    const cells = [{ months: 1, reached: 4, checked: 4, alive: 3, survivalRate: 0.75, reachedShare: 1 }, { months: 3, reached: 0, checked: 0, alive: 0, survivalRate: null, reachedShare: 0 }];
    const option = buildSurvivalChartOption({ milestones: [1, 3], sites: [{ siteId: 'a', siteName: 'Heron Cove', planted: 4, cells }, { siteId: 'b', siteName: 'Otter Flats', planted: 0, cells: [] }] });
    expect(option.series).toMatchObject([{ name: 'Heron Cove', data: [75, null] }, { name: 'Otter Flats', data: [null, null] }]);
    // Different markers as well as colours, so the lines are told apart without colour.
    const [a, b] = option.series as { symbol: string }[];
    expect(a?.symbol).not.toBe(b?.symbol);
  });
});
