import { z } from 'zod';
import { CrewRole, RoleCapacity } from './crew.schema.js';

export const WorkdayKind = z.enum(['planting', 'nursery', 'monitoring', 'other']);
export type WorkdayKind = z.infer<typeof WorkdayKind>;

export const WorkdayStatus = z.enum(['draft', 'published', 'cancelled', 'completed']);
export type WorkdayStatus = z.infer<typeof WorkdayStatus>;

const Instant = z.iso.datetime({ offset: true, message: 'must be an ISO date-time' });

const WorkdayFields = z.object({
  title: z.string().trim().min(1, { message: 'is required' }).max(160),
  kind: WorkdayKind,
  siteId: z.string().uuid({ message: 'must be a site id' }),
  startsAt: Instant,
  endsAt: Instant,
  capacity: z.number().int().min(1, { message: 'must be at least 1' }).max(500),
  /** Per-role caps; without them any role may sign up within `capacity`. */
  roles: z.array(RoleCapacity).max(5),
  description: z.string().max(4000),
  meetingPoint: z.string().trim().max(200),
  whatToBring: z.string().max(2000),
  minimumAge: z.number().int().min(0).max(99),
});

const spanRules = <T extends z.ZodType<{ startsAt?: string; endsAt?: string; roles?: { role: string }[] }>>(schema: T) =>
  schema
    .refine((b) => !b.startsAt || !b.endsAt || Date.parse(b.endsAt) > Date.parse(b.startsAt), { message: 'must be after the start', path: ['endsAt'] })
    .refine((b) => !b.startsAt || !b.endsAt || Date.parse(b.endsAt) - Date.parse(b.startsAt) <= 16 * 3_600_000, { message: 'a workday may last at most 16 hours', path: ['endsAt'] })
    .refine((b) => new Set((b.roles ?? []).map((r) => r.role)).size === (b.roles ?? []).length, { message: 'each role at most once', path: ['roles'] });

/** A new workday; a draft unless `status: 'published'`. Title, kind and capacity have defaults. */
export const CreateWorkdayBody = spanRules(
  WorkdayFields.extend({
    title: WorkdayFields.shape.title.optional(),
    kind: WorkdayKind.default('planting'),
    capacity: WorkdayFields.shape.capacity.default(12),
    roles: WorkdayFields.shape.roles.optional(),
    description: WorkdayFields.shape.description.default(''),
    meetingPoint: WorkdayFields.shape.meetingPoint.default(''),
    whatToBring: WorkdayFields.shape.whatToBring.default(''),
    minimumAge: WorkdayFields.shape.minimumAge.default(0),
    status: z.enum(['draft', 'published']).default('draft'),
  }).strict(),
);
export type CreateWorkdayBody = z.infer<typeof CreateWorkdayBody>;

export const UpdateWorkdayBody = spanRules(WorkdayFields.partial().strict());
export type UpdateWorkdayBody = z.infer<typeof UpdateWorkdayBody>;

export const CancelWorkdayBody = z.object({ message: z.string().trim().min(1, { message: 'tell the crew why' }).max(2000) }).strict();

export const ListWorkdaysQuery = z.object({
  status: WorkdayStatus.optional(),
  siteId: z.string().uuid().optional(),
  kind: WorkdayKind.optional(),
  from: z.iso.datetime({ offset: true }).or(z.iso.date()).optional(),
  to: z.iso.datetime({ offset: true }).or(z.iso.date()).optional(),
});
export type ListWorkdaysQuery = z.infer<typeof ListWorkdaysQuery>;

export const WorkdayIdParams = z.object({ id: z.string().uuid({ message: 'must be a workday id' }) });

export const RolePlaces = z.object({ role: CrewRole, capacity: z.number(), confirmed: z.number(), waitlisted: z.number() });

export const WorkdayDto = z.object({
  id: z.string().uuid(),
  title: z.string(),
  kind: WorkdayKind,
  siteId: z.string().uuid(),
  startsAt: z.string(),
  endsAt: z.string(),
  status: WorkdayStatus,
  description: z.string(),
  meetingPoint: z.string(),
  whatToBring: z.string(),
  minimumAge: z.number(),
  capacity: z.number(),
  cancelMessage: z.string(),
  site: z.object({ id: z.string(), name: z.string(), launchName: z.string(), timeZone: z.string(), latitude: z.number(), longitude: z.number() }),
  confirmed: z.number(),
  waitlisted: z.number(),
  /** Per-role places; without role caps one row per role with the total cap. */
  roles: z.array(RolePlaces),
  roleCapped: z.boolean(),
});
export type WorkdayDto = z.infer<typeof WorkdayDto>;
