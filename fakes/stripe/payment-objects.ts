import { randomId } from '../support/ids.js';
import type { StoredSession } from './checkout-session.js';

/** The subsets of the API's PaymentIntent, Charge and Refund objects the app may read, same names. */
export interface PaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_received: number;
  created: number;
  currency: string;
  latest_charge: string;
  livemode: false;
  metadata: Record<string, string>;
  status: 'succeeded';
}

export interface Charge {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  billing_details: { email: string | null; name: string | null };
  captured: true;
  created: number;
  currency: string;
  livemode: false;
  metadata: Record<string, string>;
  paid: true;
  payment_intent: string;
  payment_method_details: { type: 'card'; card: { brand: string; last4: string } };
  /** True only once the whole amount is refunded; partial refunds leave it false. */
  refunded: boolean;
  status: 'succeeded';
}

export interface Refund {
  id: string;
  object: 'refund';
  amount: number;
  charge: string;
  created: number;
  currency: string;
  metadata: Record<string, string>;
  payment_intent: string;
  reason: string | null;
  status: 'succeeded';
}

export interface CardSummary {
  brand: string;
  last4: string;
  name: string | null;
}

/** A captured card payment for a session's total, as Checkout creates it when the payer pays. */
export function buildPayment(stored: StoredSession, card: CardSummary, nowSeconds: number): { intent: PaymentIntent; charge: Charge } {
  const { session } = stored;
  const intentId = randomId('pi_', 24);
  const chargeId = randomId('ch_', 24);
  const money = { amount: session.amount_total, currency: session.currency, created: nowSeconds, livemode: false as const };
  const intent: PaymentIntent = {
    id: intentId,
    object: 'payment_intent',
    ...money,
    amount_received: session.amount_total,
    latest_charge: chargeId,
    metadata: { ...stored.paymentMetadata },
    status: 'succeeded',
  };
  const charge: Charge = {
    id: chargeId,
    object: 'charge',
    ...money,
    amount_captured: session.amount_total,
    amount_refunded: 0,
    billing_details: { email: session.customer_email, name: card.name },
    captured: true,
    metadata: { ...stored.paymentMetadata },
    paid: true,
    payment_intent: intentId,
    payment_method_details: { type: 'card', card: { brand: card.brand, last4: card.last4 } },
    refunded: false,
    status: 'succeeded',
  };
  return { intent, charge };
}
