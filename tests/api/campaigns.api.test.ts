import request from 'supertest';
import { IsNull, Not } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Donation } from '../../server/db/entities/donation.entity.js';
import { Organisation } from '../../server/db/entities/organisation.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { seedDemoGiving } from '../../server/db/seeds/demo-giving.js';
import { buildCampaign, buildDonation, dayFromToday } from '../factories/donation.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';

let t: TestApp;
let admin: Awaited<ReturnType<typeof authAgentFor>>;
beforeAll(async () => {
  t = await createTestApp();
  admin = await authAgentFor(t, 'admin');
});
afterAll(() => t.close());

const noon = (date: string) => new Date(`${date}T16:00:00Z`);

describe('POST and PATCH /api/campaigns (admin)', () => {
  it('creates a campaign with defaults and edits it', async () => {
    const created = await admin.agent.post('/api/campaigns').set('X-CSRF-Token', admin.token)
      .send({ name: '  Mangrove mile  ', priceCents: 2500, goalTrees: 200, startsOn: dayFromToday(-1) });
    expect(created.status).toBe(201);
    expect(created.body.campaign).toMatchObject({ name: 'Mangrove mile', story: '', priceCents: 2500, goalTrees: 200, endsOn: null, active: true, open: true, sponsoredTrees: 0, raisedCents: 0, donationCount: 0 });

    const id = created.body.campaign.id as string;
    const edited = await admin.agent.patch(`/api/campaigns/${id}`).set('X-CSRF-Token', admin.token).send({ story: 'Why it matters.', active: false });
    expect(edited.status).toBe(200);
    expect(edited.body.campaign).toMatchObject({ id, story: 'Why it matters.', active: false, open: false });
  });

  it.each([
    [{ name: 'X', priceCents: 50, goalTrees: 10, startsOn: '2026-01-01' }, 'priceCents'],
    [{ name: 'X', priceCents: 2500, goalTrees: 0, startsOn: '2026-01-01' }, 'goalTrees'],
    [{ name: 'X', priceCents: 2500, goalTrees: 10, startsOn: '2026-02-01', endsOn: '2026-01-01' }, 'endsOn'],
    [{ name: '', priceCents: 2500, goalTrees: 10, startsOn: '2026-01-01' }, 'name'],
    [{ name: 'X', priceCents: 2500, goalTrees: 10, startsOn: '1 March' }, 'startsOn'],
  ])('refuses %o with 400 on %s', async (body, field) => {
    const res = await admin.agent.post('/api/campaigns').set('X-CSRF-Token', admin.token).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(field);
  });

  it('refuses an end before the stored start', async () => {
    const c = await buildCampaign(t.db, { startsOn: '2026-05-01', endsOn: null });
    const res = await admin.agent.patch(`/api/campaigns/${c.id}`).set('X-CSRF-Token', admin.token).send({ endsOn: '2026-04-30' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ endsOn: ['must be on or after the start'] });
  });
});

describe('GET /api/campaigns', () => {
  it('lists the open campaigns with trees sponsored by paid gifts only', async () => {
    const open = await buildCampaign(t.db, { goalTrees: 50 });
    const openForever = await buildCampaign(t.db, { endsOn: null });
    const inactive = await buildCampaign(t.db, { active: false });
    const future = await buildCampaign(t.db, { startsOn: dayFromToday(3), endsOn: dayFromToday(30) });
    const ended = await buildCampaign(t.db, { startsOn: dayFromToday(-30), endsOn: dayFromToday(-3) });
    await buildDonation(t.db, { campaignId: open.id, treeCount: 3 });
    await buildDonation(t.db, { campaignId: open.id, treeCount: 2 });
    await buildDonation(t.db, { campaignId: open.id, treeCount: 4, status: 'refunded', refundedAt: new Date() });

    const res = await request(t.app).get('/api/campaigns').expect(200);
    const ids = (res.body.campaigns as { id: string }[]).map((c) => c.id);
    expect(ids).toEqual(expect.arrayContaining([open.id, openForever.id]));
    for (const closed of [inactive, future, ended]) expect(ids).not.toContain(closed.id);
    expect(res.body.campaigns.find((c: { id: string }) => c.id === open.id)).toMatchObject({ goalTrees: 50, sponsoredTrees: 5, open: true });
  });
});

describe('GET /api/campaigns/:id', () => {
  it('shows progress, the opt-in donor wall newest first, and the fee settings', async () => {
    const c = await buildCampaign(t.db, { name: 'Wall test' });
    await buildDonation(t.db, { campaignId: c.id, treeCount: 2, wallName: 'Ruth K.', paidAt: noon('2026-03-01') });
    await buildDonation(t.db, { campaignId: c.id, treeCount: 1, wallName: '', paidAt: noon('2026-03-03') });
    await buildDonation(t.db, { campaignId: c.id, treeCount: 5, wallName: null, paidAt: noon('2026-03-04') });
    await buildDonation(t.db, { campaignId: c.id, treeCount: 7, wallName: 'Refunded R.', status: 'refunded', paidAt: noon('2026-03-05') });

    const res = await request(t.app).get(`/api/campaigns/${c.id}`).expect(200);
    expect(res.body).toMatchObject({
      campaign: { id: c.id, name: 'Wall test', sponsoredTrees: 8, open: true },
      sponsoredTrees: 8,
      currency: 'usd',
      givingRules: { cardFeePercent: expect.any(Number), cardFeeFixedCents: expect.any(Number) },
    });
    expect(res.body.wall).toEqual([
      { name: 'Anonymous', trees: 1, date: '2026-03-03' },
      { name: 'Ruth K.', trees: 2, date: '2026-03-01' },
    ]);
  });

  it('hides an inactive campaign from the public (admins still see it) and shows an ended one as closed', async () => {
    const inactive = await buildCampaign(t.db, { active: false });
    expect((await request(t.app).get(`/api/campaigns/${inactive.id}`)).status).toBe(404);
    expect((await admin.agent.get(`/api/campaigns/${inactive.id}`)).status).toBe(200);
    const ended = await buildCampaign(t.db, { startsOn: dayFromToday(-30), endsOn: dayFromToday(-3) });
    expect((await request(t.app).get(`/api/campaigns/${ended.id}`)).body.campaign.open).toBe(false);
    expect((await request(t.app).get('/api/campaigns/not-a-uuid')).status).toBe(400);
  });
});

describe('GET /api/campaigns/manage', () => {
  it('lists every campaign with what it raised (gifts of paid donations, without fee cover)', async () => {
    const c = await buildCampaign(t.db, { active: false });
    await buildDonation(t.db, { campaignId: c.id, giftCents: 5000, feeCoverCents: 181, treeCount: 2 });
    await buildDonation(t.db, { campaignId: c.id, giftCents: 2500, treeCount: 1, status: 'refunded' });
    const res = await admin.agent.get('/api/campaigns/manage').expect(200);
    expect(res.body.campaigns.find((x: { id: string }) => x.id === c.id)).toMatchObject({ active: false, sponsoredTrees: 2, raisedCents: 5000, donationCount: 1 });
  });
});

describe('demo giving seed', () => {
  it('adds the demo campaigns and gifts once, with fictional receipt details where they were empty', async () => {
    const own = await createTestApp({ ownDatabase: 'demo_giving' });
    try {
      await Promise.all(Array.from({ length: 40 }, () => buildTree(own.db, { stage: 'ready' })));
      expect(await seedDemoGiving({ db: own.db, now: new Date() })).toBe(7);
      expect(await seedDemoGiving({ db: own.db, now: new Date() })).toBe(0);
      expect(await own.db.getRepository(Organisation).findOneByOrFail({ id: 1 })).toMatchObject({ legalName: 'Bayhaven Shoreline Trust, Inc. (demo)', taxId: '00-0000000' });
      const open = await request(own.app).get('/api/campaigns').expect(200);
      expect(open.body.campaigns).toHaveLength(1);
      // 4 + 2 + 1 + 10 + 2 + 5 trees paid; the 3 of the refunded gift do not count.
      expect(open.body.campaigns[0]).toMatchObject({ name: 'Heron Reach living shoreline (demo)', sponsoredTrees: 24 });
      expect(await own.db.getRepository(Tree).count({ where: { sponsorDonationId: Not(IsNull()) } })).toBe(24);
      const paid = await own.db.getRepository(Donation).findBy({ status: 'paid' });
      for (const d of paid) expect(d.amountCents).toBe(d.giftCents + d.feeCoverCents);
    } finally {
      await own.close();
    }
  });
});
