import { z } from 'zod';
import {
  CheckResult,
  MonitoringDueDto,
  VisitDetail,
  VisitDto,
  VisitTree,
  type CheckBody,
  type CreateVisitBody,
} from '@shared/schemas/outcomes.schema';
import { get, put, post, queryString } from './http';

export type { CheckResult, MonitoringDueDto, VisitDetail, VisitDto, VisitTree };
export type { TreeCondition } from '@shared/schemas/outcomes.schema';
export type CheckInput = z.input<typeof CheckBody>;
export type CreateVisitInput = z.input<typeof CreateVisitBody>;

const VisitResponse = z.object({ visit: VisitDto });
const VisitsResponse = z.object({ visits: z.array(VisitDto) });
const LookupResponse = z.object({ tree: VisitTree });
const visitPath = (id: string) => `/api/monitoring-visits/${encodeURIComponent(id)}`;

/** Coordinators and admins: a visit to a site on a date (not in the future). */
export async function createVisit(body: CreateVisitInput): Promise<VisitDto> {
  return (await post('/api/monitoring-visits', body, VisitResponse)).visit;
}

/** Coordinators and admins: visits, newest first; dates are 'YYYY-MM-DD', both included. */
export async function listVisits(query: { siteId?: string; from?: string; to?: string } = {}): Promise<VisitDto[]> {
  return (await get(`/api/monitoring-visits${queryString(query)}`, VisitsResponse)).visits;
}

/** Coordinators and admins: the visit and the site's planted trees, each with its check at this visit. */
export function fetchVisit(id: string): Promise<VisitDetail> {
  return get(visitPath(id), VisitDetail);
}

/** Coordinators and admins: a planted tree of the visit's site by its tag as typed ('42', 't-42', 'T-0042'); 404 when none. */
export async function lookupVisitTree(visitId: string, tag: string): Promise<VisitTree> {
  return (await get(`${visitPath(visitId)}/lookup${queryString({ tag })}`, LookupResponse)).tree;
}

/** Coordinators and admins: records (or replaces) one tree's check at the visit. */
export function saveCheck(visitId: string, treeId: string, body: CheckInput): Promise<CheckResult> {
  return put(`${visitPath(visitId)}/checks/${encodeURIComponent(treeId)}`, body, CheckResult);
}

/** Coordinators and admins: planting cohorts whose next monitoring check is due or overdue, per site. */
export function fetchMonitoringDue(): Promise<MonitoringDueDto> {
  return get('/api/monitoring/due', MonitoringDueDto);
}
