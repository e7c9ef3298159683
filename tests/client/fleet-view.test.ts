import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { Craft } from '@shared/schemas/trips.schema';
import { server } from '../setup/client-setup';
import { errorResponse } from './support/msw';
import { buildOrganisation, mockOrganisation } from './support/organisation';
import { renderApp } from './support/render-app';
import { buildUser } from './support/users';
import { buildFleetCraft, fleet } from './trip-board-data';

const coordinator = buildUser({ role: 'coordinator' });

interface FleetRequests {
  created: unknown[];
  patched: unknown[];
  deleted: string[];
  rules: URLSearchParams[];
}

function mockFleet(list: Craft[], options: { onCreate?: () => Response } = {}): FleetRequests {
  const seen: FleetRequests = { created: [], patched: [], deleted: [], rules: [] };
  server.use(
    http.get('/api/fleet', () => HttpResponse.json({ craft: list })),
    http.post('/api/fleet', async ({ request }) => {
      const body = (await request.json()) as Record<string, unknown>;
      seen.created.push(body);
      return options.onCreate?.() ?? HttpResponse.json({ craft: buildFleetCraft({ ...body, id: '0c000000-0000-4000-8000-000000000009' }) }, { status: 201 });
    }),
    http.patch('/api/fleet/:id', async ({ request, params }) => {
      const body = (await request.json()) as Record<string, unknown>;
      seen.patched.push(body);
      const old = list.find((c) => c.id === params.id) ?? buildFleetCraft();
      return HttpResponse.json({ craft: { ...old, ...body } });
    }),
    http.delete('/api/fleet/:id', ({ params }) => {
      seen.deleted.push(String(params.id));
      const old = list.find((c) => c.id === params.id) ?? buildFleetCraft();
      return HttpResponse.json({ craft: { ...old, active: false } });
    }),
    http.get('/api/fleet/rule-of-thumb', ({ request }) => {
      const q = new URL(request.url).searchParams;
      seen.rules.push(q);
      const persons = Math.floor((Number(q.get('lengthFt')) * Number(q.get('beamFt'))) / 15);
      return HttpResponse.json({ persons, note: 'Boater-education rule of thumb (boat-ed.com study guide): a suggestion only, not a rating.' });
    }),
  );
  return seen;
}

async function openFleet() {
  await renderApp('/fleet', coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 1, name: 'Fleet' });
  return main;
}

describe('FleetView', () => {
  it('lists each craft with the facts the planner uses, ratings in kg and lb for a feet organisation', async () => {
    mockFleet([...fleet, buildFleetCraft({ id: '0c000000-0000-4000-8000-000000000004', name: 'Old Tub', active: false })]);
    const main = await openFleet();

    const inService = within(await main.findByRole('list', { name: 'In service (3)' }));
    const skiff = within(inService.getByRole('heading', { name: 'Skimmer' }).closest('li')!);
    expect(skiff.getByText('Skiff')).toBeTruthy();
    expect(skiff.getByText('Needs a boat operator')).toBeTruthy();
    // 408.2 kg / 0.45359237 = 899.9 lb (the pound is exactly 0.45359237 kg).
    expect(skiff.getByText('408 kg (900 lb), capacity plate')).toBeTruthy();
    expect(skiff.getByText('5')).toBeTruthy();
    expect(skiff.getByText('8')).toBeTruthy();
    // 12 km/h / 1.852 = 6.5 kn; 0.3 m = 0.98 ft.
    expect(skiff.getByText('12 km/h (6.5 kn)')).toBeTruthy();
    expect(skiff.getByText('0.98 ft')).toBeTruthy();
    const retired = within(main.getByRole('list', { name: 'Retired (1)' }));
    expect(retired.getByText('Retired')).toBeTruthy();
    expect(retired.queryByRole('button', { name: 'Retire Old Tub' })).toBeNull();
  });

  it('shows ratings in kilograms only where the organisation works in metres', async () => {
    mockOrganisation(buildOrganisation({ units: 'm' }));
    mockFleet(fleet);
    const main = await openFleet();
    expect(await main.findByText('408 kg, capacity plate')).toBeTruthy();
  });

  it('adds a craft from a form with every field labelled, converting pounds to kilograms', async () => {
    const seen = mockFleet([]);
    const user = userEvent.setup();
    const main = await openFleet();
    expect(await main.findByText(/No craft yet/)).toBeTruthy();

    await user.click(main.getByRole('button', { name: 'Add a craft' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Add a craft' }));
    await user.type(dialog.getByLabelText('Name'), 'Heron');
    await user.clear(dialog.getByLabelText('Seats'));
    await user.type(dialog.getByLabelText('Seats'), '2');
    await user.type(dialog.getByLabelText('Rated maximum load (lb)'), '550');
    await user.clear(dialog.getByLabelText('Pot slots'));
    await user.type(dialog.getByLabelText('Pot slots'), '2');
    await user.type(dialog.getByLabelText('Loaded draft (ft, optional)'), '0.5');
    await user.clear(dialog.getByLabelText('Cruising speed when loaded (km/h)'));
    await user.type(dialog.getByLabelText('Cruising speed when loaded (km/h)'), '4.5');
    await user.click(dialog.getByRole('button', { name: 'Add craft' }));

    // 550 lb × 0.45359237 = 249.48 kg, to 0.1 kg; 0.5 ft × 0.3048 = 0.1524 m.
    await waitFor(() => expect(seen.created).toHaveLength(1));
    expect(seen.created[0]).toEqual({
      name: 'Heron', kind: 'sit-on-top-kayak', seats: 2, maxLoadKg: 249.5, hasCapacityPlate: false, potSlots: 2, draftM: 0.1524, speedKmh: 4.5,
      needsOperator: false, active: true, notes: '',
    });
    expect(await within(await main.findByRole('list', { name: 'In service (1)' })).findByRole('heading', { name: 'Heron' })).toBeTruthy();
  });

  it('shows what is wrong under the field, and a name already used', async () => {
    const seen = mockFleet([], { onCreate: () => errorResponse(409, 'conflict', 'A craft with this name exists', { name: ['is already used by another craft'] }) });
    const user = userEvent.setup();
    const main = await openFleet();
    await user.click(main.getByRole('button', { name: 'Add a craft' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Add a craft' }));

    await user.click(dialog.getByRole('button', { name: 'Add craft' }));
    expect(await dialog.findByText('Is required')).toBeTruthy();
    expect(seen.created).toHaveLength(0);

    await user.type(dialog.getByLabelText('Name'), 'Tarpon');
    await user.type(dialog.getByLabelText('Rated maximum load (lb)'), '950');
    await user.click(dialog.getByRole('button', { name: 'Add craft' }));
    expect(await dialog.findByText('Another craft already has this name.')).toBeTruthy();
  });

  it('edits a craft, sending kilograms', async () => {
    const seen = mockFleet(fleet);
    const user = userEvent.setup();
    const main = await openFleet();
    await user.click(await main.findByRole('button', { name: 'Edit Tarpon' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Edit Tarpon' }));
    // 430.9 kg = 949.97 lb, shown to 0.1 lb as 950; typed back as 1000 lb it is 453.6 kg.
    expect((dialog.getByLabelText('Rated maximum load (lb)') as HTMLInputElement).value).toBe('950');
    await user.clear(dialog.getByLabelText('Rated maximum load (lb)'));
    await user.type(dialog.getByLabelText('Rated maximum load (lb)'), '1000');
    await user.click(dialog.getByRole('button', { name: 'Save changes' }));
    await waitFor(() => expect(seen.patched).toHaveLength(1));
    expect(seen.patched[0]).toMatchObject({ name: 'Tarpon', maxLoadKg: 453.6, active: true });
  });

  it('retires a craft after confirming', async () => {
    const seen = mockFleet(fleet);
    const user = userEvent.setup();
    const main = await openFleet();
    await user.click(await main.findByRole('button', { name: 'Retire Ibis' }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Retire Ibis?' })).getByRole('button', { name: 'Retire' }));
    await waitFor(() => expect(seen.deleted).toEqual([fleet[2]!.id]));
    expect(await within(await main.findByRole('list', { name: 'Retired (1)' })).findByRole('heading', { name: 'Ibis' })).toBeTruthy();
  });

  // Boater-education rule of thumb (TRADE.md §1; boat-ed.com study guide "Calculating your boat's
  // capacity"): persons = length × beam ÷ 15 in feet, rounded down: 16 × 5 / 15 = 5.33 → 5.
  it('offers the persons rule of thumb for a skiff without a plate, labelled as never a rating', async () => {
    const seen = mockFleet([]);
    const user = userEvent.setup();
    const main = await openFleet();
    await user.click(main.getByRole('button', { name: 'Add a craft' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Add a craft' }));
    expect(dialog.queryByRole('heading', { name: /rule of thumb/ })).toBeNull();

    await user.click(dialog.getByRole('combobox', { name: 'Kind of craft' }));
    await user.click(await screen.findByRole('option', { name: 'Skiff' }));
    const rule = within(dialog.getByRole('region', { name: 'No capacity plate? A rule of thumb' }));
    expect(rule.getByText(/not a rating/)).toBeTruthy();
    await user.type(rule.getByLabelText('Length (ft)'), '16');
    await user.type(rule.getByLabelText('Beam (ft)'), '5{Enter}');

    expect(await rule.findByText('About 5 people, by the rule of thumb.')).toBeTruthy();
    expect(rule.getByText(/boat-ed\.com/)).toBeTruthy();
    expect(seen.rules.map((q) => [q.get('lengthFt'), q.get('beamFt')])).toEqual([['16', '5']]);
    // Nothing was saved, and the rating box is still empty: the suggestion never fills it in.
    expect(seen.created).toHaveLength(0);
    expect((dialog.getByLabelText('Rated maximum load (lb)') as HTMLInputElement).value).toBe('');

    await user.click(dialog.getByRole('radio', { name: 'Capacity plate on the hull' }));
    expect(dialog.queryByRole('region', { name: 'No capacity plate? A rule of thumb' })).toBeNull();
  });

  it('converts metres to feet for the rule of thumb', async () => {
    mockOrganisation(buildOrganisation({ units: 'm' }));
    const seen = mockFleet([]);
    const user = userEvent.setup();
    const main = await openFleet();
    await user.click(main.getByRole('button', { name: 'Add a craft' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Add a craft' }));
    await user.click(dialog.getByRole('combobox', { name: 'Kind of craft' }));
    await user.click(await screen.findByRole('option', { name: 'Something else' }));
    const rule = within(dialog.getByRole('region', { name: 'No capacity plate? A rule of thumb' }));
    // 4.88 m / 0.3048 = 16.01 ft; 1.52 m = 4.99 ft.
    await user.type(rule.getByLabelText('Length (m)'), '4.88');
    await user.type(rule.getByLabelText('Beam (m)'), '1.52');
    await user.click(rule.getByRole('button', { name: 'Work it out' }));
    await waitFor(() => expect(seen.rules.map((q) => [q.get('lengthFt'), q.get('beamFt')])).toEqual([['16.01', '4.99']]));
  });
});
