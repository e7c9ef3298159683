import { computed, type ComputedRef } from 'vue';
import { grossUpCents, quoteDonation, type CardFee } from '@shared/domain/fee-cover';

export type GiftMode = 'trees' | 'amount';

export interface GiftChoice {
  mode: GiftMode;
  trees: number | null | undefined;
  /** The custom gift in cents (amount mode). */
  amountCents: number;
  coverFees: boolean;
}

export interface GiftSummary {
  /** What the donor means the organisation to receive. */
  giftCents: number;
  /** Added so the card fee doesn't eat into the gift (0 unless chosen). */
  feeCoverCents: number;
  /** What the card is charged. */
  totalCents: number;
  /** What is left after a domestic card's fee, by the organisation's fee settings. */
  receivedCents: number;
  /** Trees the gift sponsors (whole trees at the campaign's price). */
  trees: number;
  /** What covering the fees adds (or would add) to this gift, so the offer shows its exact cost. */
  coverOfferCents: number;
}

const NOTHING: GiftSummary = { giftCents: 0, feeCoverCents: 0, totalCents: 0, receivedCents: 0, trees: 0, coverOfferCents: 0 };

/** The card fee on a charge, to the nearest cent: a percentage of the charge plus a fixed part. */
export function cardFeeCents(chargeCents: number, fee: CardFee): number {
  return Math.round((chargeCents * fee.cardFeePercent) / 100 + fee.cardFeeFixedCents);
}

function whole(n: number | null | undefined): number {
  return typeof n === 'number' && Number.isFinite(n) && n > 0 ? Math.floor(n) : 0;
}

/**
 * The donate form's summary, from the same quote the server charges (shared/domain/fee-cover.ts):
 * trees × price, or a custom amount counting as whole trees at the price; with fees covered the
 * charge is grossed up so the organisation nets the whole gift. `priceCents` null: no campaign.
 */
export function priceGift(choice: GiftChoice, priceCents: number | null, fee: CardFee): GiftSummary {
  const request = choice.mode === 'trees' ? { trees: whole(choice.trees) } : { amountCents: whole(choice.amountCents) };
  if ((request.trees ?? request.amountCents ?? 0) === 0 || (choice.mode === 'trees' && priceCents === null)) return NOTHING;
  const quote = quoteDonation({ ...request, coverFees: choice.coverFees }, priceCents, fee);
  return {
    giftCents: quote.giftCents,
    feeCoverCents: quote.feeCoverCents,
    totalCents: quote.totalCents,
    receivedCents: Math.max(0, quote.totalCents - cardFeeCents(quote.totalCents, fee)),
    trees: quote.treeCount,
    coverOfferCents: grossUpCents(quote.giftCents, fee) - quote.giftCents,
  };
}

/** The summary kept in step with the form and the campaign. */
export function useSponsorPricing(
  choice: () => GiftChoice,
  campaign: () => { priceCents: number; fee: CardFee } | null,
): ComputedRef<GiftSummary | null> {
  return computed(() => {
    const c = campaign();
    return c ? priceGift(choice(), c.priceCents, c.fee) : null;
  });
}
