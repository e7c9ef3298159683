import { afterEach, beforeEach, describe, expect, it } from 'vitest';
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
  // The links sit in the bar from 1120px; happy-dom's window is 1024px wide unless told otherwise.
  beforeEach(async () => {
    await setViewport(1280, 800);
  });
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('gives volunteers Home, Workdays, My workdays, Sites, Tide calendar and My account, with their name and role', async () => {
    await renderApp('/', buildUser({ role: 'volunteer', name: 'Lena Park' }));

    await screen.findByRole('heading', { level: 1, name: 'Hello, Lena' });
    const links = navLinks();
    expect(links.slice(0, 3)).toEqual(['Home', 'Workdays', 'My workdays']);
    expect(links).toEqual(expect.arrayContaining(['Sites', 'Tide calendar']));
    expect(links.at(-1)).toBe('My account');
    expect(links).not.toEqual(expect.arrayContaining(['People']));
    const banner = within(screen.getByRole('banner'));
    expect(banner.getByText('Lena Park')).toBeTruthy();
    expect(banner.getByText('Volunteer')).toBeTruthy();
  });

  it('adds Manage workdays and People for coordinators', async () => {
    await renderApp('/', buildUser({ role: 'coordinator' }));

    await screen.findByRole('heading', { level: 2, name: 'At the water' });
    const links = navLinks();
    expect(links.slice(0, 3)).toEqual(['Home', 'Workdays', 'My workdays']);
    expect(links).toEqual(expect.arrayContaining(['Manage workdays', 'People']));
    expect(links.at(-1)).toBe('My account');
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
    expect(navLinks()).toEqual(['Workdays', 'Sign in', 'Create an account']);
  });

  it('offers signed-out visitors the public workdays beside sign-in', async () => {
    server.use(http.get('/api/workdays', () => HttpResponse.json({ workdays: [] })));
    await renderApp('/workdays', null);

    await screen.findByRole('heading', { level: 1, name: 'Workdays' });
    expect(navLinks()).toEqual(['Workdays', 'Sign in', 'Create an account']);
  });

  it('folds the links into the Menu button below 1120px, where they would crowd the name', async () => {
    await setViewport(1024, 768);
    await renderApp('/', buildUser({ role: 'admin' }));

    expect(await screen.findByRole('button', { name: 'Menu' })).toBeTruthy();
    expect(screen.queryByRole('navigation', { name: 'Main' })).toBeNull();
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
    const links = within(drawer).getAllByRole('link').map((a) => a.textContent?.trim());
    expect(links.slice(0, 3)).toEqual(['Home', 'Workdays', 'My workdays']);
    expect(links).toEqual(expect.arrayContaining(['Sites', 'Tide calendar', 'People']));
    expect(links.at(-1)).toBe('My account');
    expect(within(drawer).getByText('Kai Torres')).toBeTruthy();
    expect(menuButton.getAttribute('aria-expanded')).toBe('true');
  });
});
