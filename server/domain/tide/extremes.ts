/**
 * Post-processing of high and low waters: dropping insignificant wiggles, NOAA-style
 * subordinate offsets, and a site's local correction.
 */
import type { LocalCorrection, SubordinateOffsets, TideExtreme } from './types.js';

/**
 * Smallest height difference (metres) between a neighbouring high and low that counts as two
 * tides. Measured on NOAA's 2016 Safety Harbor table: every published high/low pair differs by
 * ≥ 0.0099 m in our predictions and every unpublished one by ≤ 0.008 m.
 */
export const MIN_EXTREME_RANGE_M = 0.009;

/**
 * Removes high/low pairs whose height difference is below `minRange`, smallest first, so
 * highs and lows keep alternating. Input must alternate and be in time order.
 * @example filterSmallExtremes(raw, MIN_EXTREME_RANGE_M)
 */
export function filterSmallExtremes(extremes: readonly TideExtreme[], minRange: number): TideExtreme[] {
  const list = [...extremes];
  for (;;) {
    let worst = -1;
    let worstRange = minRange;
    for (let i = 0; i + 1 < list.length; i++) {
      const range = Math.abs(list[i + 1]!.height - list[i]!.height);
      if (range < worstRange) {
        worst = i;
        worstRange = range;
      }
    }
    if (worst < 0) return list;
    list.splice(worst, 2);
  }
}

/**
 * Applies a subordinate station's published offsets to its reference station's extremes:
 * high and low times shift by their own minutes; heights (above the chart datum) are
 * multiplied by the high/low ratio, or have the high/low amount added when `kind` is `fixed`.
 */
export function applySubordinateOffsets(extremes: readonly TideExtreme[], offsets: SubordinateOffsets): TideExtreme[] {
  return extremes
    .map((e) => {
      const isHigh = e.type === 'high';
      const minutes = isHigh ? offsets.time.high : offsets.time.low;
      const amount = isHigh ? offsets.height.high : offsets.height.low;
      const height = offsets.height.kind === 'ratio' ? e.height * amount : e.height + amount;
      return { timeMs: e.timeMs + minutes * 60_000, height, type: e.type };
    })
    .sort((a, b) => a.timeMs - b.timeMs);
}

/** Resolved local correction with defaults filled in. */
export function resolveCorrection(c: LocalCorrection | undefined): Required<LocalCorrection> {
  return { timeOffsetMinutes: c?.timeOffsetMinutes ?? 0, heightRatio: c?.heightRatio ?? 1, heightOffset: c?.heightOffset ?? 0 };
}

/** Applies a site's local correction (time shift, then height × ratio + offset) to extremes. */
export function applyLocalCorrection(extremes: readonly TideExtreme[], correction: LocalCorrection | undefined): TideExtreme[] {
  const c = resolveCorrection(correction);
  return extremes.map((e) => ({
    timeMs: e.timeMs + c.timeOffsetMinutes * 60_000,
    height: e.height * c.heightRatio + c.heightOffset,
    type: e.type,
  }));
}
