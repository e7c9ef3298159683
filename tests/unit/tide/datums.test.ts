/** computeTidalDatums on hand-built (invented) highs, lows and hourly heights. */
import { describe, expect, it } from 'vitest';
import { computeTidalDatums, TIDAL_DAY_MS } from '../../../server/domain/tide/datums.js';
import { seriesFromFunction } from '../../../server/domain/tide/series.js';
import type { TideExtreme } from '../../../server/domain/tide/types.js';

const T0 = Date.parse('2026-01-01T00:00:00Z');
const H = 3_600_000;
const ext = (hours: number, height: number, type: 'high' | 'low'): TideExtreme => ({ timeMs: T0 + hours * H, height, type });

describe('computeTidalDatums', () => {
  // Two tidal days of a mixed tide: day 1 highs 1.0/0.8, lows 0.1/0.3; day 2 highs 1.2/0.6, lows −0.1/0.5.
  const extremes = [
    ext(1, 1.0, 'high'), ext(7, 0.1, 'low'), ext(13, 0.8, 'high'), ext(19, 0.3, 'low'),
    ext(26, 1.2, 'high'), ext(32, -0.1, 'low'), ext(38, 0.6, 'high'), ext(44, 0.5, 'low'),
    ext(50.5, 5, 'high'), // after the second whole tidal day: ignored
  ];
  const hourly = seriesFromFunction((t) => (t < T0 + 10 * H ? 1 : 0), T0, H, 60);
  const d = computeTidalDatums({ extremes, hourly, fromMs: T0, toMs: T0 + 2 * TIDAL_DAY_MS + 3 * H });

  it('averages each tidal day’s higher high and lower low', () => {
    expect(d.tidalDays).toBe(2);
    expect(d.MHHW).toBeCloseTo((1.0 + 1.2) / 2, 12);
    expect(d.MLLW).toBeCloseTo((0.1 - 0.1) / 2, 12);
  });

  it('averages all highs and all lows, and derives MTL and DTL', () => {
    expect(d.MHW).toBeCloseTo((1.0 + 0.8 + 1.2 + 0.6) / 4, 12);
    expect(d.MLW).toBeCloseTo((0.1 + 0.3 - 0.1 + 0.5) / 4, 12);
    expect(d.MTL).toBeCloseTo((d.MHW + d.MLW) / 2, 12);
    expect(d.DTL).toBeCloseTo((d.MHHW + d.MLLW) / 2, 12);
  });

  it('takes MSL as the mean of the hourly heights over the whole tidal days', () => {
    const hours = Math.ceil((2 * TIDAL_DAY_MS) / H); // samples at 0 … 49 h lie inside 49.68 h
    expect(d.MSL).toBeCloseTo(10 / hours, 12);
  });

  it('counts a lone high or low in a diurnal tidal day as that day’s higher high or lower low', () => {
    const diurnal = computeTidalDatums({ extremes: [ext(3, 0.9, 'high'), ext(15, 0.2, 'low')], hourly, fromMs: T0, toMs: T0 + TIDAL_DAY_MS });
    expect(diurnal).toMatchObject({ MHHW: 0.9, MHW: 0.9, MLLW: 0.2, MLW: 0.2, tidalDays: 1 });
  });
});
