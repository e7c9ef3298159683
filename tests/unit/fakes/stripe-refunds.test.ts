import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakes, type RunningFakes } from '../../../fakes/index.js';
import { CARDS, payByShortcut, pointWebhooks, startReceiver, stripeClient, treeCheckout, waitFor, WEBHOOK_SECRET, type Receiver } from './stripe-helpers.js';

let fakes: RunningFakes;
let stripe: Stripe;
let base: string;
let endpoint: Receiver;

beforeAll(async () => {
  fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
  base = `http://127.0.0.1:${fakes.stripePort}`;
  stripe = stripeClient(fakes);
  endpoint = await startReceiver();
  await pointWebhooks(base, endpoint.url);
});
afterAll(async () => {
  await fakes.close();
  await endpoint.close();
});

async function paid(): Promise<{ sessionId: string; paymentIntent: string; charge: string }> {
  const session = await stripe.checkout.sessions.create(treeCheckout());
  const { body } = await payByShortcut(base, session.id, CARDS.paid);
  return { sessionId: session.id, paymentIntent: body.paymentIntent as string, charge: body.charge as string };
}

/** The verified `charge.refunded` events received for a charge, oldest first. */
function refundEvents(chargeId: string): Stripe.ChargeRefundedEvent[] {
  return endpoint.received
    .map(({ body, headers }) => stripe.webhooks.constructEvent(body, String(headers['stripe-signature']), WEBHOOK_SECRET))
    .filter((event): event is Stripe.ChargeRefundedEvent => event.type === 'charge.refunded' && event.data.object.id === chargeId);
}

describe('POST /v1/refunds', () => {
  it('refunds a payment in full by payment_intent and sends a signed charge.refunded with the charge', async () => {
    const { paymentIntent, charge } = await paid();

    const refund = await stripe.refunds.create({ payment_intent: paymentIntent }, { idempotencyKey: `refund-${paymentIntent}` });

    expect(refund).toMatchObject({ object: 'refund', amount: 5000, currency: 'usd', status: 'succeeded', charge, payment_intent: paymentIntent });
    expect(refund.id).toMatch(/^re_\w+$/);
    expect(await stripe.refunds.retrieve(refund.id)).toMatchObject({ id: refund.id, amount: 5000 });
    const [event] = await waitFor(() => (refundEvents(charge).length === 1 ? refundEvents(charge) : undefined));
    expect(event!.data.object).toMatchObject({ id: charge, object: 'charge', amount: 5000, amount_refunded: 5000, refunded: true, payment_intent: paymentIntent, currency: 'usd', metadata: { campaignId: 'camp_1' } });
    expect(event!.request).toEqual({ id: expect.stringMatching(/^req_/), idempotency_key: `refund-${paymentIntent}` });
  });

  it('refunds part of a charge, then the rest: refunded turns true only at the full amount', async () => {
    const { charge } = await paid();

    await stripe.refunds.create({ charge, amount: 2000 });
    await stripe.refunds.create({ charge });

    const events = await waitFor(() => (refundEvents(charge).length === 2 ? refundEvents(charge) : undefined));
    expect(events.map((event) => [event.data.object.amount_refunded, event.data.object.refunded])).toEqual([[2000, false], [5000, true]]);
    expect(await stripe.charges.retrieve(charge)).toMatchObject({ amount_refunded: 5000, refunded: true });
  });

  it('refuses more than the unrefunded amount, a second full refund, and unknown payments', async () => {
    const { charge, paymentIntent } = await paid();

    await expect(stripe.refunds.create({ charge, amount: 5001 })).rejects.toMatchObject({ type: 'StripeInvalidRequestError', code: 'amount_too_large', param: 'amount' });
    await stripe.refunds.create({ payment_intent: paymentIntent });
    await expect(stripe.refunds.create({ payment_intent: paymentIntent })).rejects.toMatchObject({ code: 'charge_already_refunded' });
    await expect(stripe.refunds.create({ payment_intent: 'pi_unknown' })).rejects.toMatchObject({ code: 'resource_missing', statusCode: 404 });
    await expect(stripe.refunds.create({})).rejects.toMatchObject({ code: 'parameter_missing' });
    await waitFor(() => (refundEvents(charge).length === 1 ? true : undefined));
  });
});

describe('checkout sessions: list and expire', () => {
  it('lists the session of a payment intent in the API list form', async () => {
    const { sessionId, paymentIntent } = await paid();

    const list = await stripe.checkout.sessions.list({ payment_intent: paymentIntent });
    const none = await stripe.checkout.sessions.list({ payment_intent: 'pi_unknown' });

    expect(list).toMatchObject({ object: 'list', has_more: false, url: '/v1/checkout/sessions' });
    expect(list.data.map((session) => session.id)).toEqual([sessionId]);
    expect(none.data).toEqual([]);
  });

  it('expires an open session and sends checkout.session.expired; an expired one cannot be expired again', async () => {
    const session = await stripe.checkout.sessions.create(treeCheckout());

    const expired = await stripe.checkout.sessions.expire(session.id);

    expect(expired).toMatchObject({ id: session.id, status: 'expired', payment_status: 'unpaid' });
    await waitFor(() => endpoint.received.find(({ body }) => body.includes('checkout.session.expired') && body.includes(session.id)));
    await expect(stripe.checkout.sessions.expire(session.id)).rejects.toMatchObject({ type: 'StripeInvalidRequestError', statusCode: 400 });
  });
});
