import type { LengthUnit } from '@shared/schemas/organisation.schema';
import { fromKilograms, weightUnitFor } from './weight';

/** Exactly 1.852 km to the knot (one international nautical mile per hour). */
const KMH_PER_KNOT = 1.852;

const whole = (n: number) => Math.round(n).toLocaleString('en-US');

/**
 * A craft's rated load for the fleet list: kilograms, with pounds beside them where the
 * organisation works in feet (makers and capacity plates there state pounds).
 * @example formatRating(408.2, 'ft') // '408 kg (900 lb)'
 */
export function formatRating(kg: number, units: LengthUnit): string {
  const metric = `${whole(kg)} kg`;
  return units === 'ft' ? `${metric} (${whole(fromKilograms(kg, 'lb'))} lb)` : metric;
}

/**
 * A load on the board in the organisation's weight unit only, to stay short on a phone.
 * @example formatLoad(300, 'ft') // '661 lb'
 */
export function formatLoad(kg: number, units: LengthUnit): string {
  const unit = weightUnitFor(units);
  return `${whole(fromKilograms(kg, unit))} ${unit}`;
}

/** Rounded to a whole percent, except above 100 %, which is rounded up. @example formatShare(0.7354) // '74 %'; formatShare(1.004) // '101 %' */
export function formatShare(share: number): string {
  const pct = share * 100;
  // A load a hair over the rating must never read as "100 %".
  const shown = pct > 100 ? Math.ceil(pct) : Math.round(pct);
  return `${shown} %`;
}

/** @example knots(7.408) // 4 */
export function knots(kmh: number): number {
  return kmh / KMH_PER_KNOT;
}

/** @example formatSpeed(4) // '4 km/h (2.2 kn)' */
export function formatSpeed(kmh: number): string {
  const k = knots(kmh).toLocaleString('en-US', { maximumFractionDigits: 1, minimumFractionDigits: 1 });
  return `${kmh.toLocaleString('en-US', { maximumFractionDigits: 1 })} km/h (${k} kn)`;
}
