/** Writing a tree's history: measurements (one or a whole round) and loading rows for answers. */
import { In, type EntityManager } from 'typeorm';
import type { TreeRow } from '../../shared/schemas/nursery.schema.js';
import { TreeEvent } from '../db/entities/tree-event.entity.js';
import { Tree } from '../db/entities/tree.entity.js';
import { ValidationError } from '../errors.js';
import { toTreeRow } from './tree-view.js';

export interface MeasuredValues {
  heightCm?: number;
  leafCount?: number;
  healthy?: boolean;
  note?: string;
  photoId?: string;
}

/** Future measurements are refused; a few minutes' lead covers clocks on phones that run fast. */
export function measuredAt(at: string | undefined, now: Date): Date {
  if (at === undefined) return now;
  const when = new Date(at);
  if (when.getTime() > now.getTime() + 5 * 60_000) throw new ValidationError('A measurement cannot be in the future', { at: ['cannot be in the future'] });
  return when;
}

/**
 * One measurement event per tree. The tree's latest values change only when the measurement is
 * at least as recent as its latest one, so back-filling an old paper record keeps today's values.
 */
export async function recordMeasurements(tx: EntityManager, entries: { treeId: string; values: MeasuredValues }[], at: Date, byId: string): Promise<void> {
  if (entries.length === 0) return;
  const latest: { tree_id: string; at: Date }[] = await tx
    .getRepository(TreeEvent)
    .createQueryBuilder('e')
    .select('e.tree_id', 'tree_id')
    .addSelect('MAX(e.at)', 'at')
    .where('e.tree_id IN (:...ids)', { ids: entries.map((e) => e.treeId) })
    .andWhere("e.kind = 'measurement'")
    .groupBy('e.tree_id')
    .getRawMany();
  const latestAt = new Map(latest.map((r) => [r.tree_id, new Date(r.at).getTime()]));
  for (const { treeId, values: v } of entries) {
    if ((latestAt.get(treeId) ?? -Infinity) > at.getTime()) continue;
    const patch = { ...(v.heightCm !== undefined && { heightCm: v.heightCm }), ...(v.leafCount !== undefined && { leafCount: v.leafCount }), ...(v.healthy !== undefined && { healthy: v.healthy }) };
    if (Object.keys(patch).length > 0) await tx.getRepository(Tree).update({ id: treeId }, patch);
  }
  const events = entries.map(({ treeId, values: v }) => ({
    treeId, kind: 'measurement' as const, at, byId,
    heightCm: v.heightCm ?? null, leafCount: v.leafCount ?? null, healthy: v.healthy ?? null, note: v.note ?? '', photoId: v.photoId ?? null,
  }));
  for (let i = 0; i < events.length; i += 1000) await tx.getRepository(TreeEvent).insert(events.slice(i, i + 1000));
}

/** Trees by id, locked for the rest of the transaction (in id order, so two writers cannot deadlock). */
export async function lockTrees(tx: EntityManager, ids: readonly string[]): Promise<Tree[]> {
  return tx.getRepository(Tree).createQueryBuilder('t').where('t.id IN (:...ids)', { ids }).orderBy('t.id').setLock('pessimistic_write').getMany();
}

/** Ids in `ids` that `found` lacks, as a 400 on `field`. */
export function requireAllFound(ids: readonly string[], found: readonly { id: string }[], field: string): void {
  const have = new Set(found.map((t) => t.id));
  const missing = ids.filter((id) => !have.has(id));
  if (missing.length > 0) throw new ValidationError(`${missing.length} of the trees do not exist; nothing was changed`, { [field]: [`unknown tree ids: ${missing.join(', ')}`] });
}

/** Ledger rows (with tank and batch) in tag order. */
export async function treeRows(tx: EntityManager, ids: readonly string[]): Promise<TreeRow[]> {
  if (ids.length === 0) return [];
  const trees = await tx.getRepository(Tree).find({ where: { id: In([...ids]) }, relations: { tank: true, batch: true }, order: { tag: 'ASC' } });
  return trees.map(toTreeRow);
}
