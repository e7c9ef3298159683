/**
 * Shapes shared by the tide, daylight and low-water-window modules. Times are UTC instants in
 * epoch milliseconds (`…Ms`); heights are metres unless a function says otherwise.
 */

/** Length unit for heights shown to people. */
export type LengthUnit = 'm' | 'ft';

/** Node-correction convention of the harmonic predictor (see `nodeCorrectionsFor`). */
export type NodeCorrections = 'iho' | 'schureman';

/** One harmonic constituent as a station publishes it. */
export interface HarmonicConstituent {
  name: string;
  /** Metres. */
  amplitude: number;
  /** Degrees (Greenwich epoch, as published). */
  phase: number;
  /** Degrees per hour, when the source gives it. */
  speed?: number;
}

/**
 * Published offsets of a subordinate station from its reference station, applied to the
 * reference station's high and low waters (separately for highs and lows).
 */
export interface SubordinateOffsets {
  referenceId: string;
  /** Minutes added to the reference station's high / low water times. */
  time: { high: number; low: number };
  /** `ratio`: multiply heights above the chart datum; `fixed`: add metres. */
  height: { high: number; low: number; kind: 'ratio' | 'fixed' };
}

/** Licence of a station's data, as the dataset states it. */
export interface StationLicence {
  type: string;
  url: string;
  commercialUse: boolean;
}

/** A tide station with what prediction needs; built from the open dataset by the adapter. */
export interface TideStation {
  /** Dataset id, e.g. `noaa/8726738`. */
  id: string;
  name: string;
  latitude: number;
  longitude: number;
  /** IANA zone of the station. */
  timeZone: string;
  kind: 'reference' | 'subordinate';
  /** For a subordinate station these are its reference station's constituents. */
  constituents: readonly HarmonicConstituent[];
  /**
   * Datum elevations in metres above the station datum (STND). For a subordinate station the
   * dataset gives its reference station's datums, which are not the subordinate's own.
   */
  datums: Readonly<Record<string, number>>;
  /** The datum charts and predictions use (MLLW at NOAA stations). */
  chartDatum?: string;
  offsets?: SubordinateOffsets;
  /** Tidal datum epoch of the published datums, e.g. 1983-01-01 … 2001-12-31. */
  epoch?: { start: string; end: string };
  source: { name: string; id: string; url: string };
  licence: StationLicence;
  /** Credit to display wherever the station's data is shown. */
  attribution: string;
}

/** A site's own correction to its station's predictions, applied last. */
export interface LocalCorrection {
  /** Minutes added to every predicted time. */
  timeOffsetMinutes?: number;
  /** Multiplies heights above the station's zero datum (default 1). */
  heightRatio?: number;
  /** Metres added after the ratio (default 0). */
  heightOffset?: number;
}

/** A high or low water. */
export interface TideExtreme {
  timeMs: number;
  height: number;
  type: 'high' | 'low';
}

/** Water levels at a fixed step, starting at `startMs`. */
export interface LevelSeries {
  startMs: number;
  stepMs: number;
  heights: Float64Array;
}

/** A half-open span of time [startMs, endMs). */
export interface TimeInterval {
  startMs: number;
  endMs: number;
}
