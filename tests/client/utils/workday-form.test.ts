import { describe, expect, it } from 'vitest';
import { emptyWorkdayForm, formToUpdateBody, localToIso, plainMessage, roleCapsBody, workdayToForm } from '@/utils/workday-form';
import { buildWorkdayDto } from '../support/workday-manage';

describe('localToIso', () => {
  // Offsets from the IANA tz database (America/New_York: EST −5, EDT −4; Los Angeles PST −8, PDT −7).
  it.each([
    ['2025-03-04', '06:40', 'America/New_York', '2025-03-04T11:40:00.000Z'],
    ['2025-07-10', '06:30', 'America/New_York', '2025-07-10T10:30:00.000Z'],
    ['2025-07-10', '06:30', 'America/Los_Angeles', '2025-07-10T13:30:00.000Z'],
    ['2025-01-15', '23:59', 'America/Los_Angeles', '2025-01-16T07:59:00.000Z'],
    // 9 March 2025, 02:30 does not exist in New York (clocks jump 02:00 → 03:00): the later reading is used.
    ['2025-03-09', '02:30', 'America/New_York', '2025-03-09T07:30:00.000Z'],
    ['2025-03-04', '', 'America/New_York', ''],
    ['', '06:40', 'America/New_York', ''],
    ['2025-03-04', '25:00', 'America/New_York', ''],
  ])('%s %s in %s → %s', (date, time, zone, iso) => {
    expect(localToIso(date, time, zone)).toBe(iso);
  });
});

describe('the workday form', () => {
  it('fills a window in the given zone', () => {
    const form = emptyWorkdayForm({ siteId: 's1', startsAt: '2025-07-10T13:30:00.000Z', endsAt: '2025-07-10T16:00:00.000Z' }, 'America/Los_Angeles');
    expect(form).toMatchObject({ siteId: 's1', date: '2025-07-10', startTime: '06:30', endTime: '09:00', capacity: '12', capEachRole: false });
  });

  it('sends role caps above zero in the usual role order', () => {
    const form = emptyWorkdayForm({}, 'UTC');
    Object.assign(form.roleCaps, { planter: '6', seat: '0', 'own-kayak': '2', shore: '' });
    expect(roleCapsBody(form)).toEqual([
      { role: 'own-kayak', capacity: 2 },
      { role: 'planter', capacity: 6 },
    ]);
  });

  it('sends only what changed, empty role caps when they are turned off', () => {
    const initial = workdayToForm(buildWorkdayDto());
    const form = { ...initial, roleCaps: { ...initial.roleCaps }, capEachRole: false, title: 'New title' };
    expect(formToUpdateBody(form, initial, 'America/New_York', 'America/New_York')).toEqual({ title: 'New title', roles: [] });
  });

  it('counts a move to a site in another zone as a new time', () => {
    const initial = workdayToForm(buildWorkdayDto());
    const body = formToUpdateBody({ ...initial, siteId: 'other' }, initial, 'America/Chicago', 'America/New_York');
    expect(body).toEqual({ siteId: 'other', startsAt: '2025-03-04T12:40:00.000Z', endsAt: '2025-03-04T15:10:00.000Z' });
  });

  it.each([
    ['Too big: expected number to be <=500', 'Must be at most 500'],
    ['Invalid input: expected number, received NaN', 'Must be a number'],
    ['Must be an ISO date-time', 'Choose a day and a time'],
    ['Is taken', 'Is taken'],
  ])('says %s as %s', (message, plain) => {
    expect(plainMessage(message)).toBe(plain);
  });
});
