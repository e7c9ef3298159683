import { afterEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { buildTank, buildTree, buildTreeDetail, mockNursery } from '../support/nursery';
import { renderApp } from '../support/render-app';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';

const coordinator = buildUser({ role: 'coordinator' });
const tankA = buildTank({ name: 'Tank A' });
const tankB = buildTank({ name: 'Tank B' });
const t1 = buildTree({ tag: 'T-0001', stage: 'brining', tank: { id: tankA.id, name: 'Tank A' } });
const t2 = buildTree({ tag: 'T-0002', stage: 'potted', heightCm: null });

describe('NurseryView: trees', () => {
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('shows trees as cards on a phone, stage in words', async () => {
    await setViewport(375, 812);
    mockNursery({ trees: [t1, t2], tanks: [tankA] });
    await renderApp('/nursery', coordinator);

    const cards = within(await screen.findByRole('list', { name: 'Trees' }));
    expect(cards.getAllByRole('heading', { level: 3 }).map((h) => h.textContent?.replace(/\s+/g, ' ').trim())).toEqual(['T-0001 Brining', 'T-0002 Potted']);
    expect(cards.getByText(/Tank A · 32 cm/)).toBeTruthy();
    expect(cards.getByRole('checkbox', { name: 'Select tree T-0002' })).toBeTruthy();
  });

  it('pages on a phone with prev and next around "Page n of m", as numbered buttons would not fit', async () => {
    await setViewport(375, 812);
    mockNursery({ trees: [t1, t2], tanks: [tankA] });
    const queries: URLSearchParams[] = [];
    server.use(
      http.get('/api/trees', ({ request }) => {
        queries.push(new URL(request.url).searchParams);
        return HttpResponse.json({ trees: [t1, t2], total: 60 });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/nursery', coordinator);

    // 60 trees at 25 a page make 3 pages.
    expect(await screen.findByText('Page 1 of 3')).toBeTruthy();
    expect(document.querySelector('.el-pager')).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Go to next page' }));
    await waitFor(() => expect(queries.at(-1)?.get('page')).toBe('2'));
    expect(await screen.findByText('Page 2 of 3')).toBeTruthy();
  });

  it('lists trees with stage words, filters by stage and tag, and hides bulk actions from volunteers', async () => {
    const queries = mockNursery({ trees: [t1, t2], tanks: [tankA, tankB] });
    const user = userEvent.setup();
    await renderApp('/nursery', buildUser({ role: 'volunteer' }));

    const table = await screen.findByRole('table', { name: 'Trees' });
    expect(within(table).getByRole('link', { name: 'T-0001' }).getAttribute('href')).toBe(`/nursery/trees/${t1.id}`);
    expect(within(table).getByText('Brining')).toBeTruthy();
    expect(within(table).queryByRole('checkbox')).toBeNull();

    await user.click(screen.getByRole('combobox', { name: 'Stage' }));
    await user.click(await screen.findByRole('option', { name: 'Brining' }));
    await waitFor(() => expect(queries.at(-1)?.get('stage')).toBe('brining'));
    await user.type(screen.getByLabelText('Tag number'), 'T-0001{Enter}');
    await waitFor(() => expect(queries.at(-1)?.get('q')).toBe('T-0001'));
    expect(queries.at(-1)?.get('page')).toBe('1');
  });

  it('moves the selected trees to a tank with one bulk call', async () => {
    mockNursery({ trees: [t1, t2], tanks: [tankA, tankB] });
    let body: unknown = null;
    server.use(
      http.post('/api/trees/bulk/move', async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ changed: 2, trees: [] });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/nursery', coordinator);

    await user.click(await screen.findByRole('checkbox', { name: 'Select tree T-0001' }));
    await user.click(screen.getByRole('checkbox', { name: 'Select tree T-0002' }));
    const bar = within(screen.getByRole('region', { name: 'Bulk actions' }));
    expect(bar.getByText('2 trees selected')).toBeTruthy();
    expect(bar.getByRole('link', { name: 'Print labels' }).getAttribute('href')).toBe(`/api/trees/labels?ids=${encodeURIComponent(`${t1.id},${t2.id}`)}`);
    await user.click(bar.getByRole('combobox', { name: 'Move to tank' }));
    await user.click(await screen.findByRole('option', { name: 'Tank B' }));
    await user.click(bar.getByRole('button', { name: 'Move to tank' }));

    await waitFor(() => expect(body).toEqual({ treeIds: [t1.id, t2.id], tankId: tankB.id }));
    // The bar goes with the selection; a line says what was done.
    expect((await screen.findByRole('status')).textContent).toBe('Moved 2 trees to Tank B.');
    expect(screen.queryByRole('region', { name: 'Bulk actions' })).toBeNull();
  });

  it('says which trees could not move and why when the server refuses a bulk move', async () => {
    mockNursery({ trees: [t1, t2], tanks: [tankA] });
    server.use(
      http.post('/api/trees/bulk/move', () =>
        HttpResponse.json(
          { error: { code: 'validation_failed', message: '1 of the trees cannot move; nothing was changed', fields: { treeIds: ['T-0001 is brining; stages only move forward (or to lost)'] } } },
          { status: 400 },
        ),
      ),
    );
    const user = userEvent.setup();
    await renderApp('/nursery', coordinator);

    await user.click(await screen.findByRole('checkbox', { name: 'Select tree T-0001' }));
    const bar = within(screen.getByRole('region', { name: 'Bulk actions' }));
    await user.click(bar.getByRole('combobox', { name: 'Move to stage' }));
    await user.click(await screen.findByRole('option', { name: 'Potted' }));
    await user.click(bar.getByRole('button', { name: 'Move to stage' }));

    expect(await bar.findByText('Nothing was moved. T-0001 is brining; stages only move forward (or to lost).')).toBeTruthy();
    expect(bar.getByText('1 tree selected')).toBeTruthy();
  });

  it('opens a tree from its label address with its history and growth', async () => {
    mockNursery({ trees: [t1], tanks: [tankA] });
    const detail = buildTreeDetail(t1, {
      history: [
        { id: 'e1', kind: 'stage', at: '2025-03-01T12:00:00.000Z', by: { id: 'u1', name: 'Rosa Mendes' }, fromStage: 'potted', toStage: 'brining', tank: null, heightCm: null, leafCount: null, healthy: null, note: '', photoUrl: null, thumbUrl: null },
      ],
      measurements: [
        { at: '2025-02-01T12:00:00.000Z', heightCm: 24, leafCount: 4, healthy: true },
        { at: '2025-03-01T12:00:00.000Z', heightCm: 32, leafCount: 6, healthy: true },
      ],
    });
    server.use(http.get(`/api/trees/${t1.id}`, () => HttpResponse.json(detail)));
    await renderApp(`/nursery/trees/${t1.id}`, buildUser({ role: 'volunteer' }));

    const drawer = within(await screen.findByRole('dialog', { name: 'Tree T-0001' }));
    const history = await drawer.findByRole('list', { name: 'History' });
    expect(within(history).getByText('Potted → Brining')).toBeTruthy();
    expect(within(history).getByText('by Rosa Mendes')).toBeTruthy();
    const growth = drawer.getByRole('table', { name: 'Height over time' });
    expect(within(growth).getAllByRole('row')).toHaveLength(3);
    expect(drawer.queryByRole('button', { name: 'Save measurement' })).toBeNull();
  });

  it('records a measurement for coordinators', async () => {
    mockNursery({ trees: [t1], tanks: [tankA] });
    let body: unknown = null;
    server.use(
      http.get(`/api/trees/${t1.id}`, () => HttpResponse.json(buildTreeDetail(t1))),
      http.post(`/api/trees/${t1.id}/measurements`, async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ tree: t1 }, { status: 201 });
      }),
    );
    const user = userEvent.setup();
    await renderApp(`/nursery/trees/${t1.id}`, coordinator);

    const drawer = within(await screen.findByRole('dialog', { name: 'Tree T-0001' }));
    await user.type(await drawer.findByLabelText('Height (cm)'), '35.5');
    await user.type(drawer.getByLabelText('Leaf count'), '8');
    await user.click(drawer.getByRole('button', { name: 'Save measurement' }));

    await waitFor(() => expect(body).toEqual({ healthy: true, heightCm: 35.5, leafCount: 8 }));
    expect(await drawer.findByText('Measurement saved.')).toBeTruthy();
  });
});
