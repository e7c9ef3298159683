/**
 * A site's low-water windows: its station's predicted levels (with the site's own correction),
 * its daylight, its depths, ranked. Everything in metres above the station's MLLW.
 */
import { daylightIntervals } from './daylight.js';
import { predictLevelsMetres } from './predict.js';
import { rankWindows, type ScoredWindow, type WindowWeights } from './window-ranking.js';
import { findLowWaterWindows } from './windows.js';
import type { LevelSeries, LocalCorrection, TideStation } from './types.js';

/** The parts of a site the window finder reads (metres, elevations above the station's MLLW). */
export interface SiteWindowSettings {
  latitude: number;
  longitude: number;
  timeZone: string;
  timeOffsetMinutes: number;
  heightOffsetM: number;
  bedElevationM: number;
  routeElevationM: number;
  workingDepthM: number;
  craftDraftM: number;
  draftMarginM: number;
  minWindowMinutes: number;
  includeCivilTwilight: boolean;
}

/** The site's correction to its station's predictions. */
export function siteCorrection(site: SiteWindowSettings): LocalCorrection {
  return { timeOffsetMinutes: site.timeOffsetMinutes, heightOffset: site.heightOffsetM };
}

export const siteDepths = (site: SiteWindowSettings) => ({
  bedElevation: site.bedElevationM,
  routeElevation: site.routeElevationM,
  workingDepth: site.workingDepthM,
  draft: site.craftDraftM,
  margin: site.draftMarginM,
});

/** Windows found in a level series already computed for the site (e.g. the tide board's week). */
export function windowsInSeries(site: SiteWindowSettings, series: LevelSeries, span: { fromMs: number; toMs: number }, weights?: WindowWeights): ScoredWindow[] {
  const daylight = daylightIntervals({ ...site, ...span, includeCivilTwilight: site.includeCivilTwilight });
  const windows = findLowWaterWindows({ ...siteDepths(site), series, daylight, minDurationMinutes: site.minWindowMinutes });
  return rankWindows(windows, { ...siteDepths(site), timeZone: site.timeZone, weights });
}

/**
 * Ranked windows of a site over a span, at `stepMinutes` resolution (6 by default).
 * @example siteWindows(station, site, { fromMs, toMs }) // chronological, each with score and cautions
 */
export function siteWindows(
  station: TideStation,
  site: SiteWindowSettings,
  span: { fromMs: number; toMs: number; stepMinutes?: number },
  weights?: WindowWeights,
): ScoredWindow[] {
  const series = predictLevelsMetres(station, { ...span, stepMinutes: span.stepMinutes ?? 6, correction: siteCorrection(site) });
  return windowsInSeries(site, series, span, weights);
}
