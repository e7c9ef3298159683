/**
 * Reports (coordinators and admins): figures computed from records on every request. Every
 * report takes `from` and `to` (calendar dates, both included) and an optional `siteId`.
 * Amounts are integer cents of the organisation's currency; rates are 0–1 with 4 decimals.
 */
import { z } from 'zod';

const IsoDate = z.iso.date({ message: 'must be a date YYYY-MM-DD' });
const nil = <T extends z.ZodType>(s: T) => s.nullable();
const DAY_MS = 86_400_000;

export const ReportPeriod = z.enum(['month', 'quarter', 'year']);
export type ReportPeriod = z.infer<typeof ReportPeriod>;

const RangeFields = z.object({ from: IsoDate, to: IsoDate, siteId: z.string().uuid({ message: 'must be a site id' }).optional() });
const rangeRules = <T extends z.ZodType<{ from: string; to: string }>>(schema: T) =>
  schema
    .refine((q) => q.from <= q.to, { message: 'must be on or after from', path: ['to'] })
    .refine((q) => Date.parse(q.to) - Date.parse(q.from) <= 20 * 366 * DAY_MS, { message: 'a report covers at most 20 years', path: ['to'] });

export const ReportQuery = rangeRules(RangeFields);
export type ReportQuery = z.infer<typeof ReportQuery>;

export const HoursReportQuery = rangeRules(RangeFields.extend({ period: ReportPeriod.default('month') }));
export type HoursReportQuery = z.infer<typeof HoursReportQuery>;

const Range = { from: z.string(), to: z.string(), siteId: nil(z.string()) };

/**
 * Headline figures. volunteers: distinct people with attended minutes on workdays dated in the
 * range; volunteerHours: their minutes ÷ 60 (2 decimals); volunteerValueCents: minutes × the
 * hourly value ÷ 60, rounded half up once; treesPlanted: trees with `plantedOn` in the range;
 * treesAlive: of those, not lost or missing at their latest check up to `to` (unchecked trees
 * count as alive; `treesNotChecked` says how many); survivalRate: alive ÷ planted (null when
 * none); donations: paid, not refunded, gifts paid in the range (no site filter). `notes`
 * explains these rules in words for the screen.
 */
export const ReportSummary = z.object({
  ...Range,
  asOf: z.string(),
  volunteers: z.number(),
  volunteerMinutes: z.number(),
  volunteerHours: z.number(),
  volunteerValueCents: z.number(),
  volunteerHourValueCents: z.number(),
  volunteerHourValueSource: z.string(),
  treesPlanted: z.number(),
  treesAlive: z.number(),
  treesNotChecked: z.number(),
  survivalRate: nil(z.number()),
  donationsCents: z.number(),
  donationsCount: z.number(),
  currency: z.string(),
  notes: z.array(z.string()),
});
export type ReportSummary = z.infer<typeof ReportSummary>;

export const HoursRowDto = z.object({ period: z.string(), userId: z.string(), name: z.string(), workdays: z.number(), minutes: z.number(), hours: z.number(), valueCents: z.number() });
export const HoursReport = z.object({
  ...Range,
  period: ReportPeriod,
  currency: z.string(),
  rows: z.array(HoursRowDto),
  /** valueCents here is from the total minutes, rounded once; the rows' values share it and add up to it. */
  totals: z.object({ volunteers: z.number(), minutes: z.number(), hours: z.number(), valueCents: z.number() }),
});
export type HoursReport = z.infer<typeof HoursReport>;

/** Per month and site; `siteId: null` is the nursery (collected and potted trees have no site yet). */
export const TreesRowDto = z.object({ month: z.string(), siteId: nil(z.string()), siteName: z.string(), collected: z.number(), potted: z.number(), planted: z.number(), alive: z.number() });
export const TreesReport = z.object({ ...Range, asOf: z.string(), rows: z.array(TreesRowDto) });
export type TreesReport = z.infer<typeof TreesReport>;

export const SurvivalCellDto = z.object({ months: z.number(), reached: z.number(), checked: z.number(), alive: z.number(), survivalRate: nil(z.number()) });
/** Survival of trees planted in the range, as known on `asOf` (the earlier of `to` and today). */
export const SurvivalReport = z.object({
  ...Range,
  asOf: z.string(),
  toleranceDays: z.number(),
  milestones: z.array(z.number()),
  cohorts: z.array(z.object({ siteId: z.string(), siteName: z.string(), cohort: z.string(), planted: z.number(), cells: z.array(SurvivalCellDto) })),
  sites: z.array(z.object({ siteId: z.string(), siteName: z.string(), planted: z.number(), cells: z.array(SurvivalCellDto.extend({ reachedShare: nil(z.number()) })) })),
});
export type SurvivalReport = z.infer<typeof SurvivalReport>;

export const DonationsRowDto = z.object({ campaignId: nil(z.string()), campaignName: z.string(), count: z.number(), amountCents: z.number(), trees: z.number() });
export const DonationsReport = z.object({ ...Range, currency: z.string(), rows: z.array(DonationsRowDto), notes: z.array(z.string()) });
export type DonationsReport = z.infer<typeof DonationsReport>;
