/** Builders and MSW answers for the sponsor-a-tree client tests (invented campaign and donors). */
import { randomUUID } from 'node:crypto';
import { http, HttpResponse } from 'msw';
import type { CampaignPage, ManagedCampaign } from '@shared/schemas/campaign.schema';
import type { DonationList, DonationRow, DonationThanks } from '@shared/schemas/donation.schema';
import { server } from '../setup/client-setup';

export const CAMPAIGN_ID = '6f1c2d3e-4a5b-4c6d-8e7f-901234567890';

export function buildManagedCampaign(overrides: Partial<ManagedCampaign> = {}): ManagedCampaign {
  return {
    id: CAMPAIGN_ID,
    name: 'Gull Spit fringe',
    story: 'The fringe at Gull Spit washed out in the winter storms.\n\nEvery tree is grown in our nursery and planted on a low tide.',
    priceCents: 2500,
    goalTrees: 150,
    startsOn: '2025-01-01',
    endsOn: null,
    active: true,
    open: true,
    sponsoredTrees: 42,
    raisedCents: 105_000,
    donationCount: 12,
    createdAt: '2025-01-01T12:00:00.000Z',
    ...overrides,
  };
}

export function buildCampaignPage(overrides: Partial<CampaignPage['campaign']> = {}, rest: Partial<Omit<CampaignPage, 'campaign'>> = {}): CampaignPage {
  const { raisedCents: _r, donationCount: _d, createdAt: _c, ...campaign } = buildManagedCampaign(overrides);
  return {
    campaign,
    sponsoredTrees: campaign.sponsoredTrees,
    wall: [
      { name: 'Tide Pool Readers', trees: 3, date: '2025-03-02' },
      { name: 'Anonymous', trees: 1, date: '2025-02-20' },
    ],
    currency: 'usd',
    givingRules: { cardFeePercent: 2.9, cardFeeFixedCents: 30 },
    ...rest,
  };
}

export function mockCampaignPage(page: CampaignPage | Response): void {
  server.use(http.get('/api/campaigns/:id', () => (page instanceof Response ? page : HttpResponse.json(page))));
}

export function buildThanks(overrides: Partial<DonationThanks> = {}): DonationThanks {
  return {
    recorded: true,
    status: 'paid',
    donorName: 'Noor Castellanos',
    amountCents: 5181,
    currency: 'usd',
    treeCount: 2,
    campaignName: 'Gull Spit fringe',
    trees: ['BST-0107', 'BST-0112'],
    ...overrides,
  };
}

export function buildDonation(overrides: Partial<DonationRow> = {}): DonationRow {
  return {
    id: randomUUID(),
    amountCents: 5181,
    giftCents: 5000,
    feeCoverCents: 181,
    currency: 'usd',
    status: 'paid',
    checkoutSessionId: `cs_test_${randomUUID().replace(/-/g, '')}`,
    donor: { name: 'Noor Castellanos', email: 'noor@example.test' },
    treeCount: 2,
    trees: [
      { id: randomUUID(), tag: 'BST-0107', stage: 'ready' },
      { id: randomUUID(), tag: 'BST-0112', stage: 'brining' },
    ],
    campaign: { id: CAMPAIGN_ID, name: 'Gull Spit fringe' },
    dedication: null,
    wallName: 'Noor C.',
    wantsUpdates: false,
    paidAt: '2025-03-04T15:00:00.000Z',
    refundedAt: null,
    createdAt: '2025-03-04T15:00:00.000Z',
    ...overrides,
  };
}

/** Answers GET /api/donations with `rows` (paged by the query) and records every query. */
export function mockDonations(rows: DonationRow[], totals?: DonationList['totals']): URLSearchParams[] {
  const queries: URLSearchParams[] = [];
  server.use(
    http.get('/api/donations', ({ request }) => {
      const params = new URL(request.url).searchParams;
      queries.push(params);
      const page = Number(params.get('page') ?? 1);
      const size = Number(params.get('pageSize') ?? 25);
      const sum = (f: (r: DonationRow) => number) => rows.reduce((n, r) => n + f(r), 0);
      return HttpResponse.json({
        items: rows.slice((page - 1) * size, page * size),
        total: rows.length,
        totals: totals ?? { count: rows.length, amountCents: sum((r) => r.amountCents), giftCents: sum((r) => r.giftCents), feeCoverCents: sum((r) => r.feeCoverCents) },
      });
    }),
    http.get('/api/campaigns/manage', () => HttpResponse.json({ campaigns: [buildManagedCampaign()] })),
  );
  return queries;
}
