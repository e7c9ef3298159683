/** Words and numbers for printed reports, CSV files and notes (pure). */
import { fromMetres } from '../tide/units.js';
import type { LengthUnit } from '../tide/types.js';

/**
 * Integer cents as money in the currency.
 * @example formatMoney(200340, 'usd') // '$2,003.40'
 */
export function formatMoney(cents: number, currency: string): string {
  return new Intl.NumberFormat('en-US', { style: 'currency', currency: currency.toUpperCase() }).format(cents / 100);
}

/** Cents as a plain decimal for spreadsheets: `2003.40`. */
export const centsToDecimal = (cents: number): string => `${cents < 0 ? '-' : ''}${Math.floor(Math.abs(cents) / 100)}.${String(Math.abs(cents) % 100).padStart(2, '0')}`;

/**
 * A 0–1 rate as a percent with one decimal, or a dash when there is none.
 * @example formatRate(0.8333) // '83.3%'
 */
export const formatRate = (rate: number | null): string => (rate === null ? '–' : `${(rate * 100).toFixed(1)}%`);

/**
 * An elevation in metres in the organisation's unit, two decimals.
 * @example formatElevation(0.3, 'ft') // '0.98 ft'
 */
export const formatElevation = (metres: number, unit: LengthUnit): string => `${fromMetres(metres, unit).toFixed(2)} ${unit}`;

/**
 * The tide station of a site's datum, in words.
 * @example stationLabel('noaa/8726738') // 'NOAA station 8726738'
 */
export function stationLabel(stationId: string): string {
  const [source, id] = stationId.split('/');
  return id ? `${(source ?? '').toUpperCase()} station ${id}` : stationId;
}

/** "1 month", "12 months", "2 years". */
export const milestoneLabel = (months: number): string => (months >= 24 && months % 12 === 0 ? `${months / 12} years` : `${months} month${months === 1 ? '' : 's'}`);
