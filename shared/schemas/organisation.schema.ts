import { z } from 'zod';
import { isTimeZone } from '../domain/time-zone.js';
import { NurseryRules } from './nursery.schema.js';

export const LengthUnit = z.enum(['ft', 'm']);
export type LengthUnit = z.infer<typeof LengthUnit>;

/** The organisation as everyone sees it (the shell shows its name and the demo marker). */
export const PublicOrganisation = z.object({
  name: z.string(),
  isDemo: z.boolean(),
  units: LengthUnit,
  timeZone: z.string(),
});
export type PublicOrganisation = z.infer<typeof PublicOrganisation>;

const weight = z.number({ message: 'must be a number' }).min(0, { message: 'must be 0 or more' }).max(1, { message: 'must be at most 1' });

/** Relative weights of the low-water window ranking; any non-negative numbers, normalised when used. */
export const WindowWeights = z
  .object({ duration: weight, lowWater: weight, weekend: weight, startHour: weight })
  .refine((w) => w.duration + w.lowWater + w.weekend + w.startHour > 0, { message: 'at least one weight must be above 0' });
export type WindowWeights = z.infer<typeof WindowWeights>;

/** What admins see and edit. */
export const OrganisationSettings = PublicOrganisation.extend({
  legalName: z.string(),
  taxId: z.string(),
  contactEmail: z.string(),
  windowWeights: WindowWeights,
  nurseryRules: NurseryRules,
});
export type OrganisationSettings = z.infer<typeof OrganisationSettings>;

export const UpdateOrganisationBody = z
  .object({
    name: z.string().trim().min(1, { message: 'is required' }).max(160),
    legalName: z.string().trim().max(200),
    taxId: z.string().trim().max(40),
    contactEmail: z.union([z.literal(''), z.email({ message: 'must be an e-mail address' })]),
    units: LengthUnit,
    timeZone: z.string().refine(isTimeZone, { message: 'must be an IANA time zone such as America/New_York' }),
    windowWeights: WindowWeights,
    nurseryRules: NurseryRules,
  })
  .partial()
  .strict();
export type UpdateOrganisationBody = z.infer<typeof UpdateOrganisationBody>;
