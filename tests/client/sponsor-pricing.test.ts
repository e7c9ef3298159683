import { describe, expect, it } from 'vitest';
import { cardFeeCents, priceGift } from '@/composables/useSponsorPricing';
import { checkoutBody, type SponsorFormState } from '@/composables/useSponsorForm';
import { currencySymbol, formatMoney, minorDigits, toMajorUnits, toMinorUnits } from '@/utils/money';

const US_STANDARD = { cardFeePercent: 2.9, cardFeeFixedCents: 30 };

describe('money', () => {
  // Minor units per ISO 4217 as Intl carries them (usd and eur 2, jpy 0, bhd 3).
  it.each([
    ['usd', 2],
    ['eur', 2],
    ['jpy', 0],
    ['bhd', 3],
    ['zz9', 2],
  ])('%s has %i minor digits', (currency, digits) => {
    expect(minorDigits(currency)).toBe(digits);
  });

  it.each([
    [10330, 'usd', {}, '$103.30'],
    [2500, 'usd', { whole: true }, '$25'],
    [2550, 'usd', { whole: true }, '$25.50'],
    [123456789, 'usd', {}, '$1,234,567.89'],
    [500, 'jpy', {}, '¥500'],
    [0, 'usd', {}, '$0.00'],
    [1999, 'eur', {}, '€19.99'],
    [1234, 'zz9', {}, '12.34 ZZ9'],
  ] as const)('formatMoney(%i, %s, %o) is %s', (cents, currency, options, text) => {
    expect(formatMoney(cents, currency, options)).toBe(text);
  });

  it('turns typed amounts into whole cents without float drift, and back', () => {
    expect(toMinorUnits(51.81, 'usd')).toBe(5181);
    expect(toMinorUnits(0.1 + 0.2, 'usd')).toBe(30);
    expect(toMinorUnits(19.999, 'usd')).toBe(2000);
    expect(toMinorUnits(500, 'jpy')).toBe(500);
    expect(toMajorUnits(2550, 'usd')).toBe(25.5);
  });

  it('names the currency for field labels', () => {
    expect(currencySymbol('usd')).toBe('$');
    expect(currencySymbol('cad')).toBe('CA$');
  });
});

describe('priceGift (the donate form summary)', () => {
  // Gross-up G = (N + 0.30) / (1 − 0.029), rounded up to the cent, and the fee each charge then
  // pays: worked examples in TRADE.md §7 (vadimkononov.ca, citing Stripe's support page on passing
  // fees to customers; rate from stripe.com/pricing, US standard 2.9 % + 30¢).
  it.each([
    [10_000, 10_330, 10_000],
    [5_000, 5_181, 5_001],
    [2_500, 2_606, 2_500],
  ])('a %i-cent gift with fees covered is charged %i and nets %i', (gift, charged, net) => {
    const s = priceGift({ mode: 'amount', trees: 0, amountCents: gift, coverFees: true }, null, US_STANDARD);
    expect(s).toMatchObject({ giftCents: gift, totalCents: charged, feeCoverCents: charged - gift, receivedCents: net });
    expect(cardFeeCents(charged, US_STANDARD)).toBe(charged - net);
  });

  it('prices trees at the campaign price and offers the exact cover even when not ticked', () => {
    const s = priceGift({ mode: 'trees', trees: 2, amountCents: 0, coverFees: false }, 2500, US_STANDARD);
    // $50.00 uncovered: the fee 50 × 2.9 % + 0.30 = 1.75 comes out of the gift (TRADE.md §7 rate).
    expect(s).toEqual({ giftCents: 5000, feeCoverCents: 0, totalCents: 5000, receivedCents: 4825, trees: 2, coverOfferCents: 181 });
  });

  it('counts a custom amount as the whole trees it buys', () => {
    expect(priceGift({ mode: 'amount', trees: 0, amountCents: 6000, coverFees: false }, 2500, US_STANDARD).trees).toBe(2);
    expect(priceGift({ mode: 'amount', trees: 0, amountCents: 2000, coverFees: false }, 2500, US_STANDARD).trees).toBe(0);
  });

  it('shows nothing to pay while the amount is empty', () => {
    expect(priceGift({ mode: 'amount', trees: 0, amountCents: 0, coverFees: true }, 2500, US_STANDARD).totalCents).toBe(0);
    expect(priceGift({ mode: 'trees', trees: null, amountCents: 0, coverFees: true }, 2500, US_STANDARD).totalCents).toBe(0);
  });
});

describe('checkoutBody', () => {
  const form: SponsorFormState = {
    mode: 'trees', trees: 2, amount: undefined, coverFees: true, dedicationKind: 'none', dedicationName: '',
    name: ' Noor Castellanos ', email: ' noor@example.test ', wall: 'name', wantsUpdates: true,
  };

  it('sends trees, the donor and the wall name', () => {
    expect(checkoutBody(form, 'c1', 'usd')).toEqual({
      campaignId: 'c1', trees: 2, coverFees: true, donor: { name: 'Noor Castellanos', email: 'noor@example.test' }, wallName: 'Noor Castellanos', wantsUpdates: true,
    });
  });

  it.each([
    ['anonymous', ''],
    ['none', null],
  ] as const)('wall choice %s sends wallName %o', (wall, wallName) => {
    expect(checkoutBody({ ...form, wall }, 'c1', 'usd').wallName).toBe(wallName);
  });

  it('sends a custom amount in cents and a dedication', () => {
    const body = checkoutBody({ ...form, mode: 'amount', amount: 40.5, dedicationKind: 'memory', dedicationName: 'Abel Okafor' }, 'c1', 'usd');
    expect(body).toMatchObject({ amountCents: 4050, dedication: { kind: 'memory', name: 'Abel Okafor' } });
    expect(body).not.toHaveProperty('trees');
  });
});
