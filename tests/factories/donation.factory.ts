import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { Campaign } from '../../server/db/entities/campaign.entity.js';
import { Donation } from '../../server/db/entities/donation.entity.js';
import { uniqueEmail } from './user.factory.js';

const DAY = 86_400_000;
/** A calendar date `days` from today (UTC); tests keep two days clear of the edges so time zones never matter. */
export const dayFromToday = (days: number) => new Date(Date.now() + days * DAY).toISOString().slice(0, 10);
const hex = (n: number) => randomBytes(n).toString('hex');

/** An open campaign at $25 a tree (invented test data). */
export async function buildCampaign(db: DataSource, overrides: Partial<Campaign> = {}): Promise<Campaign> {
  const repo = db.getRepository(Campaign);
  return repo.save(repo.create({ name: `Test appeal ${hex(4)}`, story: 'Plant the test shore.', priceCents: 2500, goalTrees: 100, startsOn: dayFromToday(-10), endsOn: dayFromToday(30), active: true, ...overrides }));
}

/** A paid donation row as the webhook would have written it; hand-built values only. */
export async function buildDonation(db: DataSource, overrides: Partial<Donation> = {}): Promise<Donation> {
  const repo = db.getRepository(Donation);
  const giftCents = overrides.giftCents ?? 5000;
  const feeCoverCents = overrides.feeCoverCents ?? 0;
  return repo.save(repo.create({
    checkoutSessionId: `cs_test_${hex(16)}`,
    paymentIntentId: `pi_test_${hex(12)}`,
    giftCents,
    feeCoverCents,
    amountCents: giftCents + feeCoverCents,
    currency: 'usd',
    status: 'paid',
    treeCount: 2,
    donorName: 'Test Donor',
    donorEmail: uniqueEmail('donor'),
    wallName: null,
    paidAt: new Date(),
    ...overrides,
  }));
}
