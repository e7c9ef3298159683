import { describe, expect, it } from 'vitest';
import { clockTime, shortDate, workdayWhen } from '../../server/domain/workday-time.js';

/*
 * Offsets and abbreviations from the IANA time zone database (tzdata): America/New_York is
 * UTC−4 (EDT) in summer and UTC−5 (EST) in winter, and in 2025 daylight saving time ended on
 * Sunday 2 November at 02:00 EDT; Pacific/Honolulu is UTC−10 (HST) all year;
 * America/Puerto_Rico is UTC−4 (AST) all year.
 */
describe('workdayWhen', () => {
  it.each([
    ['summer, New York', '2025-08-16T11:30:00Z', '2025-08-16T15:30:00Z', 'America/New_York', 'Saturday, August 16, 2025, 7:30 AM – 11:30 AM EDT'],
    ['winter, New York', '2026-01-10T14:00:00Z', '2026-01-10T18:00:00Z', 'America/New_York', 'Saturday, January 10, 2026, 9:00 AM – 1:00 PM EST'],
    ['the night clocks go back', '2025-11-02T05:00:00Z', '2025-11-02T07:00:00Z', 'America/New_York', 'Sunday, November 2, 2025, 1:00 AM EDT – 2:00 AM EST'],
    ['Hawaii', '2025-08-16T18:00:00Z', '2025-08-16T22:00:00Z', 'Pacific/Honolulu', 'Saturday, August 16, 2025, 8:00 AM – 12:00 PM HST'],
    ['past local midnight', '2025-08-16T23:00:00Z', '2025-08-17T05:00:00Z', 'America/New_York', 'Saturday, August 16, 2025, 7:00 PM EDT – Sunday, August 17, 2025, 1:00 AM EDT'],
    ['Puerto Rico, an evening in UTC terms the next day', '2025-08-16T23:00:00Z', '2025-08-17T03:00:00Z', 'America/Puerto_Rico', 'Saturday, August 16, 2025, 7:00 PM – 11:00 PM AST'],
  ])('%s', (_name, start, end, zone, expected) => {
    expect(workdayWhen(new Date(start), new Date(end), zone)).toBe(expected);
  });

  it('uses plain spaces, not the narrow no-break space ICU puts before AM/PM', () => {
    expect(workdayWhen(new Date('2025-08-16T11:30:00Z'), new Date('2025-08-16T15:30:00Z'), 'America/New_York')).not.toMatch(/[\u202f\u00a0]/);
  });
});

describe('shortDate and clockTime', () => {
  it('read the instant in the site zone, which can be another day than UTC', () => {
    const at = new Date('2025-08-17T02:00:00Z');
    expect(shortDate(at, 'America/New_York')).toBe('Sat, Aug 16');
    expect(clockTime(at, 'America/New_York')).toEqual({ time: '10:00 PM', zone: 'EDT' });
  });
});
