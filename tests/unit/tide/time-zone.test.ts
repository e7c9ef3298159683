/** Zone arithmetic with Intl; expected offsets are the zones' published rules (IANA tz database). */
import { describe, expect, it } from 'vitest';
import { datesBetween, localDate, localParts, zonedTimeToUtc, zoneOffsetMinutes } from '../../../server/domain/tide/time-zone.js';

describe('time zones', () => {
  it.each([
    ['2016-01-01T12:00:00Z', 'America/New_York', -300],
    ['2016-07-01T12:00:00Z', 'America/New_York', -240],
    ['2017-10-01T12:00:00Z', 'America/Los_Angeles', -420],
    ['2021-01-01T12:00:00Z', 'Asia/Kolkata', 330],
    ['2021-01-01T12:00:00Z', 'UTC', 0],
  ])('offset at %s in %s is %i min', (iso, zone, minutes) => {
    expect(zoneOffsetMinutes(Date.parse(iso), zone)).toBe(minutes);
  });

  it('turns a local wall-clock time into the UTC instant', () => {
    expect(zonedTimeToUtc('America/New_York', 2016, 1, 1, 12)).toBe(Date.parse('2016-01-01T17:00:00Z'));
    expect(zonedTimeToUtc('America/New_York', 2016, 7, 1, 0)).toBe(Date.parse('2016-07-01T04:00:00Z'));
  });

  it('picks the first of a repeated fall-back hour and skips ahead over a spring-forward gap', () => {
    expect(zonedTimeToUtc('America/New_York', 2016, 11, 6, 1, 30)).toBe(Date.parse('2016-11-06T05:30:00Z'));
    expect(zonedTimeToUtc('Europe/Berlin', 2016, 10, 30, 2, 30)).toBe(Date.parse('2016-10-30T00:30:00Z'));
    expect(zonedTimeToUtc('America/New_York', 2016, 3, 13, 2, 30)).toBe(Date.parse('2016-03-13T07:30:00Z'));
  });

  it('gives local date, hour and weekday', () => {
    const p = localParts(Date.parse('2016-01-02T03:30:00Z'), 'America/New_York');
    expect(p).toMatchObject({ year: 2016, month: 1, day: 1, hour: 22, minute: 30, weekday: 5 });
    expect(localDate(Date.parse('2016-01-02T03:30:00Z'), 'America/New_York')).toBe('2016-01-01');
  });

  it('lists dates inclusively, across a month end', () => {
    expect(datesBetween('2016-02-28', '2016-03-01')).toEqual(['2016-02-28', '2016-02-29', '2016-03-01']);
  });
});
