import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { RosterRow } from '@shared/schemas/roster.schema';
import { server } from '../../setup/client-setup';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { buildRosterRow, buildWorkdayDto, mockWorkdayAndRoster } from '../support/workday-manage';

const coordinator = buildUser({ role: 'coordinator' });

/** A small server: the roster lives here and each check-in step changes it, as the real one does. */
function crewServer(workdayId: string, rows: RosterRow[]) {
  const calls: { path: string; body: unknown }[] = [];
  const find = (id: unknown) => rows.find((r) => r.signupId === id)!;
  mockWorkdayAndRoster(buildWorkdayDto({ id: workdayId }), () => rows);
  const record = async (request: Request, path: string) => calls.push({ path, body: await request.json() });
  server.use(
    http.post('/api/signups/:id/check-in', async ({ request, params }) => {
      await record(request, `check-in ${String(params.id)}`);
      Object.assign(find(params.id), { checkedInAt: '2025-03-04T11:50:00.000Z', checkedOutAt: null, noShow: false });
      return new HttpResponse(null, { status: 204 });
    }),
    http.post('/api/signups/:id/check-out', async ({ request, params }) => {
      await record(request, `check-out ${String(params.id)}`);
      Object.assign(find(params.id), { checkedOutAt: '2025-03-04T14:05:00.000Z', minutes: 135 });
      return new HttpResponse(null, { status: 204 });
    }),
    http.post('/api/signups/:id/no-show', async ({ request, params }) => {
      await record(request, `no-show ${String(params.id)}`);
      Object.assign(find(params.id), { noShow: true, checkedInAt: null, checkedOutAt: null, minutes: 0 });
      return new HttpResponse(null, { status: 204 });
    }),
    http.put('/api/signups/:id/hours', async ({ request, params }) => {
      await record(request, `hours ${String(params.id)}`);
      return new HttpResponse(null, { status: 204 });
    }),
  );
  return calls;
}

async function openCheckIn(workdayId: string) {
  await renderApp(`/workdays/${workdayId}/check-in`, coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('list', { name: 'Crew' });
  return main;
}

const card = (main: ReturnType<typeof within>, name: string) => within(main.getByRole('heading', { level: 2, name }).closest('li') as HTMLElement);

describe('WorkdayCheckInView', () => {
  it('checks people in and out with one tap each, posting the right endpoints and updating the counts', async () => {
    const id = crypto.randomUUID();
    const ana = buildRosterRow({ name: 'Ana Ruiz' });
    const ben = buildRosterRow({ name: 'Ben Okafor', role: 'shore', checkedInAt: '2025-03-04T11:45:00.000Z' });
    const calls = crewServer(id, [ana, ben, buildRosterRow({ name: 'Kim Park', status: 'waitlisted', position: 1 })]);
    const user = userEvent.setup();
    const main = await openCheckIn(id);

    expect(main.getByRole('status').textContent).toMatch(/1 of 2\s+checked in/);
    expect(main.getAllByRole('heading', { level: 2 }).map((h) => h.textContent)).toEqual(['Ana Ruiz', 'Ben Okafor']);
    expect(main.getByText(/1 on the waitlist is not shown/)).toBeTruthy();

    await user.click(main.getByRole('button', { name: 'Check in Ana Ruiz' }));
    await waitFor(() => expect(card(main, 'Ana Ruiz').getByText('Checked in at 06:50')).toBeTruthy());
    expect(main.getByRole('status').textContent).toMatch(/2 of 2\s+checked in/);

    await user.click(card(main, 'Ana Ruiz').getByRole('button', { name: 'Check out Ana Ruiz' }));
    await waitFor(() => expect(card(main, 'Ana Ruiz').getByText('In 06:50 · out 09:05 · 2 h 15 min')).toBeTruthy());
    expect(calls).toEqual([
      { path: `check-in ${ana.signupId}`, body: {} },
      { path: `check-out ${ana.signupId}`, body: {} },
    ]);
  });

  it('marks a no-show only after confirming, and finds people by name', async () => {
    const id = crypto.randomUUID();
    const ana = buildRosterRow({ name: 'Ana Ruiz' });
    const calls = crewServer(id, [ana, buildRosterRow({ name: 'Ben Okafor' })]);
    const user = userEvent.setup();
    const main = await openCheckIn(id);

    await user.type(main.getByRole('searchbox', { name: 'Find by name' }), 'an');
    await waitFor(() => expect(main.getAllByRole('heading', { level: 2 }).map((h) => h.textContent)).toEqual(['Ana Ruiz']));

    await user.click(main.getByRole('button', { name: 'No-show Ana Ruiz' }));
    const confirm = within(await screen.findByRole('dialog', { name: 'Mark as no-show?' }));
    await user.click(confirm.getByRole('button', { name: 'Keep as is' }));
    await waitFor(() => expect(screen.queryByRole('dialog', { name: 'Mark as no-show?' })).toBeNull());
    expect(calls).toHaveLength(0);

    await user.click(main.getByRole('button', { name: 'No-show Ana Ruiz' }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Mark as no-show?' })).getByRole('button', { name: 'Mark no-show' }));
    await waitFor(() => expect(card(main, 'Ana Ruiz').getByText('No-show')).toBeTruthy());
    expect(calls).toEqual([{ path: `no-show ${ana.signupId}`, body: {} }]);
    expect(main.getByRole('status').textContent).toMatch(/0 of 2\s+checked in · 0 checked out · 1 no-show/);
  });

  it('corrects hours only with a reason, kept in the audit log', async () => {
    const id = crypto.randomUUID();
    const ana = buildRosterRow({ name: 'Ana Ruiz', checkedInAt: '2025-03-04T11:40:00.000Z', checkedOutAt: '2025-03-04T13:40:00.000Z', minutes: 120 });
    const calls = crewServer(id, [ana]);
    const user = userEvent.setup();
    const main = await openCheckIn(id);

    await user.click(main.getByRole('button', { name: 'Correct hours for Ana Ruiz' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Correct hours' }));
    expect(dialog.getByText(/kept in the audit log/)).toBeTruthy();
    expect((dialog.getByLabelText('Minutes to credit') as HTMLInputElement).value).toBe('120');
    await user.clear(dialog.getByLabelText('Minutes to credit'));
    await user.type(dialog.getByLabelText('Minutes to credit'), '150');
    await user.click(dialog.getByRole('button', { name: 'Save hours' }));

    expect(await dialog.findByText('Say why the hours change')).toBeTruthy();
    expect(calls).toHaveLength(0);

    await user.type(dialog.getByLabelText('Reason'), 'Stayed to wash the pots after check-out.');
    await user.click(dialog.getByRole('button', { name: 'Save hours' }));

    await waitFor(() => expect(calls).toEqual([{ path: `hours ${ana.signupId}`, body: { minutes: 150, reason: 'Stayed to wash the pots after check-out.' } }]));
    await waitFor(() => expect(screen.queryByRole('dialog', { name: 'Correct hours' })).toBeNull());
  });
});
