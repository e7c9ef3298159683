/**
 * "Cover the card fee": how much a donor pays so the organisation nets the gift they meant,
 * and how a donate request turns into amounts and a number of trees. Integer cents only.
 */

/** The card fee as settings hold it (e.g. 2.9 % + 30¢, the US standard rate). */
export interface CardFee {
  cardFeePercent: number;
  cardFeeFixedCents: number;
}

const MILLION = 1_000_000n;

/**
 * Millionths of the amount the percentage takes. Settings store the percentage as a decimal
 * number (2.9); read to four decimals so 2.9 is exactly 29 000 and no float error reaches the cents.
 */
function rateMillionths(percent: number): bigint {
  return BigInt(Math.round(percent * 10_000));
}

/**
 * Gross-up: the charge G whose fee leaves the net N, G = (N + fixed) / (1 − rate), rounded up
 * to the cent so the organisation never nets less than N. Exact integer arithmetic.
 * @example grossUpCents(10_000, { cardFeePercent: 2.9, cardFeeFixedCents: 30 }) // 10_330 ($103.30)
 */
export function grossUpCents(netCents: number, fee: CardFee): number {
  if (!Number.isSafeInteger(netCents) || netCents < 0) throw new RangeError('netCents must be a whole number of cents, 0 or more');
  const rate = rateMillionths(fee.cardFeePercent);
  if (rate < 0n || rate >= MILLION) throw new RangeError('cardFeePercent must be at least 0 and below 100');
  const numerator = (BigInt(netCents) + BigInt(Math.round(fee.cardFeeFixedCents))) * MILLION;
  const denominator = MILLION - rate;
  return Number((numerator + denominator - 1n) / denominator);
}

/** What a donor asked for: a number of trees, or an amount of their own. */
export interface DonateRequest {
  trees?: number;
  amountCents?: number;
  coverFees: boolean;
}

export interface DonationQuote {
  /** What the organisation is meant to receive. */
  giftCents: number;
  /** Added on top so the card fee does not eat into the gift; 0 when not chosen. */
  feeCoverCents: number;
  /** What the card is charged: gift + fee cover. */
  totalCents: number;
  /** Trees the gift counts toward the campaign's goal. */
  treeCount: number;
}

/**
 * Amounts and trees of a donate request at a campaign's price per tree (null: no campaign).
 * Trees: gift = trees × price. Custom amount: the gift is the amount, and it counts as
 * floor(amount / price) trees toward the goal (the remainder is a gift beyond whole trees;
 * without a campaign there is no price, so no trees). The fee cover grosses up the gift.
 * @example quoteDonation({ trees: 2, coverFees: true }, 2_500, { cardFeePercent: 2.9, cardFeeFixedCents: 30 })
 * // { giftCents: 5_000, feeCoverCents: 181, totalCents: 5_181, treeCount: 2 }
 */
export function quoteDonation(request: DonateRequest, priceCents: number | null, fee: CardFee): DonationQuote {
  const byTrees = request.trees !== undefined;
  if (byTrees === (request.amountCents !== undefined)) throw new RangeError('Give either trees or amountCents');
  if (priceCents !== null && (!Number.isSafeInteger(priceCents) || priceCents <= 0)) throw new RangeError('priceCents must be positive whole cents');
  let giftCents: number;
  let treeCount: number;
  if (byTrees) {
    if (priceCents === null) throw new RangeError('Trees need a price per tree');
    treeCount = request.trees ?? 0;
    giftCents = treeCount * priceCents;
  } else {
    giftCents = request.amountCents ?? 0;
    treeCount = priceCents === null ? 0 : Math.floor(giftCents / priceCents);
  }
  const totalCents = request.coverFees ? grossUpCents(giftCents, fee) : giftCents;
  return { giftCents, feeCoverCents: totalCents - giftCents, totalCents, treeCount };
}
