import { afterEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';

function navLinks(): string[] {
  const nav = screen.getByRole('navigation', { name: 'Main' });
  return within(nav)
    .getAllByRole('link')
    .map((a) => a.textContent?.trim() ?? '');
}

describe('AppTopBar', () => {
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('gives volunteers Home, Sites, Tide calendar and My account, with their name and role', async () => {
    await renderApp('/', buildUser({ role: 'volunteer', name: 'Lena Park' }));

    await screen.findByRole('heading', { level: 1, name: 'Hello, Lena' });
    expect(navLinks()).toEqual(['Home', 'Sites', 'Tide calendar', 'My account']);
    const banner = within(screen.getByRole('banner'));
    expect(banner.getByText('Lena Park')).toBeTruthy();
    expect(banner.getByText('Volunteer')).toBeTruthy();
  });

  it('adds People for coordinators', async () => {
    await renderApp('/', buildUser({ role: 'coordinator' }));

    await screen.findByRole('heading', { level: 2, name: 'At the water' });
    expect(navLinks()).toEqual(['Home', 'Sites', 'Tide calendar', 'People', 'My account']);
  });

  it('adds Settings for admins, just before My account', async () => {
    await renderApp('/', buildUser({ role: 'admin' }));

    await screen.findByRole('heading', { level: 2, name: 'At the water' });
    expect(navLinks().slice(-2)).toEqual(['Settings', 'My account']);
    expect(navLinks()).toContain('People');
  });

  it.each(['volunteer', 'coordinator'] as const)('shows no Settings to the %s role', async (role) => {
    await renderApp('/', buildUser({ role }));

    await screen.findByRole('link', { name: 'My account' });
    expect(navLinks()).not.toContain('Settings');
  });

  it('signs out and shows the sign-in page', async () => {
    let loggedOut = false;
    server.use(
      http.post('/api/auth/logout', () => {
        loggedOut = true;
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const user = userEvent.setup();
    const { router } = await renderApp('/', buildUser());

    await user.click(within(screen.getByRole('banner')).getByRole('button', { name: 'Sign out' }));

    await waitFor(() => expect(router.currentRoute.value.name).toBe('sign-in'));
    expect(loggedOut).toBe(true);
    expect(navLinks()).toEqual(['Sign in', 'Create an account']);
  });

  it('folds the menu into a button on a phone-width screen', async () => {
    await setViewport(375, 812);
    const user = userEvent.setup();
    await renderApp('/', buildUser({ role: 'coordinator', name: 'Kai Torres' }));

    const menuButton = await screen.findByRole('button', { name: 'Menu' });
    expect(screen.queryByRole('navigation', { name: 'Main' })).toBeNull();
    expect(menuButton.getAttribute('aria-expanded')).toBe('false');
    await user.click(menuButton);

    const drawer = await screen.findByRole('dialog', { name: 'Menu' });
    expect(within(drawer).getAllByRole('link').map((a) => a.textContent?.trim())).toEqual(['Home', 'Sites', 'Tide calendar', 'People', 'My account']);
    expect(within(drawer).getByText('Kai Torres')).toBeTruthy();
    expect(menuButton.getAttribute('aria-expanded')).toBe('true');
  });
});
