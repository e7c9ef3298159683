import { z } from 'zod';
import { id, Instant, IsoDate, Named, nil, num, Warning } from './nursery-fields.schema.js';
import { SalinityMethod } from './nursery-rules.schema.js';

/** Tanks and buckets, their salinity log, brining plans and the day's water swaps. */
export const TankIdParams = z.object({ id: id('tank') });

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
