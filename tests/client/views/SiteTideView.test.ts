import { describe, expect, it, vi } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { renderApp } from '../support/render-app';
import { buildSite, buildTide, buildWindow, mockSiteBoard } from '../support/sites';
import { buildUser } from '../support/users';

// ECharts needs a real canvas or SVG layout; the stub records the option the board built.
const charts = vi.hoisted(() => ({ options: [] as unknown[] }));
vi.mock('vue-echarts', async () => {
  const { defineComponent, h } = await import('vue');
  return {
    default: defineComponent({
      props: { option: { type: Object, default: null }, autoresize: Boolean },
      setup(props) {
        return () => {
          charts.options.push(props.option);
          return h('div', { 'data-testid': 'tide-chart' });
        };
      },
    }),
  };
});

const site = buildSite({ name: 'Heron Cove' });
const coordinator = buildUser({ role: 'coordinator' });

async function openBoard(user = coordinator, week = '2025-03-05') {
  const result = await renderApp(`/sites/${site.id}?week=${week}`, user);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 1, name: 'Heron Cove' });
  return { ...result, main };
}

describe('SiteTideView', () => {
  it("loads the week (Monday to Monday in the site's zone) and lists its windows with cautions", async () => {
    const seen = mockSiteBoard(site);
    const { main } = await openBoard();

    const list = await main.findByRole('list', { name: 'Windows this week' });
    // 9 March 2025 is the change to daylight time in New York, so the week ends at 04:00Z.
    expect(seen.tide[0]?.searchParams.get('from')).toBe('2025-03-03T05:00:00.000Z');
    expect(seen.tide[0]?.searchParams.get('to')).toBe('2025-03-10T04:00:00.000Z');
    expect(seen.tide[0]?.searchParams.get('units')).toBe('ft');
    const item = within(within(list).getAllByRole('listitem')[0]!);
    expect(item.getByRole('heading', { level: 3, name: 'Tue 4 Mar, 06:40\u201309:10 EST' })).toBeTruthy();
    expect(item.getByText(/2 h 30 min · lowest water \u22120\.6 ft at 07:55/)).toBeTruthy();
    expect(item.getByRole('meter', { name: 'Score' }).getAttribute('aria-valuenow')).toBe('72');
    expect(item.getByText('Very low tide: the mud is soft here.')).toBeTruthy();
    expect(main.getByRole('heading', { level: 2, name: 'Mon 3 Mar \u2013 Sun 9 Mar 2025' })).toBeTruthy();
  });

  it('shows the station with attribution and licence, the chart with its table, and the cautions', async () => {
    mockSiteBoard(site);
    const { main } = await openBoard();

    expect(await main.findByText(/Safety Harbor \(noaa\/8726738\)/)).toBeTruthy();
    expect(main.getByText(/Harmonic constituents: NOAA CO-OPS/)).toBeTruthy();
    expect(main.getByRole('link', { name: 'Licence: Public domain' })).toBeTruthy();
    expect(await main.findByTestId('tide-chart')).toBeTruthy();
    expect(main.getByRole('img', { name: /1 low-water window; lowest water \u22120\.6 ft on Tue 4 Mar at 07:55/ })).toBeTruthy();
    const table = main.getByRole('table', { name: /Highs and lows/ });
    expect(within(table).getAllByRole('row')).toHaveLength(3);
    expect(within(table).getByRole('cell', { name: '01:20 EST' })).toBeTruthy();
    const cautions = main.getByRole('complementary', { name: 'Before you go out' });
    expect(cautions.textContent).toMatch(/Life jackets/);
    expect(cautions.textContent).toMatch(/predictions, not observations/);
    expect(document.body.textContent).not.toMatch(/\bsafe\b/i);
    expect(charts.options.length).toBeGreaterThan(0);
  });

  it('plans a draft workday from a window and shows it with the drafts', async () => {
    let posted: unknown;
    mockSiteBoard(site);
    server.use(
      http.post('/api/workdays', async ({ request }) => {
        posted = await request.json();
        return HttpResponse.json(
          { workday: { id: 'w1', title: 'Planting at Heron Cove', kind: 'planting', siteId: site.id, startsAt: '2025-03-04T11:40:00.000Z', endsAt: '2025-03-04T14:10:00.000Z', status: 'draft' } },
          { status: 201 },
        );
      }),
    );
    const user = userEvent.setup();
    const { main } = await openBoard();
    await main.findByRole('list', { name: 'Windows this week' });
    expect(await main.findByText(/No draft workdays yet/)).toBeTruthy();

    await user.click(main.getAllByRole('button', { name: /Plan a workday/ })[0]!);
    const dialog = await screen.findByRole('dialog', { name: 'Plan a workday' });
    expect(dialog.textContent).toContain('Tue 4 Mar 2025, 06:40\u201309:10 EST');
    expect((within(dialog).getByLabelText('Title') as HTMLInputElement).value).toBe('Planting at Heron Cove');
    await user.click(within(dialog).getByRole('button', { name: 'Create draft workday' }));

    await waitFor(() =>
      expect(posted).toEqual({ siteId: site.id, startsAt: '2025-03-04T11:40:00.000Z', endsAt: '2025-03-04T14:10:00.000Z', title: 'Planting at Heron Cove', kind: 'planting' }),
    );
    expect(await main.findByText('Draft workday created')).toBeTruthy();
    const drafts = within(main.getByRole('list', { name: 'Draft workdays' }));
    expect(drafts.getByText('Planting at Heron Cove')).toBeTruthy();
    // Each draft leads on to the full workday form and its manage page.
    expect(drafts.getByRole('link', { name: 'Edit draft: Planting at Heron Cove' }).getAttribute('href')).toBe('/workdays/w1/edit');
    expect(drafts.getByRole('link', { name: 'Planting at Heron Cove' }).getAttribute('href')).toBe('/workdays/w1/manage');
  });

  it('ranks the next 8 weeks of windows, best first, each linking to its week', async () => {
    const ranked = [
      buildWindow({ siteId: site.id, start: '2025-03-20T12:00:00.000Z', end: '2025-03-20T15:00:00.000Z', score: 64 }),
      buildWindow({ siteId: site.id, start: '2025-04-02T11:00:00.000Z', end: '2025-04-02T14:30:00.000Z', score: 91 }),
    ];
    const seen = mockSiteBoard(site, { ranked });
    const { main } = await openBoard();

    const list = within(await main.findByRole('list', { name: 'Ranked windows' }));
    expect(seen.ranked[0]?.searchParams.get('sort')).toBe('score');
    const span = Date.parse(seen.ranked[0]!.searchParams.get('to')!) - Date.parse(seen.ranked[0]!.searchParams.get('from')!);
    expect(span).toBe(56 * 86_400_000);
    const headings = list.getAllByRole('heading', { level: 3 }).map((h) => h.textContent?.replace(/\s+/g, ' ').trim());
    expect(headings).toEqual(['1. Wed 2 Apr 2025, 07:00\u201310:30 EDT', '2. Thu 20 Mar 2025, 08:00\u201311:00 EDT']);
    expect(list.getByRole('link', { name: 'See that week (Wed 2 Apr 2025)' }).getAttribute('href')).toBe(`/sites/${site.id}?week=2025-03-31`);
  });

  it('steps to the next week and back to this week', async () => {
    const seen = mockSiteBoard(site);
    const user = userEvent.setup();
    const { main, router } = await openBoard();
    await main.findByRole('list', { name: 'Windows this week' });

    await user.click(main.getByRole('button', { name: /Next week/ }));
    await waitFor(() => expect(seen.tide.at(-1)?.searchParams.get('from')).toBe('2025-03-10T04:00:00.000Z'));
    expect(router.currentRoute.value.query.week).toBe('2025-03-10');

    await user.click(main.getByRole('button', { name: 'This week' }));
    await waitFor(() => expect(router.currentRoute.value.query.week).toBeUndefined());
  });

  it('shows volunteers the board without planning or drafts', async () => {
    mockSiteBoard(site, { tide: buildTide(site, { windows: [] }) });
    const { main } = await openBoard(buildUser({ role: 'volunteer' }));

    expect(await main.findByText(/No low-water windows this week/)).toBeTruthy();
    expect(main.queryByRole('button', { name: /Plan a workday/ })).toBeNull();
    expect(main.queryByRole('heading', { name: 'Draft workdays here' })).toBeNull();
    expect(main.queryByRole('link', { name: 'Edit site' })).toBeNull();
  });
});
