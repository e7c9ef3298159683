import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { AllWindows } from '@/api/tide';
import { server } from '../../setup/client-setup';
import { renderApp } from '../support/render-app';
import { buildSite, buildWindow, mockSiteBoard } from '../support/sites';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';

vi.mock('vue-echarts', async () => {
  const { defineComponent, h } = await import('vue');
  return { default: defineComponent({ props: { option: { type: Object, default: null } }, setup: () => () => h('div') }) };
});

const heron = buildSite({ name: 'Heron Cove', timeZone: 'America/New_York' });
const pelican = buildSite({ name: 'Pelican Flats', timeZone: 'America/Los_Angeles' });

const march: AllWindows = {
  sites: [heron, pelican].map(({ id, name, timeZone }) => ({ id, name, timeZone })),
  units: 'ft',
  windows: [
    buildWindow({ siteId: heron.id, start: '2025-03-04T11:40:00Z', end: '2025-03-04T14:10:00Z' }),
    // 03:30Z on the 5th is 19:30 on the 4th in Los Angeles: a bar on the 4th, not the 5th.
    buildWindow({ siteId: pelican.id, start: '2025-03-05T03:30:00Z', end: '2025-03-05T05:30:00Z' }),
    buildWindow({ siteId: heron.id, start: '2025-03-12T12:00:00Z', end: '2025-03-12T14:00:00Z' }),
  ],
  lowest: [{ siteId: heron.id, date: '2025-03-04', level: -0.6, time: '2025-03-04T12:55:00Z' }],
};

function answerWindows(): URL[] {
  const seen: URL[] = [];
  server.use(
    http.get('/api/windows', ({ request }) => {
      const url = new URL(request.url);
      seen.push(url);
      return HttpResponse.json(url.searchParams.get('from')?.startsWith('2025-02') ? march : { ...march, windows: [], lowest: [] });
    }),
  );
  return seen;
}

function dayButton(label: RegExp): HTMLElement {
  return within(screen.getByRole('list', { name: 'Days of March 2025' })).getByRole('button', { name: label });
}

describe('WindowCalendarView', () => {
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it("puts each site's windows on its own local date, with the day's lowest water", async () => {
    const seen = answerWindows();
    await renderApp('/windows?month=2025-03', buildUser());

    await screen.findByRole('list', { name: 'Days of March 2025' });
    expect(seen[0]?.searchParams.get('from')).toBe('2025-02-23T00:00:00Z');
    expect(seen[0]?.searchParams.get('units')).toBe('ft');
    expect(screen.getAllByRole('button', { name: /^(Mon|Tue|Wed|Thu|Fri|Sat|Sun) \d+ (Feb|Mar|Apr);/ })).toHaveLength(42);
    const fourth = dayButton(/^Tue 4 Mar;/).getAttribute('aria-label');
    expect(fourth).toContain('Heron Cove: 06:40\u201309:10 EST, lowest \u22120.6 ft at 07:55');
    expect(fourth).toContain('Pelican Flats: 19:30\u201321:30 PST');
    expect(dayButton(/^Wed 5 Mar;/).getAttribute('aria-label')).toBe('Wed 5 Mar; Heron Cove: no window; Pelican Flats: no window');
    expect(dayButton(/^Tue 4 Mar;/).querySelectorAll('.window-calendar-day-cell__window')).toHaveLength(2);
    expect(screen.getByRole('heading', { level: 2, name: 'March 2025' })).toBeTruthy();
  });

  it("opens the one site's tide board at that day's week", async () => {
    answerWindows();
    mockSiteBoard(heron);
    const user = userEvent.setup();
    const { router } = await renderApp('/windows?month=2025-03', buildUser());
    await screen.findByRole('list', { name: 'Days of March 2025' });

    await user.click(dayButton(/^Wed 12 Mar;/));

    await waitFor(() => expect(router.currentRoute.value.fullPath).toBe(`/sites/${heron.id}?week=2025-03-12`));
  });

  it('asks which site when the day has windows at several', async () => {
    answerWindows();
    mockSiteBoard(pelican);
    const user = userEvent.setup();
    const { router } = await renderApp('/windows?month=2025-03', buildUser());
    await screen.findByRole('list', { name: 'Days of March 2025' });

    await user.click(dayButton(/^Tue 4 Mar;/));
    const dialog = await screen.findByRole('dialog', { name: 'Open which tide board?' });
    await user.click(within(dialog).getByRole('button', { name: 'Pelican Flats' }));

    await waitFor(() => expect(router.currentRoute.value.fullPath).toBe(`/sites/${pelican.id}?week=2025-03-04`));
  });

  it('steps to the next month', async () => {
    const seen = answerWindows();
    const user = userEvent.setup();
    const { router } = await renderApp('/windows?month=2025-03', buildUser());
    await screen.findByRole('list', { name: 'Days of March 2025' });

    await user.click(screen.getByRole('button', { name: /Next month/ }));

    expect(await screen.findByRole('heading', { level: 2, name: 'April 2025' })).toBeTruthy();
    expect(router.currentRoute.value.query.month).toBe('2025-04');
    await waitFor(() => expect(seen.at(-1)?.searchParams.get('from')).toBe('2025-03-30T00:00:00Z'));
  });

  it('becomes a list of days with windows on a phone', async () => {
    await setViewport(375, 812);
    answerWindows();
    await renderApp('/windows?month=2025-03', buildUser());

    const list = within(await screen.findByRole('list', { name: 'Days with windows in March 2025' }));
    const days = list.getAllByRole('button').map((b) => b.textContent?.replace(/\s+/g, ' ').trim());
    expect(days).toHaveLength(2);
    expect(days[0]).toMatch(/^Tuesday 4 Mar: Heron Cove: 06:40\u201309:10 EST, lowest \u22120\.6 ft at 07:55; Pelican Flats: 19:30/);
    expect(screen.queryByRole('list', { name: 'Days of March 2025' })).toBeNull();
  });
});
