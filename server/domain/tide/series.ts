/** Helpers on regular level series: interpolation, resampling, the subordinate cosine curve. */
import type { LevelSeries, TideExtreme } from './types.js';

/** Time of sample `i`. */
export function sampleTime(series: LevelSeries, i: number): number {
  return series.startMs + i * series.stepMs;
}

/** Last sample time of a series. */
export function seriesEnd(series: LevelSeries): number {
  return sampleTime(series, Math.max(0, series.heights.length - 1));
}

/**
 * Level at any instant inside the series, by linear interpolation between samples (clamped to
 * the first/last sample outside it).
 */
export function levelAt(series: LevelSeries, timeMs: number): number {
  const n = series.heights.length;
  const x = (timeMs - series.startMs) / series.stepMs;
  if (x <= 0) return series.heights[0] ?? Number.NaN;
  if (x >= n - 1) return series.heights[n - 1] ?? Number.NaN;
  const i = Math.floor(x);
  const a = series.heights[i]!;
  return a + (series.heights[i + 1]! - a) * (x - i);
}

/** The series re-sampled by linear interpolation on a new grid of `count` points. */
export function resampleSeries(series: LevelSeries, startMs: number, stepMs: number, count: number): LevelSeries {
  const heights = new Float64Array(count);
  for (let i = 0; i < count; i++) heights[i] = levelAt(series, startMs + i * stepMs);
  return { startMs, stepMs, heights };
}

/**
 * Level curve through a list of highs and lows, joining each consecutive pair with a
 * half-cosine: h = h0 + (h1 − h0)·(1 − cos(π·f))/2, f the fraction of the time between them.
 * Used for subordinate stations, whose published offsets only give highs and lows. Before the
 * first or after the last extreme the curve holds that extreme's height.
 */
export function cosineSeries(extremes: readonly TideExtreme[], startMs: number, stepMs: number, count: number): LevelSeries {
  const heights = new Float64Array(count);
  let k = 0;
  for (let i = 0; i < count; i++) {
    const t = startMs + i * stepMs;
    while (k + 1 < extremes.length && extremes[k + 1]!.timeMs <= t) k++;
    const a = extremes[k];
    const b = extremes[k + 1];
    if (!a) heights[i] = Number.NaN;
    else if (!b || t <= a.timeMs) heights[i] = a.height;
    else {
      const f = (t - a.timeMs) / (b.timeMs - a.timeMs);
      heights[i] = a.height + ((b.height - a.height) * (1 - Math.cos(Math.PI * f))) / 2;
    }
  }
  return { startMs, stepMs, heights };
}

/** Converts a series' heights with `map` (units, datum shift), keeping its grid. */
export function mapSeries(series: LevelSeries, map: (h: number) => number): LevelSeries {
  const heights = new Float64Array(series.heights.length);
  for (let i = 0; i < heights.length; i++) heights[i] = map(series.heights[i]!);
  return { startMs: series.startMs, stepMs: series.stepMs, heights };
}

/**
 * Builds a series by sampling a function of time; handy for hand-built curves.
 * @example seriesFromFunction((t) => Math.cos(t / 3.6e6), 0, 360_000, 241)
 */
export function seriesFromFunction(f: (timeMs: number) => number, startMs: number, stepMs: number, count: number): LevelSeries {
  const heights = new Float64Array(count);
  for (let i = 0; i < count; i++) heights[i] = f(startMs + i * stepMs);
  return { startMs, stepMs, heights };
}
