import { describe, expect, it } from 'vitest';
import { ageOn, isMinorOn } from '../../../server/domain/crew/age.js';
import { hoursFromMinutes, minutesWorked } from '../../../server/domain/crew/hours.js';
import { csvCell, csvText } from '../../../server/domain/csv.js';

describe('ageOn', () => {
  it.each([
    ['2010-06-15', '2026-06-14', 15],
    ['2010-06-15', '2026-06-15', 16],
    ['2008-02-29', '2026-02-28', 17],
    ['2008-02-29', '2026-03-01', 18],
  ])('born %s is %i on %s', (dob, day, age) => {
    expect(ageOn(dob, day)).toBe(age);
  });

  it('treats the 18th birthday itself as adult', () => {
    expect(isMinorOn('2008-12-05', '2026-12-04')).toBe(true);
    expect(isMinorOn('2008-12-05', '2026-12-05')).toBe(false);
  });
});

describe('minutesWorked', () => {
  const at = (hhmm: string) => new Date(`2026-12-05T${hhmm}:00Z`);
  it.each([
    [{ checkedInAt: at('13:00'), checkedOutAt: at('17:30'), minutesOverride: null, noShow: false }, 270],
    [{ checkedInAt: at('13:00'), checkedOutAt: null, minutesOverride: null, noShow: false }, 0],
    [{ checkedInAt: at('13:00'), checkedOutAt: at('17:30'), minutesOverride: 200, noShow: false }, 200],
    [{ checkedInAt: null, checkedOutAt: null, minutesOverride: null, noShow: true }, 0],
  ])('%j → %i minutes', (attendance, minutes) => {
    expect(minutesWorked(attendance)).toBe(minutes);
  });

  it('rounds hours to two decimals', () => {
    expect(hoursFromMinutes(270)).toBe(4.5);
    expect(hoursFromMinutes(100)).toBe(1.67);
  });
});

describe('CSV (RFC 4180)', () => {
  it.each([
    ['plain', 'plain'],
    ['Smith, Jo', '"Smith, Jo"'],
    ['say "hi"', '"say ""hi"""'],
    ['=SUM(A1)', "'=SUM(A1)"],
    [null, ''],
  ])('%j → %s', (value, cell) => {
    expect(csvCell(value)).toBe(cell);
  });

  it('ends every line with CRLF', () => {
    expect(csvText(['a', 'b'], [[1, 2]])).toBe('a,b\r\n1,2\r\n');
  });
});
