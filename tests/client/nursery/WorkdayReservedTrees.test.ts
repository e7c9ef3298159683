import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { TreeRow } from '@shared/schemas/nursery.schema';
import type { WorkdayDto } from '@shared/schemas/workday.schema';
import { server } from '../../setup/client-setup';
import { errorResponse } from '../support/msw';
import { buildReadiness, buildTree } from '../support/nursery';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { buildWorkdayDto } from '../support/workday-manage';

const coordinator = buildUser({ role: 'coordinator' });
const tank = { id: 'c0c0c0c0-0000-4000-8000-000000000001', name: 'Tank B' };
const reservedTree = buildTree({ tag: 'T-0070', stage: 'ready', tank, potMassKg: 18.5 });
const readyTree = buildTree({ tag: 'T-0090', stage: 'ready', tank });
const notYetTree = buildTree({ tag: 'T-0080', stage: 'brining', tank });
const elsewhere = buildTree({ tag: 'T-0085', stage: 'ready', tank, reservedWorkdayId: 'd0d0d0d0-0000-4000-8000-000000000001' });

function mockReservations(workday: WorkdayDto, reserved: TreeRow[]) {
  const calls = { posted: null as unknown, deleted: [] as string[], judged: 0 };
  let list = [...reserved];
  server.use(
    http.get(`/api/workdays/${workday.id}`, () => HttpResponse.json({ workday })),
    http.get(`/api/workdays/${workday.id}/reserved-trees`, () => HttpResponse.json({ trees: list })),
    http.get('/api/trees', ({ request }) => {
      expect(new URL(request.url).searchParams.get('stage')).toBe('brining,ready');
      const free = [readyTree, notYetTree, elsewhere].filter((t) => !list.some((r) => r.id === t.id));
      return HttpResponse.json({ trees: [...list.map((t) => ({ ...t, reservedWorkdayId: workday.id })), ...free], total: 9 });
    }),
    http.get(`/api/sites/${workday.siteId}/readiness`, () => {
      calls.judged += 1;
      return HttpResponse.json({
        site: { id: workday.siteId, name: 'Heron Cove', salinityPpt: 25 }, today: '2025-03-04', mhhwM: 0.8, mslM: 0.45,
        trees: [buildReadiness(readyTree, { ready: true, reasons: [] }), buildReadiness(notYetTree, { reasons: [{ code: 'salinity_hold', message: '9 more days at 25 ppt' }] })],
      });
    }),
    http.post(`/api/workdays/${workday.id}/reserved-trees`, async ({ request }) => {
      calls.posted = await request.json();
      list = [...list, readyTree];
      return HttpResponse.json({ trees: list });
    }),
    http.delete(`/api/workdays/${workday.id}/reserved-trees/:treeId`, ({ params }) => {
      calls.deleted.push(String(params.treeId));
      list = list.filter((t) => t.id !== params.treeId);
      return new HttpResponse(null, { status: 204 });
    }),
  );
  return calls;
}

async function openManage(workday: WorkdayDto) {
  await renderApp(`/workdays/${workday.id}/manage`, coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 1, name: workday.title });
  return main;
}

describe('Reserved trees on a planting workday', () => {
  it('lists the reserved trees with their pot mass, and reserves more from a picker that puts ready trees first', async () => {
    const workday = buildWorkdayDto();
    const calls = mockReservations(workday, [reservedTree]);
    const user = userEvent.setup();
    const main = await openManage(workday);

    const reserved = within(await main.findByRole('list', { name: 'Reserved trees' }));
    expect(reserved.getByRole('link', { name: 'T-0070' }).getAttribute('href')).toBe(`/nursery/trees/${reservedTree.id}`);
    // 18.5 kg is 40.8 lb in an organisation that works in feet.
    expect(main.getByText(/1 tree reserved for this workday · 40\.8 lb of filled pots/)).toBeTruthy();
    expect(calls.judged).toBe(0);

    await user.click(main.getByRole('button', { name: 'Reserve trees' }));
    const picker = within(await main.findByRole('form', { name: 'Reserve trees for Heron Cove' }));
    const readyGroup = within(await picker.findByRole('group', { name: 'Ready for Heron Cove' }));
    expect(readyGroup.getByRole('checkbox', { name: /T-0090/ })).toBeTruthy();
    const later = within(picker.getByRole('group', { name: 'Not ready for Heron Cove yet' }));
    expect(later.getByText('9 more days at 25 ppt')).toBeTruthy();
    // Reserved here or for another workday: not offered.
    expect(picker.queryByRole('checkbox', { name: /T-0085|T-0070/ })).toBeNull();

    await user.click(picker.getByRole('button', { name: 'Choose all ready (1)' }));
    await user.click(picker.getByRole('button', { name: 'Reserve 1 tree' }));
    await waitFor(() => expect(calls.posted).toEqual({ treeIds: [readyTree.id] }));
    expect(await reserved.findByRole('link', { name: 'T-0090' })).toBeTruthy();
    expect(main.queryByRole('form', { name: 'Reserve trees for Heron Cove' })).toBeNull();
  });

  it('releases a tree back to the nursery', async () => {
    const workday = buildWorkdayDto();
    const calls = mockReservations(workday, [reservedTree]);
    const user = userEvent.setup();
    const main = await openManage(workday);

    await user.click(await main.findByRole('button', { name: 'Release tree T-0070' }));
    await waitFor(() => expect(calls.deleted).toEqual([reservedTree.id]));
    expect(await main.findByText(/0 trees reserved for this workday/)).toBeTruthy();
  });

  it('says plainly when a tree was taken by another workday meanwhile', async () => {
    const workday = buildWorkdayDto();
    mockReservations(workday, []);
    server.use(http.post(`/api/workdays/${workday.id}/reserved-trees`, () => errorResponse(409, 'conflict', '1 of the trees are reserved for another workday; nothing was changed')));
    const user = userEvent.setup();
    const main = await openManage(workday);

    await user.click(await main.findByRole('button', { name: 'Reserve trees' }));
    const picker = within(await main.findByRole('form', { name: 'Reserve trees for Heron Cove' }));
    await user.click(await picker.findByRole('checkbox', { name: /T-0080/ }));
    await user.click(picker.getByRole('button', { name: 'Reserve 1 tree' }));
    expect(await main.findByText('Some of those trees were reserved for another workday meanwhile; nothing was changed.')).toBeTruthy();
  });

  it('is not shown for nursery workdays', async () => {
    const nursery = buildWorkdayDto({ kind: 'nursery', title: 'Potting morning' });
    server.use(http.get(`/api/workdays/${nursery.id}`, () => HttpResponse.json({ workday: nursery })));
    const main = await openManage(nursery);
    expect(main.queryByRole('heading', { name: 'Reserved trees' })).toBeNull();
  });

  it('offers no changes once a workday is completed', async () => {
    const done = buildWorkdayDto({ status: 'completed' });
    mockReservations(done, [reservedTree]);
    const main = await openManage(done);
    await main.findByRole('list', { name: 'Reserved trees' });
    expect(main.queryByRole('button', { name: 'Reserve trees' })).toBeNull();
    expect(main.queryByRole('button', { name: 'Release tree T-0070' })).toBeNull();
  });
});
