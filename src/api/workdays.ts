import { z } from 'zod';
import { WorkdayKind } from '@shared/schemas/workday.schema';
import { get, post, queryString } from './http';

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
