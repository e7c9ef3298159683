/**
 * Demo giving for Bayhaven Shoreline Trust: two invented campaigns (one open, one ended) and a
 * handful of invented gifts, each sponsoring nursery trees the way a real gift would (ready ones
 * first). Checkout ids start `cs_demo_` and match nothing at the payments service. Seeded once:
 * skipped when the open demo campaign exists. Runs after the nursery.
 */
import type { DataSource } from 'typeorm';
import { grossUpCents } from '../../../shared/domain/fee-cover.js';
import { linkTrees } from '../../services/sponsor-trees.js';
import { Campaign } from '../entities/campaign.entity.js';
import { Donation } from '../entities/donation.entity.js';
import { Organisation } from '../entities/organisation.entity.js';
import { DEMO_DOMAIN } from './demo-people.js';

const DAY = 86_400_000;
const isoDate = (ms: number) => new Date(ms).toISOString().slice(0, 10);
const OPEN_NAME = 'Heron Reach living shoreline (demo)';

interface DemoGift {
  donor: string;
  trees: number;
  coverFees: boolean;
  daysAgo: number;
  wall: string | null;
  dedication?: { kind: 'honour' | 'memory'; name: string };
  refunded?: boolean;
}

/** Invented donors; fee cover at the default 2.9 % + 30¢ (TRADE.md §7). */
const GIFTS: DemoGift[] = [
  { donor: 'Harriet Lowell', trees: 4, coverFees: true, daysAgo: 41, wall: 'Harriet L.' },
  { donor: 'Desmond Achebe', trees: 2, coverFees: false, daysAgo: 33, wall: '' },
  { donor: 'Pilar Esquivel', trees: 1, coverFees: true, daysAgo: 26, wall: 'The Esquivel family', dedication: { kind: 'memory', name: 'Abuela Rosa' } },
  { donor: 'Conrad Baptiste', trees: 10, coverFees: true, daysAgo: 19, wall: 'Bayside Rowing Club' },
  { donor: 'Ingrid Solberg', trees: 2, coverFees: false, daysAgo: 12, wall: null, dedication: { kind: 'honour', name: 'Marta Solberg' } },
  { donor: 'Tobias Wren', trees: 3, coverFees: true, daysAgo: 8, wall: 'Tobias W.', refunded: true },
  { donor: 'Amara Lindgren', trees: 5, coverFees: true, daysAgo: 3, wall: '' },
];

const slug = (name: string) => name.toLowerCase().replace(/[^a-z]+/g, '.');

/** Receipts need a legal name and tax id; the demo gets obviously invented ones where they are empty. */
async function fillDemoReceiptDetails(db: DataSource): Promise<void> {
  const repo = db.getRepository(Organisation);
  await repo.update({ id: 1, legalName: '' }, { legalName: 'Bayhaven Shoreline Trust, Inc. (demo)' });
  await repo.update({ id: 1, taxId: '' }, { taxId: '00-0000000' });
}

export async function seedDemoGiving(deps: { db: DataSource; now: Date }): Promise<number> {
  await fillDemoReceiptDetails(deps.db);
  if (await deps.db.getRepository(Campaign).existsBy({ name: OPEN_NAME })) return 0;
  const now = deps.now.getTime();
  return deps.db.transaction(async (tx) => {
    const [open] = await tx.getRepository(Campaign).save([
      {
        name: OPEN_NAME,
        story: 'Storms have stripped much of the fringe of red mangroves along Heron Reach.\n\nEvery tree you sponsor is grown from a local propagule in our volunteer nursery, acclimated to the site\'s salinity and planted out in a heavy pot on a daylight low tide.\n\n(Demo campaign: an invented appeal.)',
        priceCents: 2500,
        goalTrees: 150,
        startsOn: isoDate(now - 60 * DAY),
        endsOn: isoDate(now + 120 * DAY),
        active: true,
      },
      {
        name: 'Saltmarsh Point memorial grove (demo)',
        story: 'A grove of red mangroves at Saltmarsh Point, each tree given in someone\'s name. (Demo campaign, ended.)',
        priceCents: 4000,
        goalTrees: 40,
        startsOn: isoDate(now - 240 * DAY),
        endsOn: isoDate(now - 90 * DAY),
        active: true,
      },
    ]);
    const org = await tx.getRepository(Organisation).findOneByOrFail({ id: 1 });
    const rate = org.givingRules;
    for (const [i, g] of GIFTS.entries()) {
      const giftCents = g.trees * open!.priceCents;
      // The same gross-up as checkout, so the demo's fee covers are what a donor would pay.
      const amountCents = g.coverFees ? grossUpCents(giftCents, rate) : giftCents;
      const paidAt = new Date(now - g.daysAgo * DAY);
      const d = await tx.getRepository(Donation).save({
        campaignId: open!.id, checkoutSessionId: `cs_demo_${String(i + 1).padStart(4, '0')}`, paymentIntentId: `pi_demo_${String(i + 1).padStart(4, '0')}`,
        amountCents, giftCents, feeCoverCents: amountCents - giftCents, currency: org.currency, status: g.refunded ? 'refunded' : 'paid',
        treeCount: g.trees, donorName: g.donor, donorEmail: `${slug(g.donor)}@${DEMO_DOMAIN}`, wallName: g.wall, wantsUpdates: i % 2 === 0,
        dedicationKind: g.dedication?.kind ?? null, dedicationName: g.dedication?.name ?? null,
        paidAt, refundedAt: g.refunded ? new Date(paidAt.getTime() + 2 * DAY) : null, receiptSentAt: paidAt,
      });
      if (!g.refunded) await linkTrees(tx, d.id, g.trees);
    }
    return GIFTS.length;
  });
}
