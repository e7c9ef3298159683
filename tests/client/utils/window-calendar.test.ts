import { describe, expect, it } from 'vitest';
import {
  buildCalendarDays,
  calendarQuerySpan,
  describeDay,
  formatMonth,
  isMonthKey,
  monthGridKeys,
  shiftMonth,
  sitesToOffer,
  type CalendarData,
} from '@/utils/window-calendar';
import { buildWindow } from '../support/sites';

const tampa = { id: 'a', name: 'Heron Cove', timeZone: 'America/New_York' };
const bay = { id: 'b', name: 'Pelican Flats', timeZone: 'America/Los_Angeles' };

const data: CalendarData = {
  sites: [tampa, bay],
  windows: [
    buildWindow({ siteId: 'a', start: '2025-03-04T11:40:00Z', end: '2025-03-04T14:10:00Z' }),
    // 03:30Z on the 5th is still the evening of the 4th in Los Angeles (19:30 PST).
    buildWindow({ siteId: 'b', start: '2025-03-05T03:30:00Z', end: '2025-03-05T05:30:00Z' }),
    buildWindow({ siteId: 'unknown', start: '2025-03-04T11:40:00Z' }),
  ],
  lowest: [
    { siteId: 'a', date: '2025-03-04', level: -0.6, time: '2025-03-04T12:55:00Z' },
    { siteId: 'b', date: '2025-03-04', level: 0.3, time: '2025-03-05T04:10:00Z' },
  ],
};

describe('window calendar', () => {
  it('lays March 2025 out in whole Monday-to-Sunday weeks', () => {
    const keys = monthGridKeys('2025-03');
    expect(keys[0]).toBe('2025-02-24');
    expect(keys.at(-1)).toBe('2025-04-06');
    expect(keys).toHaveLength(42);
    expect(monthGridKeys('2021-02')).toHaveLength(28);
  });

  it('asks for the grid with a day to spare either side', () => {
    expect(calendarQuerySpan('2025-03')).toEqual({ from: '2025-02-23T00:00:00Z', to: '2025-04-08T00:00:00Z' });
  });

  it('steps and names months', () => {
    expect(shiftMonth('2025-01', -1)).toBe('2024-12');
    expect(shiftMonth('2025-12', 1)).toBe('2026-01');
    expect(formatMonth('2025-03')).toBe('March 2025');
    expect(isMonthKey('2025-13')).toBe(false);
  });

  it("puts each window on its site's local date, with its place on the day's track", () => {
    const days = buildCalendarDays(data, '2025-03', '2025-03-04');
    const fourth = days.find((d) => d.key === '2025-03-04');
    const fifth = days.find((d) => d.key === '2025-03-05');

    expect(fourth?.isToday).toBe(true);
    expect(fourth?.sites.map((s) => [s.site.name, s.number, s.windows.length])).toEqual([
      ['Heron Cove', 1, 1],
      ['Pelican Flats', 2, 1],
    ]);
    expect(fourth?.sites[0]?.windows[0]).toMatchObject({ startMinute: 6 * 60 + 40, endMinute: 9 * 60 + 10 });
    expect(fourth?.sites[1]?.windows[0]).toMatchObject({ startMinute: 19 * 60 + 30, endMinute: 21 * 60 + 30 });
    expect(fourth?.sites[0]?.lowest).toEqual({ level: -0.6, time: '2025-03-04T12:55:00Z' });
    expect(fifth?.sites.every((s) => s.windows.length === 0)).toBe(true);
    expect(days.find((d) => d.key === '2025-02-24')?.inMonth).toBe(false);
  });

  it('offers the sites with windows that day, or every site when none has one', () => {
    const days = buildCalendarDays({ ...data, windows: [data.windows[0]!] }, '2025-03', '2025-03-01');
    expect(sitesToOffer(days.find((d) => d.key === '2025-03-04')!).map((s) => s.id)).toEqual(['a']);
    expect(sitesToOffer(days.find((d) => d.key === '2025-03-05')!).map((s) => s.id)).toEqual(['a', 'b']);
  });

  it('describes a day in words for screen readers and the phone list', () => {
    const day = buildCalendarDays(data, '2025-03', '2025-03-01').find((d) => d.key === '2025-03-04')!;
    expect(describeDay(day, 'ft')).toBe(
      'Tue 4 Mar; Heron Cove: 06:40\u201309:10 EST, lowest \u22120.6 ft at 07:55; Pelican Flats: 19:30\u201321:30 PST, lowest 0.3 ft at 20:10',
    );
  });
});
