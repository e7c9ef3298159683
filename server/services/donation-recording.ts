/**
 * Writing donations from payment events, inside the caller's transaction: the handled-event
 * record, the donation row (at most one per checkout session), its trees and its receipt.
 */
import type { EntityManager } from 'typeorm';
import type { CheckoutSession, PaymentEvent } from '../adapters/payments.js';
import { Campaign } from '../db/entities/campaign.entity.js';
import { Donation } from '../db/entities/donation.entity.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import { readGiftMetadata, recordedAmounts } from '../domain/giving/checkout-metadata.js';
import { receiptMail } from '../domain/giving/receipt-mail.js';
import { queueMails } from './crew-outbox.js';
import { linkTrees } from './sponsor-trees.js';

/** Records the event id; false when it was handled before (a replay), so nothing else is done. */
export async function claimEvent(tx: EntityManager, event: Pick<PaymentEvent, 'id' | 'type'>, now: Date): Promise<boolean> {
  const rows: unknown[] = await tx.query(
    'INSERT INTO webhook_event (id, type, received_at) VALUES ($1, $2, $3) ON CONFLICT (id) DO NOTHING RETURNING id',
    [event.id, event.type.slice(0, 80), now],
  );
  return rows.length === 1;
}

export const idOf = (x: string | { id: string } | null | undefined): string | null => (typeof x === 'string' ? x : (x?.id ?? null));

/**
 * Inserts the session's donation unless one exists for it (ON CONFLICT (checkout_session_id)
 * DO NOTHING). Returns the new row's id, or null when it existed already or the session is
 * not a gift made through this app.
 */
export async function insertDonation(tx: EntityManager, session: CheckoutSession, opts: { status: 'paid' | 'refunded'; paidAt: Date; now: Date; currency: string }): Promise<string | null> {
  const gift = readGiftMetadata(session.metadata);
  if (!gift) return null;
  const amounts = recordedAmounts(session.amount_total ?? 0, gift);
  if (amounts.amountCents <= 0 || amounts.giftCents <= 0) return null;
  const email = session.customer_details?.email ?? session.customer_email ?? gift.donorEmail;
  const rows: { id: string }[] = await tx.query(
    `INSERT INTO donation (campaign_id, checkout_session_id, payment_intent_id, amount_cents, gift_cents, fee_cover_cents, currency, status,
       tree_count, donor_name, donor_email, wall_name, wants_updates, dedication_kind, dedication_name, paid_at, refunded_at)
     VALUES ((SELECT id FROM campaign WHERE id = $1), $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12, $13, $14, $15, $16, $17)
     ON CONFLICT (checkout_session_id) DO NOTHING
     RETURNING id`,
    [
      gift.campaignId, session.id, idOf(session.payment_intent), amounts.amountCents, amounts.giftCents, amounts.feeCoverCents,
      (session.currency ?? opts.currency).toLowerCase().slice(0, 3), opts.status, gift.treeCount, gift.donorName.slice(0, 120), email.slice(0, 254),
      gift.wallName === null ? null : gift.wallName.slice(0, 80), gift.wantsUpdates, gift.dedication?.kind ?? null, gift.dedication?.name.slice(0, 120) ?? null,
      opts.paidAt, opts.status === 'refunded' ? opts.now : null,
    ],
  );
  return rows[0]?.id ?? null;
}

/** Links the new gift's trees and queues its receipt (dedupe key `receipt:<donation>`). */
export async function sponsorAndReceipt(tx: EntityManager, donationId: string, opts: { appUrl: string; now: Date; log: (line: string) => void }): Promise<void> {
  const d = await tx.getRepository(Donation).findOneByOrFail({ id: donationId });
  const tags = await linkTrees(tx, d.id, d.treeCount);
  if (tags.length < d.treeCount) opts.log(`[giving] donation ${d.id}: ${tags.length} of ${d.treeCount} trees linked; the nursery is short, the rest wait for new trees`);
  const org = await tx.getRepository(Organisation).findOneByOrFail({ id: 1 });
  const campaign = d.campaignId ? await tx.getRepository(Campaign).findOneBy({ id: d.campaignId }) : null;
  const content = receiptMail(
    {
      id: d.id, donorName: d.donorName, amountCents: d.amountCents, giftCents: d.giftCents, feeCoverCents: d.feeCoverCents, currency: d.currency,
      paidAt: d.paidAt, treeCount: d.treeCount, treeTags: [...tags].sort(), campaignName: campaign?.name ?? null,
      dedication: d.dedicationKind && d.dedicationName ? { kind: d.dedicationKind, name: d.dedicationName } : null,
    },
    { name: org.name, legalName: org.legalName, taxId: org.taxId, timeZone: org.timeZone },
    { href: `${opts.appUrl.replace(/\/+$/, '')}/sponsor/thanks?session_id=${encodeURIComponent(d.checkoutSessionId)}`, label: 'See your gift and its trees' },
  );
  if (!d.donorEmail) return opts.log(`[giving] donation ${d.id} has no e-mail address; no receipt sent`);
  await queueMails(tx, [{ kind: 'donation-receipt', to: d.donorEmail, content, dedupeKey: `receipt:${d.id}` }]);
  // The receipt is issued now: it is in the outbox in this same transaction, and the sender delivers it.
  await tx.getRepository(Donation).update({ id: d.id }, { receiptSentAt: opts.now });
}
