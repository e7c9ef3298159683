import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { OrganisationSettings } from '@shared/schemas/organisation.schema';
import { server } from '../setup/client-setup';
import { errorResponse } from './support/msw';
import { buildSettings } from './support/organisation';
import { renderApp } from './support/render-app';
import { buildUser } from './support/users';

const admin = buildUser({ role: 'admin' });

function answerSettings(settings: OrganisationSettings, patch?: () => Response): unknown[] {
  const patches: unknown[] = [];
  server.use(
    http.get('/api/organisation/settings', () => HttpResponse.json({ settings })),
    http.patch('/api/organisation/settings', async ({ request }) => {
      const body = (await request.json()) as Partial<OrganisationSettings>;
      patches.push(body);
      return patch ? patch() : HttpResponse.json({ settings: { ...settings, ...body } });
    }),
  );
  return patches;
}

async function openCard() {
  await renderApp('/settings', admin);
  return within(await screen.findByRole('region', { name: 'Reports' }));
}

describe('OrganisationSettingsReports', () => {
  it('edits the value of a volunteer hour in dollars and saves it in cents with its source', async () => {
    const patches = answerSettings(buildSettings());
    const user = userEvent.setup();
    const card = await openCard();

    const value = card.getByRole('spinbutton', { name: 'Value of a volunteer hour ($)' }) as HTMLInputElement;
    // Independent Sector's 2022 national figure, $31.80 (TRADE.md §6).
    expect(value.value).toBe('31.80');
    expect((card.getByLabelText('Source of that figure') as HTMLInputElement).value).toBe('Independent Sector, national value of a volunteer hour, 2022');

    await user.clear(value);
    await user.type(value, '27.68');
    const source = card.getByLabelText('Source of that figure');
    await user.clear(source);
    await user.type(source, 'Independent Sector, Florida, 2021');
    await user.click(card.getByRole('button', { name: 'Save report settings' }));

    await waitFor(() => expect(patches).toHaveLength(1));
    expect(patches[0]).toEqual({ volunteerHourValueCents: 2768, volunteerHourValueSource: 'Independent Sector, Florida, 2021' });
    expect(await card.findByText('Report settings saved.')).toBeTruthy();
  });

  it('asks for a source before saving, and shows the server’s field message', async () => {
    const patches = answerSettings(buildSettings(), () => errorResponse(400, 'validation_failed', 'bad', { volunteerHourValueCents: ['must be whole cents'] }));
    const user = userEvent.setup();
    const card = await openCard();

    await user.clear(card.getByLabelText('Source of that figure'));
    await user.click(card.getByRole('button', { name: 'Save report settings' }));
    expect(await card.findByText('Say where the figure comes from, and its year')).toBeTruthy();
    expect(patches).toHaveLength(0);

    await user.type(card.getByLabelText('Source of that figure'), 'Our funder’s rate, 2025');
    await user.click(card.getByRole('button', { name: 'Save report settings' }));
    expect(await card.findByText('Must be whole cents')).toBeTruthy();
  });
});
