import { z } from 'zod';

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

/** What admins see and edit. */
export const OrganisationSettings = PublicOrganisation.extend({
  legalName: z.string(),
  taxId: z.string(),
  contactEmail: z.string(),
});
export type OrganisationSettings = z.infer<typeof OrganisationSettings>;

const isTimeZone = (tz: string) => {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: tz });
    return true;
  } catch {
    return false;
  }
};

export const UpdateOrganisationBody = z
  .object({
    name: z.string().trim().min(1, { message: 'is required' }).max(160),
    legalName: z.string().trim().max(200),
    taxId: z.string().trim().max(40),
    contactEmail: z.union([z.literal(''), z.email({ message: 'must be an e-mail address' })]),
    units: LengthUnit,
    timeZone: z.string().refine(isTimeZone, { message: 'must be an IANA time zone such as America/New_York' }),
  })
  .partial()
  .strict();
export type UpdateOrganisationBody = z.infer<typeof UpdateOrganisationBody>;
