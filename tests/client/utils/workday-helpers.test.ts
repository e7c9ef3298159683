import { describe, expect, it } from 'vitest';
import { ageOn } from '@/utils/age';
import { formatHours, hoursSpan } from '@/utils/hours-period';
import { buildTideSparkline } from '@/utils/tide-sparkline';
import { fromKilograms, toKilograms, weightUnitFor } from '@/utils/weight';
import { buildWorkdayMonth } from '@/utils/workday-calendar';
import { bringList, workdayDaySpan, workdayWhen } from '@/utils/workday-format';
import { PELICAN, buildWorkday } from '../support/workdays';

describe('workday helpers', () => {
  it.each([
    ['2010-06-15', '2026-06-14', 15],
    ['2010-06-15', '2026-06-15', 16],
    // Born on 29 February: a year older on 1 March in common years.
    ['2008-02-29', '2025-02-28', 16],
    ['2008-02-29', '2025-03-01', 17],
  ])('ageOn(%s, %s) is %i', (dob, day, age) => {
    expect(ageOn(dob, day)).toBe(age);
  });

  it('converts loads with the exact pound (0.45359237 kg) and picks pounds for organisations in feet', () => {
    expect(toKilograms(100, 'lb')).toBe(45.4);
    expect(fromKilograms(1000, 'lb')).toBe(2204.6);
    expect(weightUnitFor('ft')).toBe('lb');
    expect(weightUnitFor('m')).toBe('kg');
  });

  it("shows a workday on its site's date and clock, and spans its local day", () => {
    const w = buildWorkday({ site: PELICAN, siteId: PELICAN.id, startsAt: '2025-03-15T03:30:00.000Z', endsAt: '2025-03-15T05:30:00.000Z' });

    expect(workdayWhen(w)).toBe('Fri 14 Mar 2025, 20:30\u201322:30 PDT');
    expect(workdayDaySpan(w)).toEqual({ from: '2025-03-14T07:00:00.000Z', to: '2025-03-15T07:00:00.000Z' });
  });

  it('places workdays in the month grid by local date', () => {
    const days = buildWorkdayMonth([buildWorkday(), buildWorkday({ site: PELICAN, siteId: PELICAN.id, startsAt: '2025-03-15T03:30:00.000Z' })], '2025-03', '2025-03-01');

    expect(days).toHaveLength(42);
    expect(days.filter((d) => d.workdays.length > 0).map((d) => d.key)).toEqual(['2025-03-14', '2025-03-15']);
    expect(days.find((d) => d.isToday)?.key).toBe('2025-03-01');
  });

  it('reads what to bring one item per line', () => {
    expect(bringList('Water\n- Hat\n\n\u2022 Closed shoes  ')).toEqual(['Water', 'Hat', 'Closed shoes']);
  });

  it.each([
    ['this-year', { from: '2025-01-01', to: '2026-01-01' }],
    ['last-year', { from: '2024-01-01', to: '2025-01-01' }],
    ['all', {}],
  ] as const)('asks for %s hours as %o', (period, span) => {
    expect(hoursSpan(period, '2025-06-10')).toEqual(span);
  });

  it('makes a typed end date inclusive', () => {
    expect(hoursSpan('custom', '2025-06-10', { from: '2025-03-01', to: '2025-03-31' })).toEqual({ from: '2025-03-01', to: '2025-04-01' });
    expect(formatHours(150)).toBe('2.5 h');
  });

  it('draws the day with the workday and the nights as bands', () => {
    const chart = buildTideSparkline({
      day: '2025-03-15',
      timeZone: 'America/New_York',
      span: { from: '2025-03-15T04:00:00.000Z', to: '2025-03-16T04:00:00.000Z' },
      levels: [
        { time: '2025-03-15T04:00:00.000Z', height: 2 },
        { time: '2025-03-15T16:00:00.000Z', height: 0 },
        { time: '2025-03-16T04:00:00.000Z', height: 1 },
      ],
      workday: { start: '2025-03-15T10:00:00.000Z', end: '2025-03-15T16:00:00.000Z' },
      daylight: [{ date: '2025-03-15', civilDawn: null, sunrise: '2025-03-15T10:00:00.000Z', sunset: '2025-03-15T22:00:00.000Z', civilDusk: null }],
    });

    expect(chart.path).toBe('M0 12 L300 128 L600 70');
    expect(chart.band).toEqual({ x: 150, width: 150 });
    expect(chart.nights).toEqual([{ x: 0, width: 150 }, { x: 450, width: 150 }]);
    expect(chart.ticks.map((t) => [t.label, t.x])).toEqual([['00:00', 0], ['06:00', 150], ['12:00', 300], ['18:00', 450]]);
  });
});
