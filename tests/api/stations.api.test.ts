import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.js';
import { authAgentFor, createTestApp, type Agent, type TestApp } from '../setup/test-app.js';

let t: TestApp;
let agent: Agent;
const SAFETY_HARBOR = encodeURIComponent('noaa/8726738');

beforeAll(async () => {
  t = await createTestApp();
  ({ agent } = await authAgentFor(t, 'volunteer'));
});
afterAll(() => t.close());

describe('GET /api/stations', () => {
  it('finds a station by name, with its licence and attribution', async () => {
    const res = await agent.get('/api/stations').query({ q: 'Safety Harbor' });
    expect(res.status).toBe(200);
    const station = (res.body.stations as { id: string }[]).find((s) => s.id === 'noaa/8726738');
    expect(station).toMatchObject({ name: expect.stringMatching(/Safety Harbor/), attribution: expect.any(String), licence: { url: expect.any(String) } });
  });

  it('lists stations near coordinates, nearest first, with distance', async () => {
    const res = await agent.get('/api/stations').query({ near: '27.99,-82.69', limit: 5 });
    expect(res.status).toBe(200);
    const distances = (res.body.stations as { distanceKm: number }[]).map((s) => s.distanceKm);
    expect(distances.length).toBeGreaterThan(0);
    expect(distances).toEqual([...distances].sort((a, b) => a - b));
    expect(distances[0]).toBeLessThan(15);
  });

  it('rejects malformed coordinates with 400', async () => {
    const res = await agent.get('/api/stations').query({ near: '95,-82' });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('near');
  });
});

describe('GET /api/stations/:id/extremes', () => {
  // NOAA/NOS/CO-OPS annual tide prediction table, Safety Harbor 8726738, 2016 (LST/LDT, MLLW, ft):
  // 2016-01-01 02:27 low 1.3, 07:09 high 1.9, 14:10 low 0.7, 20:56 high 2.2 (EST = UTC−5).
  const published = [
    { time: '2016-01-01T07:27:00Z', type: 'low', height: 1.3 },
    { time: '2016-01-01T12:09:00Z', type: 'high', height: 1.9 },
    { time: '2016-01-01T19:10:00Z', type: 'low', height: 0.7 },
    { time: '2016-01-02T01:56:00Z', type: 'high', height: 2.2 },
  ];

  it('matches NOAA published highs and lows within 5 minutes and 0.1 ft', async () => {
    const res = await agent.get(`/api/stations/${SAFETY_HARBOR}/extremes`).query({ from: '2016-01-01T05:00:00Z', to: '2016-01-02T05:00:00Z', units: 'ft', datum: 'MLLW' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ station: { id: 'noaa/8726738' }, units: 'ft', datum: 'MLLW' });
    const got = res.body.extremes as { time: string; height: number; type: string }[];
    expect(got).toHaveLength(published.length);
    got.forEach((e, i) => {
      const p = published[i]!;
      expect(e.type).toBe(p.type);
      expect(Math.abs(Date.parse(e.time) - Date.parse(p.time))).toBeLessThanOrEqual(5 * 60_000);
      expect(Math.abs(e.height - p.height)).toBeLessThanOrEqual(0.1 + 0.05); // published values are rounded to 0.1 ft
    });
  });

  it('rejects a span over 400 days and malformed dates with 400', async () => {
    const long = await agent.get(`/api/stations/${SAFETY_HARBOR}/extremes`).query({ from: '2016-01-01', to: '2017-02-15' });
    expect(long.status).toBe(400);
    expect(ErrorBody.parse(long.body).error.fields).toHaveProperty('to');
    const bad = await agent.get(`/api/stations/${SAFETY_HARBOR}/extremes`).query({ from: 'yesterday', to: '2016-01-02' });
    expect(bad.status).toBe(400);
    expect(ErrorBody.parse(bad.body).error.fields).toHaveProperty('from');
  });

  it('answers 404 for an unknown station and 400 for a datum the station does not publish', async () => {
    expect((await agent.get(`/api/stations/${encodeURIComponent('noaa/0000000')}/extremes`).query({ from: '2016-01-01', to: '2016-01-02' })).status).toBe(404);
    const res = await agent.get(`/api/stations/${SAFETY_HARBOR}/extremes`).query({ from: '2016-01-01', to: '2016-01-02', datum: 'XYZ' });
    expect(res.status).toBe(400);
    expect(ErrorBody.parse(res.body).error.fields).toHaveProperty('datum');
  });
});

describe('GET /api/stations/:id/levels and datums', () => {
  it('returns a series at the requested step in metres', async () => {
    const res = await agent.get(`/api/stations/${SAFETY_HARBOR}/levels`).query({ from: '2016-01-01T00:00:00Z', to: '2016-01-01T06:00:00Z', step: 30, units: 'm' });
    expect(res.status).toBe(200);
    expect(res.body.levels).toHaveLength(13);
    expect(Date.parse(res.body.levels[1].time) - Date.parse(res.body.levels[0].time)).toBe(30 * 60_000);
  });

  it('computes datums from a year of predictions beside the published ones', async () => {
    const res = await agent.get(`/api/stations/${SAFETY_HARBOR}/datums`).query({ from: '2016-01-01', to: '2017-01-01', units: 'ft' });
    expect(res.status).toBe(200);
    expect(res.body.relativeTo).toBe('MLLW');
    const { computed, published } = res.body as { computed: Record<string, number>; published: Record<string, number> };
    expect(computed.MHHW).toBeGreaterThan(computed.MHW!);
    expect(computed.MHW).toBeGreaterThan(computed.MSL!);
    expect(computed.MLW).toBeGreaterThan(computed.MLLW!);
    // One year is not the 19-year epoch; still within 0.25 ft of the published epoch values.
    for (const name of ['MHHW', 'MHW', 'MSL', 'MLW']) expect(Math.abs(computed[name]! - published[name]!)).toBeLessThan(0.25);
  });
});
