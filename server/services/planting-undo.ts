/** Where a planted tree stood before its planting was recorded, read from its history. */
import type { EntityManager } from 'typeorm';
import type { TreeStage } from '../../shared/schemas/nursery.schema.js';
import { Tank } from '../db/entities/tank.entity.js';
import { TreeEvent } from '../db/entities/tree-event.entity.js';
import type { Tree } from '../db/entities/tree.entity.js';

const OUT: readonly TreeStage[] = ['planted', 'alive', 'lost'];

/**
 * The stage the tree left for `planted` (its latest such change) and the tank it left, which the
 * planting record keeps on that stage event (`tankId`); the tank only if it still exists. A tree
 * with no such history goes back to `ready`, outside any tank.
 */
export async function previousPlace(tx: EntityManager, tree: Tree): Promise<{ stage: TreeStage; tankId: string | null }> {
  const planting = await tx.getRepository(TreeEvent).findOne({ where: { treeId: tree.id, kind: 'stage', toStage: 'planted' }, order: { at: 'DESC', createdAt: 'DESC' } });
  const stage = planting?.fromStage && !OUT.includes(planting.fromStage) ? planting.fromStage : 'ready';
  const tankId = planting?.tankId && (await tx.getRepository(Tank).existsBy({ id: planting.tankId })) ? planting.tankId : null;
  return { stage, tankId };
}
