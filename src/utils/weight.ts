import type { LengthUnit } from '@shared/schemas/organisation.schema';

/** Exactly 0.45359237 kg to the international avoirdupois pound. */
const KG_PER_POUND = 0.45359237;

export type WeightUnit = 'kg' | 'lb';

/** Organisations that work in feet rate craft loads in pounds; those in metres, in kilograms. */
export function weightUnitFor(units: LengthUnit): WeightUnit {
  return units === 'ft' ? 'lb' : 'kg';
}

/**
 * A weight typed in `unit`, in kilograms to 0.1 kg (how craft loads are stored).
 * @example toKilograms(350, 'lb') // 158.8
 */
export function toKilograms(value: number, unit: WeightUnit): number {
  const kg = unit === 'lb' ? value * KG_PER_POUND : value;
  return Math.round(kg * 10) / 10;
}

/** @example fromKilograms(20, 'lb') // 44.1 */
export function fromKilograms(kg: number, unit: WeightUnit): number {
  const value = unit === 'lb' ? kg / KG_PER_POUND : kg;
  return Math.round(value * 10) / 10;
}
