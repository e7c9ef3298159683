import type { LengthUnit } from '@shared/schemas/organisation.schema';
import type { TreeStage } from '@shared/schemas/nursery.schema';

/** Words for each stage; the chip always shows them, so colour is never the only cue. */
export const STAGE_LABELS: Record<TreeStage, string> = {
  collected: 'Collected',
  tube: 'Tube',
  potted: 'Potted',
  brining: 'Brining',
  ready: 'Ready',
  planted: 'Planted',
  alive: 'Alive',
  lost: 'Lost',
};

/** Chip colours from Ebbroot's palette (background, text), each pair readable at 4.5:1 or better. */
export const STAGE_COLOURS: Record<TreeStage, { bg: string; fg: string }> = {
  collected: { bg: '#F3EBDD', fg: '#6B4E3D' },
  tube: { bg: '#E9D9C8', fg: '#4E3829' },
  potted: { bg: '#6B4E3D', fg: '#FFFFFF' },
  brining: { bg: '#2A7F8E', fg: '#FFFFFF' },
  ready: { bg: '#E0A43B', fg: '#1E2A24' },
  planted: { bg: '#1F5E46', fg: '#FFFFFF' },
  alive: { bg: '#D2DFDA', fg: '#194B38' },
  lost: { bg: '#B04A34', fg: '#FFFFFF' },
};

/** Exactly 231 cubic inches, 3.785411784 L, to the US liquid gallon (NIST Handbook 44, Appendix C). */
export const LITRES_PER_US_GALLON = 3.785411784;

export type VolumeUnit = 'L' | 'gal';

/** The unit a tank volume is typed in by default: US gallons where lengths are in feet. */
export function volumeUnitFor(units: LengthUnit): VolumeUnit {
  return units === 'ft' ? 'gal' : 'L';
}

/**
 * A volume typed in `unit`, in litres to 0.01 L (the API stores litres).
 * @example toLitres(5, 'gal') // 18.93
 */
export function toLitres(value: number, unit: VolumeUnit): number {
  return Math.round((unit === 'gal' ? value * LITRES_PER_US_GALLON : value) * 100) / 100;
}

/** @example fromLitres(18.93, 'gal') // 5 */
export function fromLitres(litres: number, unit: VolumeUnit): number {
  return Math.round((unit === 'gal' ? litres / LITRES_PER_US_GALLON : litres) * 100) / 100;
}

/**
 * A tank volume in both units, the organisation's first.
 * @example formatVolumeBoth(378.54, 'ft') // "100 gal (378.5 L)"
 */
export function formatVolumeBoth(litres: number, units: LengthUnit): string {
  const l = `${litres.toLocaleString('en-US', { maximumFractionDigits: 1 })} L`;
  const gal = formatVolume(litres, 'ft');
  return units === 'ft' ? `${gal} (${l})` : `${l} (${gal})`;
}

/**
 * A tank volume in the organisation's units: US gallons where lengths are in feet, else litres.
 * @example formatVolume(378.5, 'ft') // "100 gal"
 */
export function formatVolume(litres: number, units: LengthUnit): string {
  const value = units === 'ft' ? litres / LITRES_PER_US_GALLON : litres;
  const text = value.toLocaleString('en-US', { maximumFractionDigits: value < 10 ? 1 : 0 });
  return `${text} ${units === 'ft' ? 'gal' : 'L'}`;
}

/** A swap volume in litres, with gallons alongside where the organisation uses feet. */
export function formatSwap(litres: number, units: LengthUnit): string {
  const l = `${litres.toLocaleString('en-US', { maximumFractionDigits: 1 })} L`;
  return units === 'ft' ? `${l} (${formatVolume(litres, 'ft')})` : l;
}

export function formatPpt(ppt: number): string {
  return `${ppt.toLocaleString('en-US', { maximumFractionDigits: 1 })} ppt`;
}

/** "2025-03-04" → "Tue, 4 Mar 2025" (date-only strings, no time zone involved). */
export function formatDay(isoDate: string): string {
  const [y, m, d] = isoDate.slice(0, 10).split('-').map(Number);
  const date = new Date(Date.UTC(y ?? 1970, (m ?? 1) - 1, d ?? 1));
  return date.toLocaleDateString('en-GB', { weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
}

/** A number typed in a form box, or undefined when blank or not a number. */
export function numberOrUndefined(text: string): number | undefined {
  if (text.trim() === '') return undefined;
  const n = Number(text.trim().replace(',', '.'));
  return Number.isFinite(n) ? n : undefined;
}

/** A share of time as a whole percentage. @example formatShare(0.2741) // "27%" */
export function formatShare(share: number): string {
  return `${Math.round(share * 100)}%`;
}

/** A date-time as the day it fell on, for tables and history. */
export function formatTakenOn(iso: string): string {
  return new Date(iso).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
}
