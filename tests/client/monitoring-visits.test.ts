import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { CreateVisitBody, MonitoringDueDto, VisitDto } from '@shared/schemas/outcomes.schema';
import { server } from '../setup/client-setup';
import { useClock } from './support/clock';
import { errorResponse } from './support/msw';
import { renderApp } from './support/render-app';
import { buildSite } from './support/sites';
import { buildUser } from './support/users';
import { buildWorkdayDto } from './support/workday-manage';

useClock('2025-03-20T15:00:00Z');
const coordinator = buildUser({ role: 'coordinator' });
const site = buildSite({ name: 'Heron Cove' });

function visit(overrides: Partial<VisitDto> = {}): VisitDto {
  return { id: randomUUID(), siteId: site.id, siteName: 'Heron Cove', workdayId: null, visitedOn: '2025-02-12', notes: '', counts: { alive: 9, lost: 2, missing: 1, checked: 12 }, ...overrides };
}

const due: MonitoringDueDto = {
  today: '2025-03-20',
  toleranceDays: 14,
  sites: [{ siteId: site.id, siteName: 'Heron Cove', lastVisitOn: '2025-02-12', cohorts: [{ plantedOn: '2024-12-14', months: 3, dueOn: '2025-03-14', lateAfter: '2025-03-28', status: 'due', trees: 12, checked: 0 }] }],
};

function mockPage(visits: VisitDto[] = []) {
  const workdayQueries: URLSearchParams[] = [];
  server.use(
    http.get('/api/monitoring-visits', () => HttpResponse.json({ visits })),
    http.get('/api/monitoring/due', () => HttpResponse.json(due)),
    http.get('/api/sites', () => HttpResponse.json({ sites: [site] })),
    http.get('/api/workdays', ({ request }) => {
      workdayQueries.push(new URL(request.url).searchParams);
      return HttpResponse.json({ workdays: [buildWorkdayDto({ title: 'Heron Cove 3-month check', kind: 'monitoring', siteId: site.id, startsAt: '2025-03-18T13:00:00.000Z', endsAt: '2025-03-18T16:00:00.000Z' })] });
    }),
  );
  return workdayQueries;
}

describe('Monitoring visits', () => {
  it('lists the checks due and past visits with what they found, and the usual cautions', async () => {
    const past = visit();
    mockPage([past]);
    await renderApp('/monitoring', coordinator);
    const main = within(screen.getByRole('main'));

    const dueList = within(await main.findByRole('list', { name: 'Monitoring checks due' }));
    expect(dueList.getByText(/3-month check of the 12 trees planted Sat 14 Dec 2024: due Fri 14 Mar, late after Fri 28 Mar/)).toBeTruthy();
    const visits = within(await main.findByRole('list', { name: 'Monitoring visits' }));
    expect(visits.getByRole('link', { name: 'Heron Cove, Wed 12 Feb 2025' }).getAttribute('href')).toBe(`/monitoring/${past.id}`);
    expect(visits.getByText('12 checked: 9 alive · 2 lost · 1 missing')).toBeTruthy();
    expect(main.getByText(/life jacket for everyone and a float plan left ashore/)).toBeTruthy();
    expect(main.getByText(/Local regulations, permits and licensed captains come first/)).toBeTruthy();
  });

  it('starts a visit at a site on a monitoring workday and opens its tree-by-tree form', async () => {
    const created = visit({ visitedOn: '2025-03-18', counts: { alive: 0, lost: 0, missing: 0, checked: 0 } });
    const bodies: CreateVisitBody[] = [];
    const workdayQueries = mockPage();
    server.use(
      http.post('/api/monitoring-visits', async ({ request }) => {
        bodies.push((await request.json()) as CreateVisitBody);
        return HttpResponse.json({ visit: created }, { status: 201 });
      }),
      http.get(`/api/monitoring-visits/${created.id}`, () => HttpResponse.json({ visit: created, trees: [] })),
    );
    const user = userEvent.setup();
    const { router } = await renderApp('/monitoring', coordinator);
    const main = within(screen.getByRole('main'));

    const form = within(await main.findByRole('form', { name: 'Start a visit' }));
    expect(form.getByLabelText('Date of the visit')).toHaveProperty('value', '2025-03-20');
    await waitFor(() => expect(form.getByRole('option', { name: 'Heron Cove' })).toBeTruthy());
    await user.selectOptions(form.getByLabelText('Site'), 'Heron Cove');
    await user.selectOptions(await form.findByLabelText('Monitoring workday (optional)'), await form.findByRole('option', { name: /^Heron Cove 3-month check/ }));
    const date = form.getByLabelText('Date of the visit');
    await user.clear(date);
    await user.type(date, '2025-03-18');
    await user.type(form.getByLabelText('Notes (optional)'), 'Calm, low water at 08:40');
    await user.click(form.getByRole('button', { name: 'Start checking trees' }));

    await waitFor(() => expect(router.currentRoute.value.fullPath).toBe(`/monitoring/${created.id}`));
    expect(bodies).toEqual([{ siteId: site.id, visitedOn: '2025-03-18', notes: 'Calm, low water at 08:40', workdayId: expect.any(String) }]);
    expect(workdayQueries[0]?.get('kind')).toBe('monitoring');
    expect(workdayQueries[0]?.get('siteId')).toBe(site.id);
    expect(await screen.findByText(/No planted trees at Heron Cove by this date/)).toBeTruthy();
  });

  it('asks for the site first, and shows the server’s word on a date in the future', async () => {
    mockPage();
    // Two sites, so none is chosen for the coordinator.
    server.use(http.get('/api/sites', () => HttpResponse.json({ sites: [site, buildSite({ name: 'Otter Flats' })] })));
    server.use(http.post('/api/monitoring-visits', () => errorResponse(400, 'validation_failed', 'A visit cannot be recorded ahead of time', { visitedOn: ['cannot be in the future'] })));
    const user = userEvent.setup();
    await renderApp('/monitoring', coordinator);
    const form = within(await screen.findByRole('form', { name: 'Start a visit' }));

    await user.click(form.getByRole('button', { name: 'Start checking trees' }));
    expect(await form.findByText('Choose the site you visited.')).toBeTruthy();

    await waitFor(() => expect(form.getByRole('option', { name: 'Heron Cove' })).toBeTruthy());
    await user.selectOptions(form.getByLabelText('Site'), 'Heron Cove');
    await user.click(form.getByRole('button', { name: 'Start checking trees' }));
    expect(await form.findByText('Cannot be in the future')).toBeTruthy();
  });
});
