import { z } from 'zod';
import { TreeRow } from '@shared/schemas/nursery.schema';
import { del, get, post, queryString } from './http';

const ReservedResponse = z.object({ trees: z.array(TreeRow) });
const TreesPage = z.object({ trees: z.array(TreeRow), total: z.number() });
const reservedPath = (workdayId: string) => `/api/workdays/${encodeURIComponent(workdayId)}/reserved-trees`;

/** Everyone signed in: the trees set aside for a workday. */
export async function listReservedTrees(workdayId: string): Promise<TreeRow[]> {
  return (await get(reservedPath(workdayId), ReservedResponse)).trees;
}

/** Coordinators and admins: every listed tree or none (brining or ready, not promised elsewhere); answers the whole reserved list. */
export async function reserveTrees(workdayId: string, treeIds: string[]): Promise<TreeRow[]> {
  return (await post(reservedPath(workdayId), { treeIds }, ReservedResponse)).trees;
}

/** Coordinators and admins: gives one tree back to the nursery. */
export function releaseTree(workdayId: string, treeId: string): Promise<void> {
  return del(`${reservedPath(workdayId)}/${encodeURIComponent(treeId)}`);
}

/** Everyone signed in: brining and ready trees (the stages that can be reserved), up to 500. */
export async function listReservableTrees(): Promise<TreeRow[]> {
  return (await get(`/api/trees${queryString({ stage: 'brining,ready', pageSize: '500' })}`, TreesPage)).trees;
}
