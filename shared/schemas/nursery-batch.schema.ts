import { z } from 'zod';
import { id, IsoDate, nil, num } from './nursery-fields.schema.js';

/** Collection batches: where and when propagules were gathered, typed or imported from CSV. */
export const BatchIdParams = z.object({ id: id('batch') });

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

export const BatchDto = z.object({
  id: z.string(), code: z.string(), collectedOn: z.string(), place: z.string(), latitude: nil(z.number()), longitude: nil(z.number()),
  collector: z.string(), count: z.number(), notes: z.string(), photoId: nil(z.string()), createdAt: z.string(),
});
export type BatchDto = z.infer<typeof BatchDto>;

/** One CSV row as read: `ok` when it can be stored. */
export const ImportRow = z.object({
  line: z.number(), ok: z.boolean(), errors: z.array(z.string()),
  values: z.object({ stage: z.string(), tank: z.string(), tankId: nil(z.string()), heightCm: nil(z.number()), potHeightCm: nil(z.number()), potMassKg: nil(z.number()), note: z.string() }),
});
export type ImportRow = z.infer<typeof ImportRow>;
export const ImportPreview = z.object({ rows: z.array(ImportRow), valid: z.boolean() });
export type ImportPreview = z.infer<typeof ImportPreview>;
