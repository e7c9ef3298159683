import Stripe from 'stripe';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Donation } from '../../server/db/entities/donation.entity.js';
import { Organisation } from '../../server/db/entities/organisation.entity.js';
import { OutboxMessage } from '../../server/db/entities/outbox-message.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { WebhookEvent } from '../../server/db/entities/webhook-event.entity.js';
import { buildCampaign } from '../factories/donation.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { uniqueEmail } from '../factories/user.factory.js';
import { waitForMail } from '../setup/mail-inbox.js';
import { createTestApp, type TestApp } from '../setup/test-app.js';
import { deliver, paidSession, paymentEvent, refundedCharge } from './donations-helpers.js';

// Its own database: these tests count every nursery tree and donation.
let t: TestApp;
let secret: string;
beforeAll(async () => {
  t = await createTestApp({ ownDatabase: 'donation_webhooks' });
  secret = t.config.STRIPE_WEBHOOK_SECRET;
});
afterAll(() => t.close());

const donationsFor = (sessionId: string) => t.db.getRepository(Donation).findBy({ checkoutSessionId: sessionId });
const treesOf = (donationId: string) => t.db.getRepository(Tree).find({ where: { sponsorDonationId: donationId }, order: { tag: 'ASC' } });

describe('POST /api/webhooks/stripe: which trees a gift sponsors', () => {
  it('takes ready trees first, then the next to become ready, and never planted, lost or sponsored ones', async () => {
    const run = Date.now().toString(36).slice(-6);
    const tag = (s: string) => `W${s.slice(0, 5)}-${run}`;
    for (const stage of ['planted', 'alive', 'lost'] as const) await buildTree(t.db, { tag: tag(stage), stage });
    await buildTree(t.db, { tag: tag('collected'), stage: 'collected' });
    await buildTree(t.db, { tag: tag('tube'), stage: 'tube' });
    await buildTree(t.db, { tag: tag('potted'), stage: 'potted' });
    await buildTree(t.db, { tag: tag('brining'), stage: 'brining' });
    await buildTree(t.db, { tag: tag('sick'), stage: 'ready', healthy: false });
    await buildTree(t.db, { tag: tag('ready'), stage: 'ready' });

    const first = paidSession({ treeCount: 3, giftCents: 7500 });
    expect((await deliver(t.app, JSON.stringify(paymentEvent('checkout.session.completed', first)), secret)).status).toBe(200);
    const [gift] = await donationsFor(first.id);
    const firstTrees = (await treesOf(gift!.id)).map((x) => x.stage + (x.healthy ? '' : '-sick'));
    expect(firstTrees.sort()).toEqual(['brining', 'ready', 'ready-sick']);

    // Four more wanted, three left in the nursery: it takes what there is and the rest wait.
    const second = paidSession({ treeCount: 4, giftCents: 10_000 });
    await deliver(t.app, JSON.stringify(paymentEvent('checkout.session.completed', second)), secret).expect(200);
    const [short] = await donationsFor(second.id);
    expect(short).toMatchObject({ treeCount: 4, status: 'paid' });
    expect((await treesOf(short!.id)).map((x) => x.stage).sort()).toEqual(['collected', 'potted', 'tube']);
    const receipt = await t.db.getRepository(OutboxMessage).findOneByOrFail({ dedupeKey: `receipt:${short!.id}` });
    expect(receipt.text).toContain('So far 3 of your 4 trees are matched to nursery trees; the other 1 will be matched');

    // Refunded, so it does not wait for trees made by the tests below.
    await deliver(t.app, JSON.stringify(paymentEvent('charge.refunded', refundedCharge(second.payment_intent, 10_000))), secret).expect(200);
    expect((await t.db.getRepository(Tree).findOneByOrFail({ tag: tag('planted') })).sponsorDonationId).toBeNull();
  });
});

describe('POST /api/webhooks/stripe: exactly once', () => {
  it('records one donation when the same event is delivered five times, and when the session comes again under a new event id', async () => {
    await Promise.all(Array.from({ length: 2 }, () => buildTree(t.db, { stage: 'ready' })));
    const session = paidSession({ treeCount: 2, giftCents: 5000, feeCoverCents: 181 });
    const event = paymentEvent('checkout.session.completed', session);
    const payload = JSON.stringify(event);
    const answers = [];
    for (let i = 0; i < 5; i += 1) answers.push(await deliver(t.app, payload, secret));
    expect(answers.map((a) => a.status)).toEqual([200, 200, 200, 200, 200]);
    expect(answers.map((a) => a.body.outcome)).toEqual(['recorded', 'replayed', 'replayed', 'replayed', 'replayed']);
    await deliver(t.app, JSON.stringify(paymentEvent('checkout.session.completed', session)), secret).expect(200);

    const rows = await donationsFor(session.id);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ amountCents: 5181, giftCents: 5000, feeCoverCents: 181, status: 'paid', paymentIntentId: session.payment_intent });
    expect(await treesOf(rows[0]!.id)).toHaveLength(2);
    expect(await t.db.getRepository(OutboxMessage).countBy({ dedupeKey: `receipt:${rows[0]!.id}` })).toBe(1);
    expect(await t.db.getRepository(WebhookEvent).countBy({ id: event.id })).toBe(1);
  });

  it('replays in parallel still give one donation', async () => {
    await Promise.all(Array.from({ length: 3 }, () => buildTree(t.db, { stage: 'ready' })));
    const session = paidSession({ treeCount: 3, giftCents: 7500 });
    const completed = JSON.stringify(paymentEvent('checkout.session.completed', session));
    const again = JSON.stringify(paymentEvent('checkout.session.completed', session));
    const answers = await Promise.all([completed, completed, again, completed, again].map((p) => deliver(t.app, p, secret)));
    expect(answers.every((a) => a.status === 200)).toBe(true);
    const rows = await donationsFor(session.id);
    expect(rows).toHaveLength(1);
    expect(await treesOf(rows[0]!.id)).toHaveLength(3);
  });

  it('records nothing for a session that is not paid (declined or still pending)', async () => {
    const session = paidSession({ treeCount: 1, giftCents: 2500 }, { payment_status: 'unpaid', status: 'open' });
    const res = await deliver(t.app, JSON.stringify(paymentEvent('checkout.session.completed', session)), secret);
    expect(res.status).toBe(200);
    expect(res.body.outcome).toBe('ignored');
    expect(await donationsFor(session.id)).toHaveLength(0);
  });

  it('answers 200 to event types it does not handle and stores nothing for them', async () => {
    const event = paymentEvent('checkout.session.expired', paidSession({ treeCount: 1, giftCents: 2500 }, { status: 'expired', payment_status: 'unpaid' }));
    const res = await deliver(t.app, JSON.stringify(event), secret);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ received: true, outcome: 'ignored' });
  });
});

describe('POST /api/webhooks/stripe: signatures', () => {
  it.each([
    ['signed with another secret', (payload: string) => deliver(t.app, payload, 'whsec_not_ours')],
    ['without the signature header', (payload: string) => request(t.app).post('/api/webhooks/stripe').set('content-type', 'application/json').send(payload)],
    ['altered after signing', (payload: string) => request(t.app).post('/api/webhooks/stripe').set('content-type', 'application/json')
      .set('stripe-signature', Stripe.webhooks.generateTestHeaderString({ payload, secret }))
      .send(payload.replace('"amount_total":2500', '"amount_total":1'))],
  ])('refuses an event %s with 400 and stores nothing', async (_what, send) => {
    const session = paidSession({ treeCount: 1, giftCents: 2500 });
    const event = paymentEvent('checkout.session.completed', session);
    const res = await send(JSON.stringify(event));
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ error: { code: 'validation_failed', message: 'The webhook signature could not be verified' } });
    expect(await donationsFor(session.id)).toHaveLength(0);
    expect(await t.db.getRepository(WebhookEvent).countBy({ id: event.id })).toBe(0);
  });
});

describe('POST /api/webhooks/stripe: receipt', () => {
  it('e-mails a receipt with the amount, date, legal name, tax id, the no-goods statement, the trees and the dedication', async () => {
    await t.db.getRepository(Organisation).update({ id: 1 }, { name: 'Test Shoreline Trust', legalName: 'Test Shoreline Trust, Inc.', taxId: '00-0000000', timeZone: 'America/New_York' });
    const campaign = await buildCampaign(t.db, { name: 'North cove appeal' });
    await Promise.all(Array.from({ length: 2 }, () => buildTree(t.db, { stage: 'ready' })));
    const email = uniqueEmail('receipt');
    const session = paidSession({ campaignId: campaign.id, treeCount: 2, giftCents: 5000, feeCoverCents: 181, donorName: 'Rhea Receipt', donorEmail: email, dedication: { kind: 'memory', name: 'Grandpa Sol' } });
    const event = { ...paymentEvent('checkout.session.completed', session), created: Date.parse('2026-03-14T15:00:00Z') / 1000 };
    await deliver(t.app, JSON.stringify(event), secret).expect(200);

    const mail = await waitForMail(t.config, email, /receipt/i);
    expect(mail.subject).toBe('Your receipt: $51.81 to Test Shoreline Trust');
    const [gift] = await donationsFor(session.id);
    const tags = (await treesOf(gift!.id)).map((x) => x.tag);
    expect(tags).toHaveLength(2);
    for (const line of [
      'Hello Rhea Receipt,',
      'Thank you for sponsoring 2 trees through North cove appeal.',
      `Receipt number: ${gift!.id}`,
      'Date: Saturday, March 14, 2026',
      'Amount: $51.81',
      'Of which: $50.00 gift + $1.81 to cover the card fee',
      'Campaign: North cove appeal',
      `Trees sponsored: ${tags.join(', ')}`,
      'Dedication: In memory of Grandpa Sol',
      'Received by: Test Shoreline Trust, Inc.',
      'Tax ID: 00-0000000',
      'No goods or services were provided in exchange for this contribution.',
    ]) expect(mail.text).toContain(line);
    expect((await t.db.getRepository(Donation).findOneByOrFail({ id: gift!.id })).receiptSentAt).toBeInstanceOf(Date);
  });
});
