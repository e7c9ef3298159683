import { describe, expect, it } from 'vitest';
import type { DayCapacity } from '@shared/schemas/trip-capacity.schema';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { renderApp } from '../support/render-app';
import { buildSite } from '../support/sites';
import { buildUser } from '../support/users';
import { buildWorkdayDto, mockWorkdayAndRoster } from '../support/workday-manage';

const coordinator = buildUser({ role: 'coordinator' });
// A site in another zone than the organisation (New York): times must follow the site.
const site = buildSite({ name: 'Otter Flats', timeZone: 'America/Los_Angeles', launchName: 'Pier 3 ramp' });
const other = buildSite({ name: 'Heron Cove' });

function answerSites(): void {
  server.use(http.get('/api/sites', () => HttpResponse.json({ sites: [other, site] })));
}

/** Invented estimate figures for the day-capacity panel. */
function buildCapacity(overrides: Partial<DayCapacity> = {}): DayCapacity {
  return {
    window: { start: '2025-07-10T13:30:00.000Z', end: '2025-07-10T16:00:00.000Z' },
    trees: 12,
    transportPots: 16,
    plantingTrees: 12,
    skippers: 3,
    planters: 4,
    roles: { 'own-kayak': 0, seat: 2, operator: 1, shore: 2, planter: 4 },
    runs: 5,
    lastLandingAt: '2025-07-10T14:45:00.000Z',
    craftUsed: ['skiff', 'canoe-1', 'canoe-2'],
    notes: ["Loads are planned to at most 70 % of a kayak's or canoe's rated load (common practice from paddling guidance) and 100 % of a capacity plate (the plate is the legal limit)."],
    ...overrides,
  };
}

/** Answers both day-capacity routes; records what was asked. */
function answerCapacity(capacity = buildCapacity()): { posted: unknown[]; byWorkday: string[] } {
  const seen = { posted: [] as unknown[], byWorkday: [] as string[] };
  server.use(
    http.post('/api/trip-plans/capacity', async ({ request }) => {
      seen.posted.push(await request.json());
      return HttpResponse.json({ capacity });
    }),
    http.get('/api/workdays/:id/capacity', ({ params }) => {
      seen.byWorkday.push(String(params.id));
      return HttpResponse.json({ capacity });
    }),
  );
  return seen;
}

function answerCreate(): { bodies: unknown[] } {
  const seen = { bodies: [] as unknown[] };
  const created = buildWorkdayDto({ siteId: site.id, title: 'Spring planting', status: 'published' });
  mockWorkdayAndRoster(created);
  server.use(
    http.post('/api/workdays', async ({ request }) => {
      seen.bodies.push(await request.json());
      return HttpResponse.json({ workday: created }, { status: 201 });
    }),
  );
  return seen;
}

async function openNew(query = '') {
  answerSites();
  answerCapacity();
  const result = await renderApp(`/workdays/new${query}`, coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('button', { name: 'Save as draft' });
  return { ...result, main };
}

const input = (main: ReturnType<typeof within>, label: string) => main.getByLabelText(label) as HTMLInputElement;

describe('WorkdayFormView', () => {
  it("fills a low-water window in the site's zone and publishes the exact body, role caps included", async () => {
    const seen = answerCreate();
    const user = userEvent.setup();
    const { main, router } = await openNew(`?siteId=${site.id}&startsAt=2025-07-10T13:30:00.000Z&endsAt=2025-07-10T16:00:00.000Z`);

    expect(input(main, 'Day').value).toBe('2025-07-10');
    expect(input(main, 'Starts').value).toBe('06:30');
    expect(input(main, 'Ends').value).toBe('09:00');
    expect(main.getByText(/Times are on Otter Flats's clock: America\/Los_Angeles \(PDT\)/)).toBeTruthy();
    expect(input(main, 'Meeting point').placeholder).toBe('Pier 3 ramp');

    await user.type(main.getByLabelText('Title'), 'Spring planting');
    await user.clear(main.getByLabelText('Ends'));
    await user.type(main.getByLabelText('Ends'), '10:15');
    await user.clear(main.getByLabelText('Total crew cap'));
    await user.type(main.getByLabelText('Total crew cap'), '10');
    await user.click(main.getByRole('checkbox', { name: 'Cap each role' }));
    await user.type(main.getByLabelText('Planter'), '6');
    await user.type(main.getByLabelText('Boat operator'), '1');
    expect(main.getByText('Role places add up to 7, fewer than the total cap of 10.')).toBeTruthy();
    await user.type(main.getByLabelText('Meeting point'), 'North beach');
    await user.type(main.getByLabelText('Minimum age'), '12');
    await user.click(main.getByRole('button', { name: 'Publish' }));

    await waitFor(() => expect(seen.bodies).toHaveLength(1));
    expect(seen.bodies[0]).toEqual({
      siteId: site.id,
      kind: 'planting',
      title: 'Spring planting',
      startsAt: '2025-07-10T13:30:00.000Z',
      endsAt: '2025-07-10T17:15:00.000Z',
      capacity: 10,
      roles: [
        { role: 'operator', capacity: 1 },
        { role: 'planter', capacity: 6 },
      ],
      description: '',
      meetingPoint: 'North beach',
      whatToBring: '',
      minimumAge: 12,
      status: 'published',
    });
    // The first visit loads the workday page's code, which can take a while on a busy machine.
    await waitFor(() => expect(router.currentRoute.value.name).toBe('workday-manage'), { timeout: 8_000 });
  });

  it('saves a draft, converting a winter day typed on the site clock (PST) to UTC', async () => {
    const seen = answerCreate();
    const user = userEvent.setup();
    const { main } = await openNew(`?siteId=${site.id}`);

    await user.type(main.getByLabelText('Day'), '2025-01-15');
    await user.type(main.getByLabelText('Starts'), '07:00');
    await user.type(main.getByLabelText('Ends'), '11:30');
    await user.click(main.getByRole('button', { name: 'Save as draft' }));

    await waitFor(() => expect(seen.bodies).toHaveLength(1));
    expect(seen.bodies[0]).toMatchObject({ startsAt: '2025-01-15T15:00:00.000Z', endsAt: '2025-01-15T19:30:00.000Z', capacity: 12, status: 'draft' });
    expect(seen.bodies[0]).not.toHaveProperty('roles');
    expect(seen.bodies[0]).not.toHaveProperty('title');
  });

  it('checks the form before sending', async () => {
    const seen = answerCreate();
    const user = userEvent.setup();
    const { main } = await openNew(`?siteId=${site.id}&startsAt=2025-07-10T13:30:00.000Z&endsAt=2025-07-10T12:00:00.000Z`);

    await user.clear(main.getByLabelText('Total crew cap'));
    await user.type(main.getByLabelText('Total crew cap'), '600');
    await user.click(main.getByRole('checkbox', { name: 'Cap each role' }));
    await user.click(main.getByRole('button', { name: 'Save as draft' }));

    expect(await main.findByText('Give at least one role a place, or turn off “Cap each role”.')).toBeTruthy();
    await user.click(main.getByRole('checkbox', { name: 'Cap each role' }));
    await user.click(main.getByRole('button', { name: 'Save as draft' }));
    expect(await main.findByText('Must be after the start')).toBeTruthy();
    expect(await main.findByText('Must be at most 500')).toBeTruthy();
    expect(seen.bodies).toHaveLength(0);
  });

  it("shows the server's field errors under the fields, a role's under that role", async () => {
    server.use(
      http.post('/api/workdays', () =>
        errorResponse(400, 'validation_failed', 'Workday is invalid', { siteId: ['is not a site you can plan at'], 'roles.0.capacity': ['is more than the fleet carries'] }),
      ),
    );
    const user = userEvent.setup();
    const { main } = await openNew(`?siteId=${site.id}&startsAt=2025-07-10T13:30:00.000Z&endsAt=2025-07-10T16:00:00.000Z`);

    await user.click(main.getByRole('checkbox', { name: 'Cap each role' }));
    await user.type(main.getByLabelText('Paddler needing a seat'), '4');
    await user.type(main.getByLabelText('Planter'), '6');
    await user.click(main.getByRole('button', { name: 'Save as draft' }));

    expect(await main.findByText('Is not a site you can plan at')).toBeTruthy();
    const seatItem = main.getByLabelText('Paddler needing a seat').closest('.el-form-item') as HTMLElement;
    await waitFor(() => expect(within(seatItem).getByText('Is more than the fleet carries')).toBeTruthy());
    expect(main.getByText('Some answers need another look; see the notes under the fields.')).toBeTruthy();
  });

  it('warns when editing a published workday and sends only what changed', async () => {
    const workday = buildWorkdayDto({ siteId: other.id, site: { ...buildWorkdayDto().site, id: other.id }, status: 'published', roleCapped: false, capacity: 12 });
    let patched: unknown;
    mockWorkdayAndRoster(workday);
    server.use(
      http.get('/api/sites', () => HttpResponse.json({ sites: [other, site] })),
      http.patch(`/api/workdays/${workday.id}`, async ({ request }) => {
        patched = await request.json();
        return HttpResponse.json({ workday: { ...workday, startsAt: '2025-03-04T12:00:00.000Z' } });
      }),
    );
    answerCapacity();
    const user = userEvent.setup();
    await renderApp(`/workdays/${workday.id}/edit`, coordinator);
    const main = within(screen.getByRole('main'));
    await main.findByRole('button', { name: 'Save changes' });

    expect(main.getByText(/Moving its time or place e-mails everyone signed up/)).toBeTruthy();
    expect(input(main, 'Starts').value).toBe('06:40');
    expect(input(main, 'Meeting point').value).toBe('');
    await user.clear(main.getByLabelText('Starts'));
    await user.type(main.getByLabelText('Starts'), '07:00');
    expect(await main.findByText(/You changed the time: saving e-mails everyone signed up/)).toBeTruthy();
    await user.click(main.getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(patched).toEqual({ startsAt: '2025-03-04T12:00:00.000Z', endsAt: '2025-03-04T14:10:00.000Z' }));
  });
});

describe('WorkdayFormView: what the day can plant', () => {
  it('estimates the chosen site and times, and copies the needs into the role caps', async () => {
    const seen = answerCreate();
    const user = userEvent.setup();
    const { main } = await openNew(`?siteId=${site.id}&startsAt=2025-07-10T13:30:00.000Z&endsAt=2025-07-10T16:00:00.000Z`);
    const estimate = answerCapacity();

    await user.clear(main.getByLabelText('Ends'));
    await user.type(main.getByLabelText('Ends'), '09:30');
    expect(await main.findByText('This day can plant about 12 trees and needs 1 boat operator, 2 paddlers needing a seat, 4 planters and 2 on the shore crew.')).toBeTruthy();
    // 14:45 UTC is 07:45 on the site's clock (PDT, UTC−7).
    expect(main.getByText('The last pot lands at about 07:45, in 5 runs across 3 craft.')).toBeTruthy();
    expect(main.getByText(/common practice from paddling guidance/)).toBeTruthy();
    expect(estimate.posted.at(-1)).toEqual({ window: { start: '2025-07-10T13:30:00.000Z', end: '2025-07-10T16:30:00.000Z' }, siteId: site.id });

    await user.click(main.getByRole('button', { name: 'Use these numbers as the role caps' }));
    expect((main.getByRole('checkbox', { name: 'Cap each role' }) as HTMLInputElement).checked).toBe(true);
    expect(input(main, 'Boat operator').value).toBe('1');
    expect(input(main, 'Paddler needing a seat').value).toBe('2');
    expect(input(main, 'Planter').value).toBe('4');
    expect(input(main, 'Shore crew').value).toBe('2');
    expect(input(main, 'Paddler with own kayak').value).toBe('');
    expect(input(main, 'Total crew cap').value).toBe('9');
    expect(main.getByText(/Role caps and the total cap now follow the estimate/)).toBeTruthy();

    await user.click(main.getByRole('button', { name: 'Save as draft' }));
    await waitFor(() => expect(seen.bodies).toHaveLength(1));
    expect(seen.bodies[0]).toMatchObject({
      capacity: 9,
      roles: [
        { role: 'seat', capacity: 2 },
        { role: 'operator', capacity: 1 },
        { role: 'shore', capacity: 2 },
        { role: 'planter', capacity: 4 },
      ],
    });
  });

  it('asks by workday id while a saved workday keeps its site and times, and shows nothing for a nursery day', async () => {
    const workday = buildWorkdayDto({ siteId: other.id, site: { ...buildWorkdayDto().site, id: other.id }, status: 'draft' });
    mockWorkdayAndRoster(workday);
    server.use(http.get('/api/sites', () => HttpResponse.json({ sites: [other, site] })));
    const seen = answerCapacity(buildCapacity({ trees: 0, roles: { 'own-kayak': 0, seat: 0, operator: 0, shore: 2, planter: 0 }, lastLandingAt: null }));
    const user = userEvent.setup();
    await renderApp(`/workdays/${workday.id}/edit`, coordinator);
    const main = within(screen.getByRole('main'));

    expect(await main.findByText('This day cannot plant any trees with the active fleet in this window.')).toBeTruthy();
    expect(seen.byWorkday).toEqual([workday.id]);
    expect(seen.posted).toEqual([]);
    expect(main.queryByRole('button', { name: 'Use these numbers as the role caps' })).toBeNull();

    await user.click(main.getByRole('combobox', { name: 'Kind of workday' }));
    await user.click(await screen.findByRole('option', { name: 'Nursery' }));
    await waitFor(() => expect(main.queryByText('What this day can do')).toBeNull());
  });
});
