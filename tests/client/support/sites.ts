import { randomUUID } from 'node:crypto';
import { http, HttpResponse } from 'msw';
import type { Site } from '@shared/schemas/site.schema';
import type { LowWaterWindowDto, StationSummary } from '@shared/schemas/tide.schema';
import type { SiteTide } from '@/api/tide';
import { server } from '../../setup/client-setup';

/** Invented test data; Safety Harbor (noaa/8726738) is a real NOAA station id, named for realism only. */
export function buildStation(overrides: Partial<StationSummary> = {}): StationSummary {
  return {
    id: 'noaa/8726738',
    name: 'Safety Harbor',
    latitude: 27.9905,
    longitude: -82.6912,
    timeZone: 'America/New_York',
    kind: 'reference',
    source: { name: 'NOAA CO-OPS', id: '8726738', url: 'https://tidesandcurrents.noaa.gov/stationhome.html?id=8726738' },
    licence: { type: 'Public domain', url: 'https://www.noaa.gov/disclaimer', commercialUse: true },
    attribution: 'Harmonic constituents: NOAA CO-OPS',
    ...overrides,
  };
}

export function buildSite(overrides: Partial<Site> = {}): Site {
  return {
    id: randomUUID(),
    name: 'Heron Cove',
    latitude: 27.99,
    longitude: -82.69,
    timeZone: 'America/New_York',
    stationId: 'noaa/8726738',
    timeOffsetMinutes: 0,
    heightOffsetM: 0,
    bedElevationM: 0.1524,
    routeElevationM: -0.3048,
    launchName: 'Bayside ramp',
    launchDistanceM: 1852,
    workingDepthM: 0.3,
    craftDraftM: 0.15,
    draftMarginM: 0.1,
    minWindowMinutes: 120,
    includeCivilTwilight: false,
    salinityPpt: 28,
    notes: '',
    createdAt: '2025-01-02T10:00:00.000Z',
    updatedAt: '2025-01-02T10:00:00.000Z',
    ...overrides,
  };
}

export function buildWindow(overrides: Partial<LowWaterWindowDto> = {}): LowWaterWindowDto {
  return {
    siteId: 'site-1',
    start: '2025-03-04T11:40:00.000Z',
    end: '2025-03-04T14:10:00.000Z',
    durationMinutes: 150,
    lowestLevel: -0.6,
    lowestAt: '2025-03-04T12:55:00.000Z',
    sunrise: '2025-03-04T11:50:00.000Z',
    sunset: '2025-03-04T23:31:00.000Z',
    score: 72,
    cautions: [],
    ...overrides,
  };
}

/** A week of tide at `site` from Monday 3 March 2025 (EST), with a simple semidiurnal curve. */
export function buildTide(site: Site, overrides: Partial<SiteTide> = {}): SiteTide {
  const from = Date.parse('2025-03-03T05:00:00.000Z');
  const levels = Array.from({ length: 7 * 144 }, (_, i) => ({
    time: new Date(from + i * 600_000).toISOString(),
    height: Math.round(1.2 * Math.cos((2 * Math.PI * i) / 74.5) * 100) / 100 + 0.8,
  }));
  return {
    site,
    station: buildStation(),
    units: 'ft',
    datum: 'MLLW',
    levels,
    extremes: [
      { time: '2025-03-04T06:20:00.000Z', height: 2.1, type: 'high' },
      { time: '2025-03-04T12:55:00.000Z', height: -0.6, type: 'low' },
    ],
    daylight: [{ date: '2025-03-04', civilDawn: '2025-03-04T11:25:00.000Z', sunrise: '2025-03-04T11:50:00.000Z', sunset: '2025-03-04T23:31:00.000Z', civilDusk: '2025-03-04T23:55:00.000Z' }],
    windows: [buildWindow({ siteId: site.id, cautions: [{ code: 'soft-mud', text: 'Very low tide: the mud is soft here.' }] })],
    lines: { bed: 0.5, route: -1, workableBelow: 1.5, floatableAbove: -0.2 },
    ...overrides,
  };
}

/** What the tide board asked for, for assertions. */
export interface BoardRequests {
  tide: URL[];
  ranked: URL[];
}

/**
 * Answers everything the tide board of `site` loads: the site, its week of tide, the ranked windows
 * and (for staff) the drafts. Returns the tide and windows requests it saw.
 */
export function mockSiteBoard(site: Site, options: { tide?: SiteTide; ranked?: LowWaterWindowDto[]; drafts?: unknown[] } = {}): BoardRequests {
  const seen: BoardRequests = { tide: [], ranked: [] };
  server.use(
    http.get(`/api/sites/${site.id}`, () => HttpResponse.json({ site })),
    http.get(`/api/sites/${site.id}/tide`, ({ request }) => {
      seen.tide.push(new URL(request.url));
      return HttpResponse.json(options.tide ?? buildTide(site));
    }),
    http.get(`/api/sites/${site.id}/windows`, ({ request }) => {
      seen.ranked.push(new URL(request.url));
      return HttpResponse.json({ site: { id: site.id, name: site.name, timeZone: site.timeZone }, units: 'ft', windows: options.ranked ?? [] });
    }),
    http.get('/api/workdays', () => HttpResponse.json({ workdays: options.drafts ?? [] })),
  );
  return seen;
}
