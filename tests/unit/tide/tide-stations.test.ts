/**
 * The dataset adapter on the real @neaps/tide-database (loaded once for this file), and the
 * whole chain — station, levels, daylight, windows — on Safety Harbor with an invented site.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { createTideStationDirectory, type TideStationDirectory } from '../../../server/adapters/tide-stations.js';
import { daylightIntervals } from '../../../server/domain/tide/daylight.js';
import { predictExtremes, predictLevels } from '../../../server/domain/tide/station-prediction.js';
import { levelAt } from '../../../server/domain/tide/series.js';
import type { TideStation } from '../../../server/domain/tide/types.js';
import { rankWindows } from '../../../server/domain/tide/window-ranking.js';
import { findLowWaterWindows } from '../../../server/domain/tide/windows.js';

let directory: TideStationDirectory;
let safetyHarbor: TideStation;

beforeAll(async () => {
  directory = createTideStationDirectory();
  safetyHarbor = (await directory.get('noaa/8726738'))!;
}, 60_000);

describe('tide station directory (@neaps/tide-database)', () => {
  it('maps a NOAA reference station with datums, epoch, licence and attribution', () => {
    expect(safetyHarbor).toMatchObject({
      id: 'noaa/8726738',
      name: 'Safety Harbor',
      kind: 'reference',
      timeZone: 'America/New_York',
      chartDatum: 'MLLW',
      epoch: { start: '1983-01-01', end: '2001-12-31' },
      licence: { type: 'public domain', commercialUse: true },
    });
    expect(safetyHarbor.attribution).toContain('tide-database');
    expect(safetyHarbor.constituents.find((c) => c.name === 'M2')?.amplitude).toBeGreaterThan(0.1);
  });

  it('maps a subordinate station with its reference and offsets', async () => {
    expect(await directory.get('noaa/8726769')).toMatchObject({
      kind: 'subordinate',
      offsets: { referenceId: 'noaa/8726520', time: { high: 158, low: 174 }, height: { kind: 'ratio' } },
    });
  });

  it('leaves out current stations and unknown ids', async () => {
    expect(await directory.get('noaa/ACT8581')).toBeNull();
    expect(await directory.get('noaa/does-not-exist')).toBeNull();
  });

  it('finds stations by name and nearest first by position, with distances', async () => {
    expect((await directory.search('Safety Harbor', 5))[0]?.id).toBe('noaa/8726738');
    const near = await directory.near({ latitude: 27.99, longitude: -82.69, maxResults: 3 });
    expect(near[0]).toMatchObject({ id: 'noaa/8726738' });
    expect(near[0]!.distanceKm).toBeLessThan(1);
    expect(near.every((s, i) => i === 0 || s.distanceKm >= near[i - 1]!.distanceKm)).toBe(true);
  });

  it('predicts a subordinate station from its reference station’s extremes (Mobbly Bayou from St. Petersburg)', async () => {
    const sub = (await directory.get('noaa/8726769'))!;
    const ref = (await directory.get('noaa/8726520'))!;
    const span = { fromMs: Date.parse('2026-06-01T00:00:00Z'), toMs: Date.parse('2026-06-03T00:00:00Z') };
    const refExtremes = predictExtremes(ref, { fromMs: span.fromMs - 4 * 3_600_000, toMs: span.toMs }).extremes;
    for (const e of predictExtremes(sub, span).extremes) {
      const minutes = e.type === 'high' ? 158 : 174;
      const match = refExtremes.find((r) => r.type === e.type && Math.abs(r.timeMs + minutes * 60_000 - e.timeMs) < 2000);
      expect(match).toBeDefined();
    }
  });
});

describe('a week of low-water windows at Safety Harbor (invented site)', () => {
  const site = { latitude: 27.99, longitude: -82.69, timeZone: 'America/New_York', bedElevation: 0.2, routeElevation: -0.15, workingDepth: 0.45, draft: 0.15, margin: 0.08 };

  it('keeps every window inside daylight and inside both depth limits', () => {
    const fromMs = Date.parse('2026-06-01T04:00:00Z');
    const toMs = fromMs + 7 * 86_400_000;
    const { series } = predictLevels(safetyHarbor, { fromMs, toMs, stepMinutes: 6 });
    const daylight = daylightIntervals({ ...site, fromMs, toMs });
    const windows = rankWindows(findLowWaterWindows({ ...site, series, daylight }), site);
    expect(windows.length).toBeGreaterThan(0);
    for (const w of windows) {
      expect(w.startMs).toBeGreaterThanOrEqual(w.sunriseMs!);
      expect(w.endMs).toBeLessThanOrEqual(w.sunsetMs!);
      expect(levelAt(series, w.lowestAtMs) - site.routeElevation).toBeGreaterThanOrEqual(site.draft + site.margin - 1e-6);
      expect(levelAt(series, w.startMs) - site.bedElevation).toBeLessThanOrEqual(site.workingDepth + 1e-6);
    }
  });
});
