import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';

const TOKEN = 'a'.repeat(32);

describe('VerifyEmailView', () => {
  it('confirms the e-mail with the token from the link and updates the signed-in user', async () => {
    const me = buildUser({ emailVerified: false });
    let body: unknown;
    server.use(
      http.post('/api/auth/verify-email', async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ user: { ...me, emailVerified: true } });
      }),
    );
    const { pinia } = await renderApp(`/verify-email?token=${TOKEN}`, me);

    expect(await screen.findByText('Thank you, your e-mail is confirmed.')).toBeTruthy();
    expect(body).toEqual({ token: TOKEN });
    expect(pinia.state.value.session?.user?.emailVerified).toBe(true);
  });

  it('explains an expired or used link', async () => {
    server.use(http.post('/api/auth/verify-email', () => errorResponse(400, 'invalid_token', 'Token is invalid')));
    await renderApp(`/verify-email?token=${TOKEN}`, null);

    expect(await screen.findByText('This link has expired or was already used.')).toBeTruthy();
  });
});

describe('ResetPasswordView', () => {
  it('saves the new password with the token', async () => {
    let body: unknown;
    server.use(
      http.post('/api/auth/password-reset/confirm', async ({ request }) => {
        body = await request.json();
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const user = userEvent.setup();
    await renderApp(`/reset-password?token=${TOKEN}`, null);

    await user.type(await screen.findByLabelText('New password'), 'a brand new passphrase');
    await user.click(screen.getByRole('button', { name: 'Save new password' }));

    expect(await screen.findByText('Your password has been changed.')).toBeTruthy();
    expect(body).toEqual({ token: TOKEN, password: 'a brand new passphrase' });
  });

  it('offers a new link when the token is refused', async () => {
    server.use(http.post('/api/auth/password-reset/confirm', () => errorResponse(400, 'invalid_token', 'Token is invalid')));
    const user = userEvent.setup();
    await renderApp(`/reset-password?token=${TOKEN}`, null);

    await user.type(await screen.findByLabelText('New password'), 'a brand new passphrase');
    await user.click(screen.getByRole('button', { name: 'Save new password' }));

    expect(await screen.findByText(/This link has expired/)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Ask for a new link' }).getAttribute('href')).toBe('/forgot-password');
  });
});

describe('ForgotPasswordView', () => {
  it('says a link is on its way without revealing whether the account exists', async () => {
    server.use(http.post('/api/auth/password-reset/request', () => HttpResponse.json({ ok: true }, { status: 202 })));
    const user = userEvent.setup();
    await renderApp('/forgot-password', null);
    const main = within(await screen.findByRole('main'));

    await user.type(await main.findByLabelText('Email'), 'who@example.test');
    await user.click(main.getByRole('button', { name: 'Send the link' }));

    expect(await screen.findByText(/If an account uses who@example.test/)).toBeTruthy();
  });
});
