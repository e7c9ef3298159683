import { z } from 'zod';
import type { CrewRole } from '@shared/schemas/crew.schema';
import { WorkdayDto, WorkdayKind, type ListWorkdaysQuery, type UpdateWorkdayBody } from '@shared/schemas/workday.schema';
import { get, patch, post, queryString } from './http';

/**
 * The part of a workday the draft step shows. Parsed loosely (unknown keys dropped) so the richer
 * shared WorkdayDto the workday pages use can grow without breaking this screen.
 */
export const WorkdayDraft = z.object({
  id: z.string(),
  title: z.string(),
  kind: WorkdayKind,
  siteId: z.string(),
  startsAt: z.string(),
  endsAt: z.string(),
  status: z.string(),
});
export type WorkdayDraft = z.infer<typeof WorkdayDraft>;

export interface CreateWorkdayBody {
  siteId: string;
  startsAt: string;
  endsAt: string;
  title?: string;
  kind?: WorkdayKind;
  capacity?: number;
  roles?: { role: CrewRole; capacity: number }[];
  description?: string;
  meetingPoint?: string;
  whatToBring?: string;
  minimumAge?: number;
  status?: 'draft' | 'published';
}

const WorkdayResponse = z.object({ workday: WorkdayDraft });
const WorkdaysResponse = z.object({ workdays: z.array(WorkdayDraft) });

/** Coordinators and admins: a draft workday for a low-water window. */
export async function createWorkday(body: CreateWorkdayBody): Promise<WorkdayDraft> {
  return (await post('/api/workdays', body, WorkdayResponse)).workday;
}

/** Coordinators and admins: the draft workdays at one site. */
export async function listDraftWorkdays(siteId: string): Promise<WorkdayDraft[]> {
  return (await get(`/api/workdays${queryString({ status: 'draft', siteId })}`, WorkdaysResponse)).workdays;
}

const WorkdayDtoResponse = z.object({ workday: WorkdayDto });
const WorkdayDtosResponse = z.object({ workdays: z.array(WorkdayDto) });

function workdayPath(id: string, action?: string): string {
  return `/api/workdays/${encodeURIComponent(id)}${action ? `/${action}` : ''}`;
}

/** One workday with its places per role: anyone unless it is a draft (coordinators and admins). */
export async function fetchWorkday(id: string): Promise<WorkdayDto> {
  return (await get(workdayPath(id), WorkdayDtoResponse)).workday;
}

/** Workdays by start time; anyone sees published, cancelled and completed ones, staff also drafts. */
export async function listWorkdays(query: ListWorkdaysQuery = {}): Promise<WorkdayDto[]> {
  return (await get(`/api/workdays${queryString({ ...query })}`, WorkdayDtosResponse)).workdays;
}

/** Coordinators and admins; moving the time or place of a published workday e-mails the crew. */
export async function updateWorkday(id: string, body: UpdateWorkdayBody): Promise<WorkdayDto> {
  return (await patch(workdayPath(id), body, WorkdayDtoResponse)).workday;
}

/** Coordinators and admins; 409 `conflict` unless it is a draft. */
export async function publishWorkday(id: string): Promise<WorkdayDto> {
  return (await post(workdayPath(id, 'publish'), {}, WorkdayDtoResponse)).workday;
}

/** Coordinators and admins; everyone signed up gets `message` by e-mail. */
export async function cancelWorkday(id: string, message: string): Promise<WorkdayDto> {
  return (await post(workdayPath(id, 'cancel'), { message }, WorkdayDtoResponse)).workday;
}

/** Coordinators and admins; 409 `conflict` unless it is published. */
export async function completeWorkday(id: string): Promise<WorkdayDto> {
  return (await post(workdayPath(id, 'complete'), {}, WorkdayDtoResponse)).workday;
}
