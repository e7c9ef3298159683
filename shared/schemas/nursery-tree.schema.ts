import { z } from 'zod';
import { anyOf, id, Instant, listParam, Named, nil, num, TreeIds, unique } from './nursery-fields.schema.js';
import { TreeStage } from './nursery-rules.schema.js';

/** The ledger's trees: listing, edits, measurements (one or a tank's round), bulk moves, labels and photos. */
export const TreeIdParams = z.object({ id: id('tree') });
export const PhotoIdParams = z.object({ id: id('photo') });

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

/** Pot details, health and photo; `note` (say, what is wrong with it) goes into the history line only. */
export const UpdateTreeBody = z
  .object({
    potHeightCm: num(0, 200, ' cm').nullable(), potMassKg: num(0, 500, ' kg').nullable(), healthy: z.boolean(), photoId: id('photo').nullable(),
    // 400, not 500: the history line also says what changed, in a 500-character column.
    note: z.string().trim().max(400),
  })
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

/** A label sheet for listed trees or for a whole batch. */
export const LabelsQuery = z
  .object({ ids: z.preprocess(listParam, z.array(id('tree')).min(1).max(500)).optional(), batchId: id('batch').optional() })
  .refine((q) => (q.ids === undefined) !== (q.batchId === undefined), { message: 'give ids or batchId', path: ['ids'] });

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

export const PhotoDto = z.object({ id: z.string(), url: z.string(), thumbUrl: z.string() });
export type PhotoDto = z.infer<typeof PhotoDto>;
