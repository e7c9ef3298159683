/**
 * Which nursery trees a gift sponsors. Ready trees first, then the next to become ready
 * (ready > brining > potted > tube > collected; healthy before unhealthy; oldest first); never a
 * planted or lost tree, never one another gift holds. Rows are claimed `FOR UPDATE SKIP LOCKED`,
 * so two gifts recorded at the same moment never take the same tree — each takes the next free one.
 */
import type { EntityManager } from 'typeorm';
import { Tree } from '../db/entities/tree.entity.js';

/** Nursery stages in the order gifts take them. */
export const SPONSOR_STAGE_ORDER = ['ready', 'brining', 'potted', 'tube', 'collected'] as const;

const stageRank = `CASE t.stage ${SPONSOR_STAGE_ORDER.map((s, i) => `WHEN '${s}' THEN ${i}`).join(' ')} END`;

/** Links up to `count` free nursery trees to the donation; returns their tags in order. */
export async function linkTrees(tx: EntityManager, donationId: string, count: number): Promise<string[]> {
  if (count <= 0) return [];
  const rows: { id: string; tag: string }[] = await tx.query(
    `SELECT t.id, t.tag FROM tree t
      WHERE t.sponsor_donation_id IS NULL AND t.stage = ANY($1)
      ORDER BY ${stageRank}, t.healthy DESC, t.created_at ASC, t.tag ASC
      LIMIT $2
      FOR UPDATE SKIP LOCKED`,
    [[...SPONSOR_STAGE_ORDER], count],
  );
  if (rows.length === 0) return [];
  await tx.getRepository(Tree).createQueryBuilder().update()
    .set({ sponsorDonationId: donationId })
    .where('id IN (:...ids)', { ids: rows.map((r) => r.id) })
    .execute();
  return rows.map((r) => r.tag);
}

/** Frees a refunded gift's trees for other sponsors (the planted news flag goes with them). */
export async function releaseTrees(tx: EntityManager, donationId: string): Promise<number> {
  const result = await tx.getRepository(Tree).createQueryBuilder().update()
    .set({ sponsorDonationId: null, sponsorToldPlantedAt: null })
    .where('sponsor_donation_id = :donationId', { donationId })
    .execute();
  return result.affected ?? 0;
}

/** Tags of a donation's trees, by tag. */
export async function treeTagsOf(tx: EntityManager, donationId: string): Promise<string[]> {
  const trees = await tx.getRepository(Tree).find({ where: { sponsorDonationId: donationId }, select: { id: true, tag: true }, order: { tag: 'ASC' } });
  return trees.map((t) => t.tag);
}
