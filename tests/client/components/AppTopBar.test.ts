import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';
import { groupLinks, mainNav, texts, topLevel } from '../support/nav';

// Each role's menu, group by group, as the top bar shows it (groups are opened one at a time).
const coordinatorGroups = {
  Workdays: ['Workday calendar', 'My workdays', 'Manage workdays', 'Fleet'],
  'Tides & sites': ['Sites', 'Tide calendar'],
  Nursery: ['Nursery ledger', 'Monitoring'],
};

describe('AppTopBar on a wide screen', () => {
  beforeEach(async () => {
    await setViewport(1280, 800);
  });
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('groups an admin’s pages under Workdays, Tides & sites, Nursery, Giving & reports and Organisation', async () => {
    const user = userEvent.setup();
    await renderApp('/', buildUser({ role: 'admin', name: 'Miriam Alder' }));
    await screen.findByRole('heading', { level: 2, name: 'At the water' });

    expect(topLevel()).toEqual(['Home', 'Workdays', 'Tides & sites', 'Nursery', 'Giving & reports', 'Organisation']);
    const groups = { ...coordinatorGroups, 'Giving & reports': ['Sponsor a tree', 'Reports', 'Donations', 'Campaigns'], Organisation: ['People', 'Settings'] };
    for (const [group, links] of Object.entries(groups)) expect(await groupLinks(user, group)).toEqual(links);
    const banner = within(screen.getByRole('banner'));
    expect(banner.getByRole('link', { name: 'My account' }).getAttribute('href')).toBe('/account');
    expect(banner.getByText('Miriam Alder')).toBeTruthy();
  });

  it('gives coordinators the same groups without Donations or Settings, and People as a plain link', async () => {
    const user = userEvent.setup();
    await renderApp('/', buildUser({ role: 'coordinator' }));
    await screen.findByRole('heading', { level: 2, name: 'At the water' });

    expect(topLevel()).toEqual(['Home', 'Workdays', 'Tides & sites', 'Nursery', 'Giving & reports', 'People']);
    const groups = { ...coordinatorGroups, 'Giving & reports': ['Sponsor a tree', 'Reports'] };
    for (const [group, links] of Object.entries(groups)) expect(await groupLinks(user, group)).toEqual(links);
    expect(within(mainNav()).queryByRole('button', { name: 'Organisation' })).toBeNull();
    expect(within(screen.getByRole('banner')).getByRole('link', { name: 'My account' })).toBeTruthy();
  });

  it('keeps a volunteer’s few pages as plain links, with My account beside their name and role', async () => {
    await renderApp('/', buildUser({ role: 'volunteer', name: 'Lena Park' }));
    await screen.findByRole('heading', { level: 1, name: 'Hello, Lena' });

    expect(topLevel()).toEqual(['Home', 'Workday calendar', 'My workdays', 'Sites', 'Tide calendar', 'Nursery ledger', 'Sponsor a tree']);
    expect(within(mainNav()).queryAllByRole('button')).toHaveLength(0);
    const banner = within(screen.getByRole('banner'));
    expect(banner.getByText('Lena Park')).toBeTruthy();
    expect(banner.getByText('Volunteer')).toBeTruthy();
    expect(banner.getByRole('link', { name: 'My account' })).toBeTruthy();
  });

  it('offers signed-out visitors the flat public menu', async () => {
    server.use(http.get('/api/workdays', () => HttpResponse.json({ workdays: [] })));
    await renderApp('/workdays', null);

    await screen.findByRole('heading', { level: 1, name: 'Workdays' });
    expect(topLevel()).toEqual(['Workdays', 'Sponsor a tree', 'Sign in', 'Create an account']);
    expect(within(mainNav()).getByRole('link', { name: 'Workdays' }).getAttribute('aria-current')).toBe('page');
    expect(within(screen.getByRole('banner')).queryByRole('link', { name: 'My account' })).toBeNull();
  });

  it('marks the current page and highlights its group while the group is closed', async () => {
    const user = userEvent.setup();
    await renderApp('/sites', buildUser({ role: 'admin' }));
    await screen.findByRole('heading', { level: 1, name: 'Sites' });

    const nav = within(mainNav());
    const tides = nav.getByRole('button', { name: 'Tides & sites' });
    expect(tides.getAttribute('aria-current')).toBe('true');
    expect(nav.getByRole('button', { name: 'Workdays' }).getAttribute('aria-current')).toBeNull();
    await user.click(tides);
    expect(nav.getByRole('link', { name: 'Sites' }).getAttribute('aria-current')).toBe('page');
    expect(nav.getByRole('link', { name: 'Tide calendar' }).getAttribute('aria-current')).toBeNull();
  });

  it('signs out and shows the sign-in page with the public menu', async () => {
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
    expect(topLevel()).toEqual(['Workdays', 'Sponsor a tree', 'Sign in', 'Create an account']);
  });
});

describe('AppTopBar by screen width', () => {
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('keeps the admin menu in the bar at 1024px', async () => {
    await setViewport(1024, 768);
    await renderApp('/', buildUser({ role: 'admin' }));

    expect(await screen.findByRole('navigation', { name: 'Main' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Menu' })).toBeNull();
  });

  it('folds the menu into the Menu button below 900px', async () => {
    await setViewport(860, 768);
    await renderApp('/', buildUser({ role: 'admin' }));

    expect(await screen.findByRole('button', { name: 'Menu' })).toBeTruthy();
    expect(screen.queryByRole('navigation', { name: 'Main' })).toBeNull();
  });

  it('shows every group as a headed section in the phone drawer, nothing to open', async () => {
    await setViewport(375, 812);
    const user = userEvent.setup();
    await renderApp('/', buildUser({ role: 'admin', name: 'Kai Torres' }));

    const menuButton = await screen.findByRole('button', { name: 'Menu' });
    expect(menuButton.getAttribute('aria-expanded')).toBe('false');
    await user.click(menuButton);

    const drawer = within(await screen.findByRole('dialog', { name: 'Menu' }));
    expect(texts(drawer.getAllByRole('heading', { level: 3 }))).toEqual(['Workdays', 'Tides & sites', 'Nursery', 'Giving & reports', 'Organisation']);
    const section = (name: string): string[] => texts(within(drawer.getByRole('region', { name })).getAllByRole('link'));
    expect(section('Workdays')).toEqual(coordinatorGroups.Workdays);
    expect(section('Tides & sites')).toEqual(coordinatorGroups['Tides & sites']);
    expect(section('Nursery')).toEqual(coordinatorGroups.Nursery);
    expect(section('Giving & reports')).toEqual(['Sponsor a tree', 'Reports', 'Donations', 'Campaigns']);
    expect(section('Organisation')).toEqual(['People', 'Settings']);
    expect(drawer.queryAllByRole('button', { expanded: false })).toHaveLength(0);
    expect(drawer.getByRole('link', { name: 'Home' })).toBeTruthy();
    expect(drawer.getByRole('link', { name: 'My account' })).toBeTruthy();
    expect(drawer.getByText('Kai Torres')).toBeTruthy();
    expect(menuButton.getAttribute('aria-expanded')).toBe('true');
  });

  it('gives a coordinator’s drawer an Organisation section with People only', async () => {
    await setViewport(375, 812);
    const user = userEvent.setup();
    await renderApp('/', buildUser({ role: 'coordinator' }));

    await user.click(await screen.findByRole('button', { name: 'Menu' }));

    const drawer = within(await screen.findByRole('dialog', { name: 'Menu' }));
    expect(texts(within(drawer.getByRole('region', { name: 'Organisation' })).getAllByRole('link'))).toEqual(['People']);
    expect(texts(within(drawer.getByRole('region', { name: 'Giving & reports' })).getAllByRole('link'))).toEqual(['Sponsor a tree', 'Reports']);
  });

  it('lists a volunteer’s pages in the drawer without headings', async () => {
    await setViewport(375, 812);
    const user = userEvent.setup();
    await renderApp('/', buildUser({ role: 'volunteer' }));

    await user.click(await screen.findByRole('button', { name: 'Menu' }));

    const drawer = within(await screen.findByRole('dialog', { name: 'Menu' }));
    expect(drawer.queryAllByRole('heading', { level: 3 })).toHaveLength(0);
    expect(texts(drawer.getAllByRole('link'))).toEqual([
      'Home',
      'Workday calendar',
      'My workdays',
      'Sites',
      'Tide calendar',
      'Nursery ledger',
      'Sponsor a tree',
      'My account',
    ]);
  });
});
