/**
 * Prediction plumbing on a hand-built (invented) station — one M2 constituent of 0.4 m about an
 * MSL 0.5 m above MLLW — so expected values follow from the setup: units, datum shifts, local
 * corrections and NOAA-style subordinate offsets.
 */
import { describe, expect, it } from 'vitest';
import { UnknownDatumError } from '../../../server/domain/tide/station-datums.js';
import { predictExtremes, predictLevels, seriesPoints } from '../../../server/domain/tide/station-prediction.js';
import { levelAt } from '../../../server/domain/tide/series.js';
import type { SubordinateOffsets } from '../../../server/domain/tide/types.js';
import { handBuiltStation } from './helpers.js';

const station = handBuiltStation();
const fromMs = Date.parse('2026-03-02T00:00:00Z');
const toMs = Date.parse('2026-03-04T00:00:00Z');
const HOUR = 3_600_000;
const base = predictExtremes(station, { fromMs, toMs }).extremes;

describe('predictExtremes and predictLevels (hand-built M2 station)', () => {
  it('finds alternating highs and lows half an M2 period apart, about MSL ± 0.4 m above MLLW', () => {
    expect(base.length).toBeGreaterThanOrEqual(7);
    base.forEach((e, i) => {
      expect(e.height).toBeCloseTo(e.type === 'high' ? 0.9 : 0.1, 1);
      if (i > 0) {
        expect(e.type).not.toBe(base[i - 1]!.type);
        expect((e.timeMs - base[i - 1]!.timeMs) / HOUR).toBeCloseTo(12.4206 / 2, 2);
      }
    });
  });

  it('puts the level curve through the highs and lows', () => {
    const { series } = predictLevels(station, { fromMs, toMs, stepMinutes: 1 });
    for (const e of base) expect(levelAt(series, e.timeMs)).toBeCloseTo(e.height, 4);
  });

  it('starts the series on a step boundary and covers the span', () => {
    const { series, unit, datum } = predictLevels(station, { fromMs: fromMs + 7 * 60_000, toMs, stepMinutes: 6 });
    expect({ unit, datum }).toEqual({ unit: 'm', datum: 'MLLW' });
    expect(series.startMs).toBe(fromMs + 6 * 60_000);
    expect(series.startMs + (series.heights.length - 1) * series.stepMs).toBe(toMs);
    expect(seriesPoints(series)[1]).toEqual({ timeMs: fromMs + 12 * 60_000, height: series.heights[1] });
  });

  it('converts to feet (0.3048 m each) and to other published datums', () => {
    const feet = predictExtremes(station, { fromMs, toMs, unit: 'ft' }).extremes;
    const mhhw = predictExtremes(station, { fromMs, toMs, datum: 'MHHW' }).extremes;
    feet.forEach((e, i) => expect(e.height).toBeCloseTo(base[i]!.height / 0.3048, 10));
    mhhw.forEach((e, i) => expect(e.height).toBeCloseTo(base[i]!.height - 1, 10));
  });

  it('refuses a datum the station does not publish', () => {
    expect(() => predictExtremes(station, { fromMs, toMs, datum: 'NAVD88' })).toThrow(UnknownDatumError);
  });

  it('applies a local correction: times shifted, heights × ratio + offset', () => {
    const correction = { timeOffsetMinutes: 30, heightRatio: 1.1, heightOffset: 0.05 };
    const fixed = predictExtremes(station, { fromMs, toMs, correction }).extremes;
    const inner = base.filter((e) => e.timeMs + 30 * 60_000 <= toMs);
    // The predictor bisects extremes to within a second, so times agree to a second or two.
    fixed.slice(0, inner.length).forEach((e, i) => expect(Math.abs(e.timeMs - inner[i]!.timeMs - 30 * 60_000)).toBeLessThan(2000));
    fixed.slice(0, inner.length).forEach((e, i) => expect(e.height).toBeCloseTo(inner[i]!.height * 1.1 + 0.05, 5));
    const plain = predictLevels(station, { fromMs, toMs, stepMinutes: 6 }).series;
    const shifted = predictLevels(station, { fromMs, toMs, stepMinutes: 6, correction }).series;
    const t = fromMs + 5 * HOUR;
    expect(levelAt(shifted, t)).toBeCloseTo(levelAt(plain, t - 30 * 60_000) * 1.1 + 0.05, 6);
  });
});

describe('subordinate stations (NOAA-style offsets on the reference extremes)', () => {
  const ratio: SubordinateOffsets = { referenceId: 'test/hand-built', time: { high: 60, low: 90 }, height: { high: 0.8, low: 0.6, kind: 'ratio' } };
  const sub = handBuiltStation({ id: 'test/sub', kind: 'subordinate', offsets: ratio });
  const subExtremes = predictExtremes(sub, { fromMs, toMs }).extremes;
  const refAll = predictExtremes(station, { fromMs: fromMs - 6 * HOUR, toMs }).extremes;

  it('shifts highs and lows by their own minutes and multiplies heights by their own ratios', () => {
    for (const e of subExtremes) {
      const minutes = e.type === 'high' ? 60 : 90;
      const ref = refAll.find((r) => r.type === e.type && Math.abs(r.timeMs + minutes * 60_000 - e.timeMs) < 2000);
      expect(ref).toBeDefined();
      expect(e.height).toBeCloseTo(ref!.height * (e.type === 'high' ? 0.8 : 0.6), 5);
    }
  });

  it('adds fixed height offsets when the station publishes fixed ones', () => {
    const fixed = handBuiltStation({ kind: 'subordinate', offsets: { ...ratio, height: { high: 0.1, low: -0.05, kind: 'fixed' } } });
    for (const e of predictExtremes(fixed, { fromMs, toMs }).extremes) {
      expect(e.height).toBeCloseTo(e.type === 'high' ? 0.9 + 0.1 : 0.1 - 0.05, 1);
    }
  });

  it('joins the corrected highs and lows with a half-cosine curve', () => {
    const { series } = predictLevels(sub, { fromMs, toMs, stepMinutes: 1 });
    const [a, b] = subExtremes;
    expect(levelAt(series, a!.timeMs)).toBeCloseTo(a!.height, 4);
    expect(levelAt(series, b!.timeMs)).toBeCloseTo(b!.height, 4);
    const mid = (a!.timeMs + b!.timeMs) / 2;
    expect(levelAt(series, mid)).toBeCloseTo((a!.height + b!.height) / 2, 4);
    const quarter = a!.timeMs + (b!.timeMs - a!.timeMs) / 4;
    expect(levelAt(series, quarter)).toBeCloseTo(a!.height + ((b!.height - a!.height) * (1 - Math.cos(Math.PI / 4))) / 2, 4);
  });

  it('gives heights only on its own chart datum', () => {
    expect(() => predictExtremes(sub, { fromMs, toMs, datum: 'MHHW' })).toThrow(UnknownDatumError);
    expect(predictExtremes(sub, { fromMs, toMs, datum: 'MLLW' }).extremes).toEqual(subExtremes);
  });
});
