import { z } from 'zod';
import { LengthUnit } from '@shared/schemas/organisation.schema';
import { DatumTable, StationSummary } from '@shared/schemas/tide.schema';
import { get, queryString } from './http';

const StationsResponse = z.object({ stations: z.array(StationSummary) });

export const StationDetail = StationSummary.extend({
  chartDatum: z.string().optional(),
  epoch: z.object({ start: z.string(), end: z.string() }).optional(),
  /** In the requested units, relative to MLLW. */
  publishedDatums: DatumTable,
});
export type StationDetail = z.infer<typeof StationDetail>;

const StationResponse = z.object({ station: StationDetail, units: LengthUnit });

export const StationDatums = z.object({
  station: StationSummary,
  units: LengthUnit,
  /** MLLW at NOAA stations; the station's chart datum (or MSL) elsewhere. */
  relativeTo: z.string(),
  span: z.object({ from: z.string(), to: z.string() }),
  computed: DatumTable,
  published: DatumTable.nullable(),
});
export type StationDatums = z.infer<typeof StationDatums>;

/** Station ids contain a slash (noaa/8726738), so the whole id is one encoded path segment. */
function stationPath(id: string): string {
  return `/api/stations/${encodeURIComponent(id)}`;
}

/** Stations whose name or id matches `text`. */
export async function searchStations(text: string, limit = 10): Promise<StationSummary[]> {
  return (await get(`/api/stations${queryString({ q: text, limit: String(limit) })}`, StationsResponse)).stations;
}

/** The stations nearest a point, nearest first, each with `distanceKm`. */
export async function nearestStations(latitude: number, longitude: number, limit = 5): Promise<StationSummary[]> {
  const near = `${latitude},${longitude}`;
  return (await get(`/api/stations${queryString({ near, limit: String(limit) })}`, StationsResponse)).stations;
}

export async function fetchStation(id: string, units: LengthUnit): Promise<StationDetail> {
  return (await get(`${stationPath(id)}${queryString({ units })}`, StationResponse)).station;
}

/** Datums computed from predictions over [from, to], beside the station's published ones. */
export async function fetchStationDatums(id: string, span: { from: string; to: string }, units: LengthUnit): Promise<StationDatums> {
  return get(`${stationPath(id)}/datums${queryString({ ...span, units })}`, StationDatums);
}
