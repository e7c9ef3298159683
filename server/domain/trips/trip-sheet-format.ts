/**
 * How figures read on the printed trip sheet and float plan: the organisation's units (pounds
 * and nautical miles where it works in feet, kilograms and kilometres where it works in metres)
 * and its time zone.
 */
import type { LengthUnit } from '../../../shared/schemas/organisation.schema.js';
import { clockTime, longDate } from '../workday-time.js';
import type { SheetCraft } from './trip-sheet-types.js';
import type { CraftKind } from './types.js';

/** Exact by definition (international yard and pound agreement, 1959). */
export const KG_PER_POUND = 0.45359237;
/** Exact by definition (International Hydrographic Conference, 1929). */
export const METRES_PER_NAUTICAL_MILE = 1852;
export const METRES_PER_FOOT = 0.3048;

const KIND_LABELS: Record<CraftKind, string> = {
  'sit-on-top-kayak': 'sit-on-top kayak',
  'tandem-kayak': 'tandem kayak',
  canoe: 'canoe',
  skiff: 'skiff',
  other: 'other craft',
};

const fixed = (n: number, digits: number) => n.toLocaleString('en-US', { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** @example weight(350, 'ft') // '772 lb'; weight(27, 'm') // '27 kg' */
export function weight(kg: number, units: LengthUnit): string {
  return units === 'ft' ? `${fixed(kg / KG_PER_POUND, 0)} lb` : `${fixed(kg, 0)} kg`;
}

/** Route lengths, two decimals under one unit. @example distance(0.8, 'ft') // '0.43 nmi' */
export function distance(km: number, units: LengthUnit): string {
  const value = units === 'ft' ? (km * 1000) / METRES_PER_NAUTICAL_MILE : km;
  return `${fixed(value, value < 1 ? 2 : 1)} ${units === 'ft' ? 'nmi' : 'km'}`;
}

/** Drafts. @example length(0.15, 'ft') // '0.5 ft' */
export function length(m: number, units: LengthUnit): string {
  return units === 'ft' ? `${fixed(m / METRES_PER_FOOT, 1)} ft` : `${fixed(m, 2)} m`;
}

/** @example percent(0.634) // '63%' */
export const percent = (share: number) => `${Math.round(share * 100)}%`;

/** Times on the sheet: the clock in the zone, its abbreviation only where it differs from the sheet's. */
export function sheetClock(timeZone: string, sheetZone: string) {
  return (iso: string | number): string => {
    const { time, zone } = clockTime(new Date(iso), timeZone);
    return zone === sheetZone ? time : `${time} ${zone}`;
  };
}

/** The zone abbreviation at an instant, e.g. `EDT`. */
export const zoneAt = (iso: string | number, timeZone: string) => clockTime(new Date(iso), timeZone).zone;

/** `Friday, April 10, 2026` in the zone. */
export const sheetDate = (iso: string | number, timeZone: string) => longDate(new Date(iso), timeZone);

/** `2026-04-10` in the zone, for file names. */
export function isoDay(iso: string | number, timeZone: string): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(new Date(iso));
}

export const kindLabel = (kind: CraftKind) => KIND_LABELS[kind] ?? kind;

/** The craft's name as a reader knows it: its fleet name, or whose own kayak it is. */
export function craftName(c: SheetCraft): string {
  if (c.name) return c.name;
  return c.ownerName ? `${c.ownerName}'s own ${kindLabel(c.kind)}` : `Own ${kindLabel(c.kind)}`;
}

/** @example craftLine(canoe) // '"Heron", canoe, 2 seats' */
export function craftLine(c: SheetCraft): string {
  const seats = `${c.seats} seat${c.seats === 1 ? '' : 's'}`;
  return c.name ? `"${c.name}", ${kindLabel(c.kind)}, ${seats}` : `${craftName(c)}, ${seats}`;
}

/** Where the rated maximum comes from; paddlecraft rarely carry a plate (TRADE.md §1). */
export const ratingSource = (c: SheetCraft) => (c.hasCapacityPlate ? 'capacity plate' : "maker's rating");

export const listOr = (items: string[], none: string) => (items.length ? items.join(', ') : none);
