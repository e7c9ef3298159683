/** Printed tag numbers (T-0001…) and batch codes (B-0001…), handed out without gaps or clashes. */
import type { EntityManager } from 'typeorm';

const pad = (n: number) => String(n).padStart(4, '0');
export const treeTag = (n: number) => `T-${pad(n)}`;
export const batchCode = (n: number) => `B-${pad(n)}`;

/**
 * Locks the tree and batch tables against other writers of new rows (SHARE ROW EXCLUSIVE
 * conflicts with itself, so concurrent batches queue here; readers are not blocked) and returns
 * the next tag and batch numbers: 1 + the largest numeric suffix in use. Always lock in this
 * order (tree, then collection_batch) so two transactions cannot deadlock.
 */
export async function lockNextNumbers(tx: EntityManager): Promise<{ tree: number; batch: number }> {
  await tx.query('LOCK TABLE tree IN SHARE ROW EXCLUSIVE MODE');
  await tx.query('LOCK TABLE collection_batch IN SHARE ROW EXCLUSIVE MODE');
  const rows: { tree: number | string; batch: number | string }[] = await tx.query(
    `SELECT (SELECT COALESCE(MAX(CAST(substring(tag FROM '^T-([0-9]{1,9})$') AS integer)), 0) FROM tree) AS tree,
            (SELECT COALESCE(MAX(CAST(substring(code FROM '^B-([0-9]{1,9})$') AS integer)), 0) FROM collection_batch) AS batch`,
  );
  return { tree: Number(rows[0]?.tree ?? 0) + 1, batch: Number(rows[0]?.batch ?? 0) + 1 };
}
