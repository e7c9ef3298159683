/**
 * Predictions against NOAA's published annual table for Safety Harbor (noaa/8726738), 2016 —
 * source S1 (NOAA/NOS/CO-OPS Annual Tide Prediction XML, heights to 0.1 ft, times to the
 * minute). The station comes from the real dataset through the adapter, loaded once.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { createTideStationDirectory } from '../../../server/adapters/tide-stations.js';
import { predictExtremes } from '../../../server/domain/tide/station-prediction.js';
import type { TideExtreme } from '../../../server/domain/tide/types.js';
import { matchExtremes, quantile, readFixture, type HiloFixture, type Match } from './helpers.js';

const fixture = readFixture<HiloFixture>('safety-harbor-2016-hilo.json');
let predicted: TideExtreme[] = [];
let matches: Match[] = [];

beforeAll(async () => {
  const station = await createTideStationDirectory().get('noaa/8726738');
  if (!station) throw new Error('noaa/8726738 missing from the dataset');
  const fromMs = Date.parse('2016-01-01T05:00:00Z');
  const toMs = Date.parse('2017-01-01T05:00:00Z');
  predicted = predictExtremes(station, { fromMs, toMs, unit: 'ft', datum: 'MLLW' }).extremes;
  matches = matchExtremes(fixture.extremes, predicted);
}, 60_000);

describe('Safety Harbor 2016 vs NOAA published predictions (S1)', () => {
  it('the fixture holds the whole published year (S1)', () => {
    expect(fixture.sources.S1).toContain('stationid 8726738');
    expect(fixture.extremes).toHaveLength(1391);
  });

  it('matches every published high and low with a predicted one of the same type within an hour (S1)', () => {
    expect(matches.filter((m) => m.predicted === null).map((m) => m.published)).toEqual([]);
  });

  it('predicts every published height within 0.1 ft (S1)', () => {
    const worst = Math.max(...matches.map((m) => m.heightOff));
    expect(worst).toBeLessThanOrEqual(0.1);
  });

  it('predicts times with a median error ≤ 2 min and a 95th percentile ≤ 5 min (S1)', () => {
    const minutes = matches.map((m) => m.minutesOff);
    expect(quantile(minutes, 0.5)).toBeLessThanOrEqual(2);
    expect(quantile(minutes, 0.95)).toBeLessThanOrEqual(5);
  });

  it('predicts no high or low that the table leaves out (small stands removed in pairs) (S1)', () => {
    const first = Date.parse(fixture.extremes[0]!.timeUtc) - 60_000;
    const last = Date.parse(fixture.extremes.at(-1)!.timeUtc) + 60_000;
    expect(predicted.filter((e) => e.timeMs >= first && e.timeMs <= last)).toHaveLength(fixture.extremes.length);
  });

  it('keeps highs and lows alternating', () => {
    const repeats = predicted.filter((e, i) => i > 0 && predicted[i - 1]!.type === e.type);
    expect(repeats).toEqual([]);
  });
});
