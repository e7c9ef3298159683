/** Amounts in minor units (cents) as people read them; pure. */

const formats = new Map<string, Intl.NumberFormat>();
function currencyFormat(currency: string): Intl.NumberFormat {
  const code = currency.toUpperCase();
  let f = formats.get(code);
  if (!f) formats.set(code, (f = new Intl.NumberFormat('en-US', { style: 'currency', currency: code })));
  return f;
}

/** Digits after the decimal point of a currency (2 for usd, 0 for jpy). */
export function minorDigits(currency: string): number {
  return currencyFormat(currency).resolvedOptions().maximumFractionDigits ?? 2;
}

/**
 * A plain decimal for spreadsheets, from integer minor units without floating point.
 * @example decimalAmount(10_330, 'usd') // '103.30'
 */
export function decimalAmount(minor: number, currency: string): string {
  const digits = minorDigits(currency);
  const sign = minor < 0 ? '-' : '';
  const abs = String(Math.abs(minor)).padStart(digits + 1, '0');
  return digits === 0 ? `${sign}${abs}` : `${sign}${abs.slice(0, -digits)}.${abs.slice(-digits)}`;
}

/**
 * @example formatMoney(10_330, 'usd') // '$103.30'
 */
export function formatMoney(minor: number, currency: string): string {
  return currencyFormat(currency).format(Number(decimalAmount(minor, currency)));
}

export const treesWord = (n: number) => (n === 1 ? '1 tree' : `${n} trees`);
