import { z } from 'zod';
import { isTimeZone } from '../domain/time-zone.js';

/**
 * A planting site. Lengths are metres and elevations are relative to the tide station's MLLW;
 * the client converts to the organisation's display units.
 */
const metres = (min: number, max: number) => z.number({ message: 'must be a number' }).min(min, { message: `must be at least ${min} m` }).max(max, { message: `must be at most ${max} m` });

/** Every field, without defaults: `.partial()` of a schema with defaults would fill them in (zod 4). */
export const SiteFields = z.object({
  name: z.string().trim().min(1, { message: 'is required' }).max(120),
  latitude: z.number({ message: 'must be a number' }).min(-90).max(90),
  longitude: z.number({ message: 'must be a number' }).min(-180).max(180),
  timeZone: z.string().refine(isTimeZone, { message: 'must be an IANA time zone such as America/New_York' }),
  stationId: z.string().regex(/^[a-z]+\/[\w.-]+$/, { message: 'must be a station id such as noaa/8726738' }),
  /** The coordinator's local correction to the station's predictions, when they have one. */
  timeOffsetMinutes: z.number().int().min(-180).max(180),
  heightOffsetM: metres(-3, 3),
  bedElevationM: metres(-5, 5),
  routeElevationM: metres(-10, 5),
  launchName: z.string().trim().max(120),
  launchDistanceM: metres(0, 50_000),
  /** Deepest water over the bed that people on foot should work in. */
  workingDepthM: metres(0, 2),
  craftDraftM: metres(0, 2),
  draftMarginM: metres(0, 2),
  minWindowMinutes: z.number().int().min(15).max(720),
  includeCivilTwilight: z.boolean(),
  salinityPpt: z.number().min(0).max(45).nullable(),
  notes: z.string().max(2000),
});

/** A new site; optional fields take the defaults below. */
export const CreateSiteBody = SiteFields.extend({
  timeOffsetMinutes: SiteFields.shape.timeOffsetMinutes.default(0),
  heightOffsetM: SiteFields.shape.heightOffsetM.default(0),
  launchName: SiteFields.shape.launchName.default(''),
  launchDistanceM: SiteFields.shape.launchDistanceM.default(0),
  workingDepthM: SiteFields.shape.workingDepthM.default(0.3),
  craftDraftM: SiteFields.shape.craftDraftM.default(0.15),
  draftMarginM: SiteFields.shape.draftMarginM.default(0.1),
  minWindowMinutes: SiteFields.shape.minWindowMinutes.default(120),
  includeCivilTwilight: SiteFields.shape.includeCivilTwilight.default(false),
  salinityPpt: SiteFields.shape.salinityPpt.default(null),
  notes: SiteFields.shape.notes.default(''),
  })
  .strict();
export type CreateSiteBody = z.infer<typeof CreateSiteBody>;

export const UpdateSiteBody = SiteFields.partial().strict();
export type UpdateSiteBody = z.infer<typeof UpdateSiteBody>;

export const SiteIdParams = z.object({ id: z.string().uuid({ message: 'must be a site id' }) });

export const Site = SiteFields.extend({ id: z.string().uuid(), createdAt: z.string(), updatedAt: z.string() });
export type Site = z.infer<typeof Site>;
