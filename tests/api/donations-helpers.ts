/** Shared by the donation API tests: signed payment events, and the payments fake's test controls. */
import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import Stripe from 'stripe';
import request from 'supertest';
import type { Config } from '../../server/config.js';
import { giftMetadata, type GiftDetails } from '../../server/domain/giving/checkout-metadata.js';
import { uniqueEmail } from '../factories/user.factory.js';

const hex = (n: number) => randomBytes(n).toString('hex');
export const CARDS = { paid: '4242424242424242', declined: '4000000000000002' };

/** POSTs a payload to the webhook route, signed as the payments service signs it. */
export function deliver(app: Express, payload: string, secret: string) {
  const header = Stripe.webhooks.generateTestHeaderString({ payload, secret });
  return request(app).post('/api/webhooks/stripe').set('content-type', 'application/json').set('stripe-signature', header).send(payload);
}

/** A completed Checkout Session as the service sends it in `checkout.session.completed`. */
export function paidSession(gift: Partial<GiftDetails> & { treeCount: number; giftCents: number }, over: Record<string, unknown> = {}) {
  const details: GiftDetails = { campaignId: null, feeCoverCents: 0, donorName: 'Test Donor', donorEmail: uniqueEmail('donor'), wallName: null, wantsUpdates: false, dedication: null, ...gift };
  return {
    id: `cs_test_${hex(24)}`,
    object: 'checkout.session',
    amount_subtotal: details.giftCents + details.feeCoverCents,
    amount_total: details.giftCents + details.feeCoverCents,
    currency: 'usd',
    customer_email: details.donorEmail,
    customer_details: { email: details.donorEmail, name: null },
    metadata: giftMetadata(details),
    mode: 'payment',
    payment_intent: `pi_test_${hex(12)}`,
    payment_status: 'paid',
    status: 'complete',
    ...over,
  };
}

export function paymentEvent(type: string, object: unknown) {
  return { id: `evt_test_${hex(12)}`, object: 'event', api_version: '2026-10-28.endive', created: Math.floor(Date.now() / 1000), data: { object }, livemode: false, pending_webhooks: 1, request: { id: null, idempotency_key: null }, type };
}

/** The refund of a charge as `charge.refunded` carries it. */
export const refundedCharge = (paymentIntent: string, amount: number) =>
  ({ id: `ch_test_${hex(12)}`, object: 'charge', amount, amount_refunded: amount, created: Math.floor(Date.now() / 1000), currency: 'usd', payment_intent: paymentIntent, refunded: true });

interface FakeEventRecord {
  event: { id: string; type: string; data: { object: { id: string; payment_intent?: string | null } } };
}

/** Events the payments fake has sent (or would send), newest first. */
export async function fakeEvents(config: Config, type: string): Promise<FakeEventRecord['event'][]> {
  const res = await fetch(`${config.STRIPE_API_URL}/__fake/events?type=${encodeURIComponent(type)}`);
  return ((await res.json()) as FakeEventRecord[]).map((r) => r.event);
}

/** The fake's test shortcut for the hosted page's Pay button. */
export async function payInFake(config: Config, sessionId: string, card: string): Promise<{ status: number; body: { paid?: boolean; paymentIntent?: string } }> {
  const res = await fetch(`${config.STRIPE_API_URL}/__fake/sessions/${sessionId}/pay`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ card }) });
  return { status: res.status, body: (await res.json()) as { paid?: boolean; paymentIntent?: string } };
}

/** The SDK as the app builds it, for acting on the fake directly (e.g. refunds). */
export function sdkFor(config: Config): Stripe {
  const url = new URL(config.STRIPE_API_URL);
  return new Stripe(config.STRIPE_SECRET_KEY, { host: url.hostname, port: Number(url.port), protocol: 'http', maxNetworkRetries: 0 });
}
