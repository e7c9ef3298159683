import { z } from 'zod';

export const WorkdayKind = z.enum(['planting', 'nursery', 'monitoring', 'other']);
export type WorkdayKind = z.infer<typeof WorkdayKind>;

export const WorkdayStatus = z.enum(['draft', 'published', 'cancelled', 'completed']);
export type WorkdayStatus = z.infer<typeof WorkdayStatus>;

/** A draft workday for a site and time span (e.g. picked from a low-water window). */
export const CreateWorkdayBody = z
  .object({
    siteId: z.string().uuid({ message: 'must be a site id' }),
    startsAt: z.iso.datetime({ offset: true, message: 'must be an ISO date-time' }),
    endsAt: z.iso.datetime({ offset: true, message: 'must be an ISO date-time' }),
    title: z.string().trim().min(1).max(160).optional(),
    kind: WorkdayKind.default('planting'),
  })
  .strict()
  .refine((b) => Date.parse(b.endsAt) > Date.parse(b.startsAt), { message: 'must be after the start', path: ['endsAt'] })
  .refine((b) => Date.parse(b.endsAt) - Date.parse(b.startsAt) <= 16 * 3_600_000, { message: 'a workday may last at most 16 hours', path: ['endsAt'] });
export type CreateWorkdayBody = z.infer<typeof CreateWorkdayBody>;

export const ListWorkdaysQuery = z.object({ status: WorkdayStatus.optional(), siteId: z.string().uuid().optional() });

export const WorkdayDto = z.object({
  id: z.string().uuid(),
  title: z.string(),
  kind: WorkdayKind,
  siteId: z.string().uuid(),
  startsAt: z.string(),
  endsAt: z.string(),
  status: WorkdayStatus,
});
export type WorkdayDto = z.infer<typeof WorkdayDto>;
