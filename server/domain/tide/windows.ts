/**
 * Low-water windows: when the water over the planting bed is shallow enough to work on foot
 * AND the water over the route's shallowest point is deep enough for the craft, in light,
 * for long enough to be worth a workday.
 */
import type { DaylightInterval } from './daylight.js';
import { bandIntervals, intersectIntervals } from './intervals.js';
import { levelAt } from './series.js';
import type { LevelSeries } from './types.js';

/** Default shortest window worth a workday. */
export const DEFAULT_MIN_WINDOW_MINUTES = 120;
const MINUTE_MS = 60_000;

/** A site's depths; all in the series' unit, elevations relative to the series' datum. */
export interface WindowDepths {
  bedElevation: number;
  routeElevation: number;
  /** Deepest water over the bed people may work in on foot. */
  workingDepth: number;
  /** Loaded draft of the craft planned for. */
  draft: number;
  /** Extra water wanted under the craft at the route's shallowest point. */
  margin: number;
}

/** What `findLowWaterWindows` needs. */
export interface LowWaterWindowInput extends WindowDepths {
  /** Water level above the datum of the elevations (e.g. MLLW), same unit. */
  series: LevelSeries;
  /** Light intervals, sorted (see `daylightIntervals`). */
  daylight: readonly DaylightInterval[];
  minDurationMinutes?: number;
}

/** One window; times are whole minutes inside the true edges. */
export interface LowWaterWindow {
  startMs: number;
  endMs: number;
  durationMinutes: number;
  lowestLevel: number;
  lowestAtMs: number;
  /** Local date of the light interval, with its sunrise and sunset. */
  date: string;
  sunriseMs: number | null;
  sunsetMs: number | null;
}

/**
 * The band of workable water levels: depth over the route ≥ draft + margin gives the floor,
 * depth over the bed ≤ working depth the ceiling. Empty (lo > hi) when the two cannot meet.
 */
export function workableBand(d: WindowDepths): { lo: number; hi: number } {
  return { lo: d.routeElevation + d.draft + d.margin, hi: d.bedElevation + d.workingDepth };
}

/**
 * Finds low-water windows in time order. Edges are where the level (read as straight lines
 * between samples) crosses the band's floor or ceiling, or where light begins or ends — so a
 * window crossing sunset is clipped, and a very flat tide that never leaves the band still
 * gives a window. Edges are rounded inward to whole minutes; windows shorter than the minimum
 * (default 120 min) are dropped.
 */
export function findLowWaterWindows(input: LowWaterWindowInput): LowWaterWindow[] {
  const { lo, hi } = workableBand(input);
  const minMs = (input.minDurationMinutes ?? DEFAULT_MIN_WINDOW_MINUTES) * MINUTE_MS;
  const out: LowWaterWindow[] = [];
  for (const part of intersectIntervals(bandIntervals(input.series, lo, hi), input.daylight)) {
    const startMs = Math.ceil(part.startMs / MINUTE_MS) * MINUTE_MS;
    const endMs = Math.floor(part.endMs / MINUTE_MS) * MINUTE_MS;
    if (endMs - startMs < minMs) continue;
    const lowest = lowestWithin(input.series, startMs, endMs);
    out.push({
      startMs,
      endMs,
      durationMinutes: (endMs - startMs) / MINUTE_MS,
      lowestLevel: lowest.level,
      lowestAtMs: lowest.timeMs,
      date: part.within.date,
      sunriseMs: part.within.sunriseMs,
      sunsetMs: part.within.sunsetMs,
    });
  }
  return out;
}

/**
 * Lowest level in [startMs, endMs] and when: the lower edge value or the lowest sample inside,
 * refined through a parabola over the sample and its neighbours.
 */
export function lowestWithin(series: LevelSeries, startMs: number, endMs: number): { level: number; timeMs: number } {
  let best = { level: levelAt(series, startMs), timeMs: startMs };
  const atEnd = levelAt(series, endMs);
  if (atEnd < best.level) best = { level: atEnd, timeMs: endMs };
  const { startMs: t0, stepMs: step, heights: h } = series;
  const first = Math.max(1, Math.ceil((startMs - t0) / step));
  const last = Math.min(h.length - 2, Math.floor((endMs - t0) / step));
  for (let i = first; i <= last; i++) {
    const y = h[i]!;
    if (y >= best.level || y > h[i - 1]! || y > h[i + 1]!) continue;
    const a = h[i - 1]!;
    const b = h[i + 1]!;
    const curve = a - 2 * y + b;
    const vertexMs = curve > 0 ? t0 + (i + (a - b) / (2 * curve)) * step : Number.NaN;
    best =
      vertexMs >= startMs && vertexMs <= endMs
        ? { level: y - (a - b) ** 2 / (8 * curve), timeMs: vertexMs }
        : { level: y, timeMs: t0 + i * step };
  }
  return best;
}
