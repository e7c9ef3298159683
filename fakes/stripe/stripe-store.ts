import type { StoredSession } from './checkout-session.js';
import type { FormObject } from './form-body.js';
import type { Charge, PaymentIntent, Refund } from './payment-objects.js';

const MAX_RECORDS = 500;

export interface RecordedRequest {
  method: string;
  path: string;
  body: FormObject;
  query: FormObject;
  time: string;
}

export interface StoredResponse {
  status: number;
  body: unknown;
  /** Method, path and parameters of the first request, to refuse a key reused for another. */
  request: string;
}

export interface StripeStore {
  recordRequest(request: RecordedRequest): void;
  /** Newest first. */
  requests(): RecordedRequest[];
  saveSession(stored: StoredSession): void;
  findSession(id: string): StoredSession | undefined;
  /** Newest first. */
  sessions(): StoredSession[];
  /**
   * The SDK retries POSTs on network errors with the same Idempotency-Key; replaying
   * the first response keeps a retry from creating a second session, as the API does.
   */
  replay(key: string): StoredResponse | undefined;
  remember(key: string, response: StoredResponse): void;
  savePayment(payment: { intent: PaymentIntent; charge: Charge }): void;
  findIntent(id: string): PaymentIntent | undefined;
  findCharge(id: string): Charge | undefined;
  saveRefund(refund: Refund): void;
  findRefund(id: string): Refund | undefined;
}

function pushCapped<T>(items: T[], item: T): void {
  items.unshift(item);
  if (items.length > MAX_RECORDS) items.length = MAX_RECORDS;
}

export function createStripeStore(): StripeStore {
  const requests: RecordedRequest[] = [];
  const sessions: StoredSession[] = [];
  const responses = new Map<string, StoredResponse>();
  // Not capped: a charge must stay refundable, and a dev or test process sees few payments.
  const intents = new Map<string, PaymentIntent>();
  const charges = new Map<string, Charge>();
  const refunds = new Map<string, Refund>();
  return {
    recordRequest: (request) => pushCapped(requests, request),
    requests: () => [...requests],
    saveSession: (stored) => pushCapped(sessions, stored),
    findSession: (id) => sessions.find((stored) => stored.session.id === id),
    sessions: () => [...sessions],
    replay: (key) => responses.get(key),
    remember(key, response) {
      responses.set(key, response);
      // Maps iterate in insertion order, so the first key is the oldest.
      const oldest = responses.keys().next();
      if (responses.size > MAX_RECORDS && !oldest.done) responses.delete(oldest.value);
    },
    savePayment({ intent, charge }) {
      intents.set(intent.id, intent);
      charges.set(charge.id, charge);
    },
    findIntent: (id) => intents.get(id),
    findCharge: (id) => charges.get(id),
    saveRefund: (refund) => void refunds.set(refund.id, refund),
    findRefund: (id) => refunds.get(id),
  };
}
