import { describe, expect, it, vi } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { renderApp } from '../support/render-app';
import { buildSite, buildStation, mockSiteBoard } from '../support/sites';
import { buildUser } from '../support/users';

// The form leads to the tide board after saving; its chart is not drawn in happy-dom.
vi.mock('vue-echarts', async () => {
  const { defineComponent, h } = await import('vue');
  return { default: defineComponent({ props: { option: { type: Object, default: null } }, setup: () => () => h('div') }) };
});

const coordinator = buildUser({ role: 'coordinator' });
const safetyHarbor = buildStation({ distanceKm: 2.2 });
const stPete = buildStation({ id: 'noaa/8726520', name: 'St. Petersburg', kind: 'reference', distanceKm: 20.5 });

async function openNewForm() {
  const result = await renderApp('/sites/new', coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('button', { name: 'Create site' });
  return { ...result, main };
}

function answerStations(): URL[] {
  const seen: URL[] = [];
  server.use(
    http.get('/api/stations', ({ request }) => {
      const url = new URL(request.url);
      seen.push(url);
      return HttpResponse.json({ stations: url.searchParams.has('near') ? [safetyHarbor, stPete] : [stPete] });
    }),
  );
  return seen;
}

describe('SiteFormView', () => {
  it('checks the form before sending, with metre limits said in feet', async () => {
    let posted = false;
    server.use(http.post('/api/sites', () => ((posted = true), HttpResponse.json({}, { status: 500 }))));
    const user = userEvent.setup();
    const { main } = await openNewForm();

    await user.type(main.getByLabelText('Bed elevation (ft above MLLW)'), '20');
    await user.click(main.getByRole('button', { name: 'Create site' }));

    expect(await main.findByText('Is required')).toBeTruthy();
    // Element Plus shows each field's message on its own tick.
    await waitFor(() => expect(main.getAllByText('Must be a number')).toHaveLength(3)); // latitude, longitude, route
    expect(await main.findByText('Must be at most 16.4 ft')).toBeTruthy();
    expect(await main.findByText('Must be a station id such as noaa/8726738')).toBeTruthy();
    expect(posted).toBe(false);
  });

  it('splits pasted coordinates, picks the nearest station and creates the site in metres', async () => {
    const stationRequests = answerStations();
    let body: Record<string, unknown> | undefined;
    const created = buildSite({ name: 'Heron Cove' });
    server.use(
      http.post('/api/sites', async ({ request }) => {
        body = (await request.json()) as Record<string, unknown>;
        return HttpResponse.json({ site: created }, { status: 201 });
      }),
    );
    mockSiteBoard(created);
    const user = userEvent.setup();
    const { main, router } = await openNewForm();

    expect(main.getByText('America/New_York')).toBeTruthy(); // the organisation's zone by default
    await user.type(main.getByLabelText('Site name'), 'Heron Cove');
    await user.click(main.getByLabelText('Latitude'));
    await user.paste('27.99, -82.69');
    expect((main.getByLabelText('Latitude') as HTMLInputElement).value).toBe('27.99');
    expect((main.getByLabelText('Longitude') as HTMLInputElement).value).toBe('-82.69');

    await user.click(main.getByRole('button', { name: 'Nearest to these coordinates' }));
    const stations = await main.findByRole('list', { name: 'Stations' });
    expect(stationRequests.at(-1)?.searchParams.get('near')).toBe('27.99,-82.69');
    expect(within(stations).getByRole('button', { name: /Safety Harbor.*1\.2 nmi away/ }).getAttribute('aria-pressed')).toBe('true');
    expect(main.getByText(/Chosen: Safety Harbor/)).toBeTruthy();
    expect(main.getByRole('link', { name: 'Licence: Public domain' }).getAttribute('href')).toBe('https://www.noaa.gov/disclaimer');

    await user.type(main.getByLabelText('Bed elevation (ft above MLLW)'), '0.5');
    await user.type(main.getByLabelText("Route's shallowest point (ft above MLLW)"), '-1');
    await user.type(main.getByLabelText('Distance from launch to site (nmi)'), '1.5');
    await user.click(main.getByRole('button', { name: 'Create site' }));

    await waitFor(() => expect(router.currentRoute.value.fullPath).toBe(`/sites/${created.id}`));
    expect(body).toMatchObject({ name: 'Heron Cove', latitude: 27.99, longitude: -82.69, timeZone: 'America/New_York', stationId: 'noaa/8726738' });
    expect(body?.bedElevationM).toBeCloseTo(0.1524, 10);
    expect(body?.routeElevationM).toBeCloseTo(-0.3048, 10);
    expect(body?.launchDistanceM).toBeCloseTo(2778, 9);
  });

  it('searches stations by name and lets another be chosen', async () => {
    const stationRequests = answerStations();
    const user = userEvent.setup();
    const { main } = await openNewForm();

    await user.type(main.getByLabelText('Search stations by name or number'), 'St. Pete');
    const option = await main.findByRole('button', { name: /St\. Petersburg/ });
    expect(stationRequests.at(-1)?.searchParams.get('q')).toBe('St. Pete');
    await user.click(option);

    expect(option.getAttribute('aria-pressed')).toBe('true');
    expect(main.getByText(/Chosen: St\. Petersburg/)).toBeTruthy();
  });

  it('shows a taken name (409) under the name and an unknown station (400) under the station picker', async () => {
    answerStations();
    let attempt = 0;
    server.use(
      http.post('/api/sites', () =>
        ++attempt === 1
          ? errorResponse(409, 'conflict', 'Site name taken', { name: ['is taken'] })
          : errorResponse(400, 'validation_failed', 'Site is invalid', { stationId: ['is not a known station'] }),
      ),
    );
    const user = userEvent.setup();
    const { main } = await openNewForm();
    await user.type(main.getByLabelText('Site name'), 'Heron Cove');
    await user.type(main.getByLabelText('Latitude'), '27.99');
    await user.type(main.getByLabelText('Longitude'), '-82.69');
    await user.click(main.getByRole('button', { name: 'Nearest to these coordinates' }));
    await main.findByText(/Chosen: Safety Harbor/);
    await user.type(main.getByLabelText('Bed elevation (ft above MLLW)'), '0.5');
    await user.type(main.getByLabelText("Route's shallowest point (ft above MLLW)"), '-1');

    await user.click(main.getByRole('button', { name: 'Create site' }));
    expect(await main.findByText('Another site already has this name. Choose a different one.')).toBeTruthy();

    await user.click(main.getByRole('button', { name: 'Create site' }));
    expect(await main.findByText('Is not a known station')).toBeTruthy();
  });

  it('edits a site, sending the changed fields and keeping the rest as saved', async () => {
    const site = buildSite({ name: 'Heron Cove', bedElevationM: 0.1524, workingDepthM: 0.45, notes: 'Oyster bar on the north side.' });
    let patched: unknown;
    const stationPaths: string[] = [];
    server.use(
      http.get(`/api/sites/${site.id}`, () => HttpResponse.json({ site })),
      http.get('/api/stations/:id', ({ request }) => {
        stationPaths.push(new URL(request.url).pathname);
        return HttpResponse.json({ station: { ...buildStation(), publishedDatums: {} }, units: 'ft' });
      }),
      http.patch(`/api/sites/${site.id}`, async ({ request }) => {
        patched = await request.json();
        return HttpResponse.json({ site: { ...site, name: 'Heron Cove North' } });
      }),
    );
    mockSiteBoard(site);
    const user = userEvent.setup();
    const { router } = await renderApp(`/sites/${site.id}/edit`, coordinator);
    const main = within(screen.getByRole('main'));

    const name = await main.findByLabelText('Site name');
    expect((name as HTMLInputElement).value).toBe('Heron Cove');
    expect((main.getByLabelText('Bed elevation (ft above MLLW)') as HTMLInputElement).value).toBe('0.5');
    expect(await main.findByText(/Chosen: Safety Harbor/)).toBeTruthy();
    expect(stationPaths).toEqual(['/api/stations/noaa%2F8726738']);
    await user.clear(name);
    await user.type(name, 'Heron Cove North');
    await user.click(main.getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(router.currentRoute.value.name).toBe('site-tide'));
    // Only the name changed; the defaulted fields go along at their saved values (see withSavedDefaults).
    expect(patched).toEqual({
      name: 'Heron Cove North',
      timeOffsetMinutes: site.timeOffsetMinutes,
      heightOffsetM: site.heightOffsetM,
      launchName: site.launchName,
      launchDistanceM: site.launchDistanceM,
      workingDepthM: site.workingDepthM,
      craftDraftM: site.craftDraftM,
      draftMarginM: site.draftMarginM,
      minWindowMinutes: site.minWindowMinutes,
      includeCivilTwilight: site.includeCivilTwilight,
      salinityPpt: site.salinityPpt,
      notes: site.notes,
    });
  });
});
