export interface Coordinates {
  latitude: number;
  longitude: number;
}

const NUMBER = String.raw`([+-]?\d+(?:\.\d+)?)\s*°?\s*([NSEW])?`;
const PAIR = new RegExp(String.raw`^\s*${NUMBER}\s*(?:[,;/]\s*|\s+)${NUMBER}\s*$`, 'i');

function signed(value: string, hemisphere: string | undefined): number {
  const n = Number(value);
  const h = hemisphere?.toUpperCase();
  return h === 'S' || h === 'W' ? -Math.abs(n) : n;
}

/**
 * A latitude and longitude pasted as one piece of text, as map apps copy them; null when the text
 * is not a pair (or is out of range), so the caller can treat it as a plain number.
 * @example parseCoordinatePair('27.99, -82.69') // { latitude: 27.99, longitude: -82.69 }
 * @example parseCoordinatePair('27.99° N, 82.69° W') // { latitude: 27.99, longitude: -82.69 }
 */
export function parseCoordinatePair(text: string): Coordinates | null {
  const match = PAIR.exec(text.replace(/\u2212/g, '-'));
  if (!match) return null;
  const [, a, ha, b, hb] = match;
  if (a === undefined || b === undefined) return null;
  // "82.69 W, 27.99 N" is written longitude first; swap it back.
  const swapped = /^[EW]$/i.test(ha ?? '') || /^[NS]$/i.test(hb ?? '');
  const [lat, latH, lon, lonH] = swapped ? [b, hb, a, ha] : [a, ha, b, hb];
  const latitude = signed(lat, latH);
  const longitude = signed(lon, lonH);
  if (Math.abs(latitude) > 90 || Math.abs(longitude) > 180) return null;
  return { latitude, longitude };
}

/** '27.9900, −82.6900', for showing where a site or station is. */
export function formatCoordinates(latitude: number, longitude: number, digits = 4): string {
  const fmt = (n: number): string => `${n < 0 ? '\u2212' : ''}${Math.abs(n).toFixed(digits)}`;
  return `${fmt(latitude)}, ${fmt(longitude)}`;
}
