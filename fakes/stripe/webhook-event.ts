import { createHmac } from 'node:crypto';
import { randomId } from '../support/ids.js';

/** The API version the installed SDK pins, so events read like the ones it is typed for. */
export const DEFAULT_API_VERSION = '2026-10-28.endive';

export type EventType = 'checkout.session.completed' | 'checkout.session.expired' | 'charge.refunded';

/** Which API request caused the event; both null when the payer (not the app) caused it. */
export interface EventRequest {
  id: string | null;
  idempotency_key: string | null;
}

/** The API's Event object, as delivered to webhook endpoints. */
export interface StripeEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: unknown };
  livemode: false;
  pending_webhooks: number;
  request: EventRequest;
  type: EventType;
}

export interface EventSpec {
  type: EventType;
  object: unknown;
  request?: EventRequest;
}

/** `data.object` is a copy, so later changes to the session or charge do not rewrite history. */
export function buildEvent(spec: EventSpec, nowSeconds: number, pendingWebhooks: number): StripeEvent {
  return {
    id: randomId('evt_', 24),
    object: 'event',
    api_version: DEFAULT_API_VERSION,
    created: nowSeconds,
    data: { object: structuredClone(spec.object) },
    livemode: false,
    pending_webhooks: pendingWebhooks,
    request: spec.request ?? { id: null, idempotency_key: null },
    type: spec.type,
  };
}

/**
 * The `Stripe-Signature` header: `t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<raw body>">`
 * keyed with the endpoint's signing secret, which `stripe.webhooks.constructEvent` checks.
 */
export function signatureHeader(payload: string, secret: string, timestamp: number): string {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${signature}`;
}
