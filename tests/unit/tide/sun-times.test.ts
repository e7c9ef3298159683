/**
 * Sunrise and sunset from suncalc against published times for Tampa, FL — source S16 (WTSP
 * article of 2020-10-15; calculator not named; times to the minute). The coordinates are the
 * city centre from memory (the source does not state them). Tolerance: 2 minutes.
 */
import { describe, expect, it } from 'vitest';
import { daylightIntervals, sunDay } from '../../../server/domain/tide/daylight.js';
import { readFixture } from './helpers.js';

interface SunEntry { lat: number; lon: number; date: string; kind: 'sunrise' | 'sunset' | 'day_length'; time?: string; value?: string; source: string }
const fixture = readFixture<{ sources: Record<string, string>; timeZone: string; times: SunEntry[] }>('tampa-sun-times.json');
const events = fixture.times.filter((t) => t.kind !== 'day_length');
const lengths = fixture.times.filter((t) => t.kind === 'day_length');

describe('Tampa sunrise and sunset vs published times (S16)', () => {
  it.each(events)('$kind on $date within 2 min of $time ($source)', ({ lat, lon, date, kind, time }) => {
    const day = sunDay(date, lat, lon, fixture.timeZone);
    const got = kind === 'sunrise' ? day.sunriseMs : day.sunsetMs;
    expect(Math.abs(got! - Date.parse(time!)) / 60_000).toBeLessThanOrEqual(2);
  });

  it.each(lengths)('day length on $date within 2 min of $value ($source)', ({ lat, lon, date, value }) => {
    const day = sunDay(date, lat, lon, fixture.timeZone);
    const [h, m, s] = value!.split(':').map(Number);
    const published = ((h! * 60 + m!) * 60 + s!) * 1000;
    expect(Math.abs(day.sunsetMs! - day.sunriseMs! - published) / 60_000).toBeLessThanOrEqual(2);
  });
});

describe('sunDay and daylightIntervals', () => {
  const tampa = { latitude: 27.9506, longitude: -82.4572, timeZone: 'America/New_York' };

  it('orders civil dawn < sunrise < sunset < civil dusk, about 25 min of civil twilight in Tampa', () => {
    const d = sunDay('2021-06-20', tampa.latitude, tampa.longitude, tampa.timeZone);
    expect(d.civilDawnMs!).toBeLessThan(d.sunriseMs!);
    expect(d.sunsetMs!).toBeLessThan(d.civilDuskMs!);
    expect((d.sunriseMs! - d.civilDawnMs!) / 60_000).toBeGreaterThan(20);
    expect((d.sunriseMs! - d.civilDawnMs!) / 60_000).toBeLessThan(30);
  });

  it('gives one interval per local date, sunrise to sunset, clipped to the span', () => {
    const fromMs = Date.parse('2021-06-20T15:00:00Z');
    const toMs = Date.parse('2021-06-22T04:00:00Z');
    const days = daylightIntervals({ ...tampa, fromMs, toMs });
    expect(days.map((d) => d.date)).toEqual(['2021-06-20', '2021-06-21']);
    expect(days[0]!.startMs).toBe(fromMs);
    expect(days[1]!.startMs).toBe(days[1]!.sunriseMs);
    expect(days[1]!.endMs).toBe(days[1]!.sunsetMs);
  });

  it('widens each interval to civil dawn and dusk when twilight counts', () => {
    const span = { ...tampa, fromMs: Date.parse('2021-01-05T05:00:00Z'), toMs: Date.parse('2021-01-06T05:00:00Z') };
    const [plain] = daylightIntervals(span);
    const [twilight] = daylightIntervals({ ...span, includeCivilTwilight: true });
    const day = sunDay('2021-01-05', tampa.latitude, tampa.longitude, tampa.timeZone);
    expect(twilight!.startMs).toBe(day.civilDawnMs);
    expect(twilight!.endMs).toBe(day.civilDuskMs);
    expect(plain!.startMs).toBe(day.sunriseMs);
  });

  it('gives the whole local day in polar day and nothing in polar night (Tromsø)', () => {
    const place = { latitude: 69.65, longitude: 18.96, timeZone: 'Europe/Oslo' };
    const summer = daylightIntervals({ ...place, fromMs: Date.parse('2021-06-21T00:00:00Z'), toMs: Date.parse('2021-06-21T20:00:00Z') });
    expect(summer).toHaveLength(1);
    const winter = daylightIntervals({ ...place, fromMs: Date.parse('2021-12-21T00:00:00Z'), toMs: Date.parse('2021-12-21T20:00:00Z') });
    expect(winter).toEqual([]);
  });
});
