/**
 * Which datums a station publishes and how to move heights between them. Predictions are made
 * relative to the station's zero datum (MLLW where published) and shifted from there.
 */
import type { NodeCorrections, TideStation } from './types.js';

/** Dataset datum keys that are ranges, inequalities or intervals, not elevations. */
const NOT_ELEVATIONS = new Set(['GT', 'MN', 'DHQ', 'DLQ', 'HWI', 'LWI', 'CRD_OFFSET']);

/** Raised when a station does not publish the datum asked for. */
export class UnknownDatumError extends Error {
  constructor(
    readonly stationId: string,
    readonly datum: string,
    readonly available: readonly string[],
  ) {
    super(`Station ${stationId} publishes no ${datum} datum (available: ${available.join(', ')})`);
    this.name = 'UnknownDatumError';
  }
}

/**
 * NOAA's predictions use Schureman's node factors; measured against NOAA's published tables
 * the "schureman" option matches far better than the predictor's IHO default, so NOAA stations
 * use it and every other source keeps the default.
 */
export function nodeCorrectionsFor(station: Pick<TideStation, 'id'>): NodeCorrections {
  return station.id.startsWith('noaa/') ? 'schureman' : 'iho';
}

/**
 * The datum predictions are expressed in by default: MLLW when the station publishes it,
 * else its chart datum, else MSL (the constituents' own mean level).
 */
export function zeroDatum(station: Pick<TideStation, 'datums' | 'chartDatum'>): string {
  if (typeof station.datums.MLLW === 'number') return 'MLLW';
  if (station.chartDatum && typeof station.datums[station.chartDatum] === 'number') return station.chartDatum;
  return 'MSL';
}

/**
 * Datums heights can be given in. A subordinate station only has its zero datum: the dataset's
 * datums for it are its reference station's, and NOAA's offsets yield heights on the
 * subordinate's own chart datum.
 */
export function availableDatums(station: Pick<TideStation, 'kind' | 'datums' | 'chartDatum'>): string[] {
  const zero = zeroDatum(station);
  if (station.kind === 'subordinate') return [zero];
  const names = Object.keys(station.datums).filter((k) => !NOT_ELEVATIONS.has(k));
  return names.includes(zero) ? names : [zero, ...names];
}

/**
 * Metres to add to a height above the zero datum to express it above `datum`.
 * @throws UnknownDatumError when the station does not publish `datum`.
 * @example datumShift(station, 'MHHW') // -0.85 at a station where MHHW is 0.85 m above MLLW
 */
export function datumShift(station: TideStation, datum: string): number {
  const zero = zeroDatum(station);
  if (datum === zero) return 0;
  const available = availableDatums(station);
  const target = station.datums[datum];
  const base = station.datums[zero] ?? 0;
  if (!available.includes(datum) || typeof target !== 'number') {
    throw new UnknownDatumError(station.id, datum, available);
  }
  return base - target;
}

/**
 * The station's published elevation datums in metres above its zero datum (empty for a
 * subordinate station, whose own datums the dataset does not carry).
 */
export function publishedDatums(station: TideStation): Record<string, number> {
  const out: Record<string, number> = {};
  if (station.kind === 'subordinate') return out;
  const base = station.datums[zeroDatum(station)] ?? 0;
  for (const name of availableDatums(station)) {
    const value = station.datums[name];
    if (typeof value === 'number') out[name] = value - base;
  }
  return out;
}

/**
 * MSL in metres above the zero datum: the constituents oscillate about MSL, so this is the
 * constant added to the harmonic sum. Zero when the station publishes no MSL.
 */
export function mslAboveZero(station: TideStation): number {
  const msl = station.datums.MSL;
  const zero = station.datums[zeroDatum(station)];
  return typeof msl === 'number' && typeof zero === 'number' ? msl - zero : 0;
}
