/**
 * Hand-built records for the report tests (invented people and places), in a database of their
 * own so other test files cannot add to the totals. Expected figures are worked in the tests.
 */
import type { DataSource } from 'typeorm';
import { Campaign } from '../../server/db/entities/campaign.entity.js';
import { CollectionBatch } from '../../server/db/entities/collection-batch.entity.js';
import { Donation } from '../../server/db/entities/donation.entity.js';
import { MonitoringVisit } from '../../server/db/entities/monitoring-visit.entity.js';
import { TreeCheck } from '../../server/db/entities/tree-check.entity.js';
import { TreeEvent } from '../../server/db/entities/tree-event.entity.js';
import type { Tree } from '../../server/db/entities/tree.entity.js';
import { buildSignup } from '../factories/signup.factory.js';
import { buildSite } from '../factories/site.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { buildUser } from '../factories/user.factory.js';
import { buildWorkday } from '../factories/workday.factory.js';

const at = (iso: string) => new Date(iso);

async function crew(db: DataSource, workdayId: string, people: { userId: string; from?: string; to?: string; minutesOverride?: number; noShow?: boolean }[]) {
  for (const p of people) {
    await buildSignup(db, {
      workdayId, userId: p.userId, checkedInAt: p.from ? at(p.from) : null, checkedOutAt: p.to ? at(p.to) : null,
      minutesOverride: p.minutesOverride ?? null, noShow: p.noShow ?? false,
    });
  }
}

export async function buildReportRecords(db: DataSource) {
  const [ada, ben, cy] = await Promise.all(['Ada Marsh', 'Ben Creek', 'Cy Dune'].map((name) => buildUser(db, { name })));
  const heron = await buildSite(db, { name: 'Heron Test Reach', bedElevationM: 0.3, stationId: 'noaa/8726738' });
  const salt = await buildSite(db, { name: 'Salt Test Point', bedElevationM: 0.2, stationId: 'noaa/8726520' });

  // Hours: 14 March at Heron (Ada 270 min, Ben 240, Cy no-show); 18 April at Salt (Ada 180, corrected);
  // 10 February at Heron (Ben 120, outside the March–June range).
  const w1 = await buildWorkday(db, { siteId: heron.id, status: 'completed', startsAt: at('2026-03-14T14:00:00Z'), endsAt: at('2026-03-14T18:00:00Z') });
  await crew(db, w1.id, [{ userId: ada!.id, from: '2026-03-14T13:45:00Z', to: '2026-03-14T18:15:00Z' }, { userId: ben!.id, from: '2026-03-14T13:45:00Z', to: '2026-03-14T17:45:00Z' }, { userId: cy!.id, noShow: true }]);
  const w2 = await buildWorkday(db, { siteId: salt.id, status: 'completed', startsAt: at('2026-04-18T13:00:00Z'), endsAt: at('2026-04-18T16:00:00Z') });
  await crew(db, w2.id, [{ userId: ada!.id, minutesOverride: 180 }]);
  const w3 = await buildWorkday(db, { siteId: heron.id, status: 'completed', startsAt: at('2026-02-10T14:00:00Z'), endsAt: at('2026-02-10T16:00:00Z') });
  await crew(db, w3.id, [{ userId: ben!.id, minutesOverride: 120 }]);

  // Trees: four at Heron on 14 March (bed 0.30, 0.30, 0.35, 0.25 m), two at Salt on 18 April.
  const plant = (siteId: string, plantedOn: string, plantedBedElevationM: number, plantedWorkdayId: string, stage: Tree['stage'] = 'planted') =>
    buildTree(db, { stage, siteId, plantedOn, plantedBedElevationM, plantedWorkdayId });
  const h = await Promise.all([0.3, 0.3, 0.35, 0.25].map((e, i) => plant(heron.id, '2026-03-14', e, w1.id, (['alive', 'alive', 'lost', 'planted'] as const)[i])));
  const s = await Promise.all([0.2, 0.2].map((e, i) => plant(salt.id, '2026-04-18', e, w2.id, i === 0 ? 'alive' : 'planted')));
  // Checks: Heron on 12 April (alive, alive, lost, missing); Salt on 20 May (first tree alive).
  const v1 = await db.getRepository(MonitoringVisit).save({ siteId: heron.id, visitedOn: '2026-04-12' });
  await db.getRepository(TreeCheck).insert((['alive', 'alive', 'lost', 'missing'] as const).map((condition, i) => ({ visitId: v1.id, treeId: h[i]!.id, condition })));
  const v2 = await db.getRepository(MonitoringVisit).save({ siteId: salt.id, visitedOn: '2026-05-20' });
  await db.getRepository(TreeCheck).insert({ visitId: v2.id, treeId: s[0]!.id, condition: 'alive' });

  // Nursery: three trees collected 5 March; one of them potted 2 April (New York time).
  const batch = await db.getRepository(CollectionBatch).save({ code: 'B-REPORT', collectedOn: '2026-03-05', place: 'Test wrack line', count: 3 });
  const young = await Promise.all([1, 2, 3].map(() => buildTree(db, { stage: 'tube', batchId: batch.id })));
  await db.getRepository(TreeEvent).insert({ treeId: young[0]!.id, kind: 'stage', at: at('2026-04-02T15:00:00Z'), fromStage: 'tube', toStage: 'potted' });

  // Gifts: 25.00 (1 tree) 20 March and 50.00 (2 trees) 2 May to the campaign; 30.00 refunded;
  // 10.00 with no campaign 1 June; 70.00 on 2 July (outside the range).
  const campaign = await db.getRepository(Campaign).save({ name: 'Spring shoreline', priceCents: 2500, goalTrees: 100, startsOn: '2026-03-01' });
  const gift = (n: number, amountCents: number, treeCount: number, paidAt: string, campaignId: string | null, status: 'paid' | 'refunded' = 'paid') =>
    db.getRepository(Donation).save({ checkoutSessionId: `cs_report_${n}`, amountCents, giftCents: amountCents, treeCount, paidAt: at(paidAt), campaignId, status, donorName: 'A Donor', donorEmail: 'donor@test.ebbroot.test' });
  await gift(1, 2500, 1, '2026-03-20T15:00:00Z', campaign.id);
  await gift(2, 5000, 2, '2026-05-02T15:00:00Z', campaign.id);
  await gift(3, 3000, 1, '2026-04-01T15:00:00Z', campaign.id, 'refunded');
  await gift(4, 1000, 0, '2026-06-01T15:00:00Z', null);
  await gift(5, 7000, 3, '2026-07-02T15:00:00Z', campaign.id);
  return { heron, salt, campaign, people: { ada: ada!, ben: ben! } };
}
