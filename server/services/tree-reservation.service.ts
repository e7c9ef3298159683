import type { DataSource, EntityManager } from 'typeorm';
import type { TreeRow, TreeStage } from '../../shared/schemas/nursery.schema.js';
import { TreeEvent } from '../db/entities/tree-event.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import { ConflictError, NotFoundError, ValidationError } from '../errors.js';
import { dayIn, nurserySettings } from './nursery-context.js';
import { lockTrees, requireAllFound, treeRows } from './tree-history.js';

/** Trees that can be promised to a planting workday. */
const RESERVABLE: readonly TreeStage[] = ['brining', 'ready'];

/** Trees set aside for a workday, so two workdays never count on the same tree. */
export function createTreeReservationService(deps: { db: DataSource; clock: () => Date }) {
  async function workday(tx: EntityManager, id: string, lock = false): Promise<Workday> {
    const w = await tx.getRepository(Workday).findOne({ where: { id }, ...(lock && { lock: { mode: 'pessimistic_read' as const } }) });
    if (!w) throw new NotFoundError('Workday');
    return w;
  }
  async function reservedFor(tx: EntityManager, workdayId: string): Promise<TreeRow[]> {
    const ids = (await tx.getRepository(Tree).find({ where: { reservedWorkdayId: workdayId }, select: { id: true } })).map((t) => t.id);
    return treeRows(tx, ids);
  }

  return {
    list: (workdayId: string) => deps.db.transaction(async (tx) => reservedFor(tx, (await workday(tx, workdayId)).id)),

    /** Reserves every listed tree or none: each must be brining or ready and not reserved for another workday. */
    async reserve(workdayId: string, treeIds: string[], userId: string): Promise<TreeRow[]> {
      return deps.db.transaction(async (tx) => {
        const w = await workday(tx, workdayId, true);
        if (w.status === 'cancelled' || w.status === 'completed') throw new ConflictError(`The workday is ${w.status}; trees can no longer be reserved for it`);
        const trees = await lockTrees(tx, treeIds);
        requireAllFound(treeIds, trees, 'treeIds');
        const wrongStage = trees.filter((t) => !RESERVABLE.includes(t.stage)).map((t) => `${t.tag} is ${t.stage}; only brining or ready trees can be reserved`);
        if (wrongStage.length > 0) throw new ValidationError(`${wrongStage.length} of the trees cannot be reserved; nothing was changed`, { treeIds: wrongStage });
        const taken = trees.filter((t) => t.reservedWorkdayId !== null && t.reservedWorkdayId !== workdayId).map((t) => `${t.tag} is reserved for another workday`);
        if (taken.length > 0) throw new ConflictError(`${taken.length} of the trees are reserved for another workday; nothing was changed`, { treeIds: taken });
        const fresh = trees.filter((t) => t.reservedWorkdayId === null);
        if (fresh.length > 0) {
          const day = dayIn(w.startsAt, (await nurserySettings(tx)).timeZone);
          await tx.getRepository(Tree).update(fresh.map((t) => t.id), { reservedWorkdayId: workdayId });
          const at = deps.clock();
          await tx.getRepository(TreeEvent).insert(fresh.map((t) => ({ treeId: t.id, kind: 'reserve' as const, at, byId: userId, note: `Reserved for "${w.title}" on ${day}` })));
        }
        return reservedFor(tx, workdayId);
      });
    },

    async release(workdayId: string, treeId: string, userId: string): Promise<void> {
      await deps.db.transaction(async (tx) => {
        const w = await workday(tx, workdayId);
        const [tree] = await lockTrees(tx, [treeId]);
        if (!tree || tree.reservedWorkdayId !== w.id) throw new NotFoundError('Reservation');
        await tx.getRepository(Tree).update({ id: treeId }, { reservedWorkdayId: null });
        await tx.getRepository(TreeEvent).insert({ treeId, kind: 'reserve', at: deps.clock(), byId: userId, note: `Reservation for "${w.title}" released` });
      });
    },
  };
}
export type TreeReservationService = ReturnType<typeof createTreeReservationService>;
