import type { LengthUnit } from '../../shared/schemas/organisation.schema.js';
import type { DaylightDto, LowWaterWindowDto } from '../../shared/schemas/tide.schema.js';
import type { Site } from '../db/entities/site.entity.js';
import { sunDay } from '../domain/tide/daylight.js';
import { predictExtremesMetres, predictLevelsMetres } from '../domain/tide/predict.js';
import { siteCorrection, siteWindows, windowsInSeries } from '../domain/tide/site-windows.js';
import { datesBetween, localDate } from '../domain/tide/time-zone.js';
import { fromMetres } from '../domain/tide/units.js';
import type { ScoredWindow, WindowWeights } from '../domain/tide/window-ranking.js';
import type { OrganisationService } from './organisation.service.js';
import type { SiteService } from './site.service.js';
import type { Span, StationService } from './station.service.js';
import { toSiteDto } from './site.service.js';
import { toStationSummary } from './station.service.js';

const iso = (ms: number) => new Date(ms).toISOString();
const isoOrNull = (ms: number | null) => (ms === null ? null : iso(ms));
const round = (x: number) => Math.round(x * 1000) / 1000;

function toWindowDto(siteId: string, w: ScoredWindow, unit: LengthUnit): LowWaterWindowDto {
  return {
    siteId,
    start: iso(w.startMs),
    end: iso(w.endMs),
    durationMinutes: w.durationMinutes,
    lowestLevel: round(fromMetres(w.lowestLevel, unit)),
    lowestAt: iso(w.lowestAtMs),
    sunrise: isoOrNull(w.sunriseMs),
    sunset: isoOrNull(w.sunsetMs),
    score: Math.round(w.score),
    cautions: w.cautions.map((c) => ({ code: c.code, text: c.text })),
  };
}

function daylightFor(site: Site, span: Span): DaylightDto[] {
  const dates = datesBetween(localDate(span.fromMs, site.timeZone), localDate(span.toMs, site.timeZone));
  return dates.map((date) => {
    const d = sunDay(date, site.latitude, site.longitude, site.timeZone);
    return { date, civilDawn: isoOrNull(d.civilDawnMs), sunrise: isoOrNull(d.sunriseMs), sunset: isoOrNull(d.sunsetMs), civilDusk: isoOrNull(d.civilDuskMs) };
  });
}

/** Tide boards and low-water windows of sites. */
export function createSiteTideService(deps: { sites: SiteService; stations: StationService; organisation: OrganisationService }) {
  const weights = async (): Promise<WindowWeights> => (await deps.organisation.settings()).windowWeights;

  return {
    /** Everything the tide board shows for a span (up to two weeks). */
    async board(siteId: string, span: Span, unit: LengthUnit) {
      const site = await deps.sites.get(siteId);
      const station = await deps.stations.get(site.stationId);
      const correction = siteCorrection(site);
      const series = predictLevelsMetres(station, { ...span, stepMinutes: 10, correction });
      const h = (m: number) => round(fromMetres(m, unit));
      const levels = Array.from(series.heights, (m, i) => ({ time: iso(series.startMs + i * series.stepMs), height: h(m) }));
      const extremes = predictExtremesMetres(station, { ...span, correction }).map((e) => ({ time: iso(e.timeMs), height: h(e.height), type: e.type }));
      const windows = siteWindows(station, site, span, await weights())
        .sort((a, b) => a.startMs - b.startMs)
        .map((w) => toWindowDto(site.id, w, unit));
      const lines = {
        bed: h(site.bedElevationM),
        route: h(site.routeElevationM),
        workableBelow: h(site.bedElevationM + site.workingDepthM),
        floatableAbove: h(site.routeElevationM + site.craftDraftM + site.draftMarginM),
      };
      return { site: toSiteDto(site), station: toStationSummary(station), units: unit, datum: 'MLLW', levels, extremes, daylight: daylightFor(site, span), windows, lines };
    },

    /** A workday's local day of tide, for its public page: no site details, no windows. */
    async day(siteId: string, span: Span, unit: LengthUnit) {
      const { station, units, datum, levels, extremes, daylight, lines } = await this.board(siteId, span, unit);
      return { station, units, datum, levels, extremes, daylight, lines };
    },

    async windows(siteId: string, span: Span, unit: LengthUnit, sort: 'score' | 'time') {
      const site = await deps.sites.get(siteId);
      const station = await deps.stations.get(site.stationId);
      const found = siteWindows(station, site, span, await weights());
      found.sort(sort === 'score' ? (a, b) => b.score - a.score || a.startMs - b.startMs : (a, b) => a.startMs - b.startMs);
      return { site: { id: site.id, name: site.name, timeZone: site.timeZone }, units: unit, windows: found.map((w) => toWindowDto(site.id, w, unit)) };
    },

    /** Every site's windows and daily lowest water over a span (the window calendar). */
    async calendar(span: Span, unit: LengthUnit) {
      const sites = await deps.sites.entities();
      const w = await weights();
      const perSite = await Promise.all(
        sites.map(async (site) => {
          const station = await deps.stations.get(site.stationId);
          const correction = siteCorrection(site);
          const series = predictLevelsMetres(station, { ...span, stepMinutes: 6, correction });
          const windows = windowsInSeries(site, series, span, w).map((x) => toWindowDto(site.id, x, unit));
          return { site, windows, lowest: dailyLowest(site, predictExtremesMetres(station, { ...span, correction }), unit) };
        }),
      );
      return {
        sites: sites.map((s) => ({ id: s.id, name: s.name, timeZone: s.timeZone })),
        units: unit,
        windows: perSite.flatMap((p) => p.windows).sort((a, b) => a.start.localeCompare(b.start)),
        lowest: perSite.flatMap((p) => p.lowest),
      };
    },
  };
}

/** Each local date's lowest predicted low water at a site. */
function dailyLowest(site: Site, extremes: { timeMs: number; height: number; type: string }[], unit: LengthUnit) {
  const byDate = new Map<string, { timeMs: number; height: number }>();
  for (const e of extremes) {
    if (e.type !== 'low') continue;
    const date = localDate(e.timeMs, site.timeZone);
    const seen = byDate.get(date);
    if (!seen || e.height < seen.height) byDate.set(date, e);
  }
  return [...byDate].map(([date, e]) => ({ siteId: site.id, date, level: round(fromMetres(e.height, unit)), time: iso(e.timeMs) }));
}
export type SiteTideService = ReturnType<typeof createSiteTideService>;
