/**
 * Outcomes: planting records and monitoring visits (requests and responses). Elevations are
 * metres above the site tide station's MLLW; the client shows them in the organisation's units.
 */
import { z } from 'zod';
import { TreeStage } from './nursery.schema.js';

const id = (what: string) => z.string().uuid({ message: `must be a ${what} id` });
const IsoDate = z.iso.date({ message: 'must be a date YYYY-MM-DD' });
const nil = <T extends z.ZodType>(s: T) => s.nullable();

export const TreeCondition = z.enum(['alive', 'lost', 'missing']);
export type TreeCondition = z.infer<typeof TreeCondition>;

// ---- Planting records -----------------------------------------------------------------------

export const PlantingParams = z.object({ id: id('workday'), treeId: id('tree') });

/**
 * Records trees as planted by a planting workday, all or none. `plantedOn` defaults to the
 * workday's local date; each tree's `bedElevationM` to the site's bed elevation. Trees must be
 * reserved for the workday or `ready`; unreserved `brining`/`potted` trees need `allowUnready`.
 * Trees already planted by this workday are left as they are.
 */
export const RecordPlantingsBody = z
  .object({
    plantedOn: IsoDate.optional(),
    allowUnready: z.boolean().default(false),
    trees: z
      .array(z.object({ treeId: id('tree'), bedElevationM: z.number({ message: 'must be a number' }).min(-5, { message: 'must be at least -5 m' }).max(5, { message: 'must be at most 5 m' }).optional() }).strict())
      .min(1, { message: 'pick at least one tree' })
      .max(500, { message: 'at most 500 trees at once' })
      .refine((ts) => new Set(ts.map((t) => t.treeId)).size === ts.length, { message: 'each tree at most once' }),
  })
  .strict();
export type RecordPlantingsBody = z.infer<typeof RecordPlantingsBody>;

/** One tree on a planting workday's list: reserved for it, or planted by it. */
export const PlantingTree = z.object({
  id: z.string(),
  tag: z.string(),
  stage: TreeStage,
  heightCm: nil(z.number()),
  reserved: z.boolean(),
  planted: z.boolean(),
  plantedOn: nil(z.string()),
  plantedBedElevationM: nil(z.number()),
  /** The site's bed elevation: what the form should offer. */
  suggestedBedElevationM: z.number(),
  /** Monitoring has checked the tree, so its planting record can no longer be undone. */
  hasChecks: z.boolean(),
});
export type PlantingTree = z.infer<typeof PlantingTree>;

export const PlantingList = z.object({
  workday: z.object({ id: z.string(), title: z.string(), status: z.string(), kind: z.string(), localDate: z.string() }),
  site: z.object({ id: z.string(), name: z.string(), bedElevationM: z.number(), stationId: z.string() }),
  trees: z.array(PlantingTree),
});
export type PlantingList = z.infer<typeof PlantingList>;

/** The answer to a planting record: the list as it now stands and what changed. */
export const PlantingResult = PlantingList.extend({ recorded: z.number(), unchanged: z.number() });
export type PlantingResult = z.infer<typeof PlantingResult>;

// ---- Monitoring -----------------------------------------------------------------------------

export const VisitIdParams = z.object({ id: id('visit') });
export const VisitTreeParams = z.object({ id: id('visit'), treeId: id('tree') });

export const CreateVisitBody = z
  .object({ siteId: id('site'), workdayId: id('workday').optional(), visitedOn: IsoDate, notes: z.string().trim().max(4000).default('') })
  .strict();
export type CreateVisitBody = z.infer<typeof CreateVisitBody>;

export const ListVisitsQuery = z
  .object({ siteId: id('site').optional(), from: IsoDate.optional(), to: IsoDate.optional() })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'must be on or after from', path: ['to'] });
export type ListVisitsQuery = z.infer<typeof ListVisitsQuery>;

/** One tree's check at a visit (upsert). */
export const CheckBody = z
  .object({
    condition: TreeCondition,
    heightCm: z.number({ message: 'must be a number' }).min(0, { message: 'must be at least 0 cm' }).max(2000, { message: 'must be at most 2000 cm' }).nullable().optional(),
    notes: z.string().trim().max(2000).default(''),
    photoId: id('photo').nullable().optional(),
  })
  .strict();
export type CheckBody = z.infer<typeof CheckBody>;

export const LookupQuery = z.object({ tag: z.string().trim().min(1, { message: 'type a tag number' }).max(20) });

export const CheckCounts = z.object({ alive: z.number(), lost: z.number(), missing: z.number(), checked: z.number() });

export const VisitDto = z.object({
  id: z.string(),
  siteId: z.string(),
  siteName: z.string(),
  workdayId: nil(z.string()),
  visitedOn: z.string(),
  notes: z.string(),
  counts: CheckCounts,
});
export type VisitDto = z.infer<typeof VisitDto>;

export const CheckDto = z.object({
  condition: TreeCondition,
  heightCm: nil(z.number()),
  notes: z.string(),
  photoId: nil(z.string()),
  photoUrl: nil(z.string()),
  thumbUrl: nil(z.string()),
});
export type CheckDto = z.infer<typeof CheckDto>;

/** A planted tree of the visit's site with its check at this visit (null until checked). */
export const VisitTree = z.object({
  id: z.string(),
  tag: z.string(),
  stage: TreeStage,
  plantedOn: z.string(),
  plantedBedElevationM: nil(z.number()),
  heightCm: nil(z.number()),
  check: nil(CheckDto),
});
export type VisitTree = z.infer<typeof VisitTree>;

/** A visit, the trees to check (planted or alive on the visit date, and any recorded lost at it). */
export const VisitDetail = z.object({ visit: VisitDto, trees: z.array(VisitTree) });
export type VisitDetail = z.infer<typeof VisitDetail>;

export const CheckResult = z.object({ tree: VisitTree, counts: CheckCounts });
export type CheckResult = z.infer<typeof CheckResult>;

/** A planting cohort (one site, one planting date) whose next check is due or overdue. */
export const DueCohortDto = z.object({
  plantedOn: z.string(),
  months: z.number(),
  dueOn: z.string(),
  lateAfter: z.string(),
  status: z.enum(['due', 'overdue']),
  trees: z.number(),
  checked: z.number(),
});
export const MonitoringDueDto = z.object({
  today: z.string(),
  toleranceDays: z.number(),
  sites: z.array(z.object({ siteId: z.string(), siteName: z.string(), lastVisitOn: nil(z.string()), cohorts: z.array(DueCohortDto) })),
});
export type MonitoringDueDto = z.infer<typeof MonitoringDueDto>;
