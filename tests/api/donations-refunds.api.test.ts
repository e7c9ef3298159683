import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Donation } from '../../server/db/entities/donation.entity.js';
import { OutboxMessage } from '../../server/db/entities/outbox-message.entity.js';
import { Tree } from '../../server/db/entities/tree.entity.js';
import { createSmtpMailer } from '../../server/adapters/email.js';
import { createApp } from '../../server/app.js';
import { buildCampaign } from '../factories/donation.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { uniqueEmail } from '../factories/user.factory.js';
import { createTestApp, type TestApp } from '../setup/test-app.js';
import { CARDS, deliver, fakeEvents, paidSession, payInFake, paymentEvent, refundedCharge, sdkFor } from './donations-helpers.js';

// Its own database: these tests count every nursery tree they link.
let t: TestApp;
let secret: string;
beforeAll(async () => {
  t = await createTestApp({ ownDatabase: 'donation_refunds' });
  secret = t.config.STRIPE_WEBHOOK_SECRET;
});
afterAll(() => t.close());

const donationsFor = (sessionId: string) => t.db.getRepository(Donation).findBy({ checkoutSessionId: sessionId });
const treesOf = (donationId: string) => t.db.getRepository(Tree).find({ where: { sponsorDonationId: donationId }, order: { tag: 'ASC' } });

describe('POST /api/webhooks/stripe: refunds', () => {
  it('marks the gift refunded and frees its trees; a replay or a partial refund changes nothing', async () => {
    await Promise.all(Array.from({ length: 2 }, () => buildTree(t.db, { stage: 'ready' })));
    const session = paidSession({ treeCount: 2, giftCents: 5000 });
    await deliver(t.app, JSON.stringify(paymentEvent('checkout.session.completed', session)), secret).expect(200);
    const [gift] = await donationsFor(session.id);
    const trees = await treesOf(gift!.id);
    expect(trees).toHaveLength(2);

    const partial = paymentEvent('charge.refunded', { ...refundedCharge(session.payment_intent, 5000), amount_refunded: 1000, refunded: false });
    expect((await deliver(t.app, JSON.stringify(partial), secret)).body.outcome).toBe('ignored');
    expect((await donationsFor(session.id))[0]!.status).toBe('paid');

    const refund = JSON.stringify(paymentEvent('charge.refunded', refundedCharge(session.payment_intent, 5000)));
    expect((await deliver(t.app, refund, secret)).body.outcome).toBe('refunded');
    expect((await deliver(t.app, refund, secret)).body.outcome).toBe('replayed');
    const [after] = await donationsFor(session.id);
    expect(after).toMatchObject({ status: 'refunded', amountCents: 5000 });
    expect(after!.refundedAt).toBeInstanceOf(Date);
    expect(await treesOf(gift!.id)).toHaveLength(0);
    for (const tree of trees) expect((await t.db.getRepository(Tree).findOneByOrFail({ id: tree.id })).sponsorDonationId).toBeNull();
  });

  it('a refund that arrives before the payment (out of order, through the payments fake) leaves one refunded donation, whatever is replayed', async () => {
    const campaign = await buildCampaign(t.db);
    const email = uniqueEmail('order');
    const checkout = await request(t.app).post('/api/donations/checkout').send({ campaignId: campaign.id, trees: 2, coverFees: true, donor: { name: 'Ona Order', email } });
    expect(checkout.status).toBe(201);
    const sessionId = checkout.body.sessionId as string;
    const paid = await payInFake(t.config, sessionId, CARDS.paid);
    expect(paid).toMatchObject({ status: 200, body: { paid: true } });
    const paymentIntent = paid.body.paymentIntent!;
    await sdkFor(t.config).refunds.create({ payment_intent: paymentIntent });
    const completed = (await fakeEvents(t.config, 'checkout.session.completed')).find((e) => e.data.object.id === sessionId);
    const refunded = (await fakeEvents(t.config, 'charge.refunded')).find((e) => e.data.object.payment_intent === paymentIntent);
    expect(completed && refunded).toBeTruthy();
    const [c, r] = [JSON.stringify(completed), JSON.stringify(refunded)];

    expect((await deliver(t.app, r, secret)).body.outcome).toBe('refunded');
    expect((await deliver(t.app, c, secret)).body.outcome).toBe('ignored');
    for (const payload of [c, r, r, c, c, r, c, r, c, r]) expect((await deliver(t.app, payload, secret)).status).toBe(200);

    const rows = await donationsFor(sessionId);
    expect(rows).toHaveLength(1);
    // $50 of trees with the fee covered: (5000 + 30) / (1 − 0.029) rounded up = 5181 (TRADE.md §7).
    expect(rows[0]).toMatchObject({ status: 'refunded', campaignId: campaign.id, amountCents: 5181, giftCents: 5000, feeCoverCents: 181, treeCount: 2, donorEmail: email, paymentIntentId: paymentIntent });
    expect(await treesOf(rows[0]!.id)).toHaveLength(0);
    expect(await t.db.getRepository(OutboxMessage).countBy({ dedupeKey: `receipt:${rows[0]!.id}` })).toBe(0);
  });
});

describe('POST /api/webhooks/stripe: concurrency', () => {
  it('never gives one tree to two gifts recorded at the same moment', async () => {
    await Promise.all(Array.from({ length: 30 }, () => buildTree(t.db, { stage: 'ready' })));
    const sessions = Array.from({ length: 10 }, () => paidSession({ treeCount: 3, giftCents: 7500 }));
    const answers = await Promise.all(sessions.map((s) => deliver(t.app, JSON.stringify(paymentEvent('checkout.session.completed', s)), secret)));
    expect(answers.map((a) => a.status)).toEqual(Array(10).fill(200));
    const linked = new Set<string>();
    for (const s of sessions) {
      const [gift] = await donationsFor(s.id);
      const trees = await treesOf(gift!.id);
      // Had two gifts picked the same rows, the later update would have taken them from the first.
      expect(trees).toHaveLength(3);
      for (const tree of trees) linked.add(tree.id);
    }
    expect(linked.size).toBe(30);
  });
});

describe('POST /api/webhooks/stripe: two app instances on one database', () => {
  it('record each payment once when the provider delivers to both at the same time', async () => {
    const mailer = createSmtpMailer({ host: t.config.SMTP_HOST, port: t.config.SMTP_PORT, from: t.config.MAIL_FROM });
    const second = createApp({ config: t.config, db: t.db, mailer, log: () => undefined, notifier: t.background.notifier });
    try {
      await Promise.all(Array.from({ length: 8 }, () => buildTree(t.db, { stage: 'ready' })));
      const sessions = Array.from({ length: 4 }, () => paidSession({ treeCount: 2, giftCents: 5000 }));
      const payloads = sessions.map((s) => JSON.stringify(paymentEvent('checkout.session.completed', s)));
      const answers = await Promise.all(payloads.flatMap((p) => [deliver(t.app, p, secret), deliver(second.app, p, secret), deliver(second.app, p, secret)]));
      expect(answers.every((a) => a.status === 200)).toBe(true);
      for (const s of sessions) {
        const rows = await donationsFor(s.id);
        expect(rows).toHaveLength(1);
        expect(await treesOf(rows[0]!.id)).toHaveLength(2);
        expect(await t.db.getRepository(OutboxMessage).countBy({ dedupeKey: `receipt:${rows[0]!.id}` })).toBe(1);
      }
    } finally {
      await second.close();
      mailer.close();
    }
  });
});

