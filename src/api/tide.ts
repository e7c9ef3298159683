import { z } from 'zod';
import { LengthUnit } from '@shared/schemas/organisation.schema';
import { Site } from '@shared/schemas/site.schema';
import { DaylightDto, LevelPoint, LowWaterWindowDto, SiteTideLines, StationSummary, TideExtremeDto } from '@shared/schemas/tide.schema';
import { get, queryString } from './http';

export const SiteTide = z.object({
  site: Site,
  station: StationSummary,
  units: LengthUnit,
  datum: z.string(),
  levels: z.array(LevelPoint),
  extremes: z.array(TideExtremeDto),
  daylight: z.array(DaylightDto),
  windows: z.array(LowWaterWindowDto),
  lines: SiteTideLines,
});
export type SiteTide = z.infer<typeof SiteTide>;

/** A workday's local day of tide (public, like the workday page). */
export const WorkdayDayTide = SiteTide.omit({ site: true, windows: true });
export type WorkdayDayTide = z.infer<typeof WorkdayDayTide>;

export async function fetchWorkdayTide(workdayId: string, units: LengthUnit): Promise<WorkdayDayTide> {
  return get(`/api/workdays/${encodeURIComponent(workdayId)}/tide${queryString({ units })}`, WorkdayDayTide);
}

const SiteRef = z.object({ id: z.string(), name: z.string(), timeZone: z.string() });
export type SiteRef = z.infer<typeof SiteRef>;

const SiteWindowsResponse = z.object({ site: SiteRef, units: LengthUnit, windows: z.array(LowWaterWindowDto) });

export const LowestWater = z.object({ siteId: z.string(), date: z.string(), level: z.number(), time: z.string() });
export type LowestWater = z.infer<typeof LowestWater>;

export const AllWindows = z.object({
  sites: z.array(SiteRef),
  units: LengthUnit,
  windows: z.array(LowWaterWindowDto),
  lowest: z.array(LowestWater),
});
export type AllWindows = z.infer<typeof AllWindows>;

/** An interval of instants as ISO strings, sent as `from` and `to`. */
export interface Span {
  from: string;
  to: string;
}

/** A site's tide over at most 14 days: levels every 10 minutes, extremes, daylight, windows and chart lines. */
export async function fetchSiteTide(siteId: string, span: Span, units: LengthUnit): Promise<SiteTide> {
  return get(`/api/sites/${encodeURIComponent(siteId)}/tide${queryString({ ...span, units })}`, SiteTide);
}

/** A site's low-water windows over at most 400 days, best first (`score`) or in time order. */
export async function fetchSiteWindows(siteId: string, span: Span, units: LengthUnit, sort: 'score' | 'time' = 'score'): Promise<z.infer<typeof SiteWindowsResponse>> {
  return get(`/api/sites/${encodeURIComponent(siteId)}/windows${queryString({ ...span, units, sort })}`, SiteWindowsResponse);
}

/** Every site's windows and each site's lowest water per local date, for the calendar. */
export async function fetchAllWindows(span: Span, units: LengthUnit): Promise<AllWindows> {
  return get(`/api/windows${queryString({ ...span, units })}`, AllWindows);
}
