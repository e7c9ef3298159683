/** Height unit conversion. The international foot is exactly 0.3048 m (NOAA uses it too). */
import type { LengthUnit } from './types.js';

export const METRES_PER_FOOT = 0.3048;

/**
 * Converts a height in metres to the given unit.
 * @example fromMetres(0.3048, 'ft') // 1
 */
export function fromMetres(metres: number, unit: LengthUnit): number {
  return unit === 'ft' ? metres / METRES_PER_FOOT : metres;
}

/**
 * Converts a height in the given unit to metres.
 * @example toMetres(1, 'ft') // 0.3048
 */
export function toMetres(value: number, unit: LengthUnit): number {
  return unit === 'ft' ? value * METRES_PER_FOOT : value;
}
