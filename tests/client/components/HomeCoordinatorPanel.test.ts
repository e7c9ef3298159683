import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/vue';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { buildSite, buildTide } from '../support/sites';
import { buildWorkdayDto } from '../support/workday-manage';

const coordinator = buildUser({ role: 'coordinator', name: 'Kai Torres' });

async function openHome() {
  await renderApp('/', coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 2, name: 'At the water' });
  return main;
}

describe('HomeCoordinatorPanel', () => {
  it('shows the next workday with a fill bar per role, what is coming up, drafts and the latest sign-ups and cancellations', async () => {
    const next = buildWorkdayDto({ title: 'Heron Cove spring planting', startsAt: '2099-03-03T11:40:00.000Z', endsAt: '2099-03-03T14:10:00.000Z' });
    const later = buildWorkdayDto({ title: 'Otter Flats monitoring', kind: 'monitoring', startsAt: '2099-03-10T12:00:00.000Z', endsAt: '2099-03-10T15:00:00.000Z', roleCapped: false, confirmed: 3, waitlisted: 0 });
    const draft = buildWorkdayDto({ title: 'Nursery potting', status: 'draft', startsAt: '2099-03-12T13:00:00.000Z', endsAt: '2099-03-12T16:00:00.000Z' });
    const seen: URL[] = [];
    const tideAsked: URL[] = [];
    const recentAsked: URL[] = [];
    server.use(
      http.get('/api/workdays', ({ request }) => {
        seen.push(new URL(request.url));
        return HttpResponse.json({ workdays: [next, later, draft] });
      }),
      http.get(`/api/workdays/${next.id}/tide`, ({ request }) => {
        tideAsked.push(new URL(request.url));
        return HttpResponse.json(buildTide(buildSite({ id: next.siteId })));
      }),
      http.get('/api/signups/recent', ({ request }) => {
        recentAsked.push(new URL(request.url));
        return HttpResponse.json({
          signups: [
            { signupId: randomUUID(), name: 'Ben Okafor', role: 'operator', status: 'cancelled', at: '2099-02-03T15:00:00.000Z', workday: { id: later.id, title: later.title, startsAt: later.startsAt } },
            { signupId: randomUUID(), name: 'Ana Ruiz', role: 'planter', status: 'confirmed', at: '2099-02-01T15:00:00.000Z', workday: { id: next.id, title: next.title, startsAt: next.startsAt } },
          ],
        });
      }),
    );
    const main = await openHome();

    const card = within(await main.findByRole('article', { name: 'Heron Cove spring planting' }));
    expect(card.getByText('Tue 3 Mar 2099, 06:40\u201309:10 EST')).toBeTruthy();
    expect(card.getByRole('meter', { name: 'Planter' }).getAttribute('aria-valuetext')).toBe('4 of 8 places taken · 1 waiting');
    expect(card.getByRole('meter', { name: 'Boat operator' }).getAttribute('aria-valuenow')).toBe('1');
    expect(card.getByRole('link', { name: 'Check-in' }).getAttribute('href')).toBe(`/workdays/${next.id}/check-in`);
    expect(card.getByRole('link', { name: 'Roster' }).getAttribute('href')).toBe(`/workdays/${next.id}/roster`);
    expect(card.getByRole('link', { name: 'Manage' }).getAttribute('href')).toBe(`/workdays/${next.id}/manage`);
    expect(seen[0]?.searchParams.get('from')).toBeTruthy();
    // The day's tide in miniature.
    expect(await card.findByRole('img', { name: /^Tide curve for the day/ })).toBeTruthy();
    expect(tideAsked[0]?.searchParams.get('units')).toBeTruthy();

    const upcoming = within(main.getByRole('list', { name: 'Coming up' }));
    expect(upcoming.getByRole('link', { name: 'Otter Flats monitoring' })).toBeTruthy();
    expect(upcoming.getByRole('meter', { name: 'Crew for Otter Flats monitoring' }).getAttribute('aria-valuetext')).toBe('3 of 12 places taken');
    const drafts = within(main.getByRole('list', { name: 'Drafts' }));
    expect(drafts.getByRole('link', { name: 'Nursery potting' }).getAttribute('href')).toBe(`/workdays/${draft.id}/edit`);

    const signups = within(await main.findByRole('list', { name: 'Latest sign-ups and cancellations' }));
    const items = signups.getAllByRole('listitem').map((li) => Array.from(li.children, (c) => c.textContent?.replace(/\s+/g, ' ').trim()).join(' | '));
    expect(items).toEqual([
      'Ben Okafor | cancelled · Boat operator | Otter Flats monitoring (Tue 10 Mar) | Tue 3 Feb, 10:00',
      'Ana Ruiz | signed up · Planter | Heron Cove spring planting (Tue 3 Mar) | Sun 1 Feb, 10:00',
    ]);
    expect(signups.getByRole('link', { name: 'Otter Flats monitoring' }).getAttribute('href')).toBe(`/workdays/${later.id}/roster`);
    expect(recentAsked[0]?.searchParams.get('limit')).toBe('6');
  });

  it('says so when no workday is coming up', async () => {
    const main = await openHome();

    expect(await main.findByText(/No published workday coming up/)).toBeTruthy();
    expect(main.getByText(/No drafts/)).toBeTruthy();
    expect(main.getByRole('link', { name: 'new workday' }).getAttribute('href')).toBe('/workdays/new');
  });
});
