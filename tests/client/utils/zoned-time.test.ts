import { describe, expect, it } from 'vitest';
import {
  addDays,
  formatDateKey,
  formatLocalRange,
  formatLocalTime,
  isDateKey,
  localDateKey,
  localMinuteOfDay,
  mondayOf,
  offsetMinutes,
  zoneAbbreviation,
  zonedTime,
} from '@/utils/zoned-time';

// US daylight saving time starts on the second Sunday of March at 02:00 local (Energy Policy Act of
// 2005, 15 U.S.C. 260a): 9 March 2025. Eastern time is UTC−5 (EST) before and UTC−4 (EDT) after.
const NY = 'America/New_York';

describe('zoned time', () => {
  it.each([
    ['2025-03-04T04:59:00Z', NY, '2025-03-03'],
    ['2025-03-04T05:00:00Z', NY, '2025-03-04'],
    ['2025-03-04T23:30:00Z', 'Australia/Brisbane', '2025-03-05'],
    ['2025-03-04T23:30:00Z', 'UTC', '2025-03-04'],
  ])('localDateKey(%s, %s) is %s', (iso, tz, key) => {
    expect(localDateKey(iso, tz)).toBe(key);
  });

  it.each([
    ['2025-03-04T12:00:00Z', -300],
    ['2025-03-10T12:00:00Z', -240],
  ])('offsetMinutes(%s) in New York is %s', (iso, minutes) => {
    expect(offsetMinutes(iso, NY)).toBe(minutes);
  });

  it.each([
    ['2025-03-04', 0, 0, '2025-03-04T05:00:00.000Z'],
    ['2025-03-10', 0, 0, '2025-03-10T04:00:00.000Z'],
    ['2025-03-09', 0, 0, '2025-03-09T05:00:00.000Z'],
    ['2025-03-09', 12, 0, '2025-03-09T16:00:00.000Z'],
    // 02:30 does not exist on the morning clocks go forward: the later reading (03:30 EDT) is used.
    ['2025-03-09', 2, 30, '2025-03-09T07:30:00.000Z'],
  ])('zonedTime(%s, %s:%s) in New York is %s', (key, h, m, iso) => {
    expect(zonedTime(key, NY, h, m).toISOString()).toBe(iso);
  });

  it('does calendar steps and finds the Monday of a week', () => {
    expect(addDays('2025-02-27', 3)).toBe('2025-03-02');
    expect(addDays('2025-03-03', -7)).toBe('2025-02-24');
    expect(mondayOf('2025-03-09')).toBe('2025-03-03');
    expect(mondayOf('2025-03-03')).toBe('2025-03-03');
  });

  it('checks date keys', () => {
    expect(isDateKey('2025-03-04')).toBe(true);
    expect(isDateKey('2025-02-30')).toBe(false);
    expect(isDateKey('2025-3-4')).toBe(false);
    expect(isDateKey(undefined)).toBe(false);
  });

  it('formats local times with the zone abbreviation of the moment', () => {
    expect(formatLocalTime('2025-03-04T11:40:00Z', NY)).toBe('06:40');
    expect(zoneAbbreviation('2025-03-04T11:40:00Z', NY)).toBe('EST');
    expect(zoneAbbreviation('2025-03-10T11:40:00Z', NY)).toBe('EDT');
    expect(formatLocalRange('2025-03-04T11:40:00Z', '2025-03-04T14:10:00Z', NY)).toBe('06:40\u201309:10 EST');
    expect(localMinuteOfDay('2025-03-04T11:40:00Z', NY)).toBe(400);
  });

  it('writes a date key as words', () => {
    expect(formatDateKey('2025-03-04')).toBe('Tue 4 Mar');
    expect(formatDateKey('2025-03-04', { year: true, weekday: 'long' })).toBe('Tuesday 4 Mar 2025');
  });
});
