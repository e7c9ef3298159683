import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { PlantingList, PlantingTree, RecordPlantingsBody } from '@shared/schemas/outcomes.schema';
import { server } from '../setup/client-setup';
import { useClock } from './support/clock';
import { errorResponse } from './support/msw';
import { buildTree } from './support/nursery';
import { renderApp } from './support/render-app';
import { buildUser } from './support/users';

useClock('2025-03-20T15:00:00Z');
const coordinator = buildUser({ role: 'coordinator' });
const workdayId = randomUUID();
// The organisation shows feet (tests/setup/client-setup.ts). 1 ft = 0.3048 m exactly (international foot, NIST SP 811 appendix B).
const BED_M = 0.3048;

function plantingTree(tag: string, overrides: Partial<PlantingTree> = {}): PlantingTree {
  return { id: randomUUID(), tag, stage: 'ready', heightCm: 60, reserved: true, planted: false, plantedOn: null, plantedBedElevationM: null, suggestedBedElevationM: BED_M, hasChecks: false, ...overrides };
}

function plantingList(trees: PlantingTree[], overrides: Partial<PlantingList['workday']> = {}): PlantingList {
  return {
    workday: { id: workdayId, title: 'Planting at Heron Cove', status: 'completed', kind: 'planting', localDate: '2025-03-15', ...overrides },
    site: { id: randomUUID(), name: 'Heron Cove', bedElevationM: BED_M, stationId: 'noaa/8726738' },
    trees,
  };
}

async function open(list: PlantingList) {
  server.use(http.get(`/api/workdays/${workdayId}/plantings`, () => HttpResponse.json(list)));
  await renderApp(`/workdays/${workdayId}/planting`, coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 2, name: 'Trees that went in' });
  return main;
}

describe('Record planting', () => {
  it('pre-ticks the reserved trees at the site bed elevation in feet, and sends the ticked ones in metres', async () => {
    const [a, b, c] = [plantingTree('T-0001'), plantingTree('T-0002'), plantingTree('T-0003')];
    const bodies: RecordPlantingsBody[] = [];
    server.use(
      http.post(`/api/workdays/${workdayId}/plantings`, async ({ request }) => {
        bodies.push((await request.json()) as RecordPlantingsBody);
        const planted = (t: PlantingTree, m: number) => ({ ...t, stage: 'planted' as const, planted: true, plantedOn: '2025-03-16', plantedBedElevationM: m });
        return HttpResponse.json({ ...plantingList([planted(a, BED_M), b, planted(c, 0.457)]), recorded: 2, unchanged: 0 });
      }),
    );
    const user = userEvent.setup();
    const main = await open(plantingList([a, b, c]));

    expect(main.getByText(/feet above mean lower low water \(MLLW\) at the site's tide station \(noaa\/8726738\)/)).toBeTruthy();
    expect(main.getByRole('checkbox', { name: 'Plant T-0001' })).toHaveProperty('checked', true);
    // 0.3048 m is exactly 1 ft.
    expect(main.getByRole('textbox', { name: 'Bed elevation for T-0001 (ft above MLLW)' })).toHaveProperty('value', '1.00');
    expect(main.getByLabelText('Planting date')).toHaveProperty('value', '2025-03-15');

    await user.click(main.getByRole('checkbox', { name: 'Plant T-0002' }));
    const elevC = main.getByRole('textbox', { name: 'Bed elevation for T-0003 (ft above MLLW)' });
    await user.clear(elevC);
    await user.type(elevC, '1.5');
    const date = main.getByLabelText('Planting date');
    await user.clear(date);
    await user.type(date, '2025-03-16');
    await user.click(main.getByRole('button', { name: 'Record 2 trees as planted' }));

    await waitFor(() => expect(bodies).toHaveLength(1));
    // Untouched: the site's metres exactly. Typed: 1.5 ft × 0.3048 = 0.4572 m, kept to the millimetre.
    expect(bodies[0]).toEqual({ plantedOn: '2025-03-16', allowUnready: false, trees: [{ treeId: a.id, bedElevationM: BED_M }, { treeId: c.id, bedElevationM: 0.457 }] });
    expect((await main.findByRole('status')).textContent).toMatch('Recorded 2 trees as planted at Heron Cove.');
    const done = within(main.getByRole('list', { name: 'Trees planted by this workday' }));
    expect(done.getAllByRole('listitem')).toHaveLength(2);
    expect(done.getByText(/Sun 16 Mar 2025 · bed 1\.50 ft above MLLW/)).toBeTruthy();
    expect(main.getByRole('checkbox', { name: 'Plant T-0002' })).toHaveProperty('checked', false);
  });

  it('lists every tree the server refused, saving none', async () => {
    const a = plantingTree('T-0001');
    server.use(
      http.post(`/api/workdays/${workdayId}/plantings`, () =>
        errorResponse(409, 'conflict', '1 of the trees cannot be recorded as planted; nothing was changed', { trees: ['T-0001 is reserved for another workday'] }),
      ),
    );
    const user = userEvent.setup();
    const main = await open(plantingList([a]));

    await user.click(main.getByRole('button', { name: 'Record 1 tree as planted' }));

    const alert = await main.findByRole('alert');
    expect(alert.textContent).toMatch('Some trees cannot be recorded as planted; nothing was changed.');
    expect(alert.textContent).toMatch('T-0001 is reserved for another workday');
  });

  it('refuses an elevation that is not a number before asking the server', async () => {
    const user = userEvent.setup();
    const main = await open(plantingList([plantingTree('T-0001')]));
    const elev = main.getByRole('textbox', { name: 'Bed elevation for T-0001 (ft above MLLW)' });
    await user.clear(elev);
    await user.type(elev, 'high');
    await user.click(main.getByRole('button', { name: 'Record 1 tree as planted' }));

    expect(await main.findByText('Type the bed elevation as a number')).toBeTruthy();
  });

  it('shows the server’s word on one elevation under that tree', async () => {
    const [a, b] = [plantingTree('T-0001'), plantingTree('T-0002')];
    server.use(http.post(`/api/workdays/${workdayId}/plantings`, () => errorResponse(400, 'validation_failed', 'Body is invalid', { 'trees.1.bedElevationM': ['must be at most 5 m'] })));
    const user = userEvent.setup();
    const main = await open(plantingList([a, b]));
    const elev = main.getByRole('textbox', { name: 'Bed elevation for T-0002 (ft above MLLW)' });
    await user.clear(elev);
    await user.type(elev, '20');
    await user.click(main.getByRole('button', { name: 'Record 2 trees as planted' }));

    expect(await main.findByText('Bed elevation must be at most 5 m')).toBeTruthy();
    expect(elev.getAttribute('aria-invalid')).toBe('true');
  });

  it('adds an unreserved tree by tag and, for one not yet ready, asks for the override', async () => {
    const brining = buildTree({ tag: 'T-0042', stage: 'brining' });
    const bodies: RecordPlantingsBody[] = [];
    const searches: string[] = [];
    server.use(
      http.get('/api/trees', ({ request }) => {
        searches.push(new URL(request.url).searchParams.get('q') ?? '');
        return HttpResponse.json({ trees: [brining, buildTree({ tag: 'T-0420', stage: 'tube' })], total: 2 });
      }),
      http.post(`/api/workdays/${workdayId}/plantings`, async ({ request }) => {
        bodies.push((await request.json()) as RecordPlantingsBody);
        return HttpResponse.json({ ...plantingList([]), recorded: 1, unchanged: 0 });
      }),
    );
    const user = userEvent.setup();
    const main = await open(plantingList([]));
    expect(main.getByText(/No trees are reserved for this workday/)).toBeTruthy();

    await user.type(main.getByRole('searchbox', { name: 'Tag number' }), '42');
    await user.click(main.getByRole('button', { name: 'Find' }));
    const found = within(await main.findByRole('list', { name: 'Trees found' }));
    expect(found.getByText('has no grow-out pot yet')).toBeTruthy();
    await user.click(found.getByRole('button', { name: 'Add T-0042' }));

    expect(main.getByRole('checkbox', { name: 'Plant T-0042' })).toHaveProperty('checked', true);
    await user.click(main.getByRole('checkbox', { name: /Record trees the nursery had not called ready/ }));
    await user.click(main.getByRole('button', { name: 'Record 1 tree as planted' }));

    await waitFor(() => expect(bodies).toHaveLength(1));
    expect(searches).toEqual(['42']);
    expect(bodies[0]).toMatchObject({ allowUnready: true, trees: [{ treeId: brining.id, bedElevationM: BED_M }] });
  });

  it('undoes a planting, and says why when monitoring already checked the tree', async () => {
    const planted = plantingTree('T-0007', { stage: 'planted', planted: true, plantedOn: '2025-03-15', plantedBedElevationM: BED_M });
    const deleted: string[] = [];
    let refuse = false;
    server.use(
      http.delete(`/api/workdays/${workdayId}/plantings/:treeId`, ({ params }) => {
        if (refuse) return errorResponse(409, 'conflict', 'has checks');
        deleted.push(String(params.treeId));
        return new HttpResponse(null, { status: 204 });
      }),
    );
    const user = userEvent.setup();
    const main = await open(plantingList([planted]));

    refuse = true;
    await user.click(main.getByRole('button', { name: 'Undo the planting of T-0007' }));
    expect((await main.findByRole('status')).textContent).toMatch('T-0007 already has monitoring checks');

    refuse = false;
    server.use(http.get(`/api/workdays/${workdayId}/plantings`, () => HttpResponse.json(plantingList([{ ...planted, stage: 'ready', planted: false, plantedOn: null }]))));
    await user.click(main.getByRole('button', { name: 'Undo the planting of T-0007' }));
    await waitFor(() => expect(deleted).toEqual([planted.id]));
    expect(await main.findByText('T-0007 is back in the nursery ledger.')).toBeTruthy();
    expect(main.getByRole('checkbox', { name: 'Plant T-0007' })).toBeTruthy();
  });

  it('offers no undo for trees monitoring has checked, even one still marked planted after a missing check', async () => {
    const fresh = plantingTree('T-0007', { stage: 'planted', planted: true, plantedOn: '2025-03-15' });
    const missing = plantingTree('T-0008', { stage: 'planted', planted: true, plantedOn: '2025-03-15', hasChecks: true });
    const alive = plantingTree('T-0009', { stage: 'alive', planted: true, plantedOn: '2025-03-15', hasChecks: true });
    const main = await open(plantingList([fresh, missing, alive]));

    const done = within(main.getByRole('list', { name: 'Trees planted by this workday' }));
    expect(done.getByRole('button', { name: 'Undo the planting of T-0007' })).toBeTruthy();
    expect(done.queryByRole('button', { name: 'Undo the planting of T-0008' })).toBeNull();
    expect(done.queryByRole('button', { name: 'Undo the planting of T-0009' })).toBeNull();
    const [, second, third] = done.getAllByRole('listitem');
    for (const item of [second!, third!]) expect(item.textContent).toMatch('No undo: monitoring has checked this tree, so correct its checks instead.');
  });

  it('records nothing for a workday that is not a planting one', async () => {
    server.use(http.get(`/api/workdays/${workdayId}/plantings`, () => HttpResponse.json(plantingList([], { kind: 'monitoring' }))));
    await renderApp(`/workdays/${workdayId}/planting`, coordinator);

    expect(await screen.findByText('Only planting workdays record plantings.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /as planted/ })).toBeNull();
  });

  it('records nothing before the workday has come, and says from when it can', async () => {
    // The clock is 20 Mar 2025; the server refuses a planting date in the future.
    server.use(http.get(`/api/workdays/${workdayId}/plantings`, () => HttpResponse.json(plantingList([plantingTree('T-0001')], { status: 'published', localDate: '2025-03-22' }))));
    await renderApp(`/workdays/${workdayId}/planting`, coordinator);

    expect(await screen.findByText('This workday is on Sat 22 Mar 2025: plantings are recorded on the day or after it.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /as planted/ })).toBeNull();
  });
});
