import { z } from 'zod';
import { LengthUnit } from './organisation.schema.js';

/** Instants travel as ISO-8601 UTC strings. */
const IsoInstant = z.string();

export const TideDatumName = z.enum(['MLLW', 'MLW', 'MSL', 'MTL', 'DTL', 'MHW', 'MHHW', 'STND', 'NAVD88', 'LAT', 'HAT']);

/** Query strings for tide data; `from`/`to` are ISO dates or instants (each route caps the span). */
export const TideSpanQuery = z
  .object({
    from: z.iso.datetime({ offset: true }).or(z.iso.date()),
    to: z.iso.datetime({ offset: true }).or(z.iso.date()),
    units: LengthUnit.optional(),
    datum: z.string().regex(/^[A-Z0-9]{2,8}$/, { message: 'must be a datum name such as MLLW' }).optional(),
  })
  .refine((q) => Date.parse(q.to) > Date.parse(q.from), { message: 'must be after from', path: ['to'] });
export type TideSpanQuery = z.infer<typeof TideSpanQuery>;

export const LevelsQuery = z.intersection(TideSpanQuery, z.object({ step: z.coerce.number().int().min(1).max(120).default(10) }));

export const StationSearchQuery = z.object({
  q: z.string().trim().min(1).max(100).optional(),
  near: z
    .string()
    .regex(/^-?\d+(\.\d+)?,-?\d+(\.\d+)?$/, { message: 'must be LAT,LON' })
    .refine((s) => {
      const [lat, lon] = s.split(',').map(Number);
      return Math.abs(lat ?? 99) <= 90 && Math.abs(lon ?? 999) <= 180;
    }, { message: 'latitude must be within ±90 and longitude within ±180' })
    .optional(),
  limit: z.coerce.number().int().min(1).max(50).default(20),
});

export const StationSummary = z.object({
  id: z.string(),
  name: z.string(),
  latitude: z.number(),
  longitude: z.number(),
  timeZone: z.string(),
  kind: z.enum(['reference', 'subordinate']),
  source: z.object({ name: z.string(), id: z.string(), url: z.string() }),
  licence: z.object({ type: z.string(), url: z.string(), commercialUse: z.boolean() }),
  attribution: z.string(),
  distanceKm: z.number().optional(),
});
export type StationSummary = z.infer<typeof StationSummary>;

export const TideExtremeDto = z.object({ time: IsoInstant, height: z.number(), type: z.enum(['high', 'low']) });
export type TideExtremeDto = z.infer<typeof TideExtremeDto>;
export const LevelPoint = z.object({ time: IsoInstant, height: z.number() });

export const DatumTable = z.record(z.string(), z.number());

export const DaylightDto = z.object({
  date: z.string(),
  civilDawn: IsoInstant.nullable(),
  sunrise: IsoInstant.nullable(),
  sunset: IsoInstant.nullable(),
  civilDusk: IsoInstant.nullable(),
});
export type DaylightDto = z.infer<typeof DaylightDto>;

export const WindowCaution = z.object({ code: z.string(), text: z.string() });

export const LowWaterWindowDto = z.object({
  siteId: z.string(),
  start: IsoInstant,
  end: IsoInstant,
  durationMinutes: z.number(),
  lowestLevel: z.number(),
  lowestAt: IsoInstant,
  sunrise: IsoInstant.nullable(),
  sunset: IsoInstant.nullable(),
  /** 0–100; higher is a better workday. */
  score: z.number(),
  cautions: z.array(WindowCaution),
});
export type LowWaterWindowDto = z.infer<typeof LowWaterWindowDto>;

/** Reference lines on a site's tide chart, in the response's units above MLLW. */
export const SiteTideLines = z.object({
  bed: z.number(),
  route: z.number(),
  /** Highest level at which the bed is workable on foot (bed + working depth). */
  workableBelow: z.number(),
  /** Lowest level at which the loaded craft floats on the route (route + draft + margin). */
  floatableAbove: z.number(),
});
