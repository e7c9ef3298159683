import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http } from 'msw';
import type { PublicUser } from '@shared/schemas/user.schema';
import { server } from '../../setup/client-setup';
import { useClock } from '../support/clock';
import { errorResponse } from '../support/msw';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { buildDayTide, buildWorkday, mockWorkdayPage } from '../support/workdays';

useClock('2025-03-01T15:00:00Z');

async function openPage(workday = buildWorkday(), user: PublicUser | null = buildUser()) {
  const result = await renderApp(`/workdays/${workday.id}`, user);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 1, name: workday.title });
  return { ...result, main };
}

describe('WorkdayView', () => {
  it("shows an anonymous visitor the day in the site's zone, places per role, the cautions and 'Sign in to join'", async () => {
    const workday = buildWorkday();
    // The workday and its day's tide (both public): a request for the crew or a sign-up would fail the test.
    server.use(
      http.get(`/api/workdays/${workday.id}`, () => Response.json({ workday })),
      http.get(`/api/workdays/${workday.id}/tide`, () => Response.json(buildDayTide())),
    );
    const { main } = await openPage(workday, null);

    expect(document.title).toBe('Spring planting at Heron Cove · Ebbroot');
    expect(main.getByText('Saturday 15 Mar 2025')).toBeTruthy();
    expect(main.getByText('07:30\u201311:00 EDT')).toBeTruthy();
    expect(main.getByText('Bayside ramp, by the green shed')).toBeTruthy();
    expect(main.getByRole('meter', { name: 'Planter: places taken' }).getAttribute('aria-valuetext')).toBe('3 of 6 places taken, 3 places left, nobody waiting');
    expect(main.getByRole('meter', { name: 'Paddler with own kayak: places taken' }).getAttribute('aria-valuetext')).toMatch(/full: waitlist open, 1 on the waitlist/);
    expect(main.queryByRole('meter', { name: /Paddler needing a seat/ })).toBeNull();
    expect(main.getByRole('link', { name: 'Add to calendar' }).getAttribute('href')).toBe(`/api/calendar/workdays/${workday.id}.ics`);

    const cautions = main.getByRole('complementary', { name: 'Cautions for the day' });
    expect(cautions.textContent).toMatch(/life jacket \(PFD\)/i);
    expect(cautions.textContent).toMatch(/first thunder, and wait 30 minutes after the last/);
    expect(cautions.textContent).toMatch(/oyster shell/);
    expect(cautions.textContent).toMatch(/Float plan/);
    expect(cautions.textContent).toMatch(/boat operator's word come first/);
    expect(document.body.textContent).not.toMatch(/\bsafe\b/i);

    const join = main.getByRole('link', { name: 'Sign in to join' });
    expect(join.getAttribute('href')).toBe(`/login?redirect=/workdays/${workday.id}`);
    expect(await main.findByRole('list', { name: 'Highs and lows' })).toBeTruthy();
    expect(main.queryByRole('heading', { name: "Who's coming" })).toBeNull();
  });

  it("shows a signed-in volunteer the day's highs and lows and the crew's first names", async () => {
    const workday = buildWorkday();
    const seen = mockWorkdayPage(workday);
    const { main } = await openPage(workday);

    const turns = await main.findByRole('list', { name: 'Highs and lows' });
    expect(seen.tide[0]?.searchParams.get('units')).toBe('ft');
    expect(within(turns).getAllByRole('listitem').map((li) => li.textContent?.replace(/\s+/g, ' ').trim())).toEqual([
      'Low 08:40 EDT · \u22120.5 ft',
      'High 15:10 EDT · 2.2 ft',
    ]);
    expect(main.getByRole('img', { name: /Tide curve for the day: low \u22120\.5 ft at 08:40, high 2\.2 ft at 15:10/ })).toBeTruthy();
    const crew = await main.findByRole('heading', { name: "Who's coming" });
    expect(crew.parentElement?.textContent).toMatch(/Planter: Ana, Ben/);
    expect(crew.parentElement?.textContent).toMatch(/Paddler with own kayak: Kai/);
  });

  it("shows a cancelled workday's notice with the coordinator's message, and no sign-up", async () => {
    const workday = buildWorkday({ status: 'cancelled', cancelMessage: 'Small craft advisory all morning; we will pick a new date.' });
    server.use(
      http.get(`/api/workdays/${workday.id}`, () => Response.json({ workday })),
      http.get(`/api/workdays/${workday.id}/tide`, () => Response.json(buildDayTide())),
    );
    const { main } = await openPage(workday, null);

    const notice = main.getByRole('alert');
    expect(within(notice).getByRole('heading', { name: 'This workday is cancelled' })).toBeTruthy();
    expect(notice.textContent).toContain('Small craft advisory all morning; we will pick a new date.');
    expect(main.queryByRole('link', { name: 'Sign in to join' })).toBeNull();
    expect(main.queryByRole('link', { name: 'Add to calendar' })).toBeNull();
  });

  it('shows my waitlist position when I am already in line', async () => {
    const workday = buildWorkday();
    mockWorkdayPage(workday, { mine: { id: crypto.randomUUID(), status: 'waitlisted', role: 'own-kayak', position: 2 } });
    const { main } = await openPage(workday);

    expect(await main.findByText("You're number 2 on the waitlist")).toBeTruthy();
    expect(main.getByText('Role: Paddler with own kayak')).toBeTruthy();
  });

  it('cancels my place after a confirmation, then offers the sign-up again', async () => {
    const workday = buildWorkday();
    const seen = mockWorkdayPage(workday, { mine: { id: crypto.randomUUID(), status: 'confirmed', role: 'planter' } });
    const user = userEvent.setup();
    const { main } = await openPage(workday);

    expect(await main.findByText("You're on the crew")).toBeTruthy();
    // The jump button at the top no longer invites me to sign up for a day I'm already on.
    expect(main.getByRole('button', { name: 'See your place on this workday' })).toBeTruthy();
    expect(main.queryByRole('button', { name: 'Sign up for this workday' })).toBeNull();
    await user.click(main.getByRole('button', { name: 'Cancel my place' }));
    const dialog = await screen.findByRole('dialog', { name: 'Give up your place?' });
    await user.click(within(dialog).getByRole('button', { name: 'Yes, cancel my place' }));

    await waitFor(() => expect(seen.deleted).toBe(1));
    expect(await main.findByRole('radio', { name: /Planter/ })).toBeTruthy();
    expect(main.queryByText("You're on the crew")).toBeNull();
    expect(main.getByRole('button', { name: 'Sign up for this workday' })).toBeTruthy();
  });

  it('says why a place cannot be cancelled once the workday has started', async () => {
    const workday = buildWorkday();
    mockWorkdayPage(workday, { mine: { id: crypto.randomUUID(), status: 'confirmed', role: 'planter' } });
    server.use(http.delete(`/api/workdays/${workday.id}/signups/mine`, () => errorResponse(409, 'conflict', 'started')));
    const user = userEvent.setup();
    const { main } = await openPage(workday);

    await user.click(await main.findByRole('button', { name: 'Cancel my place' }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Give up your place?' })).getByRole('button', { name: 'Yes, cancel my place' }));

    expect(await main.findByText(/This workday has started, so your place can no longer be cancelled here/)).toBeTruthy();
    expect(main.getByText("You're on the crew")).toBeTruthy();
  });
});
