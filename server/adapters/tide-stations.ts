/**
 * Tide stations from the open dataset @neaps/tide-database. The dataset is large (≈31 MB on
 * disk, ≈150 MB of memory once imported), so it is imported lazily, once per process, on the
 * first call; it is server-side only. Stations are mapped to the domain's TideStation.
 */
import type { Station } from '@neaps/tide-database';
import type { TideStation } from '../domain/tide/types.js';

type TideDatabase = typeof import('@neaps/tide-database');

/** What a station list shows. */
export interface TideStationSummary {
  id: string;
  name: string;
  latitude: number;
  longitude: number;
  timeZone: string;
  kind: 'reference' | 'subordinate';
  region: string | null;
  country: string;
  referenceId: string | null;
  attribution: string;
}

/** Looks up tide stations (current stations in the dataset are left out). */
export interface TideStationDirectory {
  /** Loads the dataset now (e.g. at start-up) instead of on the first lookup. */
  warm(): Promise<void>;
  get(id: string): Promise<TideStation | null>;
  search(query: string, maxResults?: number): Promise<TideStationSummary[]>;
  near(position: { latitude: number; longitude: number; maxResults?: number; maxDistanceKm?: number }): Promise<(TideStationSummary & { distanceKm: number })[]>;
}

let loading: Promise<TideDatabase> | null = null;

/** The dataset module, imported on first use and shared by every caller. */
export function loadTideDatabase(): Promise<TideDatabase> {
  loading ??= import('@neaps/tide-database').catch((err: unknown) => {
    loading = null;
    throw err;
  });
  return loading;
}

// Lists filter on kind only: reading harmonic_constituents decodes a station's heavy fields.
const isTide = (s: Station) => s.kind === 'tide';
const canPredict = (s: Station) => isTide(s) && s.harmonic_constituents.length > 0;

/** Maps a dataset record to the domain's station. */
export function toTideStation(s: Station): TideStation {
  return {
    id: s.id,
    name: s.name,
    latitude: s.latitude,
    longitude: s.longitude,
    timeZone: s.timezone,
    kind: s.type,
    constituents: s.harmonic_constituents.map((c) => ({ name: c.name, amplitude: c.amplitude, phase: c.phase, ...(c.speed === undefined ? {} : { speed: c.speed }) })),
    datums: { ...s.datums },
    ...(s.chart_datum ? { chartDatum: s.chart_datum } : {}),
    ...(s.offsets
      ? {
          offsets: {
            referenceId: s.offsets.reference,
            time: { high: s.offsets.time.high, low: s.offsets.time.low },
            height: { high: s.offsets.height.high, low: s.offsets.height.low, kind: s.offsets.height.type },
          },
        }
      : {}),
    ...(s.epoch ? { epoch: { start: s.epoch.start, end: s.epoch.end } } : {}),
    source: { name: s.source.name, id: s.source.id, url: s.source.url },
    licence: { type: s.license.type, url: s.license.url, commercialUse: s.license.commercial_use },
    attribution: s.attribution,
  };
}

function toSummary(s: Station): TideStationSummary {
  return {
    id: s.id,
    name: s.name,
    latitude: s.latitude,
    longitude: s.longitude,
    timeZone: s.timezone,
    kind: s.type,
    region: s.region ?? null,
    country: s.country,
    referenceId: s.offsets?.reference ?? null,
    attribution: s.attribution,
  };
}

/** The directory over the real dataset. */
export function createTideStationDirectory(): TideStationDirectory {
  return {
    async warm() {
      await loadTideDatabase();
    },
    async get(id) {
      const s = (await loadTideDatabase()).stationsById.get(id);
      return s && canPredict(s) ? toTideStation(s) : null;
    },
    async search(query, maxResults = 20) {
      const db = await loadTideDatabase();
      return db.search(query, { maxResults, filter: isTide }).map(toSummary);
    },
    async near({ latitude, longitude, maxResults = 10, maxDistanceKm }) {
      const db = await loadTideDatabase();
      const found = db.near({ latitude, longitude, maxResults, filter: isTide, ...(maxDistanceKm === undefined ? {} : { maxDistance: maxDistanceKm }) });
      return found.map(([s, distanceKm]) => ({ ...toSummary(s), distanceKm }));
    },
  };
}
