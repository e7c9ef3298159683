/**
 * How a tree's top and root collar stand against a site's tides: shares of time under water over a
 * level series (the tide domain's `shareSubmerged`) and the year's MHHW and MSL (`computeTidalDatums`).
 */
import { computeTidalDatums, TIDAL_DAY_MS } from '../tide/datums.js';
import { seriesEnd } from '../tide/series.js';
import { shareSubmerged } from '../tide/submergence.js';
import type { LevelSeries, TideExtreme } from '../tide/types.js';
import { NurseryInputError, requireRange } from './errors.js';

/**
 * The site's predicted tide over the coming year, in metres above the station's MLLW with the
 * site's correction applied (e.g. `predictLevelsMetres` at 60 min and `predictExtremesMetres`).
 */
export interface SiteTide {
  series: LevelSeries;
  extremes: readonly TideExtreme[];
  /** The series' MHHW and MSL, when already computed (`siteTideDatums`), to reuse across trees. */
  datums?: SiteTideDatums;
}

export interface SiteTideDatums {
  mhhwM: number;
  mslM: number;
}

/**
 * When a crown is clear: `mhhw` — its top at or above MHHW computed from the series (only the
 * higher high tides reach it); `share` — under water at most `maxShare` (0–1) of the time.
 */
export type CrownThreshold = { kind: 'mhhw' } | { kind: 'share'; maxShare: number };

export interface CrownClearance {
  /** Bed + pot + tree, metres above MLLW. */
  topM: number;
  /** The lowest top that passes. */
  requiredTopM: number;
  pass: boolean;
  /** Centimetres the tree must still grow (0 when it passes). */
  shortfallCm: number;
  crownSubmergedShare: number;
  collarFloodedShare: number;
  mhhwM: number;
  mslM: number;
}

/**
 * MHHW and MSL of the series' whole tidal days (NOAA's definitions via the tide domain's
 * `computeTidalDatums`). Over one year these differ from the 19-year epoch's by the nodal cycle.
 * @example const tide = { series, extremes }; const withDatums = { ...tide, datums: siteTideDatums(tide) };
 */
export function siteTideDatums(tide: SiteTide): SiteTideDatums {
  const fromMs = tide.series.startMs;
  const toMs = seriesEnd(tide.series);
  if (toMs - fromMs < TIDAL_DAY_MS) throw new NurseryInputError('tide', 'The tide series must cover at least one tidal day (use a year).');
  const d = computeTidalDatums({ extremes: tide.extremes, hourly: tide.series, fromMs, toMs });
  return { mhhwM: d.MHHW, mslM: d.MSL };
}

/** Lowest elevation submerged at most `maxShare` of the time (share falls as elevation rises). */
export function elevationForShare(series: LevelSeries, maxShare: number): number {
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const h of series.heights) {
    lo = Math.min(lo, h);
    hi = Math.max(hi, h);
  }
  if (shareSubmerged(series, lo) <= maxShare) return lo;
  for (let i = 0; i < 50; i++) {
    const mid = (lo + hi) / 2;
    if (shareSubmerged(series, mid) <= maxShare) hi = mid;
    else lo = mid;
  }
  return hi;
}

/**
 * Crown and collar against the tide. The collar is the pot's top (bed + pot height), where the
 * roots come out.
 * @example crownClearance({ bedElevationM: 0.6, potHeightCm: 30, heightCm: 45, tide, threshold: { kind: 'mhhw' } })
 */
export function crownClearance(input: {
  bedElevationM: number;
  potHeightCm: number;
  heightCm: number;
  tide: SiteTide;
  threshold: CrownThreshold;
}): CrownClearance {
  const { tide, threshold } = input;
  requireRange('heightCm', input.heightCm, 0, 1000, 'cm');
  requireRange('potHeightCm', input.potHeightCm, 0, 300, 'cm');
  if (threshold.kind === 'share') requireRange('maxShare', threshold.maxShare, 0, 1);
  const collarM = input.bedElevationM + input.potHeightCm / 100;
  const topM = collarM + input.heightCm / 100;
  const { mhhwM, mslM } = tide.datums ?? siteTideDatums(tide);
  const crownSubmergedShare = shareSubmerged(tide.series, topM);
  const requiredTopM = threshold.kind === 'mhhw' ? mhhwM : elevationForShare(tide.series, threshold.maxShare);
  const pass = threshold.kind === 'mhhw' ? topM >= mhhwM : crownSubmergedShare <= threshold.maxShare;
  const shortfallCm = pass ? 0 : Math.max(1, Math.ceil((requiredTopM - topM) * 100 - 1e-6));
  return { topM, requiredTopM, pass, shortfallCm, crownSubmergedShare, collarFloodedShare: shareSubmerged(tide.series, collarM), mhhwM, mslM };
}
