import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { useClock } from '../support/clock';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';

useClock('2025-06-10T15:00:00Z');

const thisYear = {
  rows: [
    { workdayId: crypto.randomUUID(), title: 'Spring planting', startsAt: '2025-03-15T11:30:00.000Z', role: 'planter', minutes: 210, noShow: false, crewTreesPlanted: 24 },
    { workdayId: crypto.randomUUID(), title: 'Nursery potting', startsAt: '2025-02-08T14:00:00.000Z', role: 'shore', minutes: 0, noShow: true, crewTreesPlanted: 0 },
  ],
  totalMinutes: 210,
  totalHours: 3.5,
  workdaysAttended: 1,
  crewTreesPlanted: 24,
};
const lastYear = {
  rows: [{ workdayId: crypto.randomUUID(), title: 'Autumn monitoring', startsAt: '2024-10-05T13:00:00.000Z', role: 'seat', minutes: 150, noShow: false, crewTreesPlanted: 1 }],
  totalMinutes: 150,
  totalHours: 2.5,
  workdaysAttended: 1,
  crewTreesPlanted: 1,
};

function answerHours(): URL[] {
  const seen: URL[] = [];
  server.use(
    http.get('/api/me/hours', ({ request }) => {
      const url = new URL(request.url);
      seen.push(url);
      return HttpResponse.json(url.searchParams.get('from') === '2024-01-01' ? lastYear : thisYear);
    }),
  );
  return seen;
}

describe('MyHoursView', () => {
  it("shows this year's totals and a row per workday", async () => {
    const seen = answerHours();
    await renderApp('/my/hours', buildUser());

    const year = await screen.findByRole('region', { name: 'This year' });
    await waitFor(() => expect(year.textContent).toMatch(/Volunteer hours\s*3\.5 h/));
    expect(year.textContent).toMatch(/Workdays attended\s*1/);
    expect(year.textContent).toMatch(/Trees planted by crews you were on\s*24/);
    expect(screen.getByRole('status').textContent).toMatch(/3\.5 h over 1 workday · 24 trees planted by crews you were on/);
    expect(seen[0]?.searchParams.get('from')).toBe('2025-01-01');
    expect(seen[0]?.searchParams.get('to')).toBe('2026-01-01');
    const table = screen.getByRole('table', { name: 'Hours per workday, this year' });
    const rows = within(table)
      .getAllByRole('row')
      .map((r) => Array.from(r.children, (cell) => cell.textContent?.trim()).join(' | '));
    expect(rows).toEqual([
      'Date | Workday | Hours',
      'Sat 15 Mar 2025 | Spring plantingPlanterYour crew planted 24 trees | 3.5 h',
      'Sat 8 Feb 2025 | Nursery pottingShore crew | Not there',
      'Total | 3.5 h',
    ]);
  });

  it('asks for another period and keeps the year totals', async () => {
    const seen = answerHours();
    const user = userEvent.setup();
    await renderApp('/my/hours', buildUser());
    await screen.findByRole('table', { name: 'Hours per workday, this year' });

    await user.click(screen.getByRole('combobox', { name: 'Period' }));
    await user.click(await screen.findByRole('option', { name: 'Last year' }));

    const table = await screen.findByRole('table', { name: 'Hours per workday, last year' });
    expect(seen.at(-1)?.searchParams.get('from')).toBe('2024-01-01');
    expect(seen.at(-1)?.searchParams.get('to')).toBe('2025-01-01');
    expect(within(table).getByRole('link', { name: 'Autumn monitoring' })).toBeTruthy();
    expect(within(table).getByText('Your crew planted 1 tree')).toBeTruthy();
    expect(screen.getByRole('region', { name: 'This year' }).textContent).toMatch(/3\.5 h/);
  });
});
