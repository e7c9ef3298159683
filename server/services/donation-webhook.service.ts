/**
 * Payment webhooks: the only way a donation is recorded. The signature is verified over the
 * raw body first; each event id is handled once (webhook_event), and each checkout session
 * gives at most one donation (unique checkout_session_id), so replays and any order of
 * `checkout.session.completed` and `charge.refunded` end in exactly one row.
 */
import type { DataSource } from 'typeorm';
import { BadSignatureError, type PaymentEvent, type Payments } from '../adapters/payments.js';
import { Donation } from '../db/entities/donation.entity.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import { AppError } from '../errors.js';
import { claimEvent, idOf, insertDonation, sponsorAndReceipt } from './donation-recording.js';
import { releaseTrees } from './sponsor-trees.js';

type Event<T extends PaymentEvent['type']> = Extract<PaymentEvent, { type: T }>;
export type WebhookOutcome = 'recorded' | 'refunded' | 'replayed' | 'ignored';

export function createDonationWebhookService(deps: {
  db: DataSource;
  payments: Payments;
  clock: () => Date;
  appUrl: string;
  log: (line: string) => void;
  /** Wakes the outbox sender after commit so the receipt goes out now. */
  flush: () => Promise<void>;
}) {
  const { db, payments, clock, log } = deps;
  const orgCurrency = async () => (await db.getRepository(Organisation).findOneByOrFail({ id: 1 })).currency;

  async function paid(event: Event<'checkout.session.completed' | 'checkout.session.async_payment_succeeded'>): Promise<WebhookOutcome> {
    const session = event.data.object;
    const currency = await orgCurrency();
    const outcome = await db.transaction(async (tx): Promise<WebhookOutcome> => {
      const now = clock();
      if (!(await claimEvent(tx, event, now))) return 'replayed';
      // A declined or still-pending payment leaves nothing to record.
      if (session.payment_status !== 'paid') return 'ignored';
      const id = await insertDonation(tx, session, { status: 'paid', paidAt: new Date(event.created * 1000), now, currency });
      if (!id) return 'ignored';
      await sponsorAndReceipt(tx, id, { appUrl: deps.appUrl, now, log });
      return 'recorded';
    });
    if (outcome === 'recorded') await deps.flush();
    return outcome;
  }

  /**
   * A full refund marks the gift refunded and frees its trees. When the refund arrives before
   * the payment was recorded (events out of order), the session is fetched by its payment
   * intent and recorded as refunded straight away; the late completion then finds it and does nothing.
   */
  async function refunded(event: Event<'charge.refunded'>): Promise<WebhookOutcome> {
    const charge = event.data.object;
    const paymentIntent = idOf(charge.payment_intent);
    const partial = charge.refunded === false;
    const known = paymentIntent ? await db.getRepository(Donation).existsBy({ paymentIntentId: paymentIntent }) : true;
    const session = !partial && paymentIntent && !known ? await payments.checkoutSessionForPaymentIntent(paymentIntent) : null;
    const currency = await orgCurrency();
    return db.transaction(async (tx): Promise<WebhookOutcome> => {
      const now = clock();
      if (!(await claimEvent(tx, event, now))) return 'replayed';
      if (partial && paymentIntent) {
        // Partial refunds are not tracked (no column for them): the gift keeps its full amount, so leave a trace in the log.
        log(`[giving] partial refund of ${charge.amount_refunded} of ${charge.amount} (${charge.currency}) on payment ${paymentIntent} is not recorded; the donation keeps its full amount until the charge is refunded in full`);
      }
      if (!paymentIntent || partial) return 'ignored';
      if (session) await insertDonation(tx, session, { status: 'refunded', paidAt: new Date(charge.created * 1000), now, currency });
      const d = await tx.getRepository(Donation).findOne({ where: { paymentIntentId: paymentIntent }, lock: { mode: 'pessimistic_write' } });
      if (!d) return 'ignored';
      if (d.status !== 'refunded') await tx.getRepository(Donation).update({ id: d.id }, { status: 'refunded', refundedAt: now });
      await releaseTrees(tx, d.id);
      return 'refunded';
    });
  }

  return {
    /** Verifies and handles one delivery; a bad or missing signature is a 400 and stores nothing. */
    async handle(rawBody: Buffer, signature: string | undefined): Promise<{ type: string; outcome: WebhookOutcome }> {
      let event: PaymentEvent;
      try {
        event = payments.verifyWebhook(rawBody, signature);
      } catch (err) {
        if (err instanceof BadSignatureError) throw new AppError(400, 'validation_failed', 'The webhook signature could not be verified');
        throw err;
      }
      let outcome: WebhookOutcome = 'ignored';
      if (event.type === 'checkout.session.completed' || event.type === 'checkout.session.async_payment_succeeded') outcome = await paid(event);
      else if (event.type === 'charge.refunded') outcome = await refunded(event);
      return { type: event.type, outcome };
    },
  };
}
export type DonationWebhookService = ReturnType<typeof createDonationWebhookService>;
