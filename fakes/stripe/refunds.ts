import { randomId } from '../support/ids.js';
import { integer, stringMap, text, type FormObject } from './form-body.js';
import type { Charge, Refund } from './payment-objects.js';
import { invalidParam, missingParam, resourceMissing, type StripeApiError } from './stripe-errors.js';
import type { StripeStore } from './stripe-store.js';
import type { EventRequest } from './webhook-event.js';
import type { WebhookSender } from './webhook-sender.js';

export interface RefundDeps {
  store: StripeStore;
  webhooks: WebhookSender;
  /** Unix seconds. */
  now: () => number;
}

export type RefundOutcome = { ok: true; refund: Refund } | { ok: false; status: number; error: StripeApiError };

const REASONS = new Set(['duplicate', 'fraudulent', 'requested_by_customer']);

const failure = (status: number, error: StripeApiError): RefundOutcome => ({ ok: false, status, error });

/** `charge` or `payment_intent` names what to refund; when both are given they must agree. */
function findCharge(params: FormObject, store: StripeStore): Charge | RefundOutcome {
  const chargeId = text(params, 'charge');
  const intentId = text(params, 'payment_intent');
  if (!chargeId && !intentId) return failure(400, missingParam('charge'));
  const intent = intentId ? store.findIntent(intentId) : undefined;
  if (intentId && !intent) return failure(404, resourceMissing('payment_intent', intentId, 'payment_intent'));
  const charge = store.findCharge(chargeId ?? intent?.latest_charge ?? '');
  if (!charge) return failure(404, resourceMissing('charge', chargeId ?? '', 'charge'));
  if (intent && charge.payment_intent !== intent.id) {
    return failure(400, invalidParam('charge', `Charge ${charge.id} does not belong to PaymentIntent ${intent.id}.`));
  }
  return charge;
}

function refundAmount(params: FormObject, charge: Charge): number | RefundOutcome {
  const remaining = charge.amount - charge.amount_refunded;
  if (remaining === 0) return failure(400, { type: 'invalid_request_error', code: 'charge_already_refunded', message: `Charge ${charge.id} has already been refunded.` });
  if (text(params, 'amount') === undefined) return remaining;
  const amount = integer(params, 'amount');
  if (amount === undefined || amount < 1) return failure(400, invalidParam('amount', 'Invalid positive integer', 'parameter_invalid_integer'));
  if (amount > remaining) {
    const message = `Refund amount (${amount}) is greater than the unrefunded amount on the charge (${remaining}), in ${charge.currency} minor units.`;
    return failure(400, { type: 'invalid_request_error', code: 'amount_too_large', param: 'amount', message });
  }
  return amount;
}

/**
 * `POST /v1/refunds`: refunds all or part of a captured charge at once (test-mode refunds
 * succeed immediately), then sends `charge.refunded` with the updated charge. Like the
 * service, the event also follows partial refunds; `refunded` turns true only at the full amount.
 */
export function createRefund(params: FormObject, request: EventRequest, { store, webhooks, now }: RefundDeps): RefundOutcome {
  const charge = findCharge(params, store);
  if ('ok' in charge) return charge;
  const amount = refundAmount(params, charge);
  if (typeof amount !== 'number') return amount;
  const reason = text(params, 'reason') ?? null;
  if (reason !== null && !REASONS.has(reason)) return failure(400, invalidParam('reason', `Invalid reason: must be one of ${[...REASONS].join(', ')}`));
  const refund: Refund = {
    id: randomId('re_', 24),
    object: 'refund',
    amount,
    charge: charge.id,
    created: now(),
    currency: charge.currency,
    metadata: stringMap(params, 'metadata'),
    payment_intent: charge.payment_intent,
    reason,
    status: 'succeeded',
  };
  store.saveRefund(refund);
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded === charge.amount;
  webhooks.publish({ type: 'charge.refunded', object: charge, request });
  return { ok: true, refund };
}
