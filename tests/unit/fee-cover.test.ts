import { describe, expect, it } from 'vitest';
import { grossUpCents, quoteDonation } from '../../shared/domain/fee-cover.js';

/** US standard card rate 2.9 % + 30¢ (stripe.com/pricing, as transcribed in TRADE.md §7). */
const US_STANDARD = { cardFeePercent: 2.9, cardFeeFixedCents: 30 };
/** The fee the processor takes from a charge, rounded to the cent (for the "net" column). */
const feeOn = (chargeCents: number) => Math.round(chargeCents * 0.029 + 30);

describe('grossUpCents', () => {
  // Source: Stripe support page on passing fees to customers, via vadimkononov.ca;
  // US standard 2.9 % + 30¢ from stripe.com/pricing (worked examples as TRADE.md §7 gives them).
  it.each([
    { net: 10_000, charge: 10_330, fee: 330, netAfterFee: 10_000 },
    { net: 5_000, charge: 5_181, fee: 180, netAfterFee: 5_001 },
    { net: 2_500, charge: 2_606, fee: 106, netAfterFee: 2_500 },
  ])('$net¢ → $charge¢ (fee $fee¢, the organisation nets $netAfterFee¢)', ({ net, charge, fee, netAfterFee }) => {
    expect(grossUpCents(net, US_STANDARD)).toBe(charge);
    expect(feeOn(charge)).toBe(fee);
    expect(charge - feeOn(charge)).toBe(netAfterFee);
  });

  it('never leaves the organisation short: the net after the fee is at least the gift, for every gift to $1,000', () => {
    for (let net = 1; net <= 100_000; net += 7) {
      const charge = grossUpCents(net, US_STANDARD);
      // Exact check in integers: charge × (1 − 0.029) − 30 ≥ net  ⇔  charge × 971 − 30 000 ≥ net × 1 000.
      expect(charge * 971 - 30_000).toBeGreaterThanOrEqual(net * 1_000);
      // …and one cent less would not do (rounded up, not more).
      expect((charge - 1) * 971 - 30_000).toBeLessThan(net * 1_000);
    }
  });

  it('is exact where floating point drifts: 2.9 % read as 29 000 millionths', () => {
    // 100.30 / 0.971 in floating point; the integer rule gives the same cent without relying on it.
    expect(grossUpCents(10_000, { cardFeePercent: 2.9, cardFeeFixedCents: 30 })).toBe(10_330);
    // A quotient that lands exactly on a cent is not pushed up a cent: (67 + 30) / 0.97 = 100 exactly.
    expect(grossUpCents(67, { cardFeePercent: 3, cardFeeFixedCents: 30 })).toBe(100);
  });

  it('adds nothing when the fee is zero, and only the fixed part when the rate is zero', () => {
    expect(grossUpCents(4_321, { cardFeePercent: 0, cardFeeFixedCents: 0 })).toBe(4_321);
    expect(grossUpCents(4_321, { cardFeePercent: 0, cardFeeFixedCents: 30 })).toBe(4_351);
  });

  it.each([
    [-1, US_STANDARD],
    [1.5, US_STANDARD],
    [100, { cardFeePercent: 100, cardFeeFixedCents: 0 }],
  ])('refuses %s cents at %o', (net, fee) => {
    expect(() => grossUpCents(net, fee)).toThrow(RangeError);
  });
});

describe('quoteDonation', () => {
  it('prices trees at the campaign price and grosses up the gift when the donor covers the fee', () => {
    expect(quoteDonation({ trees: 2, coverFees: true }, 2_500, US_STANDARD)).toEqual({ giftCents: 5_000, feeCoverCents: 181, totalCents: 5_181, treeCount: 2 });
    expect(quoteDonation({ trees: 4, coverFees: false }, 2_500, US_STANDARD)).toEqual({ giftCents: 10_000, feeCoverCents: 0, totalCents: 10_000, treeCount: 4 });
  });

  it('counts a custom amount as whole trees toward the goal, rounding down', () => {
    expect(quoteDonation({ amountCents: 7_499, coverFees: false }, 2_500, US_STANDARD).treeCount).toBe(2);
    expect(quoteDonation({ amountCents: 7_500, coverFees: false }, 2_500, US_STANDARD).treeCount).toBe(3);
    expect(quoteDonation({ amountCents: 1_000, coverFees: true }, 2_500, US_STANDARD)).toEqual({ giftCents: 1_000, feeCoverCents: 61, totalCents: 1_061, treeCount: 0 });
  });

  it('without a campaign takes an amount as a general gift of no trees, and refuses a tree count', () => {
    expect(quoteDonation({ amountCents: 10_000, coverFees: true }, null, US_STANDARD)).toEqual({ giftCents: 10_000, feeCoverCents: 330, totalCents: 10_330, treeCount: 0 });
    expect(() => quoteDonation({ trees: 1, coverFees: false }, null, US_STANDARD)).toThrow(RangeError);
  });

  it('needs exactly one of trees and amount', () => {
    expect(() => quoteDonation({ coverFees: false }, 2_500, US_STANDARD)).toThrow(RangeError);
    expect(() => quoteDonation({ trees: 1, amountCents: 100, coverFees: false }, 2_500, US_STANDARD)).toThrow(RangeError);
  });
});
