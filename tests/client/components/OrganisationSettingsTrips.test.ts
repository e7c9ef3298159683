import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { OrganisationSettings } from '@shared/schemas/organisation.schema';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { buildSettings } from '../support/organisation';
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

async function openCard() {
  await renderApp('/settings', admin);
  const card = within(await screen.findByRole('region', { name: 'Trip plans' }));
  return card;
}

describe('OrganisationSettingsTrips', () => {
  it('shows the trip settings with units, the margins in percent and where the 70 % comes from', async () => {
    answerSettings(buildSettings());
    const card = await openCard();

    const paddle = card.getByRole('spinbutton', { name: /Kayaks and canoes: plan up to \(% of the maker's rated load\)/ }) as HTMLInputElement;
    expect(paddle.value).toBe('70');
    expect((card.getByRole('spinbutton', { name: /capacity plate: plan up to \(% of the plate\)/ }) as HTMLInputElement).value).toBe('100');
    expect((card.getByRole('spinbutton', { name: 'Weight counted per person (kg)' }) as HTMLInputElement).value).toBe('84');
    expect((card.getByRole('spinbutton', { name: 'Filled pot mass when none is recorded (kg)' }) as HTMLInputElement).value).toBe('27.0');
    expect((card.getByRole('spinbutton', { name: 'Planting time per tree, per pair of planters (min)' }) as HTMLInputElement).value).toBe('20');
    expect((card.getByRole('spinbutton', { name: 'Loading a run at the launch (min)' }) as HTMLInputElement).value).toBe('10');
    expect((card.getByRole('spinbutton', { name: 'Unloading a run at the site (min)' }) as HTMLInputElement).value).toBe('5');
    // 84 kg × 2.20462 = 185.2 lb; 27 kg = 59.5 lb.
    expect(card.getByText(/About 185 lb\./)).toBeTruthy();
    expect(card.getByText(/About 60 lb\./)).toBeTruthy();
    const note = card.getByText(/common practice from paddling guidance/);
    expect(note.textContent).toMatch(/capacity plate is the legal limit/);
    expect(paddle.getAttribute('aria-describedby')).toBe(note.id);
    const person = card.getByRole('spinbutton', { name: 'Weight counted per person (kg)' });
    expect(document.getElementById(person.getAttribute('aria-describedby') ?? '')?.textContent).toMatch(/not given their own weight/);
  });

  it('saves only the trip settings, margins as shares of the rating', async () => {
    const seen = answerSettings(buildSettings());
    const user = userEvent.setup();
    const card = await openCard();

    const paddle = card.getByRole('spinbutton', { name: /Kayaks and canoes/ });
    await user.clear(paddle);
    await user.type(paddle, '65');
    const pot = card.getByRole('spinbutton', { name: 'Filled pot mass when none is recorded (kg)' });
    await user.clear(pot);
    await user.type(pot, '31.5');
    await user.click(card.getByRole('button', { name: 'Save trip settings' }));

    expect(await card.findByText('Trip settings saved.')).toBeTruthy();
    expect(seen.patches).toEqual([{
      tripRules: { paddlecraftMargin: 0.65, platedMargin: 1, standardPersonKg: 84, plantingMinutesPerTree: 20, potMassKg: 31.5, loadMinutes: 10, unloadMinutes: 5 },
    }]);
  });

  it('shows the server’s field errors under the matching fields', async () => {
    answerSettings(buildSettings());
    server.use(
      http.patch('/api/organisation/settings', () =>
        errorResponse(400, 'validation_failed', 'Settings are invalid', { 'tripRules.platedMargin': ['must be at most 1'], 'tripRules.loadMinutes': ['must be at most 120'] }),
      ),
    );
    const user = userEvent.setup();
    const card = await openCard();
    await user.click(card.getByRole('button', { name: 'Save trip settings' }));

    expect(await card.findByText('Some trip settings need another look.')).toBeTruthy();
    expect(await card.findByText('Must be between 10 % and 100 %')).toBeTruthy();
    expect(await card.findByText('Must be at most 120')).toBeTruthy();
    expect(card.queryByText('Trip settings saved.')).toBeNull();
  });
});
