import { describe, expect, it, vi } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../setup/client-setup';
import { useClock } from './support/clock';
import { errorResponse } from './support/msw';
import { renderApp } from './support/render-app';
import { buildSite } from './support/sites';
import { buildUser } from './support/users';
import { mockReports } from './report-fixtures';

// ECharts needs a real layout; the stub records the option the chart was given.
const charts = vi.hoisted(() => ({ options: [] as unknown[] }));
vi.mock('vue-echarts', async () => {
  const { defineComponent, h } = await import('vue');
  return {
    default: defineComponent({
      props: { option: { type: Object, default: null }, autoresize: Boolean },
      setup(props) {
        return () => {
          charts.options.push(props.option);
          return h('div', { 'data-testid': 'survival-chart' });
        };
      },
    }),
  };
});

useClock('2025-06-10T15:00:00Z');
const coordinator = buildUser({ role: 'coordinator' });
const site = buildSite({ name: 'Heron Cove' });

async function open() {
  const seen = mockReports();
  server.use(http.get('/api/sites', () => HttpResponse.json({ sites: [site] })));
  const rendered = await renderApp('/reports', coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByText('Value of volunteer time');
  return { main, seen, rendered };
}

const hrefOf = (el: HTMLElement) => el.getAttribute('href') ?? '';

describe('Reports', () => {
  it('opens on this year for every site with the headline figures, each with its basis', async () => {
    const { main, seen } = await open();

    for (const name of ['summary', 'hours', 'trees', 'survival', 'donations']) {
      expect(Object.fromEntries(seen[name]![0]!)).toMatchObject({ from: '2025-01-01', to: '2025-12-31' });
      expect(seen[name]![0]!.has('siteId')).toBe(false);
    }
    const figure = (term: string) => [...(main.getByText(term, { selector: 'dt' }).parentElement?.querySelectorAll('dd') ?? [])].map((d) => d.textContent?.trim());
    // TRADE.md §6 worked example (Independent Sector, 2022 figure): 14 × 4.5 h × $31.80 = $2,003.40.
    expect(figure('Volunteers')).toEqual(['14']);
    expect(figure('Volunteer hours')).toEqual(['63 h']);
    expect(figure('Value of volunteer time')).toEqual(['$2,003.40', 'at $31.80 an hour (Independent Sector, national value of a volunteer hour, 2022)']);
    expect(figure('Trees planted')).toEqual(['40']);
    expect(figure('Trees alive')).toEqual(['35', '20 not checked yet, counted alive']);
    // 35 ÷ 40 = 0.875.
    expect(figure('Survival rate')[0]).toBe('87.5 %');
    expect(figure('Donations')).toEqual(['$668.00', '7 gifts']);
  });

  it('draws survival per site with the table as its text alternative', async () => {
    charts.options.length = 0;
    const { main } = await open();

    const chart = await main.findByRole('img', { name: /Survival by months since planting/ });
    expect(chart.getAttribute('aria-label')).toMatch('Heron Cove 75 % at 6 months');
    const option = charts.options.at(-1) as { series: { name: string; data: (number | null)[] }[] };
    // 17 of 20 = 85 %, 9 of 12 = 75 %; nobody has reached 12 months, so that point is a gap.
    expect(option.series).toMatchObject([{ name: 'Heron Cove', data: [85, 75, 75, null] }]);
    const table = within(main.getByRole('table', { name: /Survival at months since planting/ }));
    const site = table.getByRole('row', { name: /Heron Cove, all/ });
    expect(site.textContent?.replace(/\s+/g, ' ')).toMatch('85 %17 of 20 alive');
    expect(site.textContent).toMatch('60 % of trees old enough');
    expect(table.getByRole('row', { name: /planted Jan 2025/ }).textContent).toMatch('not reached');
  });

  it('carries the filters into every CSV link and the PDF report, and reloads for a site', async () => {
    const { main, seen } = await open();
    const user = userEvent.setup();

    await user.selectOptions(main.getByLabelText('Site'), 'Heron Cove');
    await waitFor(() => expect(seen.summary).toHaveLength(2));
    expect(seen.survival.at(-1)?.get('siteId')).toBe(site.id);
    const query = `from=2025-01-01&to=2025-12-31&siteId=${site.id}`;
    expect(hrefOf(main.getByRole('link', { name: 'Make PDF report' }))).toBe(`/api/reports/report.pdf?${query}`);
    expect(hrefOf(main.getByRole('link', { name: 'Download CSV: Survival' }))).toBe(`/api/reports/survival.csv?${query}`);
    expect(hrefOf(main.getByRole('link', { name: 'Download CSV: Trees per site and month' }))).toBe(`/api/reports/trees.csv?${query}`);
    expect(hrefOf(main.getByRole('link', { name: 'Download CSV: Donations per campaign' }))).toBe(`/api/reports/donations.csv?${query}`);
    expect(main.getByRole('link', { name: 'Download CSV: Volunteer hours' }).hasAttribute('download')).toBe(true);

    await user.selectOptions(main.getByRole('combobox', { name: 'Per' }), 'Quarter');
    await waitFor(() => expect(seen.hours.at(-1)?.get('period')).toBe('quarter'));
    expect(hrefOf(main.getByRole('link', { name: 'Download CSV: Volunteer hours' }))).toBe(`/api/reports/hours.csv?${query}&period=quarter`);
  });

  it('lists hours, trees and donations per row', async () => {
    const { main } = await open();

    expect(within(main.getByRole('table', { name: /Volunteer hours per person/ })).getByRole('row', { name: /Tamsin Okafor/ }).textContent).toMatch('$143.10');
    const heron = within(within(main.getByRole('table', { name: 'Trees per site and month' })).getByRole('row', { name: /Heron Cove/ }));
    expect(heron.getAllByRole('cell').map((c) => c.textContent?.trim())).toEqual(['May 2025', '0', '0', '12', '9']);
    expect(within(main.getByRole('table', { name: 'Donations per campaign' })).getByRole('row', { name: /Heron Cove living shoreline/ }).textContent).toMatch('$668.00');
  });

  it('says what to fix when the server refuses the range', async () => {
    mockReports({ summary: () => errorResponse(400, 'validation_failed', 'bad', { to: ['must be on or after from'] }) });
    server.use(http.get('/api/sites', () => HttpResponse.json({ sites: [] })));
    await renderApp('/reports', coordinator);

    expect(await screen.findByText(/Check the dates: the first must not be after the second/)).toBeTruthy();
  });
});
