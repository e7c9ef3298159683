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
  /** ISO 4217, lower case; every amount in the app is integer cents of it. */
  currency: z.string(),
});
export type PublicOrganisation = z.infer<typeof PublicOrganisation>;

const weight = z.number({ message: 'must be a number' }).min(0, { message: 'must be 0 or more' }).max(1, { message: 'must be at most 1' });

/** Relative weights of the low-water window ranking; any non-negative numbers, normalised when used. */
export const WindowWeights = z
  .object({ duration: weight, lowWater: weight, weekend: weight, startHour: weight })
  .refine((w) => w.duration + w.lowWater + w.weekend + w.startHour > 0, { message: 'at least one weight must be above 0' });
export type WindowWeights = z.infer<typeof WindowWeights>;

const n = (min: number, max: number) =>
  z.number({ message: 'must be a number' }).min(min, { message: `must be at least ${min}` }).max(max, { message: `must be at most ${max}` });

/**
 * How trip plans are built. The 70 % paddlecraft margin is common practice from paddling
 * guidance (TRADE.md §1); a capacity plate is already the legal limit, so 100 % of it.
 */
export const TripRules = z.object({
  paddlecraftMargin: n(0.1, 1),
  platedMargin: n(0.1, 1),
  /** Assumed weight of a person who did not give theirs, kg. */
  standardPersonKg: n(40, 200),
  /** Minutes one pair of planters needs per tree, so the last pot must land that long before the window closes. */
  plantingMinutesPerTree: n(0, 120),
  /** Filled pot mass used when a tree has none recorded, kg. */
  potMassKg: n(1, 200),
  loadMinutes: n(0, 120),
  unloadMinutes: n(0, 120),
});
export type TripRules = z.infer<typeof TripRules>;
export const DEFAULT_TRIP_RULES: TripRules = {
  paddlecraftMargin: 0.7,
  platedMargin: 1,
  standardPersonKg: 84,
  plantingMinutesPerTree: 20,
  potMassKg: 27,
  loadMinutes: 10,
  unloadMinutes: 5,
};

/** The card fee a donor may choose to cover (US standard 2.9 % + 30¢ by default, TRADE.md §7). */
export const GivingRules = z.object({
  cardFeePercent: n(0, 20),
  cardFeeFixedCents: z.number().int({ message: 'must be whole cents' }).min(0).max(1000),
});
export type GivingRules = z.infer<typeof GivingRules>;
export const DEFAULT_GIVING_RULES: GivingRules = { cardFeePercent: 2.9, cardFeeFixedCents: 30 };

export const Currency = z.string().regex(/^[a-z]{3}$/, { message: 'must be a three-letter currency code such as usd' });

/** What admins see and edit. */
export const OrganisationSettings = PublicOrganisation.extend({
  legalName: z.string(),
  taxId: z.string(),
  contactEmail: z.string(),
  windowWeights: WindowWeights,
  nurseryRules: NurseryRules,
  tripRules: TripRules,
  givingRules: GivingRules,
  volunteerHourValueCents: z.number().int(),
  volunteerHourValueSource: z.string(),
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
    tripRules: TripRules,
    currency: Currency,
    givingRules: GivingRules,
    volunteerHourValueCents: z.number().int({ message: 'must be whole cents' }).min(0).max(100_000),
    volunteerHourValueSource: z.string().trim().max(200),
  })
  .partial()
  .strict();
export type UpdateOrganisationBody = z.infer<typeof UpdateOrganisationBody>;
