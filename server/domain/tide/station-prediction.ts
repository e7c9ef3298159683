/**
 * Predictions in the unit and datum a person asked for: heights are predicted in metres above
 * the station's zero datum, then shifted with the station's published datums and converted.
 */
import { predictExtremesMetres, predictLevelsMetres, type PredictionSpan } from './predict.js';
import { mapSeries } from './series.js';
import { datumShift, zeroDatum } from './station-datums.js';
import type { LengthUnit, LevelSeries, TideExtreme, TideStation } from './types.js';
import { fromMetres } from './units.js';

/** Unit and datum of returned heights; defaults: metres, the zero datum (MLLW where published). */
export interface HeightFrame {
  unit?: LengthUnit;
  datum?: string;
}

/** Resolved frame plus the converter from metres-above-zero into it. */
function frameFor(station: TideStation, frame: HeightFrame) {
  const unit = frame.unit ?? 'm';
  const datum = frame.datum ?? zeroDatum(station);
  const shift = datumShift(station, datum);
  return { unit, datum, convert: (h: number) => fromMetres(h + shift, unit) };
}

/**
 * High and low waters in [fromMs, toMs] in the requested unit and datum.
 * @throws UnknownDatumError when the station does not publish the datum.
 * @example predictExtremes(station, { fromMs, toMs, unit: 'ft', datum: 'MLLW' })
 */
export function predictExtremes(
  station: TideStation,
  request: PredictionSpan & HeightFrame,
): { unit: LengthUnit; datum: string; extremes: TideExtreme[] } {
  const { unit, datum, convert } = frameFor(station, request);
  const extremes = predictExtremesMetres(station, request).map((e) => ({ ...e, height: convert(e.height) }));
  return { unit, datum, extremes };
}

/**
 * Water levels every `stepMinutes` over [fromMs, toMs] in the requested unit and datum.
 * @throws UnknownDatumError when the station does not publish the datum.
 */
export function predictLevels(
  station: TideStation,
  request: PredictionSpan & HeightFrame & { stepMinutes: number },
): { unit: LengthUnit; datum: string; series: LevelSeries } {
  const { unit, datum, convert } = frameFor(station, request);
  return { unit, datum, series: mapSeries(predictLevelsMetres(station, request), convert) };
}

/** A series as a list of points, for JSON. */
export function seriesPoints(series: LevelSeries): { timeMs: number; height: number }[] {
  return Array.from(series.heights, (height, i) => ({ timeMs: series.startMs + i * series.stepMs, height }));
}
