import { randomId } from '../support/ids.js';
import { child, integer, stringMap, text, type FormObject } from './form-body.js';
import { parseLineItems, type LineItem } from './line-items.js';
import { invalidParam, missingParam, type StripeApiError } from './stripe-errors.js';

/** The subset of Stripe's Checkout Session object the app reads, with the same names. */
export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: null;
  /** Filled in when the payer completes the page, as the hosted service does. */
  customer_details: { email: string | null; name: string | null } | null;
  customer_email: string | null;
  expires_at: number;
  livemode: false;
  metadata: Record<string, string>;
  mode: CheckoutMode;
  /** Created when the payer pays; a plain id, as the API returns it unexpanded. */
  payment_intent: string | null;
  payment_status: 'unpaid' | 'paid' | 'no_payment_required';
  status: 'open' | 'complete' | 'expired';
  success_url: string | null;
  url: string;
}

export interface StoredSession {
  session: CheckoutSession;
  lineItems: LineItem[];
  /**
   * `payment_intent_data[metadata]`: like the hosted service, the session's own `metadata`
   * is not copied to the payment and charge, only this is.
   */
  paymentMetadata: Record<string, string>;
}

/** One-off payments only: subscriptions and setup need saved prices and customers the fake lacks. */
type CheckoutMode = 'payment';
const SESSION_LIFETIME_SECONDS = 24 * 60 * 60;

function isMode(value: string): value is CheckoutMode {
  return value === 'payment';
}

export type CreateSessionResult = { ok: true; stored: StoredSession } | { ok: false; error: StripeApiError };

/**
 * Builds a session from `POST /v1/checkout/sessions` params. Totals are computed from
 * `price_data.unit_amount × quantity`, as the hosted service does, so the app's
 * amounts can be checked against what a payer would be charged.
 */
export function createCheckoutSession(params: FormObject, baseUrl: string, nowSeconds: number): CreateSessionResult {
  const mode = text(params, 'mode');
  if (mode === undefined) return { ok: false, error: missingParam('mode') };
  if (!isMode(mode)) return { ok: false, error: invalidParam('mode', `The local payments fake supports mode=payment only, not ${mode}`) };
  const parsed = parseLineItems(params);
  if (!parsed.ok) return parsed;
  const amount = parsed.items.reduce((sum, item) => sum + item.amountTotal, 0);
  const id = randomId('cs_test_', 58);
  const session: CheckoutSession = {
    id,
    object: 'checkout.session',
    amount_subtotal: amount,
    amount_total: amount,
    cancel_url: text(params, 'cancel_url') ?? null,
    client_reference_id: text(params, 'client_reference_id') ?? null,
    created: nowSeconds,
    currency: parsed.items[0]?.currency ?? 'usd',
    customer: null,
    customer_details: null,
    customer_email: text(params, 'customer_email') ?? null,
    expires_at: integer(params, 'expires_at') ?? nowSeconds + SESSION_LIFETIME_SECONDS,
    livemode: false,
    metadata: stringMap(params, 'metadata'),
    mode,
    payment_intent: null,
    payment_status: amount === 0 ? 'no_payment_required' : 'unpaid',
    status: 'open',
    success_url: text(params, 'success_url') ?? null,
    url: `${baseUrl}/pay/${id}`,
  };
  const paymentMetadata = stringMap(child(params, 'payment_intent_data') ?? {}, 'metadata');
  return { ok: true, stored: { session, lineItems: parsed.items, paymentMetadata } };
}
