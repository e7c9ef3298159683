import { describe, expect, it } from 'vitest';
import { buildTideChartOption, TIDE_COLOURS, type TideChartInput } from '@/utils/tide-chart';
import { dayLabel, dayMarks, labelledExtremes, nightIntervals } from '@/utils/tide-chart-marks';
import { buildWindow } from '../support/sites';

const NY = 'America/New_York';
const FROM = '2025-03-03T05:00:00.000Z'; // Monday 3 March 2025, 00:00 EST
const TO = '2025-03-05T05:00:00.000Z'; // two days, to keep the expectations readable
const ms = (iso: string): number => Date.parse(iso);

const daylight = [
  { date: '2025-03-03', civilDawn: null, sunrise: '2025-03-03T11:51:00Z', sunset: '2025-03-03T23:30:00Z', civilDusk: null },
  { date: '2025-03-04', civilDawn: null, sunrise: '2025-03-04T11:50:00Z', sunset: '2025-03-04T23:31:00Z', civilDusk: null },
];

function input(overrides: Partial<TideChartInput> = {}): TideChartInput {
  return {
    from: FROM,
    to: TO,
    levels: [
      { time: FROM, height: 1 },
      { time: '2025-03-04T12:00:00Z', height: -0.6 },
      { time: TO, height: 2 },
    ],
    extremes: [
      { time: '2025-03-03T18:00:00Z', height: 2.1, type: 'high' },
      { time: '2025-03-04T00:30:00Z', height: 0.2, type: 'low' },
      { time: '2025-03-04T12:55:00Z', height: -0.6, type: 'low' },
    ],
    daylight,
    windows: [buildWindow({ start: '2025-03-04T11:50:00Z', end: '2025-03-04T14:10:00Z' })],
    lines: { bed: 0.5, route: -1, workableBelow: 1.5, floatableAbove: -0.2 },
    ...overrides,
  };
}

type Series = { name: string; markArea?: { data: unknown[] }; markLine?: { data: Record<string, unknown>[] }; markPoint?: { data: Record<string, unknown>[] } };
function series(option: ReturnType<typeof buildTideChartOption>, name: string): Series {
  const all = option.series as Series[];
  const found = all.find((s) => s.name === name);
  if (!found) throw new Error(`no series ${name}`);
  return found;
}

describe('tide chart marks', () => {
  it('shades from the week start to sunrise, sunset to the next sunrise, and sunset to the week end', () => {
    expect(nightIntervals(daylight, ms(FROM), ms(TO))).toEqual([
      [ms(FROM), ms('2025-03-03T11:51:00Z')],
      [ms('2025-03-03T23:30:00Z'), ms('2025-03-04T11:50:00Z')],
      [ms('2025-03-04T23:31:00Z'), ms(TO)],
    ]);
  });

  it('puts day ticks at local midnights and day labels at local noons, across the change to daylight time', () => {
    const { midnights, noons } = dayMarks(ms('2025-03-08T05:00:00Z'), ms('2025-03-10T04:00:00Z'), NY);
    expect(midnights.map((t) => new Date(t).toISOString())).toEqual(['2025-03-08T05:00:00.000Z', '2025-03-09T05:00:00.000Z', '2025-03-10T04:00:00.000Z']);
    expect(noons.map((t) => new Date(t).toISOString())).toEqual(['2025-03-08T17:00:00.000Z', '2025-03-09T16:00:00.000Z']);
    expect(dayLabel(ms('2025-03-09T16:00:00Z'), NY, false)).toBe('Sun 9 Mar');
    expect(dayLabel(ms('2025-03-09T16:00:00Z'), NY, true)).toBe('Sun\n9');
  });

  it('labels every extreme, or on phones only the lowest low of each local day', () => {
    const all = input().extremes;
    expect(labelledExtremes(all, NY, false)).toHaveLength(3);
    // 00:30Z on the 4th is 19:30 on the 3rd in New York: the only low, so the lowest, of that day.
    expect(labelledExtremes(all, NY, true).map((e) => e.time)).toEqual(['2025-03-04T00:30:00Z', '2025-03-04T12:55:00Z']);
  });
});

describe('buildTideChartOption', () => {
  const option = buildTideChartOption(input(), { units: 'ft', timeZone: NY });

  it('draws the curve in estuary teal over the week', () => {
    const tide = series(option, 'Tide') as Series & { data: number[][]; lineStyle: { color: string } };
    expect(tide.lineStyle.color).toBe('#2A7F8E');
    expect(tide.data[0]).toEqual([ms(FROM), 1]);
    expect(option.xAxis).toMatchObject({ type: 'value', min: ms(FROM), max: ms(TO) });
  });

  it('shades the nights and bands the low-water windows in translucent amber', () => {
    expect(series(option, 'Night').markArea?.data).toHaveLength(3);
    expect(series(option, 'Low-water windows').markArea).toMatchObject({
      itemStyle: { color: TIDE_COLOURS.window },
      data: [[{ xAxis: ms('2025-03-04T11:50:00Z') }, { xAxis: ms('2025-03-04T14:10:00Z') }]],
    });
    expect(TIDE_COLOURS.window).toBe('rgba(224, 164, 59, 0.4)');
  });

  it('draws "workable on foot below" in mud brown and "boat floats above" in teal', () => {
    const lines = series(option, 'Tide').markLine?.data ?? [];
    expect(lines.find((l) => l.name === 'Workable on foot below')).toMatchObject({
      yAxis: 1.5,
      lineStyle: { color: '#6B4E3D' },
      label: { formatter: 'On foot below 1.5 ft' },
    });
    expect(lines.find((l) => l.name === 'Boat floats above')).toMatchObject({
      yAxis: -0.2,
      lineStyle: { color: '#2A7F8E' },
      label: { formatter: 'Boat floats above \u22120.2 ft' },
    });
    expect(lines.find((l) => l.name === 'Bed')).toMatchObject({ yAxis: 0.5 });
  });

  it('labels highs above and lows below with the local time and height', () => {
    const marks = series(option, 'Tide').markPoint?.data ?? [];
    expect(marks).toHaveLength(3);
    expect(marks[0]).toMatchObject({ name: 'High', coord: [ms('2025-03-03T18:00:00Z'), 2.1], label: { formatter: '13:00\n2.1 ft', position: 'top' } });
    expect(marks[2]).toMatchObject({ name: 'Low', label: { formatter: '07:55\n\u22120.6 ft', position: 'bottom' } });
  });

  it('keeps every line and level inside the y axis', () => {
    const y = option.yAxis as { min: number; max: number; name: string };
    expect(y.name).toBe('ft');
    expect(y.min).toBeLessThan(-0.6);
    expect(y.max).toBeGreaterThan(2);
  });

  it('on phones drops the bed line and labels fewer extremes; a "now" line shows inside the week', () => {
    const phone = buildTideChartOption(input(), { units: 'm', timeZone: NY, compact: true, now: ms('2025-03-04T15:00:00Z') });
    const lines = series(phone, 'Tide').markLine?.data ?? [];
    expect(lines.map((l) => l.name)).toEqual(['Workable on foot below', 'Boat floats above', 'Now']);
    expect(series(phone, 'Tide').markPoint?.data).toHaveLength(2);
  });

  it('formats the tooltip in the site zone', () => {
    const tooltip = option.tooltip as { formatter: (p: unknown) => string };
    expect(tooltip.formatter([{ value: [ms('2025-03-04T12:00:00Z'), -0.55] }])).toBe('Tue 4 Mar 07:00 EST<br>\u22120.55 ft');
    expect(tooltip.formatter([])).toBe('');
  });
});
