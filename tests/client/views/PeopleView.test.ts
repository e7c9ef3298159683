import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { renderApp } from '../support/render-app';
import { buildPerson, buildUser } from '../support/users';

const ana = buildPerson({ name: 'Ana Ruiz', role: 'volunteer', emailVerified: true });
const ben = buildPerson({ name: 'Ben Okafor', role: 'volunteer', emailVerified: false });

function itemFor(name: string): HTMLElement {
  const item = screen.getAllByRole('listitem').find((li) => li.textContent?.includes(name));
  if (!item) throw new Error(`no list item for ${name}`);
  return item;
}

describe('PeopleView', () => {
  it('shows coordinators the volunteers with verified and unverified tags, read-only', async () => {
    server.use(http.get('/api/volunteers', () => HttpResponse.json({ users: [ana, ben] })));
    await renderApp('/people', buildUser({ role: 'coordinator' }));

    expect(await screen.findByText('Ana Ruiz')).toBeTruthy();
    expect(within(itemFor('Ana Ruiz')).getByText('Verified')).toBeTruthy();
    expect(within(itemFor('Ben Okafor')).getByText('Unverified')).toBeTruthy();
    expect(screen.getByText('2 volunteers')).toBeTruthy();
    expect(screen.queryByRole('combobox', { name: /Role for/ })).toBeNull();
  });

  it('shows an error with a retry when the list cannot load', async () => {
    let fail = true;
    server.use(
      http.get('/api/volunteers', () =>
        fail ? errorResponse(500, 'internal_error', 'boom') : HttpResponse.json({ users: [ana] }),
      ),
    );
    const user = userEvent.setup();
    await renderApp('/people', buildUser({ role: 'coordinator' }));

    expect(await screen.findByText(/Couldn't load people/)).toBeTruthy();
    fail = false;
    await user.click(screen.getByRole('button', { name: 'Try again' }));

    expect(await screen.findByText('Ana Ruiz')).toBeTruthy();
  });

  it('lets an admin change a role after confirming', async () => {
    const admin = buildUser({ role: 'admin', name: 'Ada Admin' });
    let patched: { id: string; body: unknown } | undefined;
    server.use(
      http.get('/api/users', () => HttpResponse.json({ users: [ana, ben] })),
      http.patch('/api/users/:id/role', async ({ params, request }) => {
        const body = await request.json();
        patched = { id: String(params.id), body };
        return HttpResponse.json({ user: { ...ana, role: 'coordinator' } });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/people', admin);
    await screen.findByText('Ana Ruiz');

    await user.click(screen.getByRole('combobox', { name: 'Role for Ana Ruiz' }));
    await user.click(await screen.findByRole('option', { name: 'Coordinator' }));
    const dialog = await screen.findByRole('dialog', { name: 'Change role?' });
    expect(dialog.textContent).toContain('Ana Ruiz will become coordinator (now volunteer).');
    await user.click(within(dialog).getByRole('button', { name: 'Change role' }));

    await waitFor(() => expect(patched).toEqual({ id: ana.id, body: { role: 'coordinator' } }));
    await waitFor(() => expect(within(itemFor('Ana Ruiz')).getByText('Coordinator')).toBeTruthy());
  });
});
