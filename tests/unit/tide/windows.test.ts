/**
 * The low-water window finder on hand-built (invented) tide curves, with crossing times worked
 * out analytically: for h(t) = M + A·cos(ωt), h = z at ωt = ±arccos((z − M)/A) + 2πk.
 */
import { describe, expect, it } from 'vitest';
import type { DaylightInterval } from '../../../server/domain/tide/daylight.js';
import { seriesFromFunction } from '../../../server/domain/tide/series.js';
import { findLowWaterWindows, workableBand } from '../../../server/domain/tide/windows.js';

const HOUR = 3_600_000;
const MIN = 60_000;
const T0 = Date.parse('2026-03-02T00:00:00Z');
const PERIOD = 12.42 * HOUR;
const W = (2 * Math.PI) / PERIOD;
const M = 0.45;
const A = 0.4;
const sine = (t: number) => M + A * Math.cos(W * (t - T0));
/** Hand-built site: band floor lo = −0.15 + 0.15 + 0.10 = 0.10 m, ceiling hi = 0.10 + 0.40 = 0.50 m. */
const DEPTHS = { bedElevation: 0.1, workingDepth: 0.4, routeElevation: -0.15, draft: 0.15, margin: 0.1 };
const DAYS = 3;
const series = seriesFromFunction(sine, T0, 6 * MIN, DAYS * 240 + 1);

function lightEachDay(startHour: number, endHour: number): DaylightInterval[] {
  return Array.from({ length: DAYS }, (_, d) => {
    const startMs = T0 + d * 24 * HOUR + startHour * HOUR;
    const endMs = T0 + d * 24 * HOUR + endHour * HOUR;
    return { date: new Date(startMs).toISOString().slice(0, 10), startMs, endMs, sunriseMs: startMs, sunsetMs: endMs };
  });
}

/** Analytic intervals where lo ≤ h ≤ hi: ωt ∈ [αhi, αlo] ∪ [2π − αlo, 2π − αhi] (+2πk). */
function analyticBand(lo: number, hi: number): { startMs: number; endMs: number }[] {
  const aHi = Math.acos((hi - M) / A);
  const aLo = Math.acos((lo - M) / A);
  const out: { startMs: number; endMs: number }[] = [];
  for (let k = 0; k < 8; k++) {
    const base = T0 + k * PERIOD;
    out.push({ startMs: base + aHi / W, endMs: base + aLo / W }, { startMs: base + (2 * Math.PI - aLo) / W, endMs: base + (2 * Math.PI - aHi) / W });
  }
  return out;
}

/** The analytic band clipped to light and kept when at least `minMinutes` long. */
function expected(light: DaylightInterval[], minMinutes: number) {
  const { lo, hi } = workableBand(DEPTHS);
  return analyticBand(lo, hi)
    .flatMap((b) => light.map((l) => ({ startMs: Math.max(b.startMs, l.startMs), endMs: Math.min(b.endMs, l.endMs) })))
    .filter((w) => w.endMs - w.startMs >= minMinutes * MIN)
    .sort((a, b) => a.startMs - b.startMs);
}

describe('findLowWaterWindows on a hand-built sine tide', () => {
  it('finds windows exactly where both depth conditions and daylight hold, edges within a minute', () => {
    const light = lightEachDay(11, 23);
    const got = findLowWaterWindows({ ...DEPTHS, series, daylight: light, minDurationMinutes: 60 });
    const want = expected(light, 60);
    expect(got.length).toBe(want.length);
    expect(want.length).toBeGreaterThanOrEqual(6);
    got.forEach((w, i) => {
      expect(Math.abs(w.startMs - want[i]!.startMs)).toBeLessThan(MIN);
      expect(Math.abs(w.endMs - want[i]!.endMs)).toBeLessThan(MIN);
      expect(w.startMs % MIN).toBe(0);
      expect(w.durationMinutes).toBe((w.endMs - w.startMs) / MIN);
    });
  });

  it('keeps both conditions: inside every window the bed is workable and the route floats the craft', () => {
    const got = findLowWaterWindows({ ...DEPTHS, series, daylight: lightEachDay(0, 24), minDurationMinutes: 30 });
    for (const w of got) {
      for (let t = w.startMs; t <= w.endMs; t += MIN) {
        expect(sine(t) - DEPTHS.bedElevation).toBeLessThanOrEqual(DEPTHS.workingDepth + 1e-4);
        expect(sine(t) - DEPTHS.routeElevation).toBeGreaterThanOrEqual(DEPTHS.draft + DEPTHS.margin - 1e-4);
      }
    }
  });

  it('drops windows shorter than the minimum (default 120 min)', () => {
    const light = lightEachDay(11, 23);
    const got = findLowWaterWindows({ ...DEPTHS, series, daylight: light });
    expect(got.length).toBe(expected(light, 120).length);
    expect(got.every((w) => w.durationMinutes >= 120)).toBe(true);
    expect(got.length).toBeLessThan(findLowWaterWindows({ ...DEPTHS, series, daylight: light, minDurationMinutes: 60 }).length);
  });

  it('clips a window that crosses sunset at sunset', () => {
    const band = analyticBand(workableBand(DEPTHS).lo, workableBand(DEPTHS).hi)[0]!;
    const sunset = band.startMs + 130 * MIN;
    const light: DaylightInterval[] = [{ date: '2026-03-02', startMs: T0, endMs: sunset, sunriseMs: T0, sunsetMs: sunset }];
    const [w] = findLowWaterWindows({ ...DEPTHS, series, daylight: light });
    expect(w!.endMs).toBe(Math.floor(sunset / MIN) * MIN);
    expect(w!.sunsetMs).toBe(sunset);
    expect(Math.abs(w!.startMs - band.startMs)).toBeLessThan(MIN);
  });

  it('reports the lowest water inside the window and when it happens', () => {
    const all = findLowWaterWindows({ ...DEPTHS, series, daylight: lightEachDay(0, 24), minDurationMinutes: 30 });
    for (const w of all) {
      expect(w.lowestLevel).toBeCloseTo(Math.min(sine(w.startMs), sine(w.endMs)), 3);
    }
    // With a floor below the tide's low, the falling and rising windows join around the low.
    const deep = { ...DEPTHS, routeElevation: -0.5 };
    const [joined] = findLowWaterWindows({ ...deep, series, daylight: lightEachDay(0, 24) });
    const lowAt = T0 + PERIOD / 2;
    expect(joined!.lowestLevel).toBeCloseTo(M - A, 4);
    expect(Math.abs(joined!.lowestAtMs - lowAt)).toBeLessThan(MIN);
  });

  it('finds a window on a very flat tide that never crosses either limit', () => {
    const flat = seriesFromFunction((t) => 0.3 + 0.01 * Math.cos(W * (t - T0)), T0, 6 * MIN, 241);
    const light = lightEachDay(11, 23).slice(0, 1);
    const [w] = findLowWaterWindows({ ...DEPTHS, series: flat, daylight: light });
    expect(w).toMatchObject({ startMs: light[0]!.startMs, endMs: light[0]!.endMs, durationMinutes: 720 });
  });

  it('finds nothing when the route needs more water than the bed allows', () => {
    const impossible = { ...DEPTHS, routeElevation: 0.4 };
    expect(workableBand(impossible).lo).toBeGreaterThan(workableBand(impossible).hi);
    expect(findLowWaterWindows({ ...impossible, series, daylight: lightEachDay(0, 24) })).toEqual([]);
  });
});
