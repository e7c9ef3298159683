/** Number formats for the nursery's messages (people read them on a phone at the tanks). */

/**
 * A salinity for a message: at most one decimal, no trailing zero.
 * @example formatPpt(26) // '26 ppt'; formatPpt(31.25) // '31.3 ppt'
 */
export function formatPpt(ppt: number): string {
  return `${formatNumber(ppt, 1)} ppt`;
}

/**
 * Litres for a task line: one decimal.
 * @example formatLitres(3.786) // '3.8 L'
 */
export function formatLitres(litres: number): string {
  return `${litres.toFixed(1)} L`;
}

/**
 * A share (0–1) as a whole percent, or with one decimal below 10%.
 * @example formatShare(0.4213) // '42%'; formatShare(0.052) // '5.2%'
 */
export function formatShare(share: number): string {
  const pct = share * 100;
  return `${formatNumber(pct, pct < 10 ? 1 : 0)}%`;
}

/** Metres with two decimals. */
export const formatMetres = (m: number): string => `${m.toFixed(2)} m`;

/** Rounds to `decimals` and drops trailing zeros (and a negative zero). */
export function formatNumber(value: number, decimals: number): string {
  const rounded = Number(value.toFixed(decimals));
  return String(rounded === 0 ? 0 : rounded);
}

/** Rounds to `decimals` places (for numbers returned to callers). */
export function roundTo(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(value * f) / f;
}
