/** Interval arithmetic on level series: where a piecewise-linear curve stays inside a band. */
import type { LevelSeries, TimeInterval } from './types.js';

/**
 * Intervals where lo ≤ level ≤ hi, with the series read as straight lines between samples, so
 * edges fall where those lines cross lo or hi rather than on sample times. Sorted, disjoint.
 * @example bandIntervals(series, 0.3, 0.9) // where the water is between 0.3 and 0.9
 */
export function bandIntervals(series: LevelSeries, lo: number, hi: number): TimeInterval[] {
  const out: TimeInterval[] = [];
  const h = series.heights;
  if (lo > hi || h.length === 0) return out;
  if (h.length === 1) {
    if (h[0]! >= lo && h[0]! <= hi) out.push({ startMs: series.startMs, endMs: series.startMs });
    return out;
  }
  let open: TimeInterval | null = null;
  for (let i = 0; i + 1 < h.length; i++) {
    const part = segmentInBand(h[i]!, h[i + 1]!, lo, hi);
    if (!part) continue;
    const t0 = series.startMs + i * series.stepMs;
    const startMs = t0 + part[0] * series.stepMs;
    const endMs = t0 + part[1] * series.stepMs;
    if (open && open.endMs >= startMs) open.endMs = endMs;
    else {
      open = { startMs, endMs };
      out.push(open);
    }
  }
  return out;
}

/** Fractions [u0, u1] of a straight segment a→b lying in [lo, hi], or null. */
function segmentInBand(a: number, b: number, lo: number, hi: number): [number, number] | null {
  if (a === b) return a >= lo && a <= hi ? [0, 1] : null;
  const uLo = (lo - a) / (b - a);
  const uHi = (hi - a) / (b - a);
  const u0 = Math.max(0, Math.min(uLo, uHi));
  const u1 = Math.min(1, Math.max(uLo, uHi));
  return u0 <= u1 ? [u0, u1] : null;
}

/**
 * Pairwise intersections of two sorted lists of disjoint intervals; each result keeps a
 * reference to the `b` interval it came from.
 */
export function intersectIntervals<T extends TimeInterval>(a: readonly TimeInterval[], b: readonly T[]): { startMs: number; endMs: number; within: T }[] {
  const out: { startMs: number; endMs: number; within: T }[] = [];
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    const x = a[i]!;
    const y = b[j]!;
    const startMs = Math.max(x.startMs, y.startMs);
    const endMs = Math.min(x.endMs, y.endMs);
    if (endMs > startMs) out.push({ startMs, endMs, within: y });
    if (x.endMs < y.endMs) i++;
    else j++;
  }
  return out;
}
