import { describe, expect, it } from 'vitest';
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
    await waitFor(() => expect(router.currentRoute.value.name).toBe('workday-manage'));
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
