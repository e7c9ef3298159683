import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/vue';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { useClock } from '../support/clock';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { buildDayTide, buildWorkday } from '../support/workdays';

useClock('2025-03-01T15:00:00Z');

describe('HomeVolunteerPanel', () => {
  it("shows my next workday with the day's low water, my year, and open workdays that need people", async () => {
    const next = buildWorkday({ title: 'Spring planting' });
    const waiting = buildWorkday({ title: 'Kayak run', startsAt: '2025-03-22T11:30:00.000Z', endsAt: '2025-03-22T15:00:00.000Z' });
    const open = buildWorkday({ title: 'Nursery potting', kind: 'nursery', startsAt: '2025-03-08T14:00:00.000Z', endsAt: '2025-03-08T17:00:00.000Z' });
    const full = buildWorkday({ title: 'Full day', capacity: 6, confirmed: 6 });
    const seenOpen: URL[] = [];
    server.use(
      http.get('/api/me/workdays', () =>
        HttpResponse.json({
          workdays: [
            { workday: next, signup: { id: crypto.randomUUID(), role: 'planter', status: 'confirmed', position: null } },
            { workday: waiting, signup: { id: crypto.randomUUID(), role: 'own-kayak', status: 'waitlisted', position: 2 } },
          ],
        }),
      ),
      http.get('/api/me/hours', () => HttpResponse.json({ rows: [], totalMinutes: 750, totalHours: 12.5, workdaysAttended: 4, crewTreesPlanted: 37 })),
      http.get('/api/workdays', ({ request }) => {
        seenOpen.push(new URL(request.url));
        return HttpResponse.json({ workdays: [open, next, full] });
      }),
      http.get(`/api/workdays/${next.id}/tide`, () => HttpResponse.json(buildDayTide())),
    );
    await renderApp('/', buildUser({ name: 'Rosa Mendes' }));

    const nextPanel = within(await screen.findByRole('region', { name: 'Your next workday' }));
    expect(await nextPanel.findByRole('link', { name: 'Spring planting' })).toBeTruthy();
    expect(nextPanel.getByText('Saturday 15 Mar 2025, 07:30\u201311:00 EDT')).toBeTruthy();
    expect(nextPanel.getByText('Bayside ramp, by the green shed')).toBeTruthy();
    expect(await nextPanel.findByText(/08:40 \(\u22120\.5 ft\)/)).toBeTruthy();
    expect(nextPanel.getByText('Hat and sunscreen')).toBeTruthy();
    expect(nextPanel.getByRole('link', { name: 'Read the cautions for the day' }).getAttribute('href')).toBe(`/workdays/${next.id}#cautions`);
    expect(nextPanel.getByText(/number 2 on the waitlist for/)).toBeTruthy();

    const year = await screen.findByRole('region', { name: 'Your year' });
    expect(year.textContent).toMatch(/12\.5 h of volunteer time over 4 workdays this year/);
    expect(year.textContent).toMatch(/37 trees planted by crews you were on/);

    const openPanel = within(screen.getByRole('region', { name: 'Workdays that need people' }));
    expect((await openPanel.findAllByRole('heading', { level: 3 })).map((h) => h.textContent?.trim())).toEqual(['Nursery potting']);
    expect(seenOpen[0]?.searchParams.get('status')).toBe('published');
  });

  it("points a new volunteer to the calendar when they aren't on a workday yet", async () => {
    await renderApp('/', buildUser());

    const panel = within(await screen.findByRole('region', { name: 'Your next workday' }));
    expect(await panel.findByText(/You don't have a place on a workday yet/)).toBeTruthy();
    expect(panel.getByRole('link', { name: 'Find one to join' }).getAttribute('href')).toBe('/workdays');
    expect(await screen.findByText(/Every upcoming workday is full or you're already on it/)).toBeTruthy();
    expect((await screen.findByRole('region', { name: 'Your year' })).textContent).toMatch(/0 trees planted by crews you were on/);
  });
});
