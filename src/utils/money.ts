/**
 * Money is stored and sent as integer minor units ("cents") of the organisation's one currency
 * (ISO 4217, lower case, as the payments API takes it). These helpers turn it into text and back.
 */

const LOCALE = 'en-US';

function formatter(currency: string, fractionDigits?: number): Intl.NumberFormat | null {
  try {
    return new Intl.NumberFormat(LOCALE, {
      style: 'currency',
      currency: currency.toUpperCase(),
      ...(fractionDigits === undefined ? {} : { minimumFractionDigits: fractionDigits, maximumFractionDigits: fractionDigits }),
    });
  } catch {
    return null; // not a currency code Intl knows
  }
}

/**
 * How many minor units the currency has after the decimal point, from Intl's ISO 4217 data
 * (2 for usd and eur, 0 for jpy); 2 when the code is unknown.
 */
export function minorDigits(currency: string): number {
  return formatter(currency)?.resolvedOptions().maximumFractionDigits ?? 2;
}

/** 5150 usd → 51.5 (what a person types into an amount field). */
export function toMajorUnits(cents: number, currency: string): number {
  return cents / 10 ** minorDigits(currency);
}

/** 51.5 usd → 5150; rounds to the nearest minor unit so 0.1 + 0.2 style drift never leaks into an amount. */
export function toMinorUnits(amount: number, currency: string): number {
  return Math.round(amount * 10 ** minorDigits(currency));
}

/**
 * Integer cents as money text in the currency.
 * @example formatMoney(10330, 'usd') // "$103.30"; formatMoney(2500, 'usd', { whole: true }) // "$25"
 */
export function formatMoney(cents: number, currency: string, options: { whole?: boolean } = {}): string {
  const digits = minorDigits(currency);
  const amount = cents / 10 ** digits;
  // "Whole" drops ".00" from round amounts only, so a price of $25.50 still shows its cents.
  const shownDigits = options.whole && Number.isInteger(amount) ? 0 : digits;
  const format = formatter(currency, shownDigits);
  if (format) return format.format(amount);
  return `${amount.toFixed(shownDigits)} ${currency.toUpperCase()}`;
}

/** The currency's symbol or code as Intl writes it in en-US ("$", "€", "CA$"), for field labels. */
export function currencySymbol(currency: string): string {
  const part = formatter(currency)?.formatToParts(0).find((p) => p.type === 'currency');
  return part?.value ?? currency.toUpperCase();
}
