import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/vue';
import { http, HttpResponse } from 'msw';
import type { MonitoringDueDto } from '@shared/schemas/outcomes.schema';
import { server } from '../setup/client-setup';
import { useClock } from './support/clock';
import { errorResponse } from './support/msw';
import { buildReadiness, buildTree } from './support/nursery';
import { renderApp } from './support/render-app';
import { buildSite } from './support/sites';
import { buildUser } from './support/users';
import { buildDayTide, buildWorkday } from './support/workdays';

useClock('2025-03-10T15:00:00Z');
const coordinator = buildUser({ role: 'coordinator' });
const heron = buildSite({ name: 'Heron Cove' });
const otter = buildSite({ name: 'Otter Flats' });

const due: MonitoringDueDto = {
  today: '2025-03-10',
  toleranceDays: 14,
  sites: [{ siteId: heron.id, siteName: 'Heron Cove', lastVisitOn: null, cohorts: [{ plantedOn: '2025-01-20', months: 1, dueOn: '2025-02-20', lateAfter: '2025-03-06', status: 'overdue', trees: 12, checked: 0 }] }],
};

function readiness(site: typeof heron, ready: number, judged: number) {
  const trees = Array.from({ length: judged }, (_, i) => buildReadiness(buildTree({ tag: `T-${i}` }), { ready: i < ready }));
  return { site: { id: site.id, name: site.name, salinityPpt: 30 }, today: '2025-03-10', mhhwM: 0.8, mslM: 0.4, trees };
}

async function openHome() {
  await renderApp('/', coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 2, name: 'At the water' });
  return main;
}

describe('Coordinator home, the rest of "At the water"', () => {
  it('shows the next workday’s tide times, brining today, trees ready per site, monitoring due and campaign progress', async () => {
    const next = buildWorkday({ title: 'Spring planting' });
    server.use(
      http.get('/api/workdays', () => HttpResponse.json({ workdays: [next] })),
      http.get(`/api/workdays/${next.id}/tide`, () => HttpResponse.json(buildDayTide())),
      http.get(`/api/workdays/${next.id}/roster`, () => HttpResponse.json({ roster: [] })),
      http.get('/api/sites', () => HttpResponse.json({ sites: [heron, otter] })),
      http.get(`/api/sites/${heron.id}/readiness`, () => HttpResponse.json(readiness(heron, 2, 3))),
      http.get(`/api/sites/${otter.id}/readiness`, () => HttpResponse.json(readiness(otter, 0, 3))),
      http.get('/api/nursery/tasks', () =>
        HttpResponse.json({ date: '2025-03-10', tasks: [{ date: '2025-03-10', fromPpt: 15, toPpt: 20, replaceLitres: 120, stockPpt: 35, tankId: 't1', tankName: 'Tank A', message: 'Swap 120 L with sea water to reach 20 ppt' }], skipped: [] }),
      ),
      http.get('/api/monitoring/due', () => HttpResponse.json(due)),
      http.get('/api/campaigns', () =>
        HttpResponse.json({ campaigns: [{ id: 'c1', name: 'Heron Cove living shoreline', story: '', priceCents: 2500, goalTrees: 150, startsOn: '2025-01-01', endsOn: null, active: true, open: true, sponsoredTrees: 26 }] }),
      ),
    );
    const main = await openHome();

    // Sat 15 Mar 2025 at the site (EDT): low 08:40, high 15:10; the low after midnight belongs to the next day.
    expect(await main.findByText('Low 08:40 (\u22120.5 ft) · High 15:10 (2.2 ft)')).toBeTruthy();
    expect(within(await main.findByRole('list', { name: 'Brining tasks today' })).getByText(/Swap 120 L with sea water to reach 20 ppt/)).toBeTruthy();
    const ready = within(await main.findByRole('list', { name: 'Trees ready per site' }));
    expect(ready.getAllByRole('listitem').map((li) => li.textContent?.replace(/\s+/g, ' ').trim())).toEqual([
      'Heron Cove: 2 ready of 3 potted, brining or ready',
      'Otter Flats: 0 ready of 3 potted, brining or ready',
    ]);
    const dueList = within(await main.findByRole('list', { name: 'Monitoring checks due' }));
    expect(dueList.getByText('Overdue')).toBeTruthy();
    expect(main.getByRole('link', { name: 'Start a monitoring visit' }).getAttribute('href')).toBe('/monitoring');
    const campaigns = within(await main.findByRole('list', { name: 'Open campaigns' }));
    expect(campaigns.getByRole('progressbar', { name: 'Trees sponsored' }).getAttribute('aria-valuetext')).toBe('26 of 150 trees sponsored');
    expect(main.getByRole('link', { name: 'Reports' }).getAttribute('href')).toBe('/reports');
  });

  it('keeps the rest of the page when one part cannot load', async () => {
    server.use(
      http.get('/api/monitoring/due', () => errorResponse(500, 'internal_error', 'boom')),
      http.get('/api/sites', () => HttpResponse.json({ sites: [heron] })),
      http.get(`/api/sites/${heron.id}/readiness`, () => errorResponse(500, 'internal_error', 'boom')),
    );
    const main = await openHome();

    expect(await main.findByText("Couldn't load the checks due.")).toBeTruthy();
    expect(await main.findByText("Couldn't judge the trees against the sites.")).toBeTruthy();
    expect(await main.findByText('No water swaps due today.')).toBeTruthy();
    expect(await main.findByText('No campaign is taking gifts now.')).toBeTruthy();
    expect(main.getByText(/No published workday coming up/)).toBeTruthy();
  });
});
