/**
 * The demo nursery: invented batches, four tanks with a month of salinity readings (one being
 * brought up toward Heron Reach's salinity), and about 150 trees spread over every stage with a
 * few measurements each. Seeded once: skipped when any tree exists.
 */
import type { DataSource, EntityManager } from 'typeorm';
import type { TreeStage } from '../../../shared/schemas/nursery.schema.js';
import { treeTag, batchCode } from '../../services/tree-tags.js';
import { CollectionBatch } from '../entities/collection-batch.entity.js';
import { SalinityReading } from '../entities/salinity-reading.entity.js';
import { Site } from '../entities/site.entity.js';
import { Tank } from '../entities/tank.entity.js';
import { TreeEvent } from '../entities/tree-event.entity.js';
import { Tree } from '../entities/tree.entity.js';

const DAY = 86_400_000;
const isoDate = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/** Stage mix of the 150 demo trees, in tag order. */
const STAGES: [TreeStage, number][] = [['collected', 20], ['tube', 35], ['potted', 30], ['brining', 25], ['ready', 15], ['planted', 10], ['alive', 10], ['lost', 5]];

async function seedTanks(tx: EntityManager, now: number): Promise<Tank[]> {
  const heron = await tx.getRepository(Site).findOneBy({ name: 'Heron Reach' });
  const tanks = await tx.getRepository(Tank).save([
    { name: 'Tank A (tubes)', volumeLitres: 380, notes: 'Demo tank. Brackish water with fertilizer for the tube stage.' },
    { name: 'Tank B (grow-out)', volumeLitres: 570, notes: 'Demo tank.' },
    { name: 'Tank C (brining)', volumeLitres: 300, targetSiteId: heron?.id ?? null, notes: 'Demo tank, being brought up to Heron Reach.' },
    { name: 'Bucket 7', volumeLitres: 18.93, notes: 'Demo: a 5-gallon bucket.' },
  ]);
  // Tank C steps up about 4 ppt every 4 days; the others hold steady.
  const series: [Tank, (day: number) => number][] = [[tanks[0]!, () => 4], [tanks[1]!, () => 8], [tanks[2]!, (d) => Math.min(24, 8 + 4 * Math.floor((30 - d) / 4))], [tanks[3]!, () => 12]];
  const readings = series.flatMap(([tank, ppt]) => [30, 26, 22, 18, 14, 10, 6, 2].map((d) => ({
    tankId: tank.id, takenAt: new Date(now - d * DAY), method: 'refractometer' as const, salinityPpt: ppt(d),
  })));
  await tx.getRepository(SalinityReading).save(readings);
  return tanks;
}

function tankFor(stage: TreeStage, tanks: Tank[]): string | null {
  if (stage === 'tube') return tanks[0]!.id;
  if (stage === 'potted') return tanks[1]!.id;
  if (stage === 'brining' || stage === 'ready') return tanks[2]!.id;
  return null;
}

export async function seedDemoNursery(deps: { db: DataSource; now: Date }): Promise<number> {
  if ((await deps.db.getRepository(Tree).count()) > 0) return 0;
  const now = deps.now.getTime();
  return deps.db.transaction(async (tx) => {
    const tanks = await seedTanks(tx, now);
    const batches = await tx.getRepository(CollectionBatch).save([
      { code: batchCode(1), collectedOn: isoDate(now - 330 * DAY), place: 'Wrack line north of Heron Reach (demo)', collector: 'Tamsin Okafor', count: 90, notes: 'Demo batch.' },
      { code: batchCode(2), collectedOn: isoDate(now - 90 * DAY), place: 'Saltmarsh Point shoreline (demo)', collector: 'Leo Brandt', count: 60, notes: 'Demo batch.' },
    ]);
    const heron = await tx.getRepository(Site).findOneBy({ name: 'Heron Reach' });
    let n = 0;
    for (const [stage, count] of STAGES) {
      for (let i = 0; i < count; i++) {
        n += 1;
        const young = stage === 'collected' || stage === 'tube';
        const height = young ? 8 + (n % 12) : 30 + (n % 25);
        const tree = await tx.getRepository(Tree).save({
          tag: treeTag(n), batchId: (young ? batches[1] : batches[0])!.id, stage, tankId: tankFor(stage, tanks),
          heightCm: stage === 'collected' ? null : height, leafCount: young ? 2 + (n % 3) : 6 + (n % 8),
          potHeightCm: young ? null : 30, potMassKg: young ? null : 27, healthy: n % 17 !== 0,
          siteId: ['planted', 'alive'].includes(stage) ? (heron?.id ?? null) : null,
          plantedOn: ['planted', 'alive'].includes(stage) ? isoDate(now - 60 * DAY) : null,
        });
        if (stage !== 'collected') {
          await tx.getRepository(TreeEvent).save([60, 30, 5].map((d, k) => ({
            treeId: tree.id, kind: 'measurement' as const, at: new Date(now - d * DAY), heightCm: Math.max(5, height - (2 - k) * 4), leafCount: tree.leafCount,
          })));
        }
      }
    }
    return n;
  });
}
