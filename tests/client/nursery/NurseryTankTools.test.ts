import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { buildTank, mockNursery } from '../support/nursery';
import { renderApp } from '../support/render-app';
import { buildSite } from '../support/sites';
import { buildUser } from '../support/users';

const coordinator = buildUser({ role: 'coordinator' });
const site = buildSite({ name: 'Heron Cove', salinityPpt: 25 });

async function openTanks(user: ReturnType<typeof userEvent.setup>, who = coordinator) {
  await renderApp('/nursery', who);
  await user.click(await screen.findByRole('tab', { name: 'Tanks' }));
}

describe('Tanks: create, edit and the salinity log', () => {
  it('creates a tank typed in US gallons, sends litres and shows both units', async () => {
    mockNursery({ sites: [site] });
    let body: unknown = null;
    server.use(
      http.post('/api/tanks', async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ tank: buildTank({ name: 'Bucket 12', volumeLitres: 18.93 }) }, { status: 201 });
      }),
    );
    const user = userEvent.setup();
    await openTanks(user);

    await user.click(await screen.findByRole('button', { name: 'New tank' }));
    const form = within(screen.getByRole('form', { name: 'New tank' }));
    await user.type(form.getByLabelText('Name'), 'Bucket 12');
    // The test organisation works in feet, so gallons are the default unit.
    await user.type(form.getByLabelText('Volume'), '5');
    // TRADE.md §4: a 5 US gal bucket holds 18.93 L.
    expect(form.getByText('That is 5 gal (18.9 L).')).toBeTruthy();
    await user.click(form.getByRole('combobox', { name: 'Brining toward site (optional)' }));
    await user.click(await screen.findByRole('option', { name: 'Heron Cove (25 ppt)' }));
    await user.click(form.getByRole('button', { name: 'Create tank' }));

    await waitFor(() => expect(body).toEqual({ name: 'Bucket 12', volumeLitres: 18.93, targetSiteId: site.id, notes: '' }));
    expect(await screen.findByText('Bucket 12 added.')).toBeTruthy();
  });

  it('converts litres when that unit is chosen, and shows the server\'s field errors', async () => {
    mockNursery();
    server.use(http.post('/api/tanks', () => errorResponse(400, 'validation_failed', 'Tank is invalid', { name: ['is required'] })));
    const user = userEvent.setup();
    await openTanks(user);

    await user.click(await screen.findByRole('button', { name: 'New tank' }));
    const form = within(screen.getByRole('form', { name: 'New tank' }));
    await user.click(form.getByText('litres'));
    await user.type(form.getByLabelText('Volume'), '378.5');
    expect(form.getByText('That is 100 gal (378.5 L).')).toBeTruthy();
    await user.type(form.getByLabelText('Name'), 'x');
    await user.click(form.getByRole('button', { name: 'Create tank' }));
    expect(await form.findByText('Is required')).toBeTruthy();
  });

  it('edits a tank without nudging an untouched volume', async () => {
    const tank = buildTank({ name: 'Tank B', volumeLitres: 570, notes: 'Grow-out' });
    mockNursery({ tanks: [tank] });
    let body: unknown = null;
    server.use(
      http.patch(`/api/tanks/${tank.id}`, async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ tank: { ...tank, name: 'Tank B (grow-out)' } });
      }),
    );
    const user = userEvent.setup();
    await openTanks(user);

    const card = within(await screen.findByRole('list', { name: 'Tanks' }));
    expect(card.getByText(/151 gal \(570 L\)/)).toBeTruthy();
    await user.click(card.getByRole('button', { name: 'Edit tank' }));
    const form = within(card.getByRole('form', { name: 'Edit Tank B' }));
    expect((form.getByLabelText('Volume') as HTMLInputElement).value).toBe('150.58');
    await user.type(form.getByLabelText('Name'), ' (grow-out)');
    await user.click(form.getByRole('button', { name: 'Save tank' }));

    await waitFor(() => expect(body).toEqual({ name: 'Tank B (grow-out)', volumeLitres: 570, targetSiteId: null, notes: 'Grow-out' }));
  });

  it('lists readings with method, ppt, and SG with temperature for the hydrometer ones', async () => {
    const tank = buildTank({ name: 'Tank A' });
    mockNursery({ tanks: [tank] });
    const reading = { tankId: tank.id, note: '', takenById: null };
    server.use(
      http.get(`/api/tanks/${tank.id}/readings`, () =>
        HttpResponse.json({
          readings: [
            { ...reading, id: 'r2', takenAt: '2025-03-04T12:00:00.000Z', method: 'hydrometer', salinityPpt: 19.9, specificGravity: 1.015, temperatureC: 25 },
            { ...reading, id: 'r1', takenAt: '2025-02-28T12:00:00.000Z', method: 'refractometer', salinityPpt: 15, specificGravity: null, temperatureC: null },
          ],
        }),
      ),
    );
    const user = userEvent.setup();
    await openTanks(user, buildUser({ role: 'volunteer' }));

    const card = within(await screen.findByRole('list', { name: 'Tanks' }));
    expect(card.queryByRole('button', { name: 'Edit tank' })).toBeNull();
    await user.click(card.getByRole('button', { name: 'Readings' }));
    const table = await card.findByRole('table', { name: 'Salinity readings' });
    const cells = within(table).getAllByRole('row').slice(1).map((r) => [...r.children].map((c) => c.textContent?.trim()));
    // TRADE.md §4 check 2: SG 1.0150 at 25/25 °C is S 19.9 (the server converts; the table shows both).
    expect(cells[0]).toEqual(['4 Mar 25', expect.stringContaining('Hydrometer'), '19.9 ppt', '1.0150', '25 °C']);
    expect(cells[1]).toEqual(['28 Feb 25', expect.stringContaining('Refractometer'), '15 ppt', '—', '—']);
  });

  it('keeps the t/t note on the hydrometer form', async () => {
    mockNursery({ tanks: [buildTank({ name: 'Tank A', treeCount: 0 })] });
    const user = userEvent.setup();
    await openTanks(user);

    const card = within(await screen.findByRole('list', { name: 'Tanks' }));
    expect(card.queryByRole('button', { name: 'Measure trees' })).toBeNull();
    await user.click(card.getByRole('button', { name: 'Log a reading' }));
    await user.click(card.getByText('Hydrometer (specific gravity)'));
    const sg = card.getByLabelText('Specific gravity');
    const help = document.getElementById(sg.getAttribute('aria-describedby') ?? '');
    expect(help?.textContent).toMatch(/the sample's density over pure water's at the same temperature \(t\/t\)/);
  });
});
