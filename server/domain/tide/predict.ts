/**
 * Water levels and high/low waters for a station, in metres above its zero datum (MLLW where
 * published), from its harmonic constituents via @neaps/tide-predictor. Subordinate stations
 * follow NOAA: the reference station's highs and lows, shifted by the published offsets.
 */
import { createTidePredictor, type TidePrediction } from '@neaps/tide-predictor';
import { applyLocalCorrection, applySubordinateOffsets, filterSmallExtremes, MIN_EXTREME_RANGE_M, resolveCorrection } from './extremes.js';
import { cosineSeries, resampleSeries } from './series.js';
import { mslAboveZero, nodeCorrectionsFor } from './station-datums.js';
import type { LevelSeries, LocalCorrection, TideExtreme, TideStation } from './types.js';

const HOUR_MS = 3_600_000;
/** Extremes are searched this far beyond the span so offsets and filtering see whole tides. */
const PAD_MS = 48 * HOUR_MS;

/** What to predict: a span, and optionally the site's local correction. */
export interface PredictionSpan {
  fromMs: number;
  toMs: number;
  correction?: LocalCorrection;
}

function predictorFor(station: TideStation): TidePrediction {
  return createTidePredictor([...station.constituents], {
    offset: mslAboveZero(station),
    nodeCorrections: nodeCorrectionsFor(station),
    // Every root of h'(t); small wiggles are removed in pairs by filterSmallExtremes.
    prominenceThreshold: 0,
  });
}

/** Reference-station extremes over [fromMs, toMs], unfiltered, in metres above the zero datum. */
function rawExtremes(station: TideStation, fromMs: number, toMs: number): TideExtreme[] {
  return predictorFor(station)
    .getExtremesPrediction({ start: new Date(fromMs), end: new Date(toMs) })
    .map((e) => ({ timeMs: e.time.getTime(), height: e.level, type: e.high ? 'high' : 'low' }));
}

/** Station extremes (subordinate offsets applied) around a span, before the local correction. */
function stationExtremes(station: TideStation, fromMs: number, toMs: number): TideExtreme[] {
  const filtered = filterSmallExtremes(rawExtremes(station, fromMs - PAD_MS, toMs + PAD_MS), MIN_EXTREME_RANGE_M);
  return station.offsets ? applySubordinateOffsets(filtered, station.offsets) : filtered;
}

/**
 * High and low waters between two instants, in metres above the station's zero datum, with
 * subordinate offsets and then the local correction applied.
 * @example predictExtremesMetres(station, { fromMs: Date.parse('2016-01-01'), toMs: Date.parse('2016-01-02') })
 */
export function predictExtremesMetres(station: TideStation, span: PredictionSpan): TideExtreme[] {
  const shift = resolveCorrection(span.correction).timeOffsetMinutes * 60_000;
  const base = stationExtremes(station, span.fromMs - shift, span.toMs - shift);
  return applyLocalCorrection(base, span.correction).filter((e) => e.timeMs >= span.fromMs && e.timeMs <= span.toMs);
}

/**
 * Water level every `stepMinutes` from the first step boundary at or before `fromMs` to the
 * first at or after `toMs`, in metres above the zero datum, local correction applied. A
 * subordinate station's curve joins its corrected highs and lows with half-cosines (NOAA
 * publishes only highs and lows for subordinate stations). A local time offset that is not a
 * whole number of steps is applied by linear interpolation between steps (sub-millimetre at 6 min).
 */
export function predictLevelsMetres(station: TideStation, span: PredictionSpan & { stepMinutes: number }): LevelSeries {
  const stepMs = Math.round(span.stepMinutes * 60_000);
  if (stepMs <= 0) throw new RangeError('stepMinutes must be positive');
  const c = resolveCorrection(span.correction);
  const startMs = Math.floor(span.fromMs / stepMs) * stepMs;
  const count = Math.ceil(span.toMs / stepMs) - startMs / stepMs + 1;
  const shift = c.timeOffsetMinutes * 60_000;
  const base = baseSeries(station, startMs - shift, startMs - shift + (count - 1) * stepMs, stepMs);
  const heights = shift === 0 && base.startMs === startMs ? base.heights : resampleSeries(base, startMs - shift, stepMs, count).heights;
  const out = new Float64Array(count);
  for (let i = 0; i < count; i++) out[i] = heights[i]! * c.heightRatio + c.heightOffset;
  return { startMs, stepMs, heights: out };
}

/** Uncorrected station levels covering [fromMs, toMs] on a grid of `stepMs`. */
function baseSeries(station: TideStation, fromMs: number, toMs: number, stepMs: number): LevelSeries {
  if (station.offsets) {
    const startMs = Math.floor(fromMs / stepMs) * stepMs;
    const count = Math.ceil((toMs - startMs) / stepMs) + 1;
    return cosineSeries(stationExtremes(station, fromMs, toMs), startMs, stepMs, count);
  }
  const points = predictorFor(station).getTimelinePrediction({
    start: new Date(fromMs),
    end: new Date(toMs),
    timeFidelity: stepMs / 1000,
  });
  const heights = new Float64Array(points.length);
  for (let i = 0; i < points.length; i++) heights[i] = points[i]!.level;
  return { startMs: points[0]?.time.getTime() ?? fromMs, stepMs, heights };
}
