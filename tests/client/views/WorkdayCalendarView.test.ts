import { afterEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { server } from '../../setup/client-setup';
import { useClock } from '../support/clock';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';
import { PELICAN, buildWorkday } from '../support/workdays';

useClock('2025-03-01T15:00:00Z');

const heronPlanting = buildWorkday({ title: 'Heron Cove planting' });
// 03:30Z on the 15th is 20:30 on the 14th in Los Angeles: it belongs on the 14th.
const pelicanNursery = buildWorkday({
  title: 'Pelican Flats nursery evening',
  kind: 'nursery',
  site: PELICAN,
  siteId: PELICAN.id,
  startsAt: '2025-03-15T03:30:00.000Z',
  endsAt: '2025-03-15T05:30:00.000Z',
  roleCapped: false,
  capacity: 8,
  confirmed: 8,
  roles: [{ role: 'planter', capacity: 8, confirmed: 8, waitlisted: 0 }],
});
const cancelled = buildWorkday({
  title: 'Heron Cove second planting',
  startsAt: '2025-03-22T11:30:00.000Z',
  endsAt: '2025-03-22T15:00:00.000Z',
  status: 'cancelled',
  cancelMessage: 'Permit visit moved; new date soon.',
});

function answerWorkdays(workdays: WorkdayDto[] = [heronPlanting, pelicanNursery, cancelled]): URL[] {
  const seen: URL[] = [];
  server.use(
    http.get('/api/workdays', ({ request }) => {
      seen.push(new URL(request.url));
      return HttpResponse.json({ workdays });
    }),
  );
  return seen;
}

function linkTexts(list: HTMLElement): string[] {
  return within(list).getAllByRole('link').map((a) => a.getAttribute('aria-label') ?? a.textContent ?? '');
}

describe('WorkdayCalendarView', () => {
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it("opens without signing in and puts each workday on its site's local date", async () => {
    const seen = answerWorkdays();
    await renderApp('/workdays?month=2025-03', null);

    await screen.findByRole('list', { name: 'Days of March 2025' });
    expect(seen[0]?.searchParams.get('from')).toBe('2025-02-23T00:00:00Z');
    expect(seen[0]?.searchParams.get('to')).toBe('2025-04-08T00:00:00Z');
    expect(linkTexts(screen.getByRole('list', { name: 'Workdays on Fri 14 Mar' }))).toEqual([
      'Pelican Flats nursery evening, Pelican Flats, 20:30\u201322:30 PDT: Full: waitlist open',
    ]);
    expect(linkTexts(screen.getByRole('list', { name: 'Workdays on Sat 15 Mar' }))).toEqual([
      'Heron Cove planting, Heron Cove, 07:30\u201311:00 EDT: 4 places left',
    ]);
    expect(linkTexts(screen.getByRole('list', { name: 'Workdays on Sat 22 Mar' }))).toEqual([
      'Heron Cove second planting, Heron Cove, 07:30\u201311:00 EDT: Cancelled',
    ]);
    expect(screen.getByRole('link', { name: /^Heron Cove planting/ }).getAttribute('href')).toBe(`/workdays/${heronPlanting.id}`);
  });

  it('lists the days with workdays on a phone, cancelled ones struck with the reason', async () => {
    await setViewport(375, 812);
    answerWorkdays();
    await renderApp('/workdays?month=2025-03', null);

    const days = await screen.findByRole('list', { name: 'Days with workdays in March 2025' });
    expect(within(days).getAllByRole('heading', { level: 3 }).map((h) => h.textContent?.trim())).toEqual([
      'Friday 14 Mar',
      'Saturday 15 Mar',
      'Saturday 22 Mar',
    ]);
    const struck = within(days).getByRole('link', { name: /Heron Cove second planting/ });
    expect(struck.textContent).toMatch(/\(cancelled\)/);
    expect(within(days).getByText('Permit visit moved; new date soon.')).toBeTruthy();
    expect(within(days).getAllByText('Full: waitlist open')).toHaveLength(1);
  });

  it('filters by kind and site, and keeps the filters in the address', async () => {
    await setViewport(375, 812);
    answerWorkdays();
    const user = userEvent.setup();
    const { router } = await renderApp('/workdays?month=2025-03', buildUser());
    await screen.findByRole('list', { name: 'Days with workdays in March 2025' });

    await user.click(screen.getByRole('combobox', { name: 'Filter by kind' }));
    await user.click(await screen.findByRole('option', { name: 'Nursery' }));
    await waitFor(() => expect(router.currentRoute.value.query.kind).toBe('nursery'));
    let days = screen.getByRole('list', { name: 'Days with workdays in March 2025' });
    expect(within(days).getAllByRole('heading', { level: 4 }).map((h) => h.textContent?.trim())).toEqual(['Pelican Flats nursery evening']);

    await user.click(screen.getByRole('combobox', { name: 'Filter by kind' }));
    await user.click(await screen.findByRole('option', { name: 'All kinds' }));
    await user.click(screen.getByRole('combobox', { name: 'Filter by site' }));
    await user.click(await screen.findByRole('option', { name: 'Heron Cove' }));
    await waitFor(() => expect(router.currentRoute.value.query.site).toBe(heronPlanting.siteId));
    days = screen.getByRole('list', { name: 'Days with workdays in March 2025' });
    expect(within(days).getAllByRole('heading', { level: 4 }).map((h) => h.textContent?.replace(/\s+/g, ' ').trim())).toEqual([
      'Heron Cove planting',
      'Heron Cove second planting (cancelled)',
    ]);
  });

  it('shows everything coming up in the list view', async () => {
    const seen = answerWorkdays([heronPlanting, pelicanNursery]);
    const user = userEvent.setup();
    const { router } = await renderApp('/workdays', null);
    await screen.findByRole('heading', { level: 2, name: 'March 2025' });

    await user.click(screen.getByRole('button', { name: 'List' }));

    const list = await screen.findByRole('list', { name: 'Upcoming workdays' });
    expect(router.currentRoute.value.query.view).toBe('list');
    // From the start of today in the organisation's zone (New York, EST on 1 March), with no end.
    expect(seen.at(-1)?.searchParams.get('from')).toBe('2025-03-01T05:00:00.000Z');
    expect(seen.at(-1)?.searchParams.has('to')).toBe(false);
    expect(within(list).getAllByRole('heading', { level: 3 }).map((h) => h.textContent?.trim())).toEqual(['Heron Cove planting', 'Pelican Flats nursery evening']);
    expect(within(list).getByText('Sat 15 Mar, 07:30\u201311:00 EDT')).toBeTruthy();
  });

  it('says so when a month has no workdays', async () => {
    answerWorkdays([]);
    await renderApp('/workdays?month=2025-04', null);

    expect(await screen.findByText(/No workdays in April 2025 yet\./)).toBeTruthy();
  });
});
