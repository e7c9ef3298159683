/**
 * The demo nursery: invented batches, five tanks with two months of salinity readings, and about
 * 150 trees spread over every stage with a few measurements each. Tank C reached Heron Reach's
 * salinity six weeks ago, so its tall `ready` trees pass every readiness rule there; a few short
 * late starters in it still fail the crown clearance, and Tank D is only part-way through its
 * hold. Seeded once: skipped when any tree exists.
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

/** Heron Reach's salinity (demo-sites.ts), the level both brining tanks are brought to. */
const HERON_PPT = 24;
/** Days before the seed on which each tank was read: every 4 days over about two months. */
export const DEMO_READING_DAYS = [58, 54, 50, 46, 42, 38, 34, 30, 26, 22, 18, 14, 10, 6, 2];
/** Refractometer wobble (±0.5 ppt) once a tank holds, so the readings look taken by hand. */
const wobble = (d: number) => [0, -0.5, 0.5][d % 3]!;
/**
 * Brining: up about 4 ppt every 4 days from the grow-out water's 8 ppt (TRADE.md §4, common
 * practice: about +5 ppt every 4–5 days), then held. Tank C reached 24 ppt 42 days before the
 * seed (held 42 days, the rule asks 21); Tank D reached 23 ppt 10 days before (held 10 days).
 */
const stepUp = (startDay: number) => (d: number) => (d > startDay ? 8 : Math.min(HERON_PPT, 8 + 4 * Math.floor((startDay - d) / 4)) + (d <= startDay - 16 ? wobble(d) : 0));

/** The demo tanks by name, with their salinity `d` days before the seed. */
export const DEMO_TANKS: { name: string; volumeLitres: number; toHeron?: boolean; notes: string; ppt: (d: number) => number }[] = [
  { name: 'Tank A (tubes)', volumeLitres: 380, notes: 'Demo tank. Brackish water with fertilizer for the tube stage.', ppt: () => 4 },
  { name: 'Tank B (grow-out)', volumeLitres: 570, notes: 'Demo tank.', ppt: () => 8 },
  { name: 'Tank C (brining)', volumeLitres: 300, toHeron: true, notes: 'Demo tank, held at Heron Reach salinity.', ppt: stepUp(58) },
  { name: 'Tank D (brining)', volumeLitres: 300, toHeron: true, notes: 'Demo tank, being brought up to Heron Reach.', ppt: (d) => (d === 10 ? 23 : stepUp(26)(d)) },
  { name: 'Bucket 7', volumeLitres: 18.93, notes: 'Demo: a 5-gallon bucket.', ppt: () => 12 },
];

/** The tank's readings, as rows to insert. */
export function demoReadings(tankId: string, ppt: (d: number) => number, now: number) {
  return DEMO_READING_DAYS.map((d) => ({ tankId, takenAt: new Date(now - d * DAY), method: 'refractometer' as const, salinityPpt: ppt(d) }));
}

/** The last brining trees (tags 106–110) stand in Tank C but were potted late: too short for the crown rule. */
export const SHORT_BRINING_FROM = 106;
/** 12–18 cm: with a 30 cm pot on Heron Reach's 0.3 m bed their tops (0.72–0.78 m) stay under MHHW (about 0.84 m). */
export const shortHeightCm = (n: number) => 12 + (n % 4) * 2;

async function seedTanks(tx: EntityManager, now: number): Promise<Tank[]> {
  const heron = await tx.getRepository(Site).findOneBy({ name: 'Heron Reach' });
  const tanks = await tx.getRepository(Tank).save(DEMO_TANKS.map((t) => ({ name: t.name, volumeLitres: t.volumeLitres, notes: t.notes, targetSiteId: t.toHeron ? (heron?.id ?? null) : null })));
  await tx.getRepository(SalinityReading).save(DEMO_TANKS.flatMap((t, i) => demoReadings(tanks[i]!.id, t.ppt, now)));
  return tanks;
}

function tankFor(stage: TreeStage, n: number, tanks: Tank[]): string | null {
  if (stage === 'tube') return tanks[0]!.id;
  if (stage === 'potted') return tanks[1]!.id;
  if (stage === 'ready' || (stage === 'brining' && n >= SHORT_BRINING_FROM)) return tanks[2]!.id;
  if (stage === 'brining') return tanks[3]!.id;
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
        const height = young ? 8 + (n % 12) : stage === 'brining' && n >= SHORT_BRINING_FROM ? shortHeightCm(n) : 30 + (n % 25);
        const tree = await tx.getRepository(Tree).save({
          tag: treeTag(n), batchId: (young ? batches[1] : batches[0])!.id, stage, tankId: tankFor(stage, n, tanks),
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
