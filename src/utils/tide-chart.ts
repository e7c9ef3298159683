import type { LineSeriesOption } from 'echarts/charts';
import type {
  GridComponentOption,
  MarkAreaComponentOption,
  MarkLineComponentOption,
  MarkPointComponentOption,
  TooltipComponentOption,
} from 'echarts/components';
import type { ComposeOption } from 'echarts/core';
import type { LengthUnit } from '@shared/schemas/organisation.schema';
import type { DaylightDto, LowWaterWindowDto, TideExtremeDto } from '@shared/schemas/tide.schema';
import { dayLabel, dayMarks, labelledExtremes, nightIntervals, type Span } from './tide-chart-marks';
import { formatLevel } from './tide-format';
import { formatDateKey, formatLocalTime, localDateKey, zoneAbbreviation } from './zoned-time';

export type TideChartOption = ComposeOption<
  LineSeriesOption | GridComponentOption | TooltipComponentOption | MarkAreaComponentOption | MarkLineComponentOption | MarkPointComponentOption
>;

/** What the chart needs from GET /api/sites/:id/tide (levels, extremes and lines in `units`). */
export interface TideChartInput {
  from: string;
  to: string;
  levels: readonly { time: string; height: number }[];
  extremes: readonly TideExtremeDto[];
  daylight: readonly DaylightDto[];
  windows: readonly LowWaterWindowDto[];
  lines: { bed: number; route: number; workableBelow: number; floatableAbove: number };
}

export interface TideChartSettings {
  units: LengthUnit;
  /** The site's zone: axis days, labels and the tooltip read in it. */
  timeZone: string;
  /** Phones: fewer labels (only each day's lowest low) and no bed line. */
  compact?: boolean;
  /** A "now" line when it falls inside the week. */
  now?: number;
}

/** Ebbroot's palette (DESIGN.md "Look"): teal water, mud for the bed, amber for windows. */
export const TIDE_COLOURS = {
  water: '#2A7F8E',
  mud: '#6B4E3D',
  ink: '#1E2A24',
  night: 'rgba(30, 42, 36, 0.13)',
  window: 'rgba(224, 164, 59, 0.4)',
} as const;

/** Y bounds on whole feet (or half metres) with room for the labels above highs and below lows. */
function levelRange(input: TideChartInput, units: TideChartSettings['units']): { min: number; max: number } {
  const values = [...input.levels.map((p) => p.height), input.lines.workableBelow, input.lines.floatableAbove, input.lines.bed];
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  // Lows carry a two-line label underneath, so the bottom gets more room than the top.
  const span = Math.max(hi - lo, 0.3);
  const step = units === 'ft' ? 1 : 0.5;
  return { min: Math.floor((lo - span * 0.3) / step) * step, max: Math.ceil((hi + span * 0.15) / step) * step };
}

/** Line labels sit on a pale chip so they stay readable where the curve crosses them. */
const CHIP = { backgroundColor: 'rgba(255, 255, 255, 0.85)', padding: [1, 4], borderRadius: 3 };

/** On phones the key under the chart names the lines, so their labels are left off the plot. */
function lineLabel(formatter: string, position: 'insideStartTop' | 'insideEndTop' | 'insideEndBottom', color: string, compact: boolean) {
  return { show: !compact, formatter, position, color, ...CHIP };
}

function referenceLines(input: TideChartInput, s: TideChartSettings): NonNullable<MarkLineComponentOption['data']> {
  const compact = s.compact ?? false;
  const lines: NonNullable<MarkLineComponentOption['data']> = [
    {
      name: 'Workable on foot below',
      yAxis: input.lines.workableBelow,
      lineStyle: { color: TIDE_COLOURS.mud, type: 'dashed', width: 2 },
      label: lineLabel(`On foot below ${formatLevel(input.lines.workableBelow, s.units)}`, 'insideStartTop', TIDE_COLOURS.mud, compact),
    },
    {
      name: 'Boat floats above',
      yAxis: input.lines.floatableAbove,
      lineStyle: { color: TIDE_COLOURS.water, type: 'dotted', width: 2 },
      label: lineLabel(`Boat floats above ${formatLevel(input.lines.floatableAbove, s.units)}`, 'insideEndBottom', TIDE_COLOURS.water, compact),
    },
  ];
  if (!s.compact) {
    lines.push({
      name: 'Bed',
      yAxis: input.lines.bed,
      lineStyle: { color: TIDE_COLOURS.mud, type: 'solid', width: 1 },
      label: lineLabel(`Bed ${formatLevel(input.lines.bed, s.units)}`, 'insideEndTop', TIDE_COLOURS.mud, compact),
    });
  }
  if (s.now !== undefined && s.now >= Date.parse(input.from) && s.now <= Date.parse(input.to)) {
    lines.push({ name: 'Now', xAxis: s.now, lineStyle: { color: TIDE_COLOURS.ink, type: 'dashed', width: 1 }, label: { formatter: 'Now', position: 'end' } });
  }
  return lines;
}

function extremeMarks(input: TideChartInput, s: TideChartSettings): NonNullable<MarkPointComponentOption['data']> {
  return labelledExtremes(input.extremes, s.timeZone, s.compact ?? false).map((e) => ({
    name: e.type === 'high' ? 'High' : 'Low',
    coord: [Date.parse(e.time), e.height],
    value: e.height,
    label: {
      formatter: `${formatLocalTime(e.time, s.timeZone)}\n${formatLevel(e.height, s.units)}`,
      position: e.type === 'high' ? 'top' : 'bottom',
      color: TIDE_COLOURS.ink,
      fontSize: s.compact ? 10 : 11,
      lineHeight: s.compact ? 12 : 13,
    },
  }));
}

function tooltipText(s: TideChartSettings): (params: unknown) => string {
  return (params) => {
    const first: unknown = Array.isArray(params) ? params[0] : params;
    const value = typeof first === 'object' && first !== null && 'value' in first ? first.value : null;
    if (!Array.isArray(value) || typeof value[0] !== 'number' || typeof value[1] !== 'number') return '';
    const [time, height] = value;
    const day = formatDateKey(localDateKey(time, s.timeZone));
    return `${day} ${formatLocalTime(time, s.timeZone)} ${zoneAbbreviation(time, s.timeZone)}<br>${formatLevel(height, s.units, 2)}`;
  };
}

/** A series that draws nothing itself and carries shaded bands. */
function bands(name: string, color: string, z: number, spans: readonly Span[]): LineSeriesOption {
  return { name, type: 'line', data: [], silent: true, z, markArea: { silent: true, itemStyle: { color }, data: spans.map(([a, b]) => [{ xAxis: a }, { xAxis: b }]) } };
}

function tideSeries(input: TideChartInput, s: TideChartSettings): LineSeriesOption {
  return {
    name: 'Tide',
    type: 'line',
    z: 3,
    showSymbol: false,
    data: input.levels.map((p) => [Date.parse(p.time), p.height]),
    lineStyle: { color: TIDE_COLOURS.water, width: s.compact ? 2 : 2.5 },
    itemStyle: { color: TIDE_COLOURS.water },
    areaStyle: { color: TIDE_COLOURS.water, opacity: 0.08, origin: 'start' },
    markPoint: { symbol: 'circle', symbolSize: 6, itemStyle: { color: TIDE_COLOURS.water }, data: extremeMarks(input, s) },
    markLine: { silent: true, symbol: ['none', 'none'], data: referenceLines(input, s) },
  };
}

/** Days across the bottom: ticks at the site's local midnights, labels at local noons. */
function timeAxis(from: number, to: number, s: TideChartSettings): TideChartOption['xAxis'] {
  const { midnights, noons } = dayMarks(from, to, s.timeZone);
  return {
    type: 'value',
    min: from,
    max: to,
    axisTick: { customValues: midnights, length: 6 },
    axisLabel: { customValues: noons, color: TIDE_COLOURS.ink, lineHeight: 15, formatter: (value: number) => dayLabel(value, s.timeZone, s.compact ?? false) },
    splitLine: { show: false },
  };
}

/**
 * The ECharts option for a week of tide at one site: the curve, nights shaded, low-water windows
 * as amber bands, highs and lows labelled with local time and height, and the two working lines.
 * Pure, so it is unit-tested without a canvas.
 */
export function buildTideChartOption(input: TideChartInput, s: TideChartSettings): TideChartOption {
  const from = Date.parse(input.from);
  const to = Date.parse(input.to);
  const windows = input.windows.map((w): Span => [Date.parse(w.start), Date.parse(w.end)]);
  return {
    animation: false,
    grid: { left: 44, right: 12, top: s.compact ? 20 : 28, bottom: s.compact ? 44 : 36 },
    tooltip: { trigger: 'axis', formatter: tooltipText(s) },
    xAxis: timeAxis(from, to, s),
    yAxis: {
      type: 'value',
      ...levelRange(input, s.units),
      name: s.units,
      nameTextStyle: { color: TIDE_COLOURS.ink },
      axisLabel: { color: TIDE_COLOURS.ink, formatter: (v: number) => formatLevel(v, s.units).replace(` ${s.units}`, '') },
      splitLine: { lineStyle: { color: '#E6DCCB' } },
    },
    series: [
      bands('Night', TIDE_COLOURS.night, 1, nightIntervals(input.daylight, from, to)),
      bands('Low-water windows', TIDE_COLOURS.window, 2, windows),
      tideSeries(input, s),
    ],
  };
}
