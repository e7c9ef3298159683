import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { OrganisationSettings } from '@shared/schemas/organisation.schema';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { buildOrganisation, buildSettings, mockOrganisation } from '../support/organisation';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';

const admin = buildUser({ role: 'admin', name: 'Ada Admin' });

function answerSettings(settings: OrganisationSettings): { patches: unknown[] } {
  const seen = { patches: [] as unknown[] };
  server.use(
    http.get('/api/organisation/settings', () => HttpResponse.json({ settings })),
    http.patch('/api/organisation/settings', async ({ request }) => {
      const body = (await request.json()) as Partial<OrganisationSettings>;
      seen.patches.push(body);
      return HttpResponse.json({ settings: { ...settings, ...body } });
    }),
  );
  return seen;
}

async function openSettings() {
  await renderApp('/settings', admin);
  const main = within(screen.getByRole('main'));
  await main.findByRole('button', { name: 'Save settings' });
  return main;
}

describe('OrganisationSettingsView', () => {
  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('loads the settings into labelled fields and shows the demo flag read-only', async () => {
    answerSettings(buildSettings({ name: 'Bayhaven Shoreline Trust', isDemo: true, units: 'm', timeZone: 'America/New_York' }));
    const main = await openSettings();

    expect((main.getByLabelText('Organisation name') as HTMLInputElement).value).toBe('Bayhaven Shoreline Trust');
    expect((main.getByLabelText('Legal name') as HTMLInputElement).value).toBe('Harbour Fringe Restoration Inc.');
    expect(main.getByLabelText('Legal name').getAttribute('aria-describedby')).toBe('settings-legal-name-hint');
    expect(main.getByText('Printed on donation receipts.')).toBeTruthy();
    expect((main.getByLabelText('Tax ID') as HTMLInputElement).value).toBe('12-3456789');
    expect((main.getByLabelText('Contact e-mail') as HTMLInputElement).value).toBe('hello@harbour-fringe.example.test');
    expect((main.getByRole('radio', { name: 'Metres (m)' }) as HTMLInputElement).checked).toBe(true);
    expect(main.getByRole('combobox', { name: 'Time zone' }).getAttribute('aria-describedby')).toBe('settings-time-zone-hint');
    expect(main.getByText('America/New_York')).toBeTruthy();
    expect(main.getByText(/Yes: a banner on every page/)).toBeTruthy();
    expect(main.queryByRole('checkbox')).toBeNull();
  });

  it('shows a load error with a retry', async () => {
    let fail = true;
    server.use(
      http.get('/api/organisation/settings', () =>
        fail ? errorResponse(500, 'internal_error', 'boom') : HttpResponse.json({ settings: buildSettings() }),
      ),
    );
    const user = userEvent.setup();
    await renderApp('/settings', admin);

    expect(await screen.findByText(/Couldn't load the settings/)).toBeTruthy();
    fail = false;
    await user.click(screen.getByRole('button', { name: 'Try again' }));

    expect(await screen.findByRole('button', { name: 'Save settings' })).toBeTruthy();
  });

  it('checks a typed time zone and e-mail before sending anything', async () => {
    // Browsers that can't list time zones get a text box; the schema still checks what is typed.
    vi.spyOn(Intl, 'supportedValuesOf').mockImplementation(() => {
      throw new RangeError('not supported');
    });
    const seen = answerSettings(buildSettings());
    const user = userEvent.setup();
    const main = await openSettings();

    const zone = main.getByRole('textbox', { name: 'Time zone' });
    await user.clear(zone);
    await user.type(zone, 'Mars/Olympus_Mons');
    await user.clear(main.getByLabelText('Contact e-mail'));
    await user.type(main.getByLabelText('Contact e-mail'), 'not-an-address');
    await user.click(main.getByRole('button', { name: 'Save settings' }));

    expect(await main.findByText('Must be an IANA time zone such as America/New_York')).toBeTruthy();
    expect(main.getByText('Must be an e-mail address')).toBeTruthy();
    expect(seen.patches).toEqual([]);
  });

  it('saves only what changed, says so, and the top bar and banner follow', async () => {
    mockOrganisation(buildOrganisation({ name: 'Bayhaven Shoreline Trust', isDemo: true }));
    const seen = answerSettings(buildSettings({ name: 'Bayhaven Shoreline Trust', isDemo: true, units: 'ft' }));
    const user = userEvent.setup();
    const main = await openSettings();
    await screen.findByRole('complementary', { name: 'Demo data' });

    await user.clear(main.getByLabelText('Organisation name'));
    await user.type(main.getByLabelText('Organisation name'), 'Bayhaven Mangrove Trust ');
    await user.click(main.getByRole('radio', { name: 'Metres (m)' }));
    await user.click(main.getByRole('combobox', { name: 'Time zone' }));
    await user.keyboard('Pacific/Auck');
    await user.click(await screen.findByRole('option', { name: 'Pacific/Auckland' }));
    await user.click(main.getByRole('button', { name: 'Save settings' }));

    expect(await main.findByText('Settings saved.')).toBeTruthy();
    expect(seen.patches).toEqual([{ name: 'Bayhaven Mangrove Trust', units: 'm', timeZone: 'Pacific/Auckland' }]);
    expect(within(screen.getByRole('banner')).getByText('Bayhaven Mangrove Trust')).toBeTruthy();
    expect(screen.getByRole('complementary', { name: 'Demo data' }).textContent).toContain('Bayhaven Mangrove Trust and everyone');
  });

  it('saves changed window weights and readiness rules as whole groups, and nothing else', async () => {
    const seen = answerSettings(buildSettings({ windowWeights: { duration: 0.4, lowWater: 0.2, weekend: 0.25, startHour: 0.15 } }));
    const user = userEvent.setup();
    const main = await openSettings();

    const weekend = main.getByRole('spinbutton', { name: 'Weekends' });
    await user.clear(weekend);
    await user.type(weekend, '0.5');
    await user.click(main.getByRole('radio', { name: /at most a share of the time/ }));
    const share = await main.findByRole('spinbutton', { name: /Largest share of hours under water/ });
    await user.clear(share);
    await user.type(share, '0.05');
    const days = main.getByRole('spinbutton', { name: 'For at least (days)' });
    await user.clear(days);
    await user.type(days, '28');
    await user.click(main.getByRole('button', { name: 'Save settings' }));

    expect(await main.findByText('Settings saved.')).toBeTruthy();
    expect(seen.patches).toEqual([{
      windowWeights: { duration: 0.4, lowWater: 0.2, weekend: 0.5, startHour: 0.15 },
      nurseryRules: { crownRule: 'share', maxCrownSubmergedShare: 0.05, salinityTolerancePpt: 2, holdDays: 28 },
    }]);
  });

  it('shows the server’s field errors from a 400 under the matching fields', async () => {
    answerSettings(buildSettings());
    server.use(
      http.patch('/api/organisation/settings', () =>
        errorResponse(400, 'validation_failed', 'Settings are invalid', { taxId: ['is not a tax number we recognise'] }),
      ),
    );
    const user = userEvent.setup();
    const main = await openSettings();

    await user.type(main.getByLabelText('Tax ID'), '-extra');
    await user.click(main.getByRole('button', { name: 'Save settings' }));

    expect(await main.findByText('Is not a tax number we recognise')).toBeTruthy();
    expect(main.getByText('Some settings need another look.')).toBeTruthy();
    expect(main.queryByText('Settings saved.')).toBeNull();
  });
});
