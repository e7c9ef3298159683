import Stripe from 'stripe';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { startFakes, type RunningFakes } from '../../../fakes/index.js';
import {
  CARDS, payByShortcut, pointWebhooks, settledEvent, startReceiver, stripeClient, treeCheckout, waitFor, WEBHOOK_SECRET, type Receiver,
} from './stripe-helpers.js';

let fakes: RunningFakes;
let stripe: Stripe;
let base: string;
const receivers: Receiver[] = [];

beforeAll(async () => {
  fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
  base = `http://127.0.0.1:${fakes.stripePort}`;
  stripe = stripeClient(fakes);
});
afterEach(async () => {
  await Promise.all(receivers.splice(0).map((receiver) => receiver.close()));
});
afterAll(() => fakes.close());

async function receiver(statuses?: number[]): Promise<Receiver> {
  const started = await startReceiver(statuses);
  receivers.push(started);
  return started;
}

/** Creates and pays a session; resolves with the session id and the event id. */
async function paidSession(): Promise<{ sessionId: string; eventId: string }> {
  const session = await stripe.checkout.sessions.create(treeCheckout());
  const { body } = await payByShortcut(base, session.id, CARDS.paid);
  return { sessionId: session.id, eventId: body.eventId as string };
}

describe('webhook delivery', () => {
  it('posts checkout.session.completed signed so that stripe.webhooks.constructEvent accepts it', async () => {
    const endpoint = await receiver();
    await pointWebhooks(base, endpoint.url);

    const { sessionId, eventId } = await paidSession();

    const [delivery] = await waitFor(() => (endpoint.received.length > 0 ? endpoint.received : undefined));
    expect(delivery!.headers['content-type']).toBe('application/json; charset=utf-8');
    const header = String(delivery!.headers['stripe-signature']);
    expect(header).toMatch(/^t=\d+,v1=[0-9a-f]{64}$/);
    const event = stripe.webhooks.constructEvent(delivery!.body, header, WEBHOOK_SECRET);
    expect(event).toMatchObject({
      id: eventId,
      object: 'event',
      type: 'checkout.session.completed',
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      api_version: expect.any(String),
      data: { object: { id: sessionId, object: 'checkout.session', status: 'complete', payment_status: 'paid', amount_total: 5000, metadata: { campaignId: 'camp_1', trees: '2' } } },
    });
    expect(event.created).toBeCloseTo(Date.now() / 1000, -1);
    expect(() => stripe.webhooks.constructEvent(delivery!.body, header, 'whsec_wrong')).toThrow(Stripe.errors.StripeSignatureVerificationError);
  });

  it('retries a receiver that answers 500 twice, then 200: three signed attempts, delivered', async () => {
    const endpoint = await receiver([500, 500, 200]);
    await pointWebhooks(base, endpoint.url);

    const { eventId } = await paidSession();

    const record = await settledEvent(base, eventId);
    expect(record.state).toBe('delivered');
    expect(record.attempts.map((attempt) => attempt.status)).toEqual([500, 500, 200]);
    expect(endpoint.received).toHaveLength(3);
    const ids = endpoint.received.map(({ body, headers }) => stripe.webhooks.constructEvent(body, String(headers['stripe-signature']), WEBHOOK_SECRET).id);
    expect(ids).toEqual([eventId, eventId, eventId]);
  });

  it('gives up after one attempt more than the configured delays when the endpoint keeps failing', async () => {
    const endpoint = await receiver([503]);
    await pointWebhooks(base, endpoint.url, [10, 10]);

    const { eventId } = await paidSession();

    const record = await settledEvent(base, eventId);
    expect(record).toMatchObject({ state: 'failed', attempts: [{ status: 503 }, { status: 503 }, { status: 503 }] });
  });

  it('retries when nothing listens at the endpoint, recording the network error', async () => {
    const gone = await startReceiver();
    await gone.close();
    await pointWebhooks(base, gone.url, [10]);

    const { eventId } = await paidSession();

    const record = await settledEvent(base, eventId);
    expect(record.state).toBe('failed');
    expect(record.attempts).toHaveLength(2);
    expect(record.attempts[0]).toMatchObject({ status: null, error: expect.stringContaining('ECONNREFUSED') });
  });

  it('resends a recorded event with the same id and body', async () => {
    const endpoint = await receiver();
    await pointWebhooks(base, endpoint.url);
    const { eventId } = await paidSession();
    await settledEvent(base, eventId);

    const res = await fetch(`${base}/__fake/events/${eventId}/resend`, { method: 'POST' });

    expect(res.status).toBe(202);
    await waitFor(() => (endpoint.received.length === 2 ? true : undefined));
    expect(endpoint.received[1]!.body).toBe(endpoint.received[0]!.body);
  });

  it('only records events while no endpoint is set', async () => {
    expect((await fetch(`${base}/__fake/webhook-endpoint`, { method: 'DELETE' })).status).toBe(204);

    const { eventId } = await paidSession();

    const record = await (await fetch(`${base}/__fake/events/${eventId}`)).json();
    expect(record).toMatchObject({ state: 'no_endpoint', attempts: [], event: { pending_webhooks: 0 } });
    expect((await fetch(`${base}/__fake/events/${eventId}/resend`, { method: 'POST' })).status).toBe(409);
  });

  it.each([
    [{ url: 'ftp://127.0.0.1/x', secret: 's' }],
    [{ url: 'http://127.0.0.1/x', secret: '' }],
    [{ url: 'http://127.0.0.1/x', secret: 's', retryDelaysMs: [-1] }],
  ])('rejects a webhook endpoint of %j', async (body) => {
    const res = await fetch(`${base}/__fake/webhook-endpoint`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });

    expect(res.status).toBe(400);
  });
});

describe('startFakes({ stripeWebhook })', () => {
  it('delivers to the configured endpoint from the start and stops a waiting retry on close', async () => {
    const endpoint = await receiver([500]);
    const own = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0, stripeWebhook: { url: endpoint.url, secret: WEBHOOK_SECRET, retryDelaysMs: [60_000] } });
    const ownBase = `http://127.0.0.1:${own.stripePort}`;
    const session = await stripeClient(own).checkout.sessions.create(treeCheckout());
    await payByShortcut(ownBase, session.id, CARDS.paid);
    await waitFor(() => (endpoint.received.length === 1 ? true : undefined));

    const started = performance.now();
    await own.close();

    expect(performance.now() - started).toBeLessThan(1000);
    expect(stripe.webhooks.constructEvent(endpoint.received[0]!.body, String(endpoint.received[0]!.headers['stripe-signature']), WEBHOOK_SECRET).type).toBe('checkout.session.completed');
  });
});
