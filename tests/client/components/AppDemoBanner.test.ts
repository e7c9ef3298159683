import { afterEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import { useOrganisationStore } from '@/stores/organisation';
import { buildOrganisation, mockOrganisation } from '../support/organisation';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';

describe('AppDemoBanner and the organisation in the shell', () => {
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('marks demo data under the top bar, with the organisation name', async () => {
    mockOrganisation(buildOrganisation({ name: 'Bayhaven Shoreline Trust', isDemo: true }));
    await renderApp('/', buildUser());

    const banner = await screen.findByRole('complementary', { name: 'Demo data' });
    expect(banner.textContent).toMatch(/Demo data\s+Bayhaven Shoreline Trust and everyone in it are invented, for trying Ebbroot out\./);
    expect(within(screen.getByRole('banner')).getByText('Bayhaven Shoreline Trust')).toBeTruthy();
  });

  it('shows no banner for a real organisation, only its name in the top bar', async () => {
    mockOrganisation(buildOrganisation({ name: 'Harbour Fringe Restoration', isDemo: false }));
    const { pinia } = await renderApp('/login', null);

    expect(await within(screen.getByRole('banner')).findByText('Harbour Fringe Restoration')).toBeTruthy();
    expect(useOrganisationStore(pinia).loaded).toBe(true);
    expect(screen.queryByRole('complementary', { name: 'Demo data' })).toBeNull();
  });

  it('keeps the app usable when the organisation cannot be loaded', async () => {
    // Wide enough for the links to sit in the bar (from 1120px).
    await setViewport(1280, 800);
    mockOrganisation('error');
    const { pinia } = await renderApp('/', buildUser({ name: 'Lena Park' }));

    expect(await screen.findByRole('heading', { level: 1, name: 'Hello, Lena' })).toBeTruthy();
    await waitFor(() => expect(useOrganisationStore(pinia).loaded).toBe(true));
    expect(screen.getByRole('navigation', { name: 'Main' })).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Ebbroot, home' })).toBeTruthy();
    expect(screen.queryByRole('complementary', { name: 'Demo data' })).toBeNull();
  });
});
