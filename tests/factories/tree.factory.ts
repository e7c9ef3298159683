import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { TreeEvent } from '../../server/db/entities/tree-event.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';

/**
 * A tree with a unique tag outside the T-0001… series (so factories never move the next API tag),
 * potted by default; hand-built values only.
 */
export async function buildTree(db: DataSource, overrides: Partial<Tree> = {}): Promise<Tree> {
  const repo = db.getRepository(Tree);
  return repo.save(repo.create({ tag: `F-${randomBytes(5).toString('hex')}`, stage: 'potted', healthy: true, ...overrides }));
}

/** A height measurement in a tree's history. */
export async function buildMeasurement(db: DataSource, treeId: string, heightCm: number, at: Date): Promise<void> {
  await db.getRepository(TreeEvent).insert({ treeId, kind: 'measurement', at, heightCm });
}
