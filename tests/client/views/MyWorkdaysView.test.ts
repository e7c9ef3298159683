import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { MyWorkday } from '@/api/me';
import { server } from '../../setup/client-setup';
import { useClock } from '../support/clock';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { buildWorkday } from '../support/workdays';

useClock('2025-03-01T15:00:00Z');

const FEED = 'https://ebbroot.example.test/api/calendar/personal/secret-one.ics';

function mine(overrides: Partial<MyWorkday['workday']>, signup: Partial<MyWorkday['signup']> = {}): MyWorkday {
  return { workday: buildWorkday(overrides), signup: { id: crypto.randomUUID(), role: 'planter', status: 'confirmed', position: null, ...signup } };
}

function answerFeed(initial: string | null): { posts: number; deletes: number } {
  const calls = { posts: 0, deletes: 0 };
  server.use(
    http.get('/api/me/calendar-token', () => HttpResponse.json({ url: initial })),
    http.post('/api/me/calendar-token', () => {
      calls.posts += 1;
      return HttpResponse.json({ url: FEED.replace('secret-one', `secret-${calls.posts + 1}`) });
    }),
    http.delete('/api/me/calendar-token', () => {
      calls.deletes += 1;
      return new HttpResponse(null, { status: 204 });
    }),
  );
  return calls;
}

describe('MyWorkdaysView', () => {
  it('splits my workdays into coming up and past, with my status on each', async () => {
    server.use(
      http.get('/api/me/workdays', () =>
        HttpResponse.json({
          workdays: [
            mine({ title: 'Winter nursery day', startsAt: '2025-02-08T14:00:00.000Z', endsAt: '2025-02-08T17:00:00.000Z', status: 'completed' }),
            mine({ title: 'Spring planting' }),
            mine({ title: 'Kayak run', startsAt: '2025-03-22T11:30:00.000Z', endsAt: '2025-03-22T15:00:00.000Z' }, { status: 'waitlisted', role: 'own-kayak', position: 3 }),
            mine({ title: 'Storm-hit planting', startsAt: '2025-03-29T11:30:00.000Z', endsAt: '2025-03-29T15:00:00.000Z', status: 'cancelled', cancelMessage: 'Storm surge expected.' }),
          ],
        }),
      ),
    );
    answerFeed(null);
    await renderApp('/my/workdays', buildUser());

    const upcoming = within(await screen.findByRole('list', { name: 'Upcoming workdays' }));
    const items = upcoming.getAllByRole('article');
    expect(items.map((a) => within(a).getByRole('heading').textContent?.trim())).toEqual(['Spring planting', 'Kayak run', 'Storm-hit planting']);
    expect(within(items[0]!).getByText('On the crew')).toBeTruthy();
    expect(within(items[0]!).getByText('Sat 15 Mar 2025, 07:30\u201311:00 EDT')).toBeTruthy();
    expect(within(items[1]!).getByText('Waitlist: number 3')).toBeTruthy();
    expect(within(items[2]!).getByText('Workday cancelled')).toBeTruthy();
    expect(within(items[2]!).getByText('Storm surge expected.')).toBeTruthy();
    const past = within(screen.getByRole('list', { name: 'Past workdays' }));
    expect(past.getByRole('link', { name: 'Winter nursery day' })).toBeTruthy();
    expect(past.getByText('Completed')).toBeTruthy();
  });

  it('creates my calendar feed, copies it, and turns it off after a confirmation', async () => {
    const calls = answerFeed(null);
    // user-event puts its own clipboard in place of the browser's, so copying can be read back.
    const user = userEvent.setup();
    await renderApp('/my/workdays', buildUser());

    expect(await screen.findByText(/You're not signed up for anything coming up/)).toBeTruthy();
    await user.click(await screen.findByRole('button', { name: 'Create my feed address' }));
    const address = (await screen.findByLabelText('Feed address')) as HTMLInputElement;
    expect(address.value).toBe(FEED.replace('secret-one', 'secret-2'));
    expect(calls.posts).toBe(1);

    await user.click(screen.getByRole('button', { name: 'Copy address' }));
    expect(await screen.findByText('Copied. Paste it into your calendar app.')).toBeTruthy();
    expect(await navigator.clipboard.readText()).toBe(address.value);

    await user.click(screen.getByRole('button', { name: 'Turn feed off' }));
    const dialog = await screen.findByRole('dialog', { name: 'Turn the feed off?' });
    await user.click(within(dialog).getByRole('button', { name: 'Turn it off' }));
    await waitFor(() => expect(calls.deletes).toBe(1));
    expect(await screen.findByText('You have no feed address yet.')).toBeTruthy();
  });

  it('replaces an existing feed address only after saying the old one stops working', async () => {
    const calls = answerFeed(FEED);
    const user = userEvent.setup();
    await renderApp('/my/workdays', buildUser());

    expect(((await screen.findByLabelText('Feed address')) as HTMLInputElement).value).toBe(FEED);
    await user.click(screen.getByRole('button', { name: 'Replace address' }));
    const dialog = await screen.findByRole('dialog', { name: 'Replace the address?' });
    expect(dialog.textContent).toMatch(/current address stops working at once/);
    await user.click(within(dialog).getByRole('button', { name: 'Replace it' }));

    await waitFor(() => expect((screen.getByLabelText('Feed address') as HTMLInputElement).value).toBe(FEED.replace('secret-one', 'secret-2')));
    expect(calls.posts).toBe(1);
  });
});
