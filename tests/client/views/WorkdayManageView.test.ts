import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { server } from '../../setup/client-setup';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { buildWorkdayDto } from '../support/workday-manage';

const coordinator = buildUser({ role: 'coordinator' });

async function openManage(workday: WorkdayDto) {
  server.use(http.get(`/api/workdays/${workday.id}`, () => HttpResponse.json({ workday })));
  await renderApp(`/workdays/${workday.id}/manage`, coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 1, name: workday.title });
  return main;
}

describe('WorkdayManageView', () => {
  it('shows the status, the time on the site clock and a fill bar per role', async () => {
    const main = await openManage(buildWorkdayDto({ startsAt: '2099-03-03T11:40:00.000Z', endsAt: '2099-03-03T14:10:00.000Z' }));

    expect(main.getByText('Published')).toBeTruthy();
    expect(main.getByText('Tue 3 Mar 2099, 06:40\u201309:10 EST')).toBeTruthy();
    const planter = main.getByRole('meter', { name: 'Planter' });
    expect(planter.getAttribute('aria-valuenow')).toBe('4');
    expect(planter.getAttribute('aria-valuemax')).toBe('8');
    expect(main.getByText('4 of 8 places taken · 1 waiting')).toBeTruthy();
    expect(main.getByRole('meter', { name: 'Boat operator' }).getAttribute('aria-valuetext')).toBe('1 of 1 place taken');
    expect(main.getByRole('link', { name: 'Roster' })).toBeTruthy();
    expect(main.getByRole('link', { name: 'Check-in at the launch' })).toBeTruthy();
    // Not over yet, so it can't be completed.
    expect(main.queryByRole('button', { name: 'Mark completed' })).toBeNull();
    expect(main.getByText(/You can mark it completed once it ends at 09:10/)).toBeTruthy();
  });

  it('publishes a draft after confirming', async () => {
    const draft = buildWorkdayDto({ status: 'draft', confirmed: 0, waitlisted: 0 });
    let published = false;
    server.use(
      http.post(`/api/workdays/${draft.id}/publish`, () => {
        published = true;
        return HttpResponse.json({ workday: { ...draft, status: 'published' } });
      }),
    );
    const user = userEvent.setup();
    const main = await openManage(draft);
    expect(main.getByText('Draft')).toBeTruthy();

    await user.click(main.getByRole('button', { name: 'Publish' }));
    const confirm = await screen.findByRole('dialog', { name: 'Publish this workday?' });
    await user.click(within(confirm).getByRole('button', { name: 'Publish' }));

    await waitFor(() => expect(published).toBe(true));
    expect(await main.findByText('Published')).toBeTruthy();
    expect(main.queryByRole('button', { name: 'Publish' })).toBeNull();
  });

  it('cancels only with a message to the crew, and says who is e-mailed', async () => {
    const workday = buildWorkdayDto();
    const bodies: unknown[] = [];
    server.use(
      http.post(`/api/workdays/${workday.id}/cancel`, async ({ request }) => {
        const body = (await request.json()) as { message: string };
        bodies.push(body);
        return HttpResponse.json({ workday: { ...workday, status: 'cancelled', cancelMessage: body.message } });
      }),
    );
    const user = userEvent.setup();
    const main = await openManage(workday);

    await user.click(main.getByRole('button', { name: 'Cancel workday' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Cancel this workday?' }));
    expect(dialog.getByText(/Everyone signed up \(5 confirmed and 1 on the waitlist\) gets your message by e-mail/)).toBeTruthy();
    await user.click(dialog.getByRole('button', { name: 'Cancel workday' }));
    expect(await dialog.findByText('Tell the crew why')).toBeTruthy();
    expect(bodies).toHaveLength(0);

    await user.type(dialog.getByLabelText('Message to the crew'), 'Lightning is forecast; we will plan another low tide soon.');
    await user.click(dialog.getByRole('button', { name: 'Cancel workday' }));

    await waitFor(() => expect(bodies).toEqual([{ message: 'Lightning is forecast; we will plan another low tide soon.' }]));
    expect(await main.findByText('Cancelled')).toBeTruthy();
    expect(main.getByText('Lightning is forecast; we will plan another low tide soon.')).toBeTruthy();
    expect(main.queryByRole('link', { name: 'Edit' })).toBeNull();
  });

  it('marks a published workday completed once it has ended', async () => {
    const workday = buildWorkdayDto({ startsAt: '2024-03-04T11:40:00.000Z', endsAt: '2024-03-04T14:10:00.000Z' });
    let completed = false;
    server.use(
      http.post(`/api/workdays/${workday.id}/complete`, () => {
        completed = true;
        return HttpResponse.json({ workday: { ...workday, status: 'completed' } });
      }),
    );
    const user = userEvent.setup();
    const main = await openManage(workday);

    await user.click(main.getByRole('button', { name: 'Mark completed' }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Mark this workday completed?' })).getByRole('button', { name: 'Mark completed' }));

    await waitFor(() => expect(completed).toBe(true));
    expect(await main.findByText('Completed')).toBeTruthy();
  });

  it('lists workdays for coordinators with a status filter', async () => {
    const draft = buildWorkdayDto({ title: 'Nursery potting day', status: 'draft', kind: 'nursery' });
    const seen: URL[] = [];
    server.use(
      http.get('/api/workdays', ({ request }) => {
        const url = new URL(request.url);
        seen.push(url);
        return HttpResponse.json({ workdays: url.searchParams.get('status') === 'draft' ? [draft] : [buildWorkdayDto(), draft] });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/workdays/manage', coordinator);
    const main = within(screen.getByRole('main'));

    const list = within(await main.findByRole('list', { name: 'Workdays' }));
    expect(list.getAllByRole('heading', { level: 2 }).map((h) => h.textContent?.trim())).toEqual(['Planting at Heron Cove', 'Nursery potting day']);
    expect(seen[0]?.searchParams.get('from')).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:00:00\.000Z$/);

    await user.click(main.getByRole('combobox', { name: 'Status' }));
    await user.click(await screen.findByRole('option', { name: 'Draft' }));
    await waitFor(() => expect(seen.at(-1)?.searchParams.get('status')).toBe('draft'));
    await waitFor(() => expect(main.getByText('1 workday')).toBeTruthy());
    expect(main.getByRole('link', { name: 'Edit Nursery potting day' })).toBeTruthy();
  });
});
