/** Shared set-up for the payments-fake tests: the real SDK pointed at the fake, and a webhook receiver. */
import type { IncomingHttpHeaders } from 'node:http';
import Stripe from 'stripe';
import { listenHttp } from '../../../fakes/support/http-server.js';
import type { RunningFakes } from '../../../fakes/index.js';

export const WEBHOOK_SECRET = 'whsec_ebbroot_test';
export const SUCCESS_URL = 'http://127.0.0.1:5180/sponsor/thanks?session={CHECKOUT_SESSION_ID}';
export const CANCEL_URL = 'http://127.0.0.1:5180/sponsor';
export const CARDS = { paid: '4242 4242 4242 4242', declined: '4000000000000002', noFunds: '4000000000009995' };

export function stripeClient(fakes: RunningFakes): Stripe {
  return new Stripe('sk_test_ebbroot', { host: '127.0.0.1', port: fakes.stripePort, protocol: 'http', maxNetworkRetries: 0 });
}

/** Two sponsored trees at 25.00 USD, as the donation service will ask for them. */
export const treeCheckout = (): Stripe.Checkout.SessionCreateParams => ({
  mode: 'payment',
  customer_email: 'marisol.test@example.com',
  success_url: SUCCESS_URL,
  cancel_url: CANCEL_URL,
  metadata: { campaignId: 'camp_1', trees: '2' },
  payment_intent_data: { metadata: { campaignId: 'camp_1' } },
  line_items: [{ quantity: 2, price_data: { currency: 'usd', unit_amount: 2500, product_data: { name: 'Sponsor a mangrove tree' } } }],
});

export interface Received {
  body: string;
  headers: IncomingHttpHeaders;
}

export interface Receiver {
  url: string;
  received: Received[];
  close(): Promise<void>;
}

/** A tiny webhook endpoint that answers with `statuses` in turn (the last one repeats). */
export async function startReceiver(statuses: number[] = [200]): Promise<Receiver> {
  const received: Received[] = [];
  const listening = await listenHttp((req, res) => {
    const chunks: Buffer[] = [];
    req.on('data', (chunk: Buffer) => chunks.push(chunk));
    req.on('end', () => {
      received.push({ body: Buffer.concat(chunks).toString('utf8'), headers: req.headers });
      res.writeHead(statuses[Math.min(received.length, statuses.length) - 1] ?? 200).end();
    });
  }, 0, '127.0.0.1');
  return { url: `http://127.0.0.1:${listening.port}/api/webhooks/stripe`, received, close: () => listening.close() };
}

export async function pointWebhooks(base: string, url: string, retryDelaysMs = [20, 40, 80]): Promise<void> {
  const res = await fetch(`${base}/__fake/webhook-endpoint`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ url, secret: WEBHOOK_SECRET, retryDelaysMs }),
  });
  if (!res.ok) throw new Error(`webhook-endpoint answered ${res.status}`);
}

export async function payByShortcut(base: string, sessionId: string, card: string): Promise<{ status: number; body: Record<string, unknown> }> {
  const res = await fetch(`${base}/__fake/sessions/${sessionId}/pay`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ card }),
  });
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

export interface EventRecordJson {
  event: Stripe.Event;
  state: 'no_endpoint' | 'pending' | 'delivered' | 'failed';
  attempts: Array<{ attempt: number; status: number | null; error: string | null; url: string }>;
}

export async function eventRecords(base: string): Promise<EventRecordJson[]> {
  return (await (await fetch(`${base}/__fake/events`)).json()) as EventRecordJson[];
}

/** Polls until `check` returns a value (not undefined) or the time is up. */
export async function waitFor<T>(check: () => Promise<T | undefined> | T | undefined, timeoutMs = 5000): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value !== undefined) return value;
    if (Date.now() > until) throw new Error('waitFor timed out');
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

/** The recorded event once its delivery has finished (delivered or given up). */
export function settledEvent(base: string, eventId: string, timeoutMs?: number): Promise<EventRecordJson> {
  return waitFor(async () => {
    const res = await fetch(`${base}/__fake/events/${eventId}`);
    const record = (await res.json()) as EventRecordJson;
    return record.state === 'delivered' || record.state === 'failed' ? record : undefined;
  }, timeoutMs);
}
