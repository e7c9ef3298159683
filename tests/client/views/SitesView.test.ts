import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/vue';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { renderApp } from '../support/render-app';
import { buildSite } from '../support/sites';
import { buildUser } from '../support/users';

const heron = buildSite({ name: 'Heron Cove', bedElevationM: 0.1524, launchName: 'Bayside ramp', launchDistanceM: 2778 });
const pelican = buildSite({ name: 'Pelican Flats', stationId: 'noaa/8726520', launchName: '', launchDistanceM: 0 });

function cardFor(name: string): HTMLElement {
  const card = within(screen.getByRole('list', { name: 'Sites' }))
    .getAllByRole('listitem')
    .find((li) => li.textContent?.includes(name));
  if (!card) throw new Error(`no card for ${name}`);
  return card;
}

describe('SitesView', () => {
  it('lists the sites as cards with station, bed elevation and launch in the organisation units', async () => {
    server.use(http.get('/api/sites', () => HttpResponse.json({ sites: [heron, pelican] })));
    await renderApp('/sites', buildUser({ role: 'volunteer' }));

    const link = await screen.findByRole('link', { name: 'Heron Cove' });
    expect(link.getAttribute('href')).toBe(`/sites/${heron.id}`);
    const card = within(cardFor('Heron Cove'));
    expect(card.getByText('noaa/8726738')).toBeTruthy();
    expect(card.getByText(/0\.50 ft/)).toBeTruthy();
    expect(card.getByText('Bayside ramp, 1.5 nmi to the site')).toBeTruthy();
    expect(within(cardFor('Pelican Flats')).getByText('Not set')).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'New site' })).toBeNull();
    expect(screen.queryByRole('link', { name: /^Edit/ })).toBeNull();
  });

  it('gives coordinators "New site" and an edit link per site', async () => {
    server.use(http.get('/api/sites', () => HttpResponse.json({ sites: [heron] })));
    await renderApp('/sites', buildUser({ role: 'coordinator' }));

    expect((await screen.findByRole('link', { name: 'New site' })).getAttribute('href')).toBe('/sites/new');
    expect((await screen.findByRole('link', { name: 'Edit Heron Cove' })).getAttribute('href')).toBe(`/sites/${heron.id}/edit`);
  });

  it('says so when there are no sites yet', async () => {
    server.use(http.get('/api/sites', () => HttpResponse.json({ sites: [] })));
    await renderApp('/sites', buildUser({ role: 'volunteer' }));

    expect(await screen.findByText(/No sites yet/)).toBeTruthy();
  });

  it('shows a load error with a retry', async () => {
    server.use(http.get('/api/sites', () => errorResponse(500, 'internal_error', 'boom')));
    await renderApp('/sites', buildUser());

    expect(await screen.findByText(/Couldn't load the sites/)).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });

  it('keeps volunteers out of the new-site form', async () => {
    const { router } = await renderApp('/sites/new', buildUser({ role: 'volunteer' }));

    expect(router.currentRoute.value.name).toBe('no-access');
  });
});
