import type { StoredSession } from './checkout-session.js';
import { buildPayment } from './payment-objects.js';
import { resourceMissing, type StripeApiError } from './stripe-errors.js';
import type { StripeStore } from './stripe-store.js';
import { checkCard, type CardError, type CardInput } from './test-cards.js';
import type { EventRequest } from './webhook-event.js';
import type { WebhookSender } from './webhook-sender.js';

export interface CheckoutFlowDeps {
  store: StripeStore;
  webhooks: WebhookSender;
  /** Unix seconds. */
  now: () => number;
}

export type PayOutcome =
  | { kind: 'paid'; stored: StoredSession; redirectUrl: string | null; paymentIntent: string; charge: string; eventId: string }
  | { kind: 'card_error'; stored: StoredSession; error: CardError }
  | { kind: 'not_open'; stored: StoredSession }
  | { kind: 'missing' };

export type ExpireOutcome = { ok: true; stored: StoredSession } | { ok: false; status: number; error: StripeApiError };

export interface CheckoutFlow {
  /** A session by id, expired first if its `expires_at` has passed (as the service does on its own). */
  lookup(id: string): StoredSession | undefined;
  /** What the hosted page's Pay button does. */
  pay(id: string, card: CardInput): PayOutcome;
  /** `POST /v1/checkout/sessions/:id/expire`. */
  expire(id: string, request: EventRequest): ExpireOutcome;
}

/** The payer returns to `success_url` with the template variable filled in, as on the hosted service. */
export function successRedirect(stored: StoredSession): string | null {
  return stored.session.success_url?.replaceAll('{CHECKOUT_SESSION_ID}', stored.session.id) ?? null;
}

/**
 * Paying, expiring and lazy expiry of Checkout Sessions. Each runs synchronously up to the
 * status change, so two Pay clicks on one session can never both succeed.
 */
export function createCheckoutFlow({ store, webhooks, now }: CheckoutFlowDeps): CheckoutFlow {
  function markExpired(stored: StoredSession, request?: EventRequest): void {
    stored.session.status = 'expired';
    webhooks.publish({ type: 'checkout.session.expired', object: stored.session, request });
  }

  function lookup(id: string): StoredSession | undefined {
    const stored = store.findSession(id);
    if (stored?.session.status === 'open' && stored.session.expires_at <= now()) markExpired(stored);
    return stored;
  }

  function pay(id: string, card: CardInput): PayOutcome {
    const stored = lookup(id);
    if (!stored) return { kind: 'missing' };
    if (stored.session.status !== 'open') return { kind: 'not_open', stored };
    const checked = checkCard(card);
    if (!checked.ok) return { kind: 'card_error', stored, error: checked.error };
    const name = card.name?.trim() || null;
    const { intent, charge } = buildPayment(stored, { brand: checked.brand, last4: checked.last4, name }, now());
    store.savePayment({ intent, charge });
    Object.assign(stored.session, {
      status: 'complete',
      payment_status: 'paid',
      payment_intent: intent.id,
      customer_details: { email: stored.session.customer_email, name },
    });
    const { event } = webhooks.publish({ type: 'checkout.session.completed', object: stored.session });
    return { kind: 'paid', stored, redirectUrl: successRedirect(stored), paymentIntent: intent.id, charge: charge.id, eventId: event.id };
  }

  function expire(id: string, request: EventRequest): ExpireOutcome {
    const stored = lookup(id);
    if (!stored) return { ok: false, status: 404, error: resourceMissing('checkout.session', id) };
    if (stored.session.status !== 'open') {
      const message = `This Checkout Session is ${stored.session.status}; only open sessions can be expired.`;
      return { ok: false, status: 400, error: { type: 'invalid_request_error', message } };
    }
    markExpired(stored, request);
    return { ok: true, stored };
  }

  return { lookup, pay, expire };
}
