/**
 * The payments service through the official Stripe SDK. Configuration points it at the local
 * payments fake in development and tests (STRIPE_API_URL), at the real API in production.
 */
import Stripe from 'stripe';

export type CheckoutSession = Stripe.Checkout.Session;
export type CheckoutSessionParams = Stripe.Checkout.SessionCreateParams;
export type PaymentEvent = Stripe.Event;

/** A webhook whose signature does not verify (wrong secret, altered body, too old, missing). */
export class BadSignatureError extends Error {}

/** The payments service turned a request down (e.g. the charge is refunded already); the message says why. */
export class PaymentRefusedError extends Error {}

export interface Payments {
  /** Creates a hosted checkout page; the same idempotency key gives back the same session. */
  createCheckoutSession(params: CheckoutSessionParams, idempotencyKey: string): Promise<CheckoutSession>;
  /** The session, or null when the service does not know the id. */
  retrieveCheckoutSession(id: string): Promise<CheckoutSession | null>;
  /** The checkout session that created a payment intent, or null. */
  checkoutSessionForPaymentIntent(paymentIntentId: string): Promise<CheckoutSession | null>;
  /** Refunds what is left of the payment; throws PaymentRefusedError when the service turns it down. */
  refundPaymentIntent(paymentIntentId: string, idempotencyKey: string): Promise<{ id: string; status: string }>;
  /** Verifies the `Stripe-Signature` header over the raw body; throws BadSignatureError. */
  verifyWebhook(rawBody: Buffer, signature: string | undefined): PaymentEvent;
}

/** Splits the API URL into the SDK's host, port and protocol options. */
export function sdkTarget(apiUrl: string): { host: string; port: number; protocol: 'http' | 'https' } {
  const url = new URL(apiUrl);
  const protocol = url.protocol === 'http:' ? 'http' : 'https';
  const port = url.port ? Number(url.port) : protocol === 'http' ? 80 : 443;
  return { host: url.hostname, port, protocol };
}

const isMissing = (err: unknown) => err instanceof Stripe.errors.StripeError && (err.statusCode === 404 || err.code === 'resource_missing');

export function createPayments(opts: { secretKey: string; webhookSecret: string; apiUrl: string }): Payments {
  // The SDK retries network failures and 409/5xx answers itself, reusing the idempotency key.
  const stripe = new Stripe(opts.secretKey, { ...sdkTarget(opts.apiUrl), maxNetworkRetries: 2, timeout: 20_000 });
  return {
    createCheckoutSession: (params, idempotencyKey) => stripe.checkout.sessions.create(params, { idempotencyKey }),
    async retrieveCheckoutSession(id) {
      try {
        return await stripe.checkout.sessions.retrieve(id);
      } catch (err) {
        if (isMissing(err)) return null;
        throw err;
      }
    },
    async checkoutSessionForPaymentIntent(paymentIntentId) {
      const page = await stripe.checkout.sessions.list({ payment_intent: paymentIntentId, limit: 1 });
      return page.data[0] ?? null;
    },
    async refundPaymentIntent(paymentIntentId, idempotencyKey) {
      try {
        const refund = await stripe.refunds.create({ payment_intent: paymentIntentId }, { idempotencyKey });
        return { id: refund.id, status: refund.status ?? 'pending' };
      } catch (err) {
        if (err instanceof Stripe.errors.StripeInvalidRequestError) throw new PaymentRefusedError(err.message);
        throw err;
      }
    },
    verifyWebhook(rawBody, signature) {
      if (!signature) throw new BadSignatureError('The Stripe-Signature header is missing');
      try {
        return stripe.webhooks.constructEvent(rawBody, signature, opts.webhookSecret);
      } catch (err) {
        throw new BadSignatureError(err instanceof Error ? err.message : String(err));
      }
    },
  };
}
