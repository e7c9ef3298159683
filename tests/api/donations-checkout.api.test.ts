import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Organisation } from '../../server/db/entities/organisation.entity.js';
import { buildCampaign, dayFromToday } from '../factories/donation.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { uniqueEmail } from '../factories/user.factory.js';
import { createTestApp, csrfAgent, type TestApp } from '../setup/test-app.js';
import { deliver, fakeEvents, payInFake, sdkFor, CARDS } from './donations-helpers.js';

let t: TestApp;
let orgName: string;
beforeAll(async () => {
  t = await createTestApp();
  orgName = (await t.db.getRepository(Organisation).findOneByOrFail({ id: 1 })).name;
});
afterAll(() => t.close());

interface RecordedRequest {
  method: string;
  path: string;
  body: { customer_email?: string; line_items?: { quantity: string; price_data: { unit_amount: string; currency: string; product_data: { name: string } } }[] };
}

/** What the app sent to the payments API for this donor. */
async function sentFor(email: string): Promise<RecordedRequest[]> {
  const all = (await (await fetch(`${t.config.STRIPE_API_URL}/__fake/requests`)).json()) as RecordedRequest[];
  return all.filter((r) => r.method === 'POST' && r.path === '/v1/checkout/sessions' && r.body.customer_email === email);
}

const donor = (name = 'Dana Donor') => ({ name, email: uniqueEmail('donor') });

describe('POST /api/donations/checkout', () => {
  it('creates a checkout session for trees with the fee covered: line items, metadata, URLs; no account and no donation yet', async () => {
    const campaign = await buildCampaign(t.db, { name: 'Heron test appeal', priceCents: 2500 });
    const who = donor();
    const res = await request(t.app).post('/api/donations/checkout').send({
      campaignId: campaign.id, trees: 2, coverFees: true, donor: who, dedication: { kind: 'honour', name: 'Nana Bea' }, wallName: 'The Bea family', wantsUpdates: true,
    });
    expect(res.status).toBe(201);
    expect(res.body).toEqual({ checkoutUrl: expect.stringMatching(/^http:\/\/127\.0\.0\.1:\d+\/pay\/cs_test_/), sessionId: expect.stringMatching(/^cs_test_/) });

    const session = await sdkFor(t.config).checkout.sessions.retrieve(res.body.sessionId);
    // $50 gift grossed up at 2.9 % + 30¢: 5030 / 0.971 = 5180.2 → 5181 (TRADE.md §7 worked example, $50 → $51.81).
    expect(session).toMatchObject({
      mode: 'payment',
      amount_total: 5181,
      currency: 'usd',
      customer_email: who.email,
      success_url: 'http://127.0.0.1:5180/sponsor/thanks?session_id={CHECKOUT_SESSION_ID}',
      cancel_url: `http://127.0.0.1:5180/sponsor/${campaign.id}?cancelled=1`,
      metadata: {
        kind: 'sponsor-a-tree', campaignId: campaign.id, treeCount: '2', giftCents: '5000', feeCoverCents: '181', donorName: who.name, donorEmail: who.email,
        wall: 'named', wallName: 'The Bea family', wantsUpdates: 'yes', dedicationKind: 'honour', dedicationName: 'Nana Bea',
      },
    });
    const [sent] = await sentFor(who.email);
    expect(sent!.body.line_items).toEqual([
      { quantity: '1', price_data: { currency: 'usd', unit_amount: '5000', product_data: { name: 'Sponsor 2 trees — Heron test appeal' } } },
      { quantity: '1', price_data: { currency: 'usd', unit_amount: '181', product_data: { name: 'Card fee cover' } } },
    ]);
    const thanks = await request(t.app).get(`/api/donations/thanks/${res.body.sessionId}`);
    expect(thanks.body).toEqual({ recorded: false, status: 'pending', donorName: who.name, amountCents: 5181, currency: 'usd', treeCount: 2, campaignName: 'Heron test appeal', trees: [] });
  });

  it('counts a custom amount as whole trees, and takes a general gift without a campaign', async () => {
    const campaign = await buildCampaign(t.db, { priceCents: 2500 });
    const a = donor();
    await request(t.app).post('/api/donations/checkout').send({ campaignId: campaign.id, amountCents: 6000, coverFees: false, donor: a, wallName: '' }).expect(201);
    const [custom] = await sentFor(a.email);
    expect(custom!.body).toMatchObject({ metadata: { treeCount: '2', giftCents: '6000', feeCoverCents: '0', wall: 'anonymous' } });
    expect(custom!.body.line_items).toHaveLength(1);

    const b = donor();
    const general = await request(t.app).post('/api/donations/checkout').send({ amountCents: 1000, coverFees: true, donor: b }).expect(201);
    const session = await sdkFor(t.config).checkout.sessions.retrieve(general.body.sessionId);
    expect(session).toMatchObject({ amount_total: 1061, cancel_url: 'http://127.0.0.1:5180/sponsor?cancelled=1', metadata: { treeCount: '0', wall: 'off' } });
    expect(session.metadata).not.toHaveProperty('campaignId');
    const [sent] = await sentFor(b.email);
    expect(sent!.body.line_items![0]!.price_data.product_data.name).toBe(`Gift to ${orgName}`);
  });

  it('gives back the same session for a repeated idempotency key (a double submit)', async () => {
    const campaign = await buildCampaign(t.db);
    const body = { campaignId: campaign.id, trees: 1, coverFees: false, donor: donor() };
    const key = `form-${Date.now()}-abc`;
    const first = await request(t.app).post('/api/donations/checkout').set('Idempotency-Key', key).send(body).expect(201);
    const second = await request(t.app).post('/api/donations/checkout').set('Idempotency-Key', key).send(body).expect(201);
    const third = await request(t.app).post('/api/donations/checkout').send(body).expect(201);
    expect(second.body.sessionId).toBe(first.body.sessionId);
    expect(third.body.sessionId).not.toBe(first.body.sessionId);
  });

  it('needs the CSRF token once the browser holds a session cookie (without one there is nothing to forge)', async () => {
    const campaign = await buildCampaign(t.db);
    const { agent, token } = await csrfAgent(t.app);
    const body = { campaignId: campaign.id, trees: 1, coverFees: false, donor: donor() };
    const refused = await agent.post('/api/donations/checkout').send(body);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('csrf_failed');
    await agent.post('/api/donations/checkout').set('X-CSRF-Token', token).send(body).expect(201);
  });

  it.each([
    ['trees and an amount', { trees: 1, amountCents: 2500 }, 'amountCents'],
    ['neither trees nor an amount', {}, 'trees'],
    ['101 trees', { trees: 101 }, 'trees'],
    ['less than $1', { amountCents: 99 }, 'amountCents'],
    ['more than $100,000', { amountCents: 10_000_001 }, 'amountCents'],
    ['half a tree', { trees: 1.5 }, 'trees'],
    ['a bad e-mail', { trees: 1, donor: { name: 'X', email: 'not-mail' } }, 'donor.email'],
    ['an unknown dedication', { trees: 1, dedication: { kind: 'birthday', name: 'Y' } }, 'dedication.kind'],
  ])('refuses %s with 400 on the field and creates no session', async (_what, over, field) => {
    const campaign = await buildCampaign(t.db);
    const who = donor();
    const res = await request(t.app).post('/api/donations/checkout').send({ campaignId: campaign.id, coverFees: false, donor: who, ...over });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(Object.keys(res.body.error.fields)).toContain(field);
    expect(await sentFor(who.email)).toHaveLength(0);
  });

  it('refuses trees without a campaign, and campaigns that are unknown, inactive, not started or ended', async () => {
    const body = (campaignId?: string) => ({ ...(campaignId ? { campaignId } : {}), trees: 1, coverFees: false, donor: donor() });
    const noCampaign = await request(t.app).post('/api/donations/checkout').send(body());
    expect(noCampaign.body.error.fields).toHaveProperty('campaignId');
    const closed = [
      await buildCampaign(t.db, { active: false }),
      await buildCampaign(t.db, { startsOn: dayFromToday(5), endsOn: null }),
      await buildCampaign(t.db, { startsOn: dayFromToday(-30), endsOn: dayFromToday(-3) }),
    ];
    for (const id of [...closed.map((c) => c.id), '00000000-0000-4000-8000-000000000000']) {
      const res = await request(t.app).post('/api/donations/checkout').send(body(id));
      expect(res.status).toBe(400);
      expect(res.body.error.fields).toHaveProperty('campaignId');
    }
  });
});

describe('GET /api/donations/thanks/:sessionId', () => {
  it('turns recorded once the payment webhook lands, with the trees; a declined card records nothing', async () => {
    const campaign = await buildCampaign(t.db, { name: 'Thanks test appeal' });
    await buildTree(t.db, { stage: 'ready' });
    const who = donor('Theo Thanks');
    const res = await request(t.app).post('/api/donations/checkout').send({ campaignId: campaign.id, trees: 1, coverFees: false, donor: who }).expect(201);
    const sessionId = res.body.sessionId as string;

    expect((await payInFake(t.config, sessionId, CARDS.declined)).status).toBe(402);
    expect((await request(t.app).get(`/api/donations/thanks/${sessionId}`)).body).toMatchObject({ recorded: false, status: 'pending' });

    expect((await payInFake(t.config, sessionId, CARDS.paid)).status).toBe(200);
    const completed = (await fakeEvents(t.config, 'checkout.session.completed')).filter((e) => e.data.object.id === sessionId);
    expect(completed).toHaveLength(1);
    await deliver(t.app, JSON.stringify(completed[0]), t.config.STRIPE_WEBHOOK_SECRET).expect(200);
    const after = await request(t.app).get(`/api/donations/thanks/${sessionId}`).expect(200);
    expect(after.body).toMatchObject({ recorded: true, status: 'paid', donorName: 'Theo Thanks', amountCents: 2500, treeCount: 1, campaignName: 'Thanks test appeal' });
    expect(after.body.trees).toHaveLength(1);
  });

  it('answers 400 for something that is not a session id and 404 for an unknown session', async () => {
    expect((await request(t.app).get('/api/donations/thanks/nope')).status).toBe(400);
    const res = await request(t.app).get(`/api/donations/thanks/cs_test_${'0'.repeat(40)}`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});

describe('POST /api/donations/checkout: rate limit', () => {
  // Last in this file: it uses up the address's allowance on this app instance.
  it('allows 100 checkouts an hour from one address, like registrations, then answers 429', async () => {
    let status = 0;
    let sent = 0;
    let body: { error?: { code: string } } = {};
    while (sent < 110 && status !== 429) {
      const res = await request(t.app).post('/api/donations/checkout').send({});
      sent += 1;
      status = res.status;
      body = res.body;
    }
    expect(status).toBe(429);
    expect(body.error?.code).toBe('rate_limited');
    expect(sent).toBeLessThanOrEqual(101);
  });

  it('allows 300 thank-you look-ups in 15 minutes from one address, then answers 429', async () => {
    // Unknown sessions are looked up at the payments service; made-up ids must not flood it.
    let status = 0;
    let sent = 0;
    while (sent < 320 && status !== 429) {
      status = (await request(t.app).get('/api/donations/thanks/nope')).status;
      sent += 1;
    }
    expect(status).toBe(429);
    expect(sent).toBeGreaterThan(290);
    expect(sent).toBeLessThanOrEqual(301);
  });
});
