import { z } from 'zod';

/** Stages of a tree, in order; a tree may end `lost` from any stage. */
export const TreeStage = z.enum(['collected', 'tube', 'potted', 'brining', 'ready', 'planted', 'alive', 'lost']);
export type TreeStage = z.infer<typeof TreeStage>;

export const SalinityMethod = z.enum(['refractometer', 'hydrometer']);
export type SalinityMethod = z.infer<typeof SalinityMethod>;

/** How readiness is judged; organisation settings. */
export const NurseryRules = z.object({
  /** 'mhhw': the tree top must stand above MHHW; 'share': submerged at most `maxCrownSubmergedShare` of hours. */
  crownRule: z.enum(['mhhw', 'share']),
  maxCrownSubmergedShare: z.number().min(0).max(0.5),
  salinityTolerancePpt: z.number().min(0.5).max(10),
  holdDays: z.number().int().min(1).max(120),
});
export type NurseryRules = z.infer<typeof NurseryRules>;

export const DEFAULT_NURSERY_RULES: NurseryRules = { crownRule: 'mhhw', maxCrownSubmergedShare: 0.02, salinityTolerancePpt: 2, holdDays: 21 };

// ---- Requests -------------------------------------------------------------------------------

const id = (what: string) => z.string().uuid({ message: `must be a ${what} id` });
const IsoDate = z.iso.date({ message: 'must be a date YYYY-MM-DD' });
const Instant = z.iso.datetime({ offset: true, message: 'must be an ISO date-time' });
const num = (min: number, max: number, unit = '') =>
  z.number({ message: 'must be a number' }).min(min, { message: `must be at least ${min}${unit}` }).max(max, { message: `must be at most ${max}${unit}` });
const unique = (ids: readonly string[]) => new Set(ids).size === ids.length;
const TreeIds = z.array(id('tree')).min(1, { message: 'pick at least one tree' }).max(500, { message: 'at most 500 trees at once' }).refine(unique, { message: 'each tree at most once' });
/** `a,b,c` (or a repeated query parameter) as a list. */
const listParam = (v: unknown) => (Array.isArray(v) ? v.flatMap((x) => String(x).split(',')) : typeof v === 'string' ? v.split(',') : v);

export const TreeIdParams = z.object({ id: id('tree') });
export const TankIdParams = z.object({ id: id('tank') });
export const BatchIdParams = z.object({ id: id('batch') });
export const PhotoIdParams = z.object({ id: id('photo') });
export const ReservedTreeParams = z.object({ id: id('workday'), treeId: id('tree') });

const BatchFields = z
  .object({
    collectedOn: IsoDate,
    place: z.string().trim().min(1, { message: 'is required' }).max(300),
    latitude: num(-90, 90).optional(),
    longitude: num(-180, 180).optional(),
    collector: z.string().trim().max(120).default(''),
    notes: z.string().max(2000).default(''),
    photoId: id('photo').optional(),
  })
  .strict();
const bothOrNeither = <T extends z.ZodType<{ latitude?: number; longitude?: number }>>(s: T) =>
  s.refine((b) => (b.latitude === undefined) === (b.longitude === undefined), { message: 'give both latitude and longitude, or neither', path: ['longitude'] });

/** Where and when propagules were collected; `count` trees are created with fresh tags. */
export const CreateBatchBody = bothOrNeither(BatchFields.extend({ count: z.number().int().min(1, { message: 'must be at least 1' }).max(500) }));
export type CreateBatchBody = z.infer<typeof CreateBatchBody>;
export const BatchInfoBody = bothOrNeither(BatchFields);
export type BatchInfoBody = z.infer<typeof BatchInfoBody>;

/** A batch from CSV (`stage,tank,height_cm,pot_height_cm,pot_mass_kg,note`, header required); stored only with `commit`. */
export const ImportBatchBody = z.object({ batch: BatchInfoBody, csv: z.string().min(1, { message: 'is empty' }).max(190_000), commit: z.boolean().default(false) }).strict();
export type ImportBatchBody = z.infer<typeof ImportBatchBody>;

export const ListTreesQuery = z.object({
  stage: z.preprocess(listParam, z.array(TreeStage)).optional(),
  tankId: id('tank').optional(),
  batchId: id('batch').optional(),
  siteId: id('site').optional(),
  reservedWorkdayId: id('workday').optional(),
  q: z.string().trim().max(20).optional(),
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(500).default(50),
});
export type ListTreesQuery = z.infer<typeof ListTreesQuery>;

const anyOf = (keys: string[]) => (b: object) => Object.entries(b).some(([k, v]) => keys.includes(k) && v !== undefined);

export const UpdateTreeBody = z
  .object({ potHeightCm: num(0, 200, ' cm').nullable(), potMassKg: num(0, 500, ' kg').nullable(), healthy: z.boolean(), photoId: id('photo').nullable() })
  .partial()
  .strict()
  .refine(anyOf(['potHeightCm', 'potMassKg', 'healthy', 'photoId']), { message: 'change at least one field' });
export type UpdateTreeBody = z.infer<typeof UpdateTreeBody>;

const MeasurementFields = z.object({
  heightCm: num(0, 500, ' cm'),
  leafCount: z.number().int().min(0).max(2000),
  healthy: z.boolean(),
  note: z.string().trim().max(500),
});
const MEASURED = ['heightCm', 'leafCount', 'healthy', 'note'];

/** One measurement of one tree; `at` defaults to now. */
export const MeasurementBody = MeasurementFields.extend({ photoId: id('photo'), at: Instant })
  .partial()
  .strict()
  .refine(anyOf([...MEASURED, 'photoId']), { message: 'record at least one value' });
export type MeasurementBody = z.infer<typeof MeasurementBody>;

/** A measurement round for every listed tree of one tank (all or nothing). */
export const MeasurementRoundBody = z
  .object({
    measurements: z
      .array(MeasurementFields.partial().extend({ treeId: id('tree') }).strict().refine(anyOf(MEASURED), { message: 'record at least one value' }))
      .min(1)
      .max(500)
      .refine((m) => unique(m.map((x) => x.treeId)), { message: 'each tree at most once' }),
    at: Instant.optional(),
  })
  .strict();
export type MeasurementRoundBody = z.infer<typeof MeasurementRoundBody>;

/** Moves trees to a stage and/or a tank (`tankId: null` takes them out); all or none. */
export const BulkMoveBody = z
  .object({ treeIds: TreeIds, stage: TreeStage.optional(), tankId: id('tank').nullable().optional(), note: z.string().trim().max(500).optional() })
  .strict()
  .refine(anyOf(['stage', 'tankId']), { message: 'give a stage, a tank or both', path: ['stage'] });
export type BulkMoveBody = z.infer<typeof BulkMoveBody>;

const TankFields = z.object({
  name: z.string().trim().min(1, { message: 'is required' }).max(80),
  volumeLitres: num(0.5, 100_000, ' L'),
  targetSiteId: id('site').nullable(),
  notes: z.string().max(2000),
});
export const CreateTankBody = TankFields.extend({ targetSiteId: TankFields.shape.targetSiteId.default(null), notes: TankFields.shape.notes.default('') }).strict();
export type CreateTankBody = z.infer<typeof CreateTankBody>;
export const UpdateTankBody = TankFields.partial().strict();
export type UpdateTankBody = z.infer<typeof UpdateTankBody>;

/**
 * A salinity reading: `salinityPpt` (refractometer), or `specificGravity` with `temperatureC`
 * (hydrometer; SG "t/t", the sample's density over pure water's at the same temperature).
 */
export const ReadingBody = z
  .object({
    salinityPpt: num(0, 45, ' ppt').optional(),
    specificGravity: z.number({ message: 'must be a number' }).optional(),
    temperatureC: z.number({ message: 'must be a number' }).optional(),
    takenAt: Instant.optional(),
    note: z.string().trim().max(300).optional(),
  })
  .strict()
  .superRefine((b, ctx) => {
    const hydrometer = b.specificGravity !== undefined || b.temperatureC !== undefined;
    if (b.salinityPpt !== undefined && hydrometer) ctx.addIssue({ code: 'custom', path: ['salinityPpt'], message: 'give salinity or specific gravity with temperature, not both' });
    if (b.salinityPpt !== undefined) return;
    if (b.specificGravity === undefined) ctx.addIssue({ code: 'custom', path: [hydrometer ? 'specificGravity' : 'salinityPpt'], message: 'is required' });
    if (hydrometer && b.temperatureC === undefined) ctx.addIssue({ code: 'custom', path: ['temperatureC'], message: 'is required with a specific gravity' });
  });
export type ReadingBody = z.infer<typeof ReadingBody>;

export const ReadingsQuery = z.object({ limit: z.coerce.number().int().min(1).max(1000).default(200) });

const pptParam = z.coerce.number({ message: 'must be a number' }).min(0).max(45);
export const BriningPlanQuery = z.object({ targetPpt: pptParam.optional(), stockPpt: pptParam.optional(), by: IsoDate.optional() });
export type BriningPlanQuery = z.infer<typeof BriningPlanQuery>;
export const NurseryTasksQuery = z.object({ date: IsoDate.optional() });

export const TreeReadinessQuery = z.object({ siteId: id('site').optional() });
export const ReserveTreesBody = z.object({ treeIds: TreeIds }).strict();

/** A label sheet for listed trees or for a whole batch. */
export const LabelsQuery = z
  .object({ ids: z.preprocess(listParam, z.array(id('tree')).min(1).max(500)).optional(), batchId: id('batch').optional() })
  .refine((q) => (q.ids === undefined) !== (q.batchId === undefined), { message: 'give ids or batchId', path: ['ids'] });

// ---- Responses ------------------------------------------------------------------------------

const Named = z.object({ id: z.string(), name: z.string() });
const nil = <T extends z.ZodType>(s: T) => s.nullable();

export const BatchDto = z.object({
  id: z.string(), code: z.string(), collectedOn: z.string(), place: z.string(), latitude: nil(z.number()), longitude: nil(z.number()),
  collector: z.string(), count: z.number(), notes: z.string(), photoId: nil(z.string()), createdAt: z.string(),
});
export type BatchDto = z.infer<typeof BatchDto>;

/** A row of the nursery ledger. */
export const TreeRow = z.object({
  id: z.string(), tag: z.string(), stage: TreeStage, tank: nil(Named), batchId: nil(z.string()), batchCode: nil(z.string()),
  heightCm: nil(z.number()), leafCount: nil(z.number()), potHeightCm: nil(z.number()), potMassKg: nil(z.number()), healthy: z.boolean(),
  reservedWorkdayId: nil(z.string()), siteId: nil(z.string()), plantedOn: nil(z.string()), photoId: nil(z.string()), thumbUrl: nil(z.string()), updatedAt: z.string(),
});
export type TreeRow = z.infer<typeof TreeRow>;

export const TreeEventDto = z.object({
  id: z.string(), kind: z.enum(['stage', 'measurement', 'move', 'reserve', 'note']), at: z.string(), by: nil(Named),
  fromStage: nil(TreeStage), toStage: nil(TreeStage), tank: nil(Named), heightCm: nil(z.number()), leafCount: nil(z.number()),
  healthy: nil(z.boolean()), note: z.string(), photoUrl: nil(z.string()), thumbUrl: nil(z.string()),
});
export type TreeEventDto = z.infer<typeof TreeEventDto>;

/** A tree with its history (newest first) and its measurements (oldest first, for the growth chart). */
export const TreeDetail = z.object({
  tree: TreeRow.extend({ photoUrl: nil(z.string()), createdAt: z.string() }),
  history: z.array(TreeEventDto),
  measurements: z.array(z.object({ at: z.string(), heightCm: nil(z.number()), leafCount: nil(z.number()), healthy: nil(z.boolean()) })),
});
export type TreeDetail = z.infer<typeof TreeDetail>;

/** One CSV row as read: `ok` when it can be stored. */
export const ImportRow = z.object({
  line: z.number(), ok: z.boolean(), errors: z.array(z.string()),
  values: z.object({ stage: z.string(), tank: z.string(), tankId: nil(z.string()), heightCm: nil(z.number()), potHeightCm: nil(z.number()), potMassKg: nil(z.number()), note: z.string() }),
});
export type ImportRow = z.infer<typeof ImportRow>;
export const ImportPreview = z.object({ rows: z.array(ImportRow), valid: z.boolean() });
export type ImportPreview = z.infer<typeof ImportPreview>;

export const ReadingDto = z.object({
  id: z.string(), tankId: z.string(), takenAt: z.string(), method: SalinityMethod, salinityPpt: z.number(),
  specificGravity: nil(z.number()), temperatureC: nil(z.number()), note: z.string(), takenById: nil(z.string()),
});
export type ReadingDto = z.infer<typeof ReadingDto>;

export const TankDto = z.object({
  id: z.string(), name: z.string(), volumeLitres: z.number(), targetSiteId: nil(z.string()),
  targetSite: nil(Named.extend({ salinityPpt: nil(z.number()) })), notes: z.string(), createdAt: z.string(), latestReading: nil(ReadingDto), treeCount: z.number(),
});
export type TankDto = z.infer<typeof TankDto>;

const Warning = z.object({ code: z.string(), message: z.string() });
export const BriningStepDto = z.object({ date: z.string(), fromPpt: z.number(), toPpt: z.number(), replaceLitres: z.number(), stockPpt: z.number() });
export const BriningPlanDto = z.object({
  tankId: z.string(), currentPpt: z.number(), targetPpt: z.number(), startDate: z.string(), steps: z.array(BriningStepDto),
  reachedOn: z.string(), readyOn: z.string(), latestStartOn: z.string().optional(), warnings: z.array(Warning),
});
export type BriningPlanDto = z.infer<typeof BriningPlanDto>;

/** Water swaps due on a date across tanks that have a target site. */
export const NurseryTasksDto = z.object({
  date: z.string(),
  tasks: z.array(BriningStepDto.extend({ tankId: z.string(), tankName: z.string(), message: z.string() })),
  skipped: z.array(z.object({ tankId: z.string(), tankName: z.string(), reason: z.string() })),
});
export type NurseryTasksDto = z.infer<typeof NurseryTasksDto>;

/** Whether one tree can go to one site, and why not. */
export const ReadinessDto = z.object({
  treeId: z.string(), tag: z.string(), stage: TreeStage, tank: nil(Named), ready: z.boolean(), reasons: z.array(Warning), cautions: z.array(Warning),
  crownSubmergedShare: z.number(), collarFloodedShare: z.number(), crownTopM: z.number(), requiredTopM: z.number(),
  heightShortfallCm: z.number(), heldDays: z.number(), readyBy: z.string().optional(),
});
export type ReadinessDto = z.infer<typeof ReadinessDto>;
export const SiteReadinessDto = z.object({
  site: Named.extend({ salinityPpt: nil(z.number()) }), today: z.string(), mhhwM: z.number(), mslM: z.number(), trees: z.array(ReadinessDto),
});
export type SiteReadinessDto = z.infer<typeof SiteReadinessDto>;

export const PhotoDto = z.object({ id: z.string(), url: z.string(), thumbUrl: z.string() });
export type PhotoDto = z.infer<typeof PhotoDto>;
