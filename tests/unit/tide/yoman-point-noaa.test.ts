/**
 * Predictions against NOAA CO-OPS predictions for Yoman Point (noaa/9446705), 1–6 Oct 2017 —
 * source S4 (heights to 0.001 ft). Caveat from the reference: the times are printed without a
 * zone and agree with harmonic predictions only when read as UTC, so they are stored as UTC
 * (zone inferred). Tolerances: 0.1 ft in height and 5 min in time for every value.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { createTideStationDirectory } from '../../../server/adapters/tide-stations.js';
import { predictExtremes } from '../../../server/domain/tide/station-prediction.js';
import { matchExtremes, readFixture, type HiloFixture, type Match } from './helpers.js';

const fixture = readFixture<HiloFixture>('yoman-point-2017-hilo.json');
let matches: Match[] = [];

beforeAll(async () => {
  const station = await createTideStationDirectory().get('noaa/9446705');
  if (!station) throw new Error('noaa/9446705 missing from the dataset');
  const times = fixture.extremes.map((e) => Date.parse(e.timeUtc));
  const span = { fromMs: Math.min(...times) - 3_600_000, toMs: Math.max(...times) + 3_600_000 };
  matches = matchExtremes(fixture.extremes, predictExtremes(station, { ...span, unit: 'ft' }).extremes);
}, 60_000);

describe('Yoman Point Oct 2017 vs NOAA CO-OPS predictions (S4, times read as UTC)', () => {
  it('matches every published high and low (S4)', () => {
    expect(fixture.extremes).toHaveLength(31);
    expect(matches.filter((m) => m.predicted === null)).toEqual([]);
  });

  it('predicts every height within 0.1 ft (S4)', () => {
    expect(Math.max(...matches.map((m) => m.heightOff))).toBeLessThanOrEqual(0.1);
  });

  it('predicts every time within 5 min (S4)', () => {
    expect(Math.max(...matches.map((m) => m.minutesOff))).toBeLessThanOrEqual(5);
  });
});
