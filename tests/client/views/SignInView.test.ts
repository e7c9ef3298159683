import { afterEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';

describe('SignInView', () => {
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('has labelled fields with autocomplete hints and the other ways in', async () => {
    await renderApp('/login', null);

    const main = within(await screen.findByRole('main'));
    expect(await main.findByRole('heading', { level: 1, name: 'Sign in' })).toBeTruthy();
    expect(main.getByLabelText('Email').getAttribute('autocomplete')).toBe('email');
    expect(main.getByLabelText('Password').getAttribute('autocomplete')).toBe('current-password');
    expect(main.getByRole('button', { name: 'Continue with Google' })).toBeTruthy();
    expect(main.getByRole('link', { name: 'Forgot your password?' }).getAttribute('href')).toBe('/forgot-password');
    expect(main.getByRole('link', { name: 'Create an account' }).getAttribute('href')).toBe('/register');
  });

  it('shows field errors from a 400 with fields under the matching inputs', async () => {
    server.use(
      http.post('/api/auth/login', () =>
        errorResponse(400, 'validation_failed', 'Sign-in is invalid', { email: ['is not accepted here'] }),
      ),
    );
    const user = userEvent.setup();
    await renderApp('/login', null);

    await user.type(screen.getByLabelText('Email'), 'ana@example.test');
    await user.type(screen.getByLabelText('Password'), 'whatever-it-is');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Is not accepted here')).toBeTruthy();
  });

  it('checks the form before sending it', async () => {
    const user = userEvent.setup();
    await renderApp('/login', null);

    await user.type(screen.getByLabelText('Email'), 'not-an-address');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    expect(await screen.findByText('Must be an e-mail address')).toBeTruthy();
    expect(await screen.findByText('Is required')).toBeTruthy();
  });

  it('says plainly when the e-mail and password do not match (401)', async () => {
    server.use(http.post('/api/auth/login', () => errorResponse(401, 'invalid_credentials', 'E-mail or password is wrong')));
    const user = userEvent.setup();
    await renderApp('/login', null);

    await user.type(screen.getByLabelText('Email'), 'ana@example.test');
    await user.type(screen.getByLabelText('Password'), 'wrong-password');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain("That e-mail and password don't match an account.");
  });

  it('signs in and returns to the page in ?redirect=', async () => {
    // Wide enough for the top bar to show who is signed in (from 1120px).
    await setViewport(1280, 800);
    const coordinator = buildUser({ role: 'coordinator', name: 'Kai Torres' });
    server.use(
      http.post('/api/auth/login', () => HttpResponse.json({ user: coordinator })),
      http.get('/api/volunteers', () => HttpResponse.json({ users: [] })),
    );
    const user = userEvent.setup();
    const { router } = await renderApp('/login?redirect=/people', null);

    await user.type(screen.getByLabelText('Email'), coordinator.email);
    await user.type(screen.getByLabelText('Password'), 'correct horse battery');
    await user.click(screen.getByRole('button', { name: 'Sign in' }));

    await waitFor(() => expect(router.currentRoute.value.name).toBe('people'));
    expect(await screen.findByText('Kai Torres')).toBeTruthy();
  });

  it('explains a failed Google sign-in', async () => {
    await renderApp('/login?error=google', null);

    expect(await screen.findByText("Signing in with Google didn't finish.")).toBeTruthy();
  });
});
