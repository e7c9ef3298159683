import type { LengthUnit } from '../../shared/schemas/organisation.schema.js';
import type { StationSummary, TideExtremeDto } from '../../shared/schemas/tide.schema.js';
import type { TideStationDirectory } from '../adapters/tide-stations.js';
import { computeStationDatums } from '../domain/tide/datums.js';
import { publishedDatums, UnknownDatumError, zeroDatum } from '../domain/tide/station-datums.js';
import { predictExtremes, predictLevels, seriesPoints } from '../domain/tide/station-prediction.js';
import type { TideStation } from '../domain/tide/types.js';
import { fromMetres } from '../domain/tide/units.js';
import { NotFoundError, ValidationError } from '../errors.js';

export interface Span {
  fromMs: number;
  toMs: number;
}

const iso = (ms: number) => new Date(ms).toISOString();

export function toStationSummary(s: TideStation, distanceKm?: number): StationSummary {
  return {
    id: s.id,
    name: s.name,
    latitude: s.latitude,
    longitude: s.longitude,
    timeZone: s.timeZone,
    kind: s.kind,
    source: s.source,
    licence: s.licence,
    attribution: s.attribution,
    ...(distanceKm === undefined ? {} : { distanceKm: Math.round(distanceKm * 100) / 100 }),
  };
}

/** A datum table (metres above the zero datum) in the unit asked. */
function inUnit(table: Record<string, number>, unit: LengthUnit): Record<string, number> {
  return Object.fromEntries(Object.entries(table).map(([k, v]) => [k, round(fromMetres(v, unit))]));
}
const round = (x: number) => Math.round(x * 1000) / 1000;

/** Tide stations and their predictions, read from the open dataset through the directory. */
export function createStationService(deps: { stations: TideStationDirectory }) {
  // A 19-year datum computation costs seconds of CPU; the answer for a span never changes.
  const datumCache = new Map<string, ReturnType<typeof computeStationDatums>>();
  function cachedDatums(s: TideStation, span: Span) {
    const key = `${s.id}|${span.fromMs}|${span.toMs}`;
    let hit = datumCache.get(key);
    if (!hit) {
      hit = computeStationDatums(s, span);
      if (datumCache.size >= 50) datumCache.delete(datumCache.keys().next().value ?? '');
      datumCache.set(key, hit);
    }
    return hit;
  }
  async function get(id: string): Promise<TideStation> {
    const station = await deps.stations.get(id);
    if (!station) throw new NotFoundError('Tide station');
    return station;
  }
  /** Wraps the domain's unknown-datum error as a 400 on the `datum` field. */
  function inFrame<T>(fn: () => T): T {
    try {
      return fn();
    } catch (err) {
      if (err instanceof UnknownDatumError) throw new ValidationError('This station does not publish that datum', { datum: [err.message] });
      throw err;
    }
  }

  return {
    get,
    exists: async (id: string) => (await deps.stations.get(id)) !== null,

    async search(q: { q?: string; near?: string; limit: number }): Promise<StationSummary[]> {
      if (q.near) {
        const [latitude = 0, longitude = 0] = q.near.split(',').map(Number);
        const found = await deps.stations.near({ latitude, longitude, maxResults: q.limit });
        const full = await Promise.all(found.map(async (s) => ({ s: await deps.stations.get(s.id), d: s.distanceKm })));
        return full.flatMap(({ s, d }) => (s ? [toStationSummary(s, d)] : []));
      }
      const found = await deps.stations.search(q.q ?? '', q.limit);
      const full = await Promise.all(found.map((s) => deps.stations.get(s.id)));
      return full.flatMap((s) => (s ? [toStationSummary(s)] : []));
    },

    async detail(id: string, unit: LengthUnit) {
      const s = await get(id);
      return {
        ...toStationSummary(s),
        ...(s.chartDatum ? { chartDatum: s.chartDatum } : {}),
        ...(s.epoch ? { epoch: s.epoch } : {}),
        publishedDatums: inUnit(publishedDatums(s), unit),
      };
    },

    async extremes(id: string, span: Span, unit: LengthUnit, datum?: string) {
      const s = await get(id);
      const out = inFrame(() => predictExtremes(s, { ...span, unit, datum }));
      const extremes: TideExtremeDto[] = out.extremes.map((e) => ({ time: iso(e.timeMs), height: round(e.height), type: e.type }));
      return { station: toStationSummary(s), units: out.unit, datum: out.datum, extremes };
    },

    async levels(id: string, span: Span, stepMinutes: number, unit: LengthUnit, datum?: string) {
      const s = await get(id);
      const out = inFrame(() => predictLevels(s, { ...span, stepMinutes, unit, datum }));
      const levels = seriesPoints(out.series).map((p) => ({ time: iso(p.timeMs), height: round(p.height) }));
      return { station: toStationSummary(s), units: out.unit, datum: out.datum, step: stepMinutes, levels };
    },

    /** Datums computed from predictions over the span, beside the published ones, relative to MLLW. */
    async datums(id: string, span: Span, unit: LengthUnit) {
      const s = await get(id);
      const { tidalDays, ...computed } = cachedDatums(s, span);
      const published = publishedDatums(s);
      return {
        station: toStationSummary(s),
        units: unit,
        relativeTo: zeroDatum(s),
        span: { from: iso(span.fromMs), to: iso(span.toMs) },
        tidalDays,
        computed: inUnit({ ...computed }, unit),
        published: Object.keys(published).length > 0 ? inUnit(published, unit) : null,
      };
    },
  };
}
export type StationService = ReturnType<typeof createStationService>;
