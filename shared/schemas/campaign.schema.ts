import { z } from 'zod';
import { GivingRules } from './organisation.schema.js';

const IsoDate = z.iso.date({ message: 'must be a date (YYYY-MM-DD)' });

const CampaignFields = z.object({
  name: z.string().trim().min(1, { message: 'is required' }).max(120),
  /** Plain text; paragraphs split on blank lines. */
  story: z.string().max(10_000),
  /** $1 to $10,000 a tree. */
  priceCents: z.number({ message: 'must be whole cents' }).int({ message: 'must be whole cents' }).min(100, { message: 'must be at least 100 cents' }).max(1_000_000),
  goalTrees: z.number({ message: 'must be a whole number' }).int({ message: 'must be a whole number' }).min(1, { message: 'must be at least 1' }).max(100_000),
  startsOn: IsoDate,
  /** Null: open until it is made inactive. */
  endsOn: IsoDate.nullable(),
  active: z.boolean(),
});

const endsAfterStart = <T extends z.ZodType<{ startsOn?: string; endsOn?: string | null }>>(schema: T) =>
  schema.refine((b) => !b.startsOn || !b.endsOn || b.endsOn >= b.startsOn, { message: 'must be on or after the start', path: ['endsOn'] });

export const CreateCampaignBody = endsAfterStart(
  CampaignFields.extend({
    story: CampaignFields.shape.story.default(''),
    endsOn: CampaignFields.shape.endsOn.default(null),
    active: CampaignFields.shape.active.default(true),
  }).strict(),
);
export type CreateCampaignBody = z.infer<typeof CreateCampaignBody>;

export const UpdateCampaignBody = endsAfterStart(CampaignFields.partial().strict());
export type UpdateCampaignBody = z.infer<typeof UpdateCampaignBody>;

export const CampaignIdParams = z.object({ id: z.uuid({ message: 'must be a campaign id' }) });

/** A campaign as the public sees it, with its progress. */
export const Campaign = z.object({
  id: z.string(),
  name: z.string(),
  story: z.string(),
  priceCents: z.number().int(),
  goalTrees: z.number().int(),
  startsOn: z.string(),
  endsOn: z.string().nullable(),
  active: z.boolean(),
  /** Active and today (organisation's time zone) within its dates: it takes gifts. */
  open: z.boolean(),
  /** Trees counted by paid (not refunded) donations. */
  sponsoredTrees: z.number().int(),
});
export type Campaign = z.infer<typeof Campaign>;

/** What admins see in the campaign list. */
export const ManagedCampaign = Campaign.extend({
  /** Gifts (without fee cover) of paid donations, cents. */
  raisedCents: z.number().int(),
  donationCount: z.number().int(),
  createdAt: z.string(),
});
export type ManagedCampaign = z.infer<typeof ManagedCampaign>;

/** One opt-in line on the donor wall; `name` is 'Anonymous' when the donor chose so. */
export const DonorWallEntry = z.object({ name: z.string(), trees: z.number().int(), date: z.string() });
export type DonorWallEntry = z.infer<typeof DonorWallEntry>;

/** `GET /api/campaigns/:id`: the public campaign page. */
export const CampaignPage = z.object({
  campaign: Campaign,
  sponsoredTrees: z.number().int(),
  /** Newest first, at most 50. */
  wall: z.array(DonorWallEntry),
  currency: z.string(),
  givingRules: GivingRules,
});
export type CampaignPage = z.infer<typeof CampaignPage>;
