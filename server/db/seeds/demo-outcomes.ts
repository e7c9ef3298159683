/**
 * Demo outcomes at Heron Reach: two planted cohorts with their planting records and monitoring,
 * so reports, the survival chart and "monitoring due" have something to show. An older "winter
 * cohort" (a completed planting workday about seven months ago with an invented crew, checked
 * at 1, 3 and 6 months: one lost early, one missing then found) and the completed spring planting day
 * from the demo workdays (or one made here ~30 days ago), checked a few days ago. Trees come
 * from a demo batch of their own with fresh tags. Idempotent on its own: skipped once that
 * batch exists. Every person, tree and figure is invented.
 */
import { Like, type DataSource, type EntityManager } from 'typeorm';
import type { TreeCondition } from '../../../shared/schemas/outcomes.schema.js';
import { addDays, addMonths } from '../../domain/outcomes/milestones.js';
import { localDate } from '../../domain/tide/time-zone.js';
import { batchCode, lockNextNumbers, treeTag } from '../../services/tree-tags.js';
import { CollectionBatch } from '../entities/collection-batch.entity.js';
import { MonitoringVisit } from '../entities/monitoring-visit.entity.js';
import { Signup } from '../entities/signup.entity.js';
import { Site } from '../entities/site.entity.js';
import { TreeCheck } from '../entities/tree-check.entity.js';
import { TreeEvent } from '../entities/tree-event.entity.js';
import { Tree } from '../entities/tree.entity.js';
import { User } from '../entities/user.entity.js';
import { Workday } from '../entities/workday.entity.js';
import { DEMO_DOMAIN } from './demo-people.js';

const DAY = 86_400_000;
export const DEMO_OUTCOMES_PLACE = 'Heron Reach wrack line, planted cohorts (demo)';
const A = 'alive', L = 'lost', M = 'missing';
/** Conditions at each visit, tree by tree (invented). */
const WINTER_VISITS: TreeCondition[][] = [
  [A, A, A, A, A, A, A, A, A, L, A, A],
  [A, A, A, A, M, A, A, A, A, L, A, L],
  [A, A, A, A, A, A, A, L, A, L, A, L],
];
const SPRING_VISIT: TreeCondition[] = [A, A, A, L, A, A, M, A];

interface Cohort { workday: Workday; plantedOn: string; trees: Tree[] }

/** A completed planting day with an invented crew checked in and out (the hours reports count). */
async function winterWorkday(tx: EntityManager, site: Site, now: number): Promise<Workday> {
  const day = localDate(now - 210 * DAY, site.timeZone);
  const w = await tx.getRepository(Workday).save(tx.getRepository(Workday).create({
    title: 'Planting at Heron Reach (winter cohort)', kind: 'planting', siteId: site.id, status: 'completed', capacity: 8,
    startsAt: new Date(`${day}T14:00:00Z`), endsAt: new Date(`${day}T18:00:00Z`), publishedAt: new Date(now - 230 * DAY),
    description: 'Demo workday. Twelve potted red mangroves set along the marked line on the flat.',
  }));
  const people = (await tx.getRepository(User).find({ where: { role: 'volunteer', email: Like(`%@${DEMO_DOMAIN}`) }, order: { name: 'DESC' }, take: 6 }));
  await tx.getRepository(Signup).save(people.map((u, i) => tx.getRepository(Signup).create({
    workdayId: w.id, userId: u.id, role: i === 0 ? 'shore' : 'planter', status: 'confirmed', queuedAt: new Date(now - 225 * DAY),
    waiverVersion: 1, waiverSignedName: u.name, waiverSignedAt: new Date(now - 225 * DAY),
    checkedInAt: new Date(w.startsAt.getTime() - 10 * 60_000), checkedOutAt: new Date(w.endsAt.getTime() + i * 5 * 60_000),
  })));
  return w;
}

/** The demo workdays' completed spring planting at the site, or one made here 30 days ago. */
async function springWorkday(tx: EntityManager, site: Site, now: number): Promise<Workday> {
  const found = await tx.getRepository(Workday).findOne({ where: { siteId: site.id, kind: 'planting', status: 'completed', title: Like('%(spring cohort)') }, order: { startsAt: 'DESC' } });
  if (found) return found;
  const day = localDate(now - 30 * DAY, site.timeZone);
  return tx.getRepository(Workday).save(tx.getRepository(Workday).create({
    title: `Planting at ${site.name} (spring cohort)`, kind: 'planting', siteId: site.id, status: 'completed', capacity: 12,
    startsAt: new Date(`${day}T13:00:00Z`), endsAt: new Date(`${day}T17:00:00Z`), publishedAt: new Date(now - 45 * DAY), description: 'Demo workday.',
  }));
}

/** Trees of the demo batch planted by the workday, with their nursery history. */
async function plant(tx: EntityManager, site: Site, workday: Workday, batch: CollectionBatch, firstTag: number, count: number, byId: string | null): Promise<Cohort> {
  const plantedOn = localDate(workday.startsAt.getTime(), site.timeZone);
  const trees = await tx.getRepository(Tree).save(Array.from({ length: count }, (_, i) => tx.getRepository(Tree).create({
    tag: treeTag(firstTag + i), batchId: batch.id, stage: 'planted', heightCm: 62 + ((i * 7) % 25), leafCount: 8 + (i % 5), potHeightCm: 30, potMassKg: 27,
    siteId: site.id, plantedOn, plantedBedElevationM: Math.round((site.bedElevationM - 0.03 + (i % 4) * 0.02) * 100) / 100, plantedWorkdayId: workday.id,
  })));
  const at = (date: string) => new Date(`${date}T16:00:00Z`);
  await tx.getRepository(TreeEvent).insert(trees.flatMap((t) => [
    { treeId: t.id, kind: 'stage' as const, at: at(batch.collectedOn), fromStage: null, toStage: 'collected' as const, note: `Entered the ledger with batch ${batch.code}` },
    { treeId: t.id, kind: 'stage' as const, at: at(addDays(plantedOn, -120)), fromStage: 'tube' as const, toStage: 'potted' as const, note: 'Demo' },
    { treeId: t.id, kind: 'stage' as const, at: workday.endsAt, byId, fromStage: 'ready' as const, toStage: 'planted' as const, note: `Planted at ${site.name} on ${plantedOn} ("${workday.title}")` },
  ]));
  return { workday, plantedOn, trees };
}

/** A visit with one check per tree; each tree's stage follows its latest check that saw it. */
async function visit(tx: EntityManager, site: Site, cohort: Cohort, visitedOn: string, conditions: TreeCondition[], byId: string | null): Promise<void> {
  const v = await tx.getRepository(MonitoringVisit).save({ siteId: site.id, visitedOn, createdById: byId, notes: 'Demo visit. Checked tree by tree from the tags.' });
  await tx.getRepository(TreeCheck).insert(cohort.trees.map((t, i) => ({
    visitId: v.id, treeId: t.id, condition: conditions[i]!, heightCm: conditions[i] === 'alive' ? t.heightCm! + 4 : null, notes: conditions[i] === 'lost' ? 'Pot found tipped over, no leaves (demo)' : '',
  })));
  for (const [i, t] of cohort.trees.entries()) {
    const c = conditions[i]!;
    const stage = c === 'missing' ? t.stage : c === 'alive' ? 'alive' : 'lost';
    if (stage === t.stage) continue;
    await tx.getRepository(Tree).update({ id: t.id }, { stage });
    await tx.getRepository(TreeEvent).insert({ treeId: t.id, kind: 'stage', at: new Date(`${visitedOn}T17:00:00Z`), byId, fromStage: t.stage, toStage: stage, note: `Monitoring visit on ${visitedOn}` });
    t.stage = stage;
  }
}

export async function seedDemoOutcomes(deps: { db: DataSource; now: Date }): Promise<number> {
  const site = await deps.db.getRepository(Site).findOneBy({ name: 'Heron Reach' });
  if (!site || (await deps.db.getRepository(CollectionBatch).existsBy({ place: DEMO_OUTCOMES_PLACE }))) return 0;
  const now = deps.now.getTime();
  const coordinator = await deps.db.getRepository(User).findOneBy({ email: `coordinator@${DEMO_DOMAIN}` });
  const byId = coordinator?.id ?? null;
  return deps.db.transaction(async (tx) => {
    const next = await lockNextNumbers(tx);
    const batch = await tx.getRepository(CollectionBatch).save({
      code: batchCode(next.batch), collectedOn: localDate(now - 560 * DAY, site.timeZone), place: DEMO_OUTCOMES_PLACE, collector: 'Tamsin Okafor', count: 20, notes: 'Demo batch.',
    });
    const winter = await plant(tx, site, await winterWorkday(tx, site, now), batch, next.tree, 12, byId);
    const spring = await plant(tx, site, await springWorkday(tx, site, now), batch, next.tree + 12, 8, byId);
    await visit(tx, site, winter, addDays(addMonths(winter.plantedOn, 1), 2), WINTER_VISITS[0]!, byId);
    await visit(tx, site, winter, addDays(addMonths(winter.plantedOn, 3), -3), WINTER_VISITS[1]!, byId);
    await visit(tx, site, winter, addDays(addMonths(winter.plantedOn, 6), 1), WINTER_VISITS[2]!, byId);
    await visit(tx, site, spring, localDate(now - 3 * DAY, site.timeZone), SPRING_VISIT, byId);
    return winter.trees.length + spring.trees.length;
  });
}
