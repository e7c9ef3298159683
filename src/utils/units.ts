import type { LengthUnit } from '@shared/schemas/organisation.schema';

/** Exactly 0.3048 m to the international foot. */
const METRES_PER_FOOT = 0.3048;

const NAMES: Record<LengthUnit, { symbol: string; plural: string }> = {
  ft: { symbol: 'ft', plural: 'feet' },
  m: { symbol: 'm', plural: 'metres' },
};

/** "ft" → "feet", for labels such as "Depth (feet)". */
export function unitName(units: LengthUnit): string {
  return NAMES[units].plural;
}

/** Lengths are stored in metres (see shared/schemas/site.schema.ts); this gives them in `units`. */
export function toDisplayLength(metres: number, units: LengthUnit): number {
  return units === 'ft' ? metres / METRES_PER_FOOT : metres;
}

/** The reverse of toDisplayLength, for numbers typed into a form. */
export function fromDisplayLength(value: number, units: LengthUnit): number {
  return units === 'ft' ? value * METRES_PER_FOOT : value;
}

/**
 * A stored length as text in the display units.
 * @example formatLength(0.3048, 'ft') // "1.0 ft"; formatLength(-0.25, 'm', 2) // "−0.25 m"
 */
export function formatLength(metres: number, units: LengthUnit, digits = 1): string {
  const value = toDisplayLength(metres, units);
  const text = Math.abs(value).toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
  const negative = value < 0 && Number(text) !== 0;
  return `${negative ? '\u2212' : ''}${text} ${NAMES[units].symbol}`;
}
