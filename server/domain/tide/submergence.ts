/**
 * Share of time a point at a given elevation is under water — for readiness: a tree's top
 * must stand above the water at all but the highest tides.
 */
import type { LevelSeries } from './types.js';

/**
 * Fraction (0–1) of the series' time during which the level is above `elevation`, with the
 * series read as straight lines between samples. Use a year or more of hourly or finer levels.
 * @example shareSubmerged(yearOfLevels, 1.77) // ≈ 0.30 on TRADE.md §3's sine tide
 */
export function shareSubmerged(series: LevelSeries, elevation: number): number {
  const h = series.heights;
  if (h.length < 2) return h.length === 1 && h[0]! > elevation ? 1 : 0;
  let wet = 0;
  for (let i = 0; i + 1 < h.length; i++) wet += fractionAbove(h[i]!, h[i + 1]!, elevation);
  return wet / (h.length - 1);
}

/** Fraction of a straight segment a→b lying above z. */
function fractionAbove(a: number, b: number, z: number): number {
  if (a > z && b > z) return 1;
  if (a <= z && b <= z) return 0;
  const cross = (z - a) / (b - a);
  return a > z ? cross : 1 - cross;
}
