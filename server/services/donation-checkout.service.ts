/**
 * The donor's side before and after paying: a hosted checkout session for a gift (nothing is
 * stored here; the payment webhook records the donation), and the thank-you page's status.
 */
import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { quoteDonation } from '../../shared/domain/fee-cover.js';
import type { CheckoutBody, CheckoutResult, DonationThanks } from '../../shared/schemas/donation.schema.js';
import { DONATION_LIMITS } from '../../shared/schemas/donation.schema.js';
import type { Payments } from '../adapters/payments.js';
import { Campaign } from '../db/entities/campaign.entity.js';
import { Donation } from '../db/entities/donation.entity.js';
import { Organisation } from '../db/entities/organisation.entity.js';
import { checkoutLines } from '../domain/giving/checkout-lines.js';
import { giftMetadata, readGiftMetadata } from '../domain/giving/checkout-metadata.js';
import { localDate } from '../domain/tide/time-zone.js';
import { NotFoundError, ValidationError } from '../errors.js';
import { isOpen } from './campaign.service.js';
import { treeTagsOf } from './sponsor-trees.js';

const CLIENT_KEY = /^[A-Za-z0-9_-]{8,100}$/;

export function createDonationCheckoutService(deps: { db: DataSource; payments: Payments; clock: () => Date; appUrl: string }) {
  const appUrl = deps.appUrl.replace(/\/+$/, '');
  const organisation = () => deps.db.getRepository(Organisation).findOneByOrFail({ id: 1 });

  async function openCampaign(id: string, timeZone: string): Promise<Campaign> {
    const c = await deps.db.getRepository(Campaign).findOneBy({ id });
    if (!c || !c.active) throw new ValidationError('This campaign does not exist', { campaignId: ['is not a campaign'] });
    if (!isOpen(c, localDate(deps.clock().getTime(), timeZone))) throw new ValidationError('This campaign is not taking gifts now', { campaignId: ['is not open'] });
    return c;
  }

  return {
    /**
     * A checkout session for the gift. `clientKey` (the form's own idempotency key) makes a
     * double submit give back the same session; without it every call makes a new one.
     */
    async checkout(body: CheckoutBody, clientKey?: string): Promise<CheckoutResult> {
      const org = await organisation();
      const campaign = body.campaignId ? await openCampaign(body.campaignId, org.timeZone) : null;
      const quote = quoteDonation({ trees: body.trees, amountCents: body.amountCents, coverFees: body.coverFees }, campaign?.priceCents ?? null, org.givingRules);
      if (quote.giftCents > DONATION_LIMITS.maxCents) throw new ValidationError('The gift is too large', { trees: ['comes to more than $100,000; choose fewer trees'] });
      const cancelPath = campaign ? `/sponsor/${campaign.id}?cancelled=1` : '/sponsor?cancelled=1';
      const session = await deps.payments.createCheckoutSession(
        {
          mode: 'payment',
          line_items: checkoutLines({ quote, currency: org.currency, campaignName: campaign?.name ?? null, organisationName: org.name }),
          customer_email: body.donor.email,
          metadata: giftMetadata({
            campaignId: campaign?.id ?? null,
            treeCount: quote.treeCount,
            giftCents: quote.giftCents,
            feeCoverCents: quote.feeCoverCents,
            donorName: body.donor.name,
            donorEmail: body.donor.email,
            wallName: body.wallName ?? null,
            wantsUpdates: body.wantsUpdates,
            dedication: body.dedication ?? null,
          }),
          success_url: `${appUrl}/sponsor/thanks?session_id={CHECKOUT_SESSION_ID}`,
          cancel_url: `${appUrl}${cancelPath}`,
        },
        `donation-checkout:${clientKey && CLIENT_KEY.test(clientKey) ? clientKey : randomUUID()}`,
      );
      if (!session.url) throw new Error(`Checkout session ${session.id} has no URL`);
      return { checkoutUrl: session.url, sessionId: session.id };
    },

    /** What the thank-you page shows; `recorded` turns true once the payment webhook has landed. */
    async thanks(sessionId: string): Promise<DonationThanks> {
      const d = await deps.db.getRepository(Donation).findOne({ where: { checkoutSessionId: sessionId }, relations: { campaign: true } });
      if (d) {
        const trees = await treeTagsOf(deps.db.manager, d.id);
        return { recorded: true, status: d.status, donorName: d.donorName, amountCents: d.amountCents, currency: d.currency, treeCount: d.treeCount, campaignName: d.campaign?.name ?? null, trees };
      }
      const session = await deps.payments.retrieveCheckoutSession(sessionId);
      const gift = session ? readGiftMetadata(session.metadata) : null;
      if (!session || !gift) throw new NotFoundError('Checkout session');
      const campaign = gift.campaignId ? await deps.db.getRepository(Campaign).findOneBy({ id: gift.campaignId }) : null;
      return {
        recorded: false, status: 'pending', donorName: gift.donorName, amountCents: session.amount_total ?? 0, currency: session.currency ?? (await organisation()).currency,
        treeCount: gift.treeCount, campaignName: campaign?.name ?? null, trees: [],
      };
    },
  };
}
export type DonationCheckoutService = ReturnType<typeof createDonationCheckoutService>;
