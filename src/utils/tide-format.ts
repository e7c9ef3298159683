import type { LengthUnit } from '@shared/schemas/organisation.schema';

/** Exactly 1852 m to the international nautical mile. */
const METRES_PER_NAUTICAL_MILE = 1852;

const MINUS = '\u2212';

function number(value: number, digits: number): string {
  const text = Math.abs(value).toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });
  return `${value < 0 && Number(text.replace(/,/g, '')) !== 0 ? MINUS : ''}${text}`;
}

/**
 * A tide level that is already in `units` (the tide API answers in the units asked for), with a
 * true minus sign so a level below MLLW can't be misread.
 * @example formatLevel(-0.42, 'ft') // '−0.4 ft'
 */
export function formatLevel(value: number, units: LengthUnit, digits = 1): string {
  return `${number(value, digits)} ${units}`;
}

/** Launch distances: nautical miles where the organisation works in feet, kilometres in metres. */
export type DistanceUnit = 'nmi' | 'km';

export function distanceUnit(units: LengthUnit): DistanceUnit {
  return units === 'ft' ? 'nmi' : 'km';
}

export function distanceUnitName(units: LengthUnit): string {
  return units === 'ft' ? 'nautical miles' : 'kilometres';
}

export function toDisplayDistance(metres: number, units: LengthUnit): number {
  return units === 'ft' ? metres / METRES_PER_NAUTICAL_MILE : metres / 1000;
}

export function fromDisplayDistance(value: number, units: LengthUnit): number {
  return units === 'ft' ? value * METRES_PER_NAUTICAL_MILE : value * 1000;
}

/** @example formatDistance(1852, 'ft') // '1.0 nmi' */
export function formatDistance(metres: number, units: LengthUnit, digits = 1): string {
  return `${number(toDisplayDistance(metres, units), digits)} ${distanceUnit(units)}`;
}

/** @example formatDuration(155) // '2 h 35 min' */
export function formatDuration(minutes: number): string {
  const total = Math.max(0, Math.round(minutes));
  const hours = Math.floor(total / 60);
  const rest = total % 60;
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}
