import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';

async function fill(name: string, email: string, password: string) {
  const user = userEvent.setup();
  const main = within(await screen.findByRole('main'));
  if (name) await user.type(main.getByLabelText('Name'), name);
  if (email) await user.type(main.getByLabelText('Email'), email);
  if (password) await user.type(main.getByLabelText('Password'), password);
  await user.click(main.getByRole('button', { name: 'Create account' }));
}

describe('RegisterView', () => {
  it('checks every field on the phone before anything is sent', async () => {
    let posted = false;
    server.use(
      http.post('/api/auth/register', () => {
        posted = true;
        return HttpResponse.json({}, { status: 500 });
      }),
    );
    await renderApp('/register', null);

    await fill('', 'rosa@', 'short');

    expect(await screen.findByText('Is required')).toBeTruthy();
    expect(await screen.findByText('Must be an e-mail address')).toBeTruthy();
    expect(await screen.findByText('Must be at least 8 characters')).toBeTruthy();
    expect(posted).toBe(false);
  });

  it('uses autocomplete hints that suit a new account', async () => {
    await renderApp('/register', null);
    const main = within(await screen.findByRole('main'));

    expect(main.getByLabelText('Name').getAttribute('autocomplete')).toBe('name');
    expect(main.getByLabelText('Password').getAttribute('autocomplete')).toBe('new-password');
  });

  it('shows a taken e-mail (409) under the e-mail field', async () => {
    server.use(http.post('/api/auth/register', () => errorResponse(409, 'conflict', 'E-mail already registered')));
    await renderApp('/register', null);

    await fill('Rosa Mendes', 'rosa@example.test', 'long enough passphrase');

    expect(await screen.findByText(/An account already uses this e-mail/)).toBeTruthy();
  });

  it('creates the account, signs in and goes home with a reminder to confirm the e-mail', async () => {
    const created = buildUser({ name: 'Rosa Mendes', email: 'rosa@example.test', emailVerified: false });
    let body: unknown;
    server.use(
      http.post('/api/auth/register', async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ user: created }, { status: 201 });
      }),
    );
    const { router } = await renderApp('/register', null);

    await fill('  Rosa Mendes ', 'Rosa@Example.test', 'long enough passphrase');

    await waitFor(() => expect(router.currentRoute.value.name).toBe('home'));
    expect(body).toEqual({ name: 'Rosa Mendes', email: 'rosa@example.test', password: 'long enough passphrase' });
    expect(await screen.findByRole('heading', { level: 1, name: 'Hello, Rosa' })).toBeTruthy();
    expect(screen.getByText('Please confirm your e-mail address')).toBeTruthy();
  });
});
