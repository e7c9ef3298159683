import { beforeEach, describe, expect, it } from 'vitest';
import { http, HttpResponse } from 'msw';
import { createPinia, setActivePinia } from 'pinia';
import { useOrganisationStore } from '@/stores/organisation';
import { server } from '../../setup/client-setup';
import { buildOrganisation, buildSettings, mockOrganisation } from '../support/organisation';

describe('useOrganisationStore', () => {
  beforeEach(() => {
    setActivePinia(createPinia());
  });

  it('load() keeps the organisation and the helpers follow its units and time zone', async () => {
    const organisation = buildOrganisation({ name: 'Saltmarsh Friends', isDemo: true, units: 'ft', timeZone: 'America/Chicago' });
    mockOrganisation(organisation);
    const store = useOrganisationStore();

    await store.load();

    expect(store).toMatchObject({ loaded: true, loadError: null, organisation, name: 'Saltmarsh Friends', isDemo: true });
    expect(store.units).toBe('ft');
    expect(store.unitName).toBe('feet');
    expect(store.timeZone).toBe('America/Chicago');
    expect(store.formatLength(0.3048)).toBe('1.0 ft');
  });

  it('load() after a failure leaves no organisation, an error, and fallbacks that are never mislabelled', async () => {
    mockOrganisation('error');
    const store = useOrganisationStore();

    await expect(store.load()).resolves.toBeUndefined();

    expect(store).toMatchObject({ loaded: true, organisation: null, name: null, isDemo: false, units: 'm' });
    expect(store.loadError).toMatch(/Something went wrong/);
    expect(store.timeZone).toBe(Intl.DateTimeFormat().resolvedOptions().timeZone);
    expect(store.formatLength(1.25, 2)).toBe('1.25 m');
  });

  it('load() rejects an answer of the wrong shape instead of trusting it', async () => {
    server.use(http.get('/api/organisation', () => HttpResponse.json({ organisation: { name: 'No units' } })));
    const store = useOrganisationStore();

    await store.load();

    expect(store.organisation).toBeNull();
    expect(store.loadError).not.toBeNull();
  });

  it('load() sends one request however often it is called at once', async () => {
    let calls = 0;
    server.use(
      http.get('/api/organisation', () => {
        calls += 1;
        return HttpResponse.json({ organisation: buildOrganisation() });
      }),
    );
    const store = useOrganisationStore();

    await Promise.all([store.load(), store.load()]);

    expect(calls).toBe(1);
  });

  it('setOrganisation() keeps only the public fields of saved settings', () => {
    const store = useOrganisationStore();

    store.setOrganisation(buildSettings({ name: 'Renamed Trust', units: 'm' }));

    expect(store.organisation).toEqual({ name: 'Renamed Trust', isDemo: false, units: 'm', timeZone: 'America/New_York', currency: 'usd' });
    expect(store.unitName).toBe('metres');
  });
});
