import type { DaylightDto } from '@shared/schemas/tide.schema';
import { zonedTime, type DateKey } from './zoned-time';

/** A small tide curve over one local day, in SVG user units (the SVG scales to its box). */
export interface TideSparkline {
  width: number;
  height: number;
  /** The curve as an SVG path. */
  path: string;
  /** The workday's hours, shaded. */
  band: { x: number; width: number } | null;
  /** Before sunrise and after sunset. */
  nights: { x: number; width: number }[];
  /** Every six hours of the local clock. */
  ticks: { x: number; label: string }[];
}

export interface SparklineInput {
  day: DateKey;
  timeZone: string;
  span: { from: string; to: string };
  levels: readonly { time: string; height: number }[];
  workday: { start: string; end: string };
  daylight: readonly DaylightDto[];
}

const WIDTH = 600;
const HEIGHT = 140;
const PAD = 12;

/**
 * Scales one day of tide levels into a 600×140 box: time across, height up (highest level near the
 * top, lowest near the bottom), with the workday and the nights as bands.
 */
export function buildTideSparkline(input: SparklineInput): TideSparkline {
  const t0 = Date.parse(input.span.from);
  const t1 = Date.parse(input.span.to);
  const x = (iso: string | number) => {
    const t = typeof iso === 'number' ? iso : Date.parse(iso);
    return Math.round(((Math.min(Math.max(t, t0), t1) - t0) / (t1 - t0)) * WIDTH * 10) / 10;
  };
  const heights = input.levels.map((l) => l.height);
  const lo = Math.min(...heights);
  const hi = Math.max(...heights);
  const y = (h: number) => Math.round((HEIGHT - PAD - ((h - lo) / (hi - lo || 1)) * (HEIGHT - 2 * PAD)) * 10) / 10;
  const path = input.levels.map((l, i) => `${i === 0 ? 'M' : 'L'}${x(l.time)} ${y(l.height)}`).join(' ');
  const bandFrom = x(input.workday.start);
  const bandTo = x(input.workday.end);
  const light = input.daylight.find((d) => d.date === input.day);
  const nights: TideSparkline['nights'] = [];
  if (light?.sunrise) nights.push({ x: 0, width: x(light.sunrise) });
  if (light?.sunset) nights.push({ x: x(light.sunset), width: WIDTH - x(light.sunset) });
  const ticks = [0, 6, 12, 18].map((hour) => ({ x: x(zonedTime(input.day, input.timeZone, hour).getTime()), label: `${String(hour).padStart(2, '0')}:00` }));
  return { width: WIDTH, height: HEIGHT, path, band: bandTo > bandFrom ? { x: bandFrom, width: bandTo - bandFrom } : null, nights, ticks };
}
