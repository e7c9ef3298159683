import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Campaign } from '../../server/db/entities/campaign.entity.js';
import { Donation } from '../../server/db/entities/donation.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { buildCampaign, buildDonation } from '../factories/donation.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { uniqueEmail } from '../factories/user.factory.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';
import { CARDS, deliver, fakeEvents, payInFake, sdkFor } from './donations-helpers.js';

// Its own database: the list and its totals cover every donation there is.
let t: TestApp;
let admin: Awaited<ReturnType<typeof authAgentFor>>;
let a: Campaign;
let b: Campaign;
const d: Record<string, Donation> = {};
const trees: Tree[] = [];

beforeAll(async () => {
  t = await createTestApp({ ownDatabase: 'donation_admin' });
  admin = await authAgentFor(t, 'admin');
  a = await buildCampaign(t.db, { name: 'Alpha appeal' });
  b = await buildCampaign(t.db, { name: 'Beta appeal' });
  d.first = await buildDonation(t.db, {
    campaignId: a.id, donorName: 'Alma Reed', donorEmail: uniqueEmail('alma'), giftCents: 5000, feeCoverCents: 181, treeCount: 2,
    paidAt: new Date('2026-01-10T17:00:00Z'), dedicationKind: 'honour', dedicationName: 'Aunt Jo', wallName: '',
  });
  d.refunded = await buildDonation(t.db, { campaignId: a.id, giftCents: 2500, treeCount: 1, status: 'refunded', paidAt: new Date('2026-01-20T17:00:00Z'), refundedAt: new Date('2026-01-21T17:00:00Z') });
  d.beta = await buildDonation(t.db, { campaignId: b.id, donorName: 'Bo Chen', giftCents: 10_000, treeCount: 4, paidAt: new Date('2026-02-05T17:00:00Z') });
  // 03:30 UTC on 1 March is still 28 February in the organisation's zone (America/New_York).
  d.lateFeb = await buildDonation(t.db, { campaignId: null, donorName: '=HYPERLINK("x")', giftCents: 1000, treeCount: 0, paidAt: new Date('2026-03-01T03:30:00Z') });
  d.march = await buildDonation(t.db, { campaignId: a.id, giftCents: 7500, treeCount: 3, paidAt: new Date('2026-03-02T17:00:00Z') });
  trees.push(await buildTree(t.db, { stage: 'ready', sponsorDonationId: d.first.id }), await buildTree(t.db, { stage: 'brining', sponsorDonationId: d.first.id }));
});
afterAll(() => t.close());

const list = (query: string) => admin.agent.get(`/api/donations${query}`);
const ids = (body: { items: { id: string }[] }) => body.items.map((i) => i.id);

describe('GET /api/donations', () => {
  it('lists newest first with trees, donor, campaign and dedication, and totals to the cent', async () => {
    const res = await list('').expect(200);
    expect(ids(res.body)).toEqual([d.march!.id, d.lateFeb!.id, d.beta!.id, d.refunded!.id, d.first!.id]);
    expect(res.body.total).toBe(5);
    expect(res.body.totals).toEqual({ amountCents: 5181 + 2500 + 10_000 + 1000 + 7500, giftCents: 5000 + 2500 + 10_000 + 1000 + 7500, feeCoverCents: 181, count: 5 });
    const first = res.body.items.find((i: { id: string }) => i.id === d.first!.id);
    expect(first).toMatchObject({
      amountCents: 5181, giftCents: 5000, feeCoverCents: 181, status: 'paid', checkoutSessionId: d.first!.checkoutSessionId,
      donor: { name: 'Alma Reed', email: d.first!.donorEmail }, campaign: { id: a.id, name: 'Alpha appeal' }, dedication: { kind: 'honour', name: 'Aunt Jo' },
      treeCount: 2, createdAt: expect.any(String), paidAt: '2026-01-10T17:00:00.000Z',
    });
    expect(first.trees).toEqual(expect.arrayContaining(trees.map((x) => ({ id: x.id, tag: x.tag, stage: x.stage }))));
    expect(res.body.items.find((i: { id: string }) => i.id === d.lateFeb!.id).campaign).toBeNull();
  });

  it.each([
    ['?status=paid', ['march', 'lateFeb', 'beta', 'first'], 5181 + 10_000 + 1000 + 7500],
    ['?status=refunded', ['refunded'], 2500],
    ['?from=2026-02-01&to=2026-02-28', ['lateFeb', 'beta'], 11_000],
    ['?from=2026-03-01', ['march'], 7500],
    ['?q=alma', ['first'], 5181],
    ['?q=bo%20ch', ['beta'], 10_000],
    ['?from=&to=&campaignId=&status=&q=', ['march', 'lateFeb', 'beta', 'refunded', 'first'], 26_181],
  ])('filters %s', async (query, expected, amount) => {
    const res = await list(query).expect(200);
    expect(ids(res.body)).toEqual(expected.map((k) => d[k]!.id));
    expect(res.body.totals).toMatchObject({ amountCents: amount, count: expected.length });
  });

  it('filters by campaign and by checkout session id', async () => {
    expect(ids((await list(`?campaignId=${a.id}`)).body)).toEqual([d.march!.id, d.refunded!.id, d.first!.id]);
    expect(ids((await list(`?q=${d.beta!.checkoutSessionId.slice(-12)}`)).body)).toEqual([d.beta!.id]);
  });

  it('pages, keeping the total and totals of the whole set', async () => {
    const res = await list('?page=2&pageSize=2').expect(200);
    expect(ids(res.body)).toEqual([d.beta!.id, d.refunded!.id]);
    expect(res.body.total).toBe(5);
    expect(res.body.totals.count).toBe(5);
  });

  it.each(['?from=2026-13-01', '?from=2026-03-01&to=2026-02-01', '?status=pending', '?pageSize=1000', '?campaignId=nope'])('refuses %s with 400', async (query) => {
    const res = await list(query);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});

describe('GET /api/donations/export.csv', () => {
  it('exports the filtered rows with decimal amounts, and defuses formulas', async () => {
    const res = await admin.agent.get('/api/donations/export.csv?status=paid').expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toContain('donations.csv');
    const lines = res.text.trim().split('\r\n');
    expect(lines[0]).toBe('Paid at,Donor,E-mail,Campaign,Trees bought,Tree tags,Gift,Card fee cover,Amount,Currency,Status,Refunded at,Dedication,Donor wall,Wants updates,Checkout session,Donation id');
    expect(lines).toHaveLength(5);
    const first = lines.find((l) => l.includes(d.first!.id))!;
    const tags = trees.map((x) => x.tag).sort().join(' ');
    expect(first).toBe(`2026-01-10T17:00:00.000Z,Alma Reed,${d.first!.donorEmail},Alpha appeal,2,${tags},50.00,1.81,51.81,USD,paid,,In honour of Aunt Jo,Anonymous,no,${d.first!.checkoutSessionId},${d.first!.id}`);
    expect(lines.find((l) => l.includes(d.lateFeb!.id))).toContain(`"'=HYPERLINK(""x"")"`);
  });
});

describe('POST /api/donations/:id/refund', () => {
  it('refunds through the payments service; the charge.refunded webhook then marks it refunded and frees its trees', async () => {
    await buildTree(t.db, { stage: 'ready' });
    const checkout = await request(t.app).post('/api/donations/checkout').send({ campaignId: b.id, trees: 1, coverFees: false, donor: { name: 'Rory Refund', email: uniqueEmail('refund') } }).expect(201);
    const sessionId = checkout.body.sessionId as string;
    expect((await payInFake(t.config, sessionId, CARDS.paid)).status).toBe(200);
    const completed = (await fakeEvents(t.config, 'checkout.session.completed')).find((e) => e.data.object.id === sessionId);
    await deliver(t.app, JSON.stringify(completed), t.config.STRIPE_WEBHOOK_SECRET).expect(200);
    const gift = await t.db.getRepository(Donation).findOneByOrFail({ checkoutSessionId: sessionId });
    expect(await t.db.getRepository(Tree).countBy({ sponsorDonationId: gift.id })).toBe(1);

    const res = await admin.agent.post(`/api/donations/${gift.id}/refund`).set('X-CSRF-Token', admin.token);
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ refundId: expect.stringMatching(/^re_/), status: 'succeeded' });
    expect((await t.db.getRepository(Donation).findOneByOrFail({ id: gift.id })).status).toBe('paid');

    const refunded = (await fakeEvents(t.config, 'charge.refunded')).find((e) => e.data.object.payment_intent === gift.paymentIntentId);
    await deliver(t.app, JSON.stringify(refunded), t.config.STRIPE_WEBHOOK_SECRET).expect(200);
    expect((await t.db.getRepository(Donation).findOneByOrFail({ id: gift.id })).status).toBe('refunded');
    expect(await t.db.getRepository(Tree).countBy({ sponsorDonationId: gift.id })).toBe(0);

    const again = await admin.agent.post(`/api/donations/${gift.id}/refund`).set('X-CSRF-Token', admin.token);
    expect(again.status).toBe(409);
  });

  it('answers 409 with the reason when the payments service refuses, e.g. refunded from its dashboard already', async () => {
    await buildTree(t.db, { stage: 'ready' });
    const checkout = await request(t.app).post('/api/donations/checkout').send({ campaignId: b.id, trees: 1, coverFees: false, donor: { name: 'Dee Dashboard', email: uniqueEmail('dash') } }).expect(201);
    const sessionId = checkout.body.sessionId as string;
    expect((await payInFake(t.config, sessionId, CARDS.paid)).status).toBe(200);
    const completed = (await fakeEvents(t.config, 'checkout.session.completed')).find((e) => e.data.object.id === sessionId);
    await deliver(t.app, JSON.stringify(completed), t.config.STRIPE_WEBHOOK_SECRET).expect(200);
    const gift = await t.db.getRepository(Donation).findOneByOrFail({ checkoutSessionId: sessionId });
    // Refunded outside the app; its webhook has not landed yet, so the gift still reads paid.
    await sdkFor(t.config).refunds.create({ payment_intent: gift.paymentIntentId! });

    const res = await admin.agent.post(`/api/donations/${gift.id}/refund`).set('X-CSRF-Token', admin.token);
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'conflict', message: expect.stringContaining('already been refunded') });
  });

  it('answers 404 for an unknown donation and 409 when there is no payment to refund', async () => {
    const missing = await admin.agent.post('/api/donations/00000000-0000-4000-8000-000000000000/refund').set('X-CSRF-Token', admin.token);
    expect(missing.status).toBe(404);
    const noIntent = await buildDonation(t.db, { paymentIntentId: null });
    const res = await admin.agent.post(`/api/donations/${noIntent.id}/refund`).set('X-CSRF-Token', admin.token);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
  });
});
