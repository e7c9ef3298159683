import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import type { CheckBody, CheckDto, VisitDetail, VisitTree } from '@shared/schemas/outcomes.schema';
import { server } from '../setup/client-setup';
import { errorResponse } from './support/msw';
import { renderApp } from './support/render-app';
import { buildUser } from './support/users';

const coordinator = buildUser({ role: 'coordinator' });
const visitId = randomUUID();

function visitTree(tag: string, check: CheckDto | null = null): VisitTree {
  return { id: randomUUID(), tag, stage: 'planted', plantedOn: '2025-01-10', plantedBedElevationM: 0.3048, heightCm: 64, check };
}

const aliveCheck: CheckDto = { condition: 'alive', heightCm: 70, notes: '', photoId: null, photoUrl: null, thumbUrl: null };

function detail(trees: VisitTree[]): VisitDetail {
  const checked = trees.filter((t) => t.check);
  return {
    visit: {
      id: visitId, siteId: randomUUID(), siteName: 'Heron Cove', workdayId: null, visitedOn: '2025-02-12', notes: '',
      counts: { alive: checked.filter((t) => t.check?.condition === 'alive').length, lost: 0, missing: 0, checked: checked.length },
    },
    trees,
  };
}

async function open(d: VisitDetail) {
  server.use(http.get(`/api/monitoring-visits/${visitId}`, () => HttpResponse.json(d)));
  await renderApp(`/monitoring/${visitId}`, coordinator);
  const main = within(screen.getByRole('main'));
  await main.findByRole('progressbar', { name: 'Trees checked' });
  return main;
}

describe('Monitoring visit, tree by tree', () => {
  it('finds a tree by its number, records it alive with a height, and moves on to the next unchecked tree', async () => {
    const [t1, t2, t3] = [visitTree('T-0001', aliveCheck), visitTree('T-0002'), visitTree('T-0003')];
    const lookups: string[] = [];
    const puts: { treeId: string; body: CheckBody }[] = [];
    server.use(
      http.get(`/api/monitoring-visits/${visitId}/lookup`, ({ request }) => {
        lookups.push(new URL(request.url).searchParams.get('tag') ?? '');
        return HttpResponse.json({ tree: t3 });
      }),
      http.put(`/api/monitoring-visits/${visitId}/checks/:treeId`, async ({ params, request }) => {
        const body = (await request.json()) as CheckBody;
        puts.push({ treeId: String(params.treeId), body });
        const check: CheckDto = { condition: body.condition, heightCm: body.heightCm ?? null, notes: body.notes, photoId: null, photoUrl: null, thumbUrl: null };
        return HttpResponse.json({ tree: { ...t3, stage: 'alive', check }, counts: { alive: 2, lost: 0, missing: 0, checked: 2 } });
      }),
    );
    const user = userEvent.setup();
    const main = await open(detail([t1, t2, t3]));

    expect(main.getByText('1 of 3 trees checked')).toBeTruthy();
    // The first unchecked tree is offered straight away.
    expect(main.getByRole('heading', { level: 2, name: 'T-0002' })).toBeTruthy();

    await user.type(main.getByRole('textbox', { name: 'Tag number' }), '3');
    await user.click(main.getByRole('button', { name: 'Find' }));
    expect(await main.findByRole('heading', { level: 2, name: 'T-0003' })).toBeTruthy();
    expect(lookups).toEqual(['3']);

    await user.click(main.getByRole('radio', { name: /Alive/ }));
    await user.type(main.getByRole('textbox', { name: 'Height (cm, optional)' }), '72');
    await user.type(main.getByRole('textbox', { name: 'Notes (optional)' }), 'new leaves');
    await user.click(main.getByRole('button', { name: 'Save and next' }));

    await waitFor(() => expect(puts).toHaveLength(1));
    expect(puts[0]).toEqual({ treeId: t3.id, body: { condition: 'alive', heightCm: 72, notes: 'new leaves', photoId: null } });
    expect(await main.findByText('2 of 3 trees checked')).toBeTruthy();
    expect(main.getByRole('status').textContent).toMatch('Saved T-0003.');
    // After T-0003 the next unchecked tree, wrapping round, is T-0002; its form starts empty.
    expect(main.getByRole('heading', { level: 2, name: 'T-0002' })).toBeTruthy();
    expect(main.getByRole('radio', { name: /Alive/ })).toHaveProperty('checked', false);
    const checked = within(main.getByRole('list', { name: 'Checked trees' }));
    const items = checked.getAllByRole('listitem').map((li) => li.textContent?.replace(/\s+/g, ' ').trim());
    expect(items[0]).toMatch(/^T-0001 ✓ Alive 70 cm/);
    expect(items[1]).toMatch(/^T-0003 ✓ Alive 72 cm · new leaves/);
    expect(items).toHaveLength(2);
    expect(checked.getByRole('button', { name: 'Change the check of T-0003' })).toBeTruthy();
    expect(main.getByText('2 alive · 0 lost · 0 missing')).toBeTruthy();
  });

  it('says plainly when no planted tree has that tag at the site', async () => {
    server.use(http.get(`/api/monitoring-visits/${visitId}/lookup`, () => errorResponse(404, 'not_found', 'Planted tree T-0099 not found')));
    const user = userEvent.setup();
    const main = await open(detail([visitTree('T-0001')]));

    await user.type(main.getByRole('textbox', { name: 'Tag number' }), '99');
    await user.click(main.getByRole('button', { name: 'Find' }));

    expect((await main.findByRole('alert')).textContent).toBe('No tree tagged “99” was planted at Heron Cove by the visit date.');
  });

  it('asks for a condition before saving, and offers every tree to pick by hand', async () => {
    const [t1, t2] = [visitTree('T-0001'), visitTree('T-0002', { ...aliveCheck, condition: 'missing', heightCm: null })];
    const user = userEvent.setup();
    const main = await open(detail([t1, t2]));

    await user.click(main.getByRole('button', { name: 'Save and next' }));
    expect(await main.findByText('Choose alive, lost or missing.')).toBeTruthy();

    await user.selectOptions(main.getByRole('combobox', { name: 'Or pick a tree' }), 'T-0002 (missing)');
    expect(await main.findByRole('heading', { level: 2, name: 'T-0002' })).toBeTruthy();
    // Its earlier check at this visit is loaded for correction.
    expect(main.getByRole('radio', { name: /Missing/ })).toHaveProperty('checked', true);
  });

  it('gives each condition a sign and a word, not colour alone', async () => {
    const main = await open(detail([visitTree('T-0001')]));
    const group = within(main.getByRole('group', { name: 'Condition' }));

    expect(group.getAllByRole('radio').map((r) => r.closest('label')?.textContent?.replace(/\s+/g, ' ').trim())).toEqual([
      '✓ Alive green leaves',
      '✕ Lost dead or gone for good',
      '? Missing not found today',
    ]);
  });
});
