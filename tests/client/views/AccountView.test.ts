import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';

describe('AccountView', () => {
  it('shows name, e-mail, role and a verified tag, without a resend button', async () => {
    await renderApp('/account', buildUser({ name: 'Lena Park', email: 'lena@example.test', role: 'coordinator' }));
    const main = within(await screen.findByRole('main'));

    expect(await main.findByText('lena@example.test')).toBeTruthy();
    expect(main.getByText('Lena Park')).toBeTruthy();
    expect(main.getByText('Coordinator')).toBeTruthy();
    expect(main.getByText('Verified')).toBeTruthy();
    expect(main.queryByRole('button', { name: 'Resend verification e-mail' })).toBeNull();
  });

  it('resends the verification e-mail when asked', async () => {
    let sent = 0;
    server.use(
      http.post('/api/auth/verify-email/resend', () => {
        sent += 1;
        return HttpResponse.json({ ok: true }, { status: 202 });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/account', buildUser({ emailVerified: false }));

    expect(await screen.findByText('Not verified yet')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Resend verification e-mail' }));

    expect(await screen.findByText(/A new link is on its way/)).toBeTruthy();
    expect(sent).toBe(1);
  });

  it('says when a resend is refused for being too soon', async () => {
    server.use(http.post('/api/auth/verify-email/resend', () => errorResponse(429, 'rate_limited', 'Slow down')));
    const user = userEvent.setup();
    await renderApp('/account', buildUser({ emailVerified: false }));

    await user.click(await screen.findByRole('button', { name: 'Resend verification e-mail' }));

    expect(await screen.findByText(/A link was sent very recently/)).toBeTruthy();
  });
});
