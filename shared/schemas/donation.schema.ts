import { z } from 'zod';

export const DedicationKind = z.enum(['honour', 'memory']);
export type DedicationKind = z.infer<typeof DedicationKind>;

export const DonationStatus = z.enum(['paid', 'refunded']);
export type DonationStatus = z.infer<typeof DonationStatus>;

export const Dedication = z.object({
  kind: DedicationKind,
  name: z.string().trim().min(1, { message: 'is required' }).max(120),
});
export type Dedication = z.infer<typeof Dedication>;

/** Limits of one gift: 1–100 trees, or $1–$100,000. */
export const DONATION_LIMITS = { minTrees: 1, maxTrees: 100, minCents: 100, maxCents: 10_000_000 } as const;

/**
 * `POST /api/donations/checkout`: exactly one of `trees` (needs a campaign) and `amountCents`.
 * `wallName`: absent or null keeps the gift off the donor wall; '' shows it as "Anonymous".
 */
export const CheckoutBody = z
  .object({
    campaignId: z.uuid({ message: 'must be a campaign id' }).optional(),
    trees: z.number({ message: 'must be a whole number' }).int({ message: 'must be a whole number' })
      .min(DONATION_LIMITS.minTrees, { message: 'must be at least 1' }).max(DONATION_LIMITS.maxTrees, { message: 'must be at most 100' }).optional(),
    amountCents: z.number({ message: 'must be whole cents' }).int({ message: 'must be whole cents' })
      .min(DONATION_LIMITS.minCents, { message: 'must be at least $1' }).max(DONATION_LIMITS.maxCents, { message: 'must be at most $100,000' }).optional(),
    coverFees: z.boolean().default(false),
    donor: z.object({
      name: z.string().trim().min(1, { message: 'is required' }).max(120),
      email: z.string().trim().max(254).pipe(z.email({ message: 'must be an e-mail address' })),
    }).strict(),
    dedication: Dedication.strict().nullable().optional(),
    wallName: z.string().trim().max(80).nullable().optional(),
    wantsUpdates: z.boolean().default(false),
  })
  .strict()
  .refine((b) => b.trees !== undefined || b.amountCents !== undefined, { message: 'choose a number of trees or an amount', path: ['trees'] })
  .refine((b) => b.trees === undefined || b.amountCents === undefined, { message: 'choose a number of trees or an amount, not both', path: ['amountCents'] })
  .refine((b) => b.trees === undefined || b.campaignId !== undefined, { message: 'trees are sponsored through a campaign', path: ['campaignId'] });
export type CheckoutBody = z.infer<typeof CheckoutBody>;

export const CheckoutResult = z.object({ checkoutUrl: z.string(), sessionId: z.string() });
export type CheckoutResult = z.infer<typeof CheckoutResult>;

/** Checkout session ids are long random tokens (`cs_…`). */
export const ThanksParams = z.object({ sessionId: z.string().regex(/^cs_[A-Za-z0-9_]{8,250}$/, { message: 'is not a checkout session id' }) });

/** `GET /api/donations/thanks/:sessionId`, polled by the thank-you page until `recorded`. */
export const DonationThanks = z.object({
  recorded: z.boolean(),
  /** 'pending' until the payment webhook is recorded. */
  status: z.enum(['pending', 'paid', 'refunded']),
  donorName: z.string(),
  amountCents: z.number().int(),
  currency: z.string(),
  treeCount: z.number().int(),
  campaignName: z.string().nullable(),
  /** Tag numbers of the nursery trees the gift sponsors (empty until recorded). */
  trees: z.array(z.string()),
});
export type DonationThanks = z.infer<typeof DonationThanks>;

export const DonationIdParams = z.object({ id: z.uuid({ message: 'must be a donation id' }) });

const IsoDate = z.iso.date({ message: 'must be a date (YYYY-MM-DD)' });
/** An empty query parameter (`?from=`) means no filter. */
const blankIsMissing = <T extends z.ZodType>(schema: T) => z.preprocess((v) => (v === '' ? undefined : v), schema);

/** Admin list and CSV filters; dates are the day paid in the organisation's time zone, inclusive. */
export const ListDonationsQuery = z
  .object({
    from: blankIsMissing(IsoDate.optional()),
    to: blankIsMissing(IsoDate.optional()),
    campaignId: blankIsMissing(z.uuid({ message: 'must be a campaign id' }).optional()),
    status: blankIsMissing(DonationStatus.optional()),
    /** Donor name, e-mail or checkout session id contains. */
    q: blankIsMissing(z.string().trim().max(100).optional()),
    page: z.coerce.number().int().min(1).default(1),
    pageSize: z.coerce.number().int().min(1).max(200).default(25),
  })
  .refine((q) => !q.from || !q.to || q.to >= q.from, { message: 'must be on or after from', path: ['to'] });
export type ListDonationsQuery = z.infer<typeof ListDonationsQuery>;

export const DonationRow = z.object({
  id: z.string(),
  amountCents: z.number().int(),
  giftCents: z.number().int(),
  feeCoverCents: z.number().int(),
  currency: z.string(),
  status: DonationStatus,
  checkoutSessionId: z.string(),
  donor: z.object({ name: z.string(), email: z.string() }),
  /** Trees bought; `trees` lists those linked so far (fewer while the nursery is short). */
  treeCount: z.number().int(),
  trees: z.array(z.object({ id: z.string(), tag: z.string(), stage: z.string() })),
  campaign: z.object({ id: z.string(), name: z.string() }).nullable(),
  dedication: Dedication.nullable(),
  wallName: z.string().nullable(),
  wantsUpdates: z.boolean(),
  paidAt: z.string(),
  refundedAt: z.string().nullable(),
  createdAt: z.string(),
});
export type DonationRow = z.infer<typeof DonationRow>;

export const DonationList = z.object({
  items: z.array(DonationRow),
  total: z.number().int(),
  /** Over every row matching the filters, not just this page. */
  totals: z.object({ amountCents: z.number().int(), giftCents: z.number().int(), feeCoverCents: z.number().int(), count: z.number().int() }),
});
export type DonationList = z.infer<typeof DonationList>;

export const RefundResult = z.object({ refundId: z.string(), status: z.string() });
export type RefundResult = z.infer<typeof RefundResult>;
