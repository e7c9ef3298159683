import { afterEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';
import { buildRosterRow, buildWorkdayDto, mockWorkdayAndRoster } from '../support/workday-manage';

const coordinator = buildUser({ role: 'coordinator' });
const workday = buildWorkdayDto();
// In the server's order: confirmed by role then name, then the waitlist in line order.
const roster = [
  buildRosterRow({ name: 'Omar Haddad', role: 'operator', operatorQualification: 'USCG OUPV licence', skills: ['boat-operator', 'first-aid'] }),
  buildRosterRow({
    name: 'Mia Chen',
    role: 'planter',
    isMinor: true,
    guardianName: 'Wei Chen',
    emailVerified: false,
    ownCraft: { kind: 'tandem-kayak', seats: 2, maxLoadKg: 158.8 },
  }),
  buildRosterRow({ name: 'José Alvarez', role: 'planter', ageNotGiven: true, emergencyContact: null, checkedInAt: '2025-03-04T11:42:00.000Z', checkedOutAt: '2025-03-04T14:02:00.000Z', minutes: 140 }),
  buildRosterRow({ name: 'Kim Park', role: 'planter', status: 'waitlisted', position: 1 }),
];

async function openRoster() {
  mockWorkdayAndRoster(workday, roster);
  await renderApp(`/workdays/${workday.id}/roster`, coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 2, name: /Waitlist/ });
  return main;
}

describe('WorkdayRosterView', () => {
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('groups the confirmed crew by role, then the waitlist, with a table per group on wide screens', async () => {
    const main = await openRoster();

    expect(main.getAllByRole('heading', { level: 2 }).map((h) => h.textContent?.replace(/\s+/g, ' ').trim())).toEqual([
      'Boat operator (1)',
      'Planter (2)',
      'Waitlist (1)',
    ]);
    const planters = within(main.getByRole('region', { name: 'Planter' }));
    expect(planters.getAllByRole('row')).toHaveLength(3); // header + two people
    expect(planters.getByText('Wei Chen', { exact: false })).toBeTruthy();
    expect(planters.getByText('In 06:42 · out 09:02 · 2 h 20 min')).toBeTruthy();
    expect(within(main.getByRole('region', { name: 'Waitlist' })).getByText('Waitlist #1')).toBeTruthy();
    expect(main.getByText('3 confirmed · 1 on the waitlist')).toBeTruthy();
    expect(main.getByRole('link', { name: 'Download CSV' }).getAttribute('href')).toBe(`/api/workdays/${workday.id}/roster?format=csv`);
  });

  it('flags waiver, minors with their guardian, missing age, own craft, operator and unverified e-mail', async () => {
    const main = await openRoster();

    const mia = within(main.getByRole('list', { name: 'Flags for Mia Chen' }));
    expect(mia.getByText('Waiver v2 signed')).toBeTruthy();
    expect(mia.getByText('Minor · guardian: Wei Chen')).toBeTruthy();
    // The organisation works in feet, so craft loads are in pounds.
    expect(mia.getByText('Own craft: Tandem kayak, 2 seats, max 350.1 lb')).toBeTruthy();
    expect(mia.getByText('E-mail not verified')).toBeTruthy();
    expect(within(main.getByRole('list', { name: 'Flags for José Alvarez' })).getByText('Age not given')).toBeTruthy();
    expect(within(main.getByRole('list', { name: 'Flags for Omar Haddad' })).getByText('Operator: USCG OUPV licence')).toBeTruthy();
    expect(main.getAllByText('Luis Ruiz').length).toBeGreaterThan(0);
  });

  it('shows cards on a phone and filters by name, role and status', async () => {
    await setViewport(375, 812);
    const user = userEvent.setup();
    const main = await openRoster();

    const planters = within(main.getByRole('list', { name: 'Planter' }));
    expect(planters.getAllByRole('heading', { level: 3 }).map((h) => h.textContent)).toEqual(['Mia Chen', 'José Alvarez']);
    expect(planters.getByRole('link', { name: '+1 727 555 0101' }).getAttribute('href')).toBe('tel:+1 727 555 0101');

    await user.type(main.getByLabelText('Search by name'), 'jose');
    await waitFor(() => expect(main.getAllByRole('heading', { level: 3 }).map((h) => h.textContent)).toEqual(['José Alvarez']));

    await user.clear(main.getByLabelText('Search by name'));
    await user.click(main.getByRole('combobox', { name: 'Status' }));
    await user.click(await screen.findByRole('option', { name: 'Waitlist' }));
    await waitFor(() => expect(main.getAllByRole('heading', { level: 3 }).map((h) => h.textContent)).toEqual(['Kim Park']));
  });
});
