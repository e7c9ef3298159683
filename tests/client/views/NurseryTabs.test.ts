import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { buildTank, mockNursery } from '../support/nursery';
import { renderApp } from '../support/render-app';
import { buildSite } from '../support/sites';
import { buildUser } from '../support/users';

const coordinator = buildUser({ role: 'coordinator' });
const tank = buildTank({ name: 'Tank A', volumeLitres: 378.5411784, treeCount: 12, targetSite: { id: 'site-1', name: 'Heron Cove', salinityPpt: 25 } });

async function openTab(name: string, user: ReturnType<typeof userEvent.setup>): Promise<void> {
  await user.click(await screen.findByRole('tab', { name }));
}

describe('NurseryView: tanks, batches and readiness', () => {
  it('shows tanks in gallons with today\'s swaps, and posts a hydrometer reading as SG and temperature', async () => {
    mockNursery({ tanks: [tank] });
    server.use(http.get('/api/nursery/tasks', () => HttpResponse.json({ date: '2025-03-04', tasks: [{ date: '2025-03-04', fromPpt: 15, toPpt: 20, replaceLitres: 3.8, stockPpt: 35, tankId: tank.id, tankName: 'Tank A', message: 'Replace 3.8 L in Tank A with 35 ppt water' }], skipped: [] })));
    let body: unknown = null;
    server.use(
      http.post(`/api/tanks/${tank.id}/readings`, async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ reading: { id: 'r1', tankId: tank.id, takenAt: '2025-03-04T12:00:00.000Z', method: 'hydrometer', salinityPpt: 19.9, specificGravity: 1.015, temperatureC: 25, note: '', takenById: null } }, { status: 201 });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/nursery', coordinator);
    await openTab('Tanks', user);

    expect(await screen.findByText('Replace 3.8 L in Tank A with 35 ppt water')).toBeTruthy();
    const card = within(screen.getByRole('list', { name: 'Tanks' }));
    expect(card.getByText(/100 gal/)).toBeTruthy();
    await user.click(card.getByRole('button', { name: 'Log a reading' }));
    await user.click(card.getByText('Hydrometer (specific gravity)'));
    expect(card.getByText(/UNESCO 1981 equation of state \(EOS-80\)/)).toBeTruthy();
    await user.type(card.getByLabelText('Specific gravity'), '1.0150');
    await user.type(card.getByLabelText('Water temperature (°C)'), '25');
    await user.click(card.getByRole('button', { name: 'Save reading' }));

    await waitFor(() => expect(body).toEqual({ specificGravity: 1.015, temperatureC: 25 }));
    expect(await card.findByText('Saved: 19.9 ppt.')).toBeTruthy();
  });

  it('renders a brining plan as steps with warnings', async () => {
    mockNursery({ tanks: [tank] });
    let url: URL | null = null;
    server.use(
      http.get(`/api/tanks/${tank.id}/brining-plan`, ({ request }) => {
        url = new URL(request.url);
        return HttpResponse.json({
          tankId: tank.id, currentPpt: 15, targetPpt: 25, startDate: '2025-03-04', reachedOn: '2025-03-08', readyOn: '2025-03-29',
          steps: [
            { date: '2025-03-04', fromPpt: 15, toPpt: 20, replaceLitres: 94.6, stockPpt: 35 },
            { date: '2025-03-08', fromPpt: 20, toPpt: 25, replaceLitres: 126.2, stockPpt: 35 },
          ],
          warnings: [{ code: 'too_soon', message: 'The workday is 10 days too soon for a full hold.' }],
        });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/nursery', buildUser({ role: 'volunteer' }));
    await openTab('Tanks', user);

    const card = within(await screen.findByRole('list', { name: 'Tanks' }));
    expect(card.queryByRole('button', { name: 'Log a reading' })).toBeNull();
    await user.click(card.getByRole('button', { name: 'Brining plan' }));
    expect((card.getByLabelText('Target salinity (ppt)') as HTMLInputElement).value).toBe('25');
    await user.click(card.getByRole('button', { name: 'Make plan' }));

    const steps = await card.findByRole('table', { name: 'Steps' });
    expect(within(steps).getAllByRole('row')).toHaveLength(3);
    expect(within(steps).getByText('94.6 L (25 gal)')).toBeTruthy();
    expect(card.getByText('The workday is 10 days too soon for a full hold.')).toBeTruthy();
    expect(url!.searchParams.get('targetPpt')).toBe('25');
    expect(url!.searchParams.get('stockPpt')).toBe('35');
  });

  it('creates a batch and shows its new tags with a label link', async () => {
    mockNursery();
    let body: unknown = null;
    server.use(
      http.post('/api/batches', async ({ request }) => {
        body = await request.json();
        const batch = { id: 'b1b1b1b1-0000-4000-8000-000000000001', code: 'B-007', collectedOn: '2025-03-01', place: 'Weedon Island', latitude: null, longitude: null, collector: 'Ana', count: 2, notes: '', photoId: null, createdAt: '2025-03-04T12:00:00.000Z' };
        return HttpResponse.json({ batch, trees: [{ id: 't1', tag: 'T-0101' }, { id: 't2', tag: 'T-0102' }] }, { status: 201 });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/nursery', coordinator);
    await openTab('New batch', user);

    const form = within(await screen.findByRole('form', { name: 'New batch' }));
    await user.type(form.getByLabelText('Collected on'), '2025-03-01');
    await user.type(form.getByLabelText('Place'), 'Weedon Island');
    await user.type(form.getByLabelText('Collector'), 'Ana');
    await user.clear(form.getByLabelText('Number of trees'));
    await user.type(form.getByLabelText('Number of trees'), '2');
    await user.click(form.getByRole('button', { name: 'Create batch' }));

    const done = within(await screen.findByRole('region', { name: 'Created trees' }));
    expect(done.getByText('T-0101')).toBeTruthy();
    expect(done.getByRole('link', { name: 'Print labels' }).getAttribute('href')).toBe('/api/trees/labels?batchId=b1b1b1b1-0000-4000-8000-000000000001');
    expect(body).toEqual({ collectedOn: '2025-03-01', place: 'Weedon Island', collector: 'Ana', notes: '', count: 2 });
  });

  it('previews a CSV import with per-row errors and offers no import until all rows are good', async () => {
    mockNursery();
    const bodies: unknown[] = [];
    server.use(
      http.post('/api/batches/import', async ({ request }) => {
        bodies.push(await request.json());
        return HttpResponse.json({
          valid: false,
          rows: [
            { line: 2, ok: true, errors: [], values: { stage: 'potted', tank: 'Tank A', tankId: 'x', heightCm: 30, potHeightCm: 15, potMassKg: null, note: '' } },
            { line: 3, ok: false, errors: ['unknown stage "pottted"', 'no tank named "Tank Z"'], values: { stage: 'pottted', tank: 'Tank Z', tankId: null, heightCm: null, potHeightCm: null, potMassKg: null, note: '' } },
          ],
        });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/nursery', coordinator);
    await openTab('New batch', user);

    const form = within(await screen.findByRole('form', { name: 'New batch' }));
    await user.type(form.getByLabelText('Collected on'), '2025-03-01');
    await user.type(form.getByLabelText('Place'), 'Weedon Island');
    await user.click(form.getByText('Import from CSV'));
    await user.type(form.getByLabelText('CSV rows'), 'stage,tank,height_cm{Enter}potted,Tank A,30{Enter}pottted,Tank Z,');
    await user.click(form.getByRole('button', { name: 'Preview' }));

    const preview = within(await form.findByRole('table', { name: 'Preview' }));
    expect(preview.getByText('unknown stage "pottted"; no tank named "Tank Z"')).toBeTruthy();
    expect(form.getByRole('alert').textContent).toContain('Nothing has been stored');
    expect(form.queryByRole('button', { name: /^Import/ })).toBeNull();
    expect(bodies[0]).toMatchObject({ commit: false, batch: { place: 'Weedon Island' } });
  });

  it('lists ready trees for a site and the reasons and ready-by dates for the others', async () => {
    mockNursery();
    const site = buildSite({ name: 'Heron Cove' });
    const base = { stage: 'brining', tank: null, cautions: [], crownSubmergedShare: 0, collarFloodedShare: 0.2, crownTopM: 1, requiredTopM: 1, heightShortfallCm: 0, heldDays: 21 };
    server.use(
      http.get('/api/sites', () => HttpResponse.json({ sites: [site] })),
      http.get(`/api/sites/${site.id}/readiness`, () =>
        HttpResponse.json({
          site: { id: site.id, name: 'Heron Cove', salinityPpt: 25 }, today: '2025-03-04', mhhwM: 0.8, mslM: 0.3,
          trees: [
            { ...base, treeId: 'a', tag: 'T-0001', stage: 'ready', ready: true, reasons: [] },
            { ...base, treeId: 'b', tag: 'T-0002', ready: false, reasons: [{ code: 'height', message: 'needs 14 cm more height' }, { code: 'salinity', message: '9 more days at 25 ppt' }], readyBy: '2025-04-20' },
          ],
        }),
      ),
    );
    const user = userEvent.setup();
    await renderApp('/nursery', buildUser({ role: 'volunteer' }));
    await openTab('Ready for a site', user);

    await user.click(await screen.findByRole('combobox', { name: 'Site' }));
    await user.click(await screen.findByRole('option', { name: 'Heron Cove' }));

    const ready = within(await screen.findByRole('list', { name: 'Ready trees' }));
    expect(ready.getByRole('link', { name: 'T-0001' })).toBeTruthy();
    const why = within(screen.getByRole('list', { name: 'Why T-0002 is not ready' }));
    expect(why.getByText('needs 14 cm more height')).toBeTruthy();
    expect(why.getByText('9 more days at 25 ppt')).toBeTruthy();
    expect(screen.getByText(/Ready by Sun,? 20 Apr 2025/)).toBeTruthy();
  });
});
