/**
 * Tidal datums computed from predictions over a chosen span, following NOAA's definitions:
 * MHHW = mean of each tidal day's higher high water, MHW = mean of all high waters,
 * MSL = mean of hourly heights, MLW = mean of all low waters, MLLW = mean of each tidal day's
 * lower low water, MTL = (MHW + MLW) / 2, DTL = (MHHW + MLLW) / 2.
 */
import { predictExtremesMetres, predictLevelsMetres } from './predict.js';
import type { LevelSeries, TideExtreme, TideStation } from './types.js';

/** A tidal (lunar) day: 24.84 hours. */
export const TIDAL_DAY_MS = 24.84 * 3_600_000;

/** Datums in the unit and datum of the input heights, plus how many tidal days they average. */
export interface TidalDatums {
  MHHW: number;
  MHW: number;
  MSL: number;
  MTL: number;
  DTL: number;
  MLW: number;
  MLLW: number;
  tidalDays: number;
}

const mean = (xs: readonly number[]) => (xs.length ? xs.reduce((a, b) => a + b, 0) / xs.length : Number.NaN);

/**
 * Computes tidal datums. The span is cut into whole tidal days of 24.84 h counted from
 * `fromMs` (a trailing partial day is dropped, so every average covers the same days); each
 * day's higher high is the highest high water whose time falls in it, its lower low the
 * lowest low water. A day with only one high (or low) counts it as the higher high (or lower
 * low), as NOAA does for diurnal days; a day with no high or no low is left out of MHHW/MLLW.
 * @param hourly heights at one-hour steps (their mean over the days is MSL).
 */
export function computeTidalDatums(input: {
  extremes: readonly TideExtreme[];
  hourly: LevelSeries;
  fromMs: number;
  toMs: number;
}): TidalDatums {
  const days = Math.floor((input.toMs - input.fromMs) / TIDAL_DAY_MS);
  const endMs = input.fromMs + days * TIDAL_DAY_MS;
  const higher = new Float64Array(days).fill(Number.NEGATIVE_INFINITY);
  const lower = new Float64Array(days).fill(Number.POSITIVE_INFINITY);
  const highs: number[] = [];
  const lows: number[] = [];
  for (const e of input.extremes) {
    if (e.timeMs < input.fromMs || e.timeMs >= endMs) continue;
    const day = Math.floor((e.timeMs - input.fromMs) / TIDAL_DAY_MS);
    if (e.type === 'high') {
      highs.push(e.height);
      higher[day] = Math.max(higher[day]!, e.height);
    } else {
      lows.push(e.height);
      lower[day] = Math.min(lower[day]!, e.height);
    }
  }
  const MHHW = mean(Array.from(higher).filter(Number.isFinite));
  const MLLW = mean(Array.from(lower).filter(Number.isFinite));
  const MHW = mean(highs);
  const MLW = mean(lows);
  const MSL = meanOver(input.hourly, input.fromMs, endMs);
  return { MHHW, MHW, MSL, MTL: (MHW + MLW) / 2, DTL: (MHHW + MLLW) / 2, MLW, MLLW, tidalDays: days };
}

/** Mean of the samples with fromMs ≤ t < toMs. */
function meanOver(series: LevelSeries, fromMs: number, toMs: number): number {
  let sum = 0;
  let n = 0;
  for (let i = 0; i < series.heights.length; i++) {
    const t = series.startMs + i * series.stepMs;
    if (t < fromMs || t >= toMs) continue;
    sum += series.heights[i]!;
    n++;
  }
  return n ? sum / n : Number.NaN;
}

/**
 * Tidal datums of a station from its own predictions over [fromMs, toMs], in metres above its
 * zero datum (MLLW where published). Use a 19-year span (a tidal datum epoch, e.g. 1983–2001)
 * to average out the 18.6-year nodal cycle; shorter spans are biased by it.
 */
export function computeStationDatums(station: TideStation, span: { fromMs: number; toMs: number }): TidalDatums {
  const extremes = predictExtremesMetres(station, span);
  const hourly = predictLevelsMetres(station, { ...span, stepMinutes: 60 });
  return computeTidalDatums({ extremes, hourly, ...span });
}
