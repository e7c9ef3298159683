import { In, type DataSource, type EntityManager } from 'typeorm';
import { TreeStage, type BulkMoveBody, type MeasurementRoundBody, type TreeRow } from '../../shared/schemas/nursery.schema.js';
import { Tank } from '../db/entities/tank.entity.js';
import { TreeEvent } from '../db/entities/tree-event.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { Workday } from '../db/entities/workday.entity.js';
import { NotFoundError, ValidationError } from '../errors.js';
import { dayIn, nurserySettings } from './nursery-context.js';
import { lockTrees, measuredAt, recordMeasurements, requireAllFound, treeRows } from './tree-history.js';

/** Stages a tree has left the nursery in: it no longer stands in a tank. */
const OUT_OF_NURSERY: readonly TreeStage[] = ['planted', 'alive', 'lost'];

/**
 * Why a tree may not go from `from` to `to` (null when it may): stages only move forward, any
 * stage may end `lost`, and only a planted tree can be recorded `alive`.
 */
export function stageMoveProblem(from: TreeStage, to: TreeStage): string | null {
  if (from === to) return null;
  if (from === 'lost') return 'is lost';
  if (to === 'lost') return null;
  if (to === 'alive' && from !== 'planted') return `is ${from}; only planted trees can be recorded alive`;
  if (TreeStage.options.indexOf(to) < TreeStage.options.indexOf(from)) return `is ${from}; stages only move forward (or to lost)`;
  return null;
}

type Change = Partial<Pick<Tree, 'stage' | 'tankId' | 'reservedWorkdayId' | 'siteId' | 'plantedOn'>>;

/** Bulk actions on many trees at once, each all or nothing. */
export function createTreeBulkService(deps: { db: DataSource; clock: () => Date }) {
  async function checkTank(tx: EntityManager, tankId: string | null | undefined): Promise<void> {
    if (tankId && !(await tx.getRepository(Tank).existsBy({ id: tankId }))) throw new ValidationError('Unknown tank', { tankId: ['is not a tank'] });
  }

  function refuseStuck(trees: Tree[], body: BulkMoveBody): void {
    const problems = trees.flatMap((t) => {
      const stage = body.stage ?? t.stage;
      const problem = body.stage ? stageMoveProblem(t.stage, body.stage) : null;
      if (problem) return [`${t.tag} ${problem}`];
      if (body.tankId && OUT_OF_NURSERY.includes(stage)) return [`${t.tag} is ${stage} and cannot stand in a tank`];
      return [];
    });
    if (problems.length > 0) {
      throw new ValidationError(`${problems.length} of the trees cannot move; nothing was changed`, { treeIds: problems });
    }
  }

  async function workdaySites(tx: EntityManager, trees: Tree[]): Promise<Map<string, string>> {
    const ids = [...new Set(trees.flatMap((t) => (t.reservedWorkdayId ? [t.reservedWorkdayId] : [])))];
    const days = ids.length ? await tx.getRepository(Workday).find({ where: { id: In(ids) }, select: { id: true, siteId: true } }) : [];
    return new Map(days.map((w) => [w.id, w.siteId]));
  }

  return {
    /** Moves trees to a stage and/or tank; one history entry per tree per change. */
    async move(body: BulkMoveBody, userId: string): Promise<{ changed: number; trees: TreeRow[] }> {
      return deps.db.transaction(async (tx) => {
        const trees = await lockTrees(tx, body.treeIds);
        requireAllFound(body.treeIds, trees, 'treeIds');
        await checkTank(tx, body.tankId);
        refuseStuck(trees, body);
        const at = deps.clock();
        const today = dayIn(at, (await nurserySettings(tx)).timeZone);
        const sites = await workdaySites(tx, trees);
        const events: Partial<TreeEvent>[] = [];
        const base = (t: Tree) => ({ treeId: t.id, at, byId: userId, note: body.note ?? '' });
        for (const t of trees) {
          const change: Change = {};
          const stage = body.stage ?? t.stage;
          if (stage !== t.stage) {
            change.stage = stage;
            const released = stage === 'lost' && t.reservedWorkdayId !== null;
            if (released) change.reservedWorkdayId = null;
            if (stage === 'planted') Object.assign(change, { plantedOn: today, siteId: t.siteId ?? sites.get(t.reservedWorkdayId ?? '') ?? null });
            events.push({ ...base(t), kind: 'stage', fromStage: t.stage, toStage: stage, ...(released && { note: [body.note, 'reservation released'].filter(Boolean).join('; ') }) });
          }
          const tankId = OUT_OF_NURSERY.includes(stage) ? null : body.tankId === undefined ? t.tankId : body.tankId;
          if (tankId !== t.tankId) {
            change.tankId = tankId;
            events.push({ ...base(t), kind: 'move', tankId });
          }
          if (Object.keys(change).length > 0) await tx.getRepository(Tree).update({ id: t.id }, change);
        }
        for (let i = 0; i < events.length; i += 1000) await tx.getRepository(TreeEvent).insert(events.slice(i, i + 1000));
        const changed = new Set(events.map((e) => e.treeId)).size;
        return { changed, trees: await treeRows(tx, body.treeIds) };
      });
    },

    /** One measurement for each listed tree; every tree must stand in the tank. */
    async measurementRound(tankId: string, body: MeasurementRoundBody, userId: string): Promise<{ recorded: number; trees: TreeRow[] }> {
      return deps.db.transaction(async (tx) => {
        const tank = await tx.getRepository(Tank).findOneBy({ id: tankId });
        if (!tank) throw new NotFoundError('Tank');
        const ids = body.measurements.map((m) => m.treeId);
        const trees = await lockTrees(tx, ids);
        requireAllFound(ids, trees, 'measurements');
        const elsewhere = trees.filter((t) => t.tankId !== tankId);
        if (elsewhere.length > 0) {
          throw new ValidationError(`${elsewhere.length} of the trees are not in ${tank.name}; nothing was recorded`, { measurements: elsewhere.map((t) => `${t.tag} is not in ${tank.name}`) });
        }
        const entries = body.measurements.map(({ treeId, ...values }) => ({ treeId, values }));
        await recordMeasurements(tx, entries, measuredAt(body.at, deps.clock()), userId);
        return { recorded: entries.length, trees: await treeRows(tx, ids) };
      });
    },
  };
}
export type TreeBulkService = ReturnType<typeof createTreeBulkService>;
