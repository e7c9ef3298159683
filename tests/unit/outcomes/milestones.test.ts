import dayjs from 'dayjs';
import { describe, expect, it } from 'vitest';
import { addMonths, milestoneMonths, milestoneWindow, monthsBetween, nextMilestone } from '../../../server/domain/outcomes/milestones.js';

describe('addMonths', () => {
  // Reference: dayjs (npm registry), whose `add(n, 'month')` clamps to the end of a shorter month.
  const dates = ['2026-01-31', '2026-03-31', '2024-01-29', '2024-02-29', '2025-12-15', '2026-08-31', '2026-10-01'];
  const months = [1, 3, 6, 12, 24, 36];
  it.each(dates.flatMap((d) => months.map((m) => [d, m] as const)))('%s + %i months agrees with dayjs', (date, m) => {
    expect(addMonths(date, m)).toBe(dayjs(date).add(m, 'month').format('YYYY-MM-DD'));
  });

  it('clamps to the end of a shorter month', () => {
    expect(addMonths('2026-01-31', 1)).toBe('2026-02-28');
    expect(addMonths('2023-02-28', 12)).toBe('2024-02-28');
  });
});

describe('milestones', () => {
  it('lists 1, 3, 6 and 12 months, then yearly', () => {
    expect(milestoneMonths(0)).toEqual([1, 3, 6, 12]);
    expect(milestoneMonths(37)).toEqual([1, 3, 6, 12, 24, 36]);
    expect([1, 3, 6, 12, 24].map(nextMilestone)).toEqual([3, 6, 12, 24, 36]);
  });

  it('opens each window two weeks before the milestone and closes it when the next one opens', () => {
    // Planted 10 March 2026: 1 month is 10 April; its window opens 27 March; 3 months is 10 June,
    // whose window opens 27 May, so the 1-month window takes visits from 27 March to 26 May.
    expect(milestoneWindow('2026-03-10', 1, 14)).toEqual({ months: 1, dueOn: '2026-04-10', opensOn: '2026-03-27', closesBefore: '2026-05-27' });
    expect(milestoneWindow('2026-03-10', 12, 14)).toEqual({ months: 12, dueOn: '2027-03-10', opensOn: '2027-02-24', closesBefore: '2028-02-25' });
  });

  it('counts whole calendar months', () => {
    expect(monthsBetween('2026-03-10', '2026-04-09')).toBe(0);
    expect(monthsBetween('2026-03-10', '2026-04-10')).toBe(1);
    expect(monthsBetween('2026-03-10', '2027-03-10')).toBe(12);
    expect(monthsBetween('2026-03-10', '2025-03-10')).toBe(0);
  });
});
