import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { buildReadiness, buildTank, buildTree, buildTreeDetail, mockNursery } from '../support/nursery';
import { renderApp } from '../support/render-app';
import { buildSite } from '../support/sites';
import { buildUser } from '../support/users';

const coordinator = buildUser({ role: 'coordinator' });
const heron = buildSite({ name: 'Heron Cove', salinityPpt: 25 });
const sandspur = buildSite({ name: 'Sandspur Shoal', salinityPpt: 33 });
const tank = buildTank({ name: 'Tank B', targetSiteId: heron.id });
const tree = buildTree({ tag: 'T-0056', stage: 'brining', tank: { id: tank.id, name: 'Tank B' }, potHeightCm: 25, potMassKg: 18.5, healthy: true });

function readinessFor(siteName: string, siteId: string, overrides: Parameters<typeof buildReadiness>[1] = {}) {
  return { site: { id: siteId, name: siteName, salinityPpt: 25 }, today: '2025-03-04', mhhwM: 0.8, mslM: 0.45, tree: buildReadiness(tree, overrides) };
}

describe('The tree drawer', () => {
  it('judges the tree for its tank\'s target site with every reason and the root-collar caution, and for another site on request', async () => {
    mockNursery({ trees: [tree], tanks: [tank], sites: [heron, sandspur] });
    const asked: (string | null)[] = [];
    server.use(
      http.get(`/api/trees/${tree.id}`, () => HttpResponse.json(buildTreeDetail(tree))),
      http.get(`/api/trees/${tree.id}/readiness`, ({ request }) => {
        const siteId = new URL(request.url).searchParams.get('siteId');
        asked.push(siteId);
        if (siteId === sandspur.id) return HttpResponse.json(readinessFor('Sandspur Shoal', sandspur.id, { ready: true, reasons: [], cautions: [] }));
        return HttpResponse.json(
          readinessFor('Heron Cove', heron.id, {
            reasons: [{ code: 'crown_low', message: 'needs 14 cm more height' }, { code: 'salinity_hold', message: '9 more days at 25 ppt' }],
            cautions: [{ code: 'collar_flooded', message: 'Its root collar would be flooded 41% of the time; established mangroves flood no more than about 30% of the time (Lewis 2005).' }],
            collarFloodedShare: 0.41, readyBy: '2025-04-20',
          }),
        );
      }),
    );
    const user = userEvent.setup();
    await renderApp(`/nursery/trees/${tree.id}`, buildUser({ role: 'volunteer' }));

    const drawer = within(await screen.findByRole('dialog', { name: 'Tree T-0056' }));
    expect(await drawer.findByText('Not ready for Heron Cove')).toBeTruthy();
    const why = within(drawer.getByRole('list', { name: 'Why tree T-0056 is not ready' }));
    expect(why.getAllByRole('listitem').map((li) => li.textContent)).toEqual(['needs 14 cm more height', '9 more days at 25 ppt']);
    expect(drawer.getByText('41% of the hours')).toBeTruthy();
    // A caution, shown as a warning: it never turns a tree from ready to not ready.
    expect(drawer.getByText(/Caution: Its root collar would be flooded 41% of the time/)).toBeTruthy();
    // 0.7 m and 0.84 m in feet (0.3048 m to the foot): 2.30 ft and 2.76 ft.
    expect(drawer.getByText('2.30 ft above MLLW (needs 2.76 ft above MLLW)')).toBeTruthy();
    expect(asked[0]).toBe(heron.id);

    await user.click(drawer.getByRole('combobox', { name: 'Judge for site' }));
    await user.click(await screen.findByRole('option', { name: 'Sandspur Shoal' }));
    expect(await drawer.findByText('Ready for Sandspur Shoal')).toBeTruthy();
    expect(drawer.queryByRole('list', { name: 'Why tree T-0056 is not ready' })).toBeNull();
  });

  it('draws the growth as a chart with the table kept as its text alternative', async () => {
    mockNursery({ trees: [tree], tanks: [] });
    server.use(
      http.get(`/api/trees/${tree.id}`, () =>
        HttpResponse.json(
          buildTreeDetail(tree, {
            measurements: [
              { at: '2025-02-01T12:00:00.000Z', heightCm: 24, leafCount: 4, healthy: true },
              { at: '2025-02-15T12:00:00.000Z', heightCm: null, leafCount: 5, healthy: true },
              { at: '2025-03-01T12:00:00.000Z', heightCm: 32, leafCount: 6, healthy: true },
            ],
          }),
        ),
      ),
    );
    await renderApp(`/nursery/trees/${tree.id}`, buildUser({ role: 'volunteer' }));

    const drawer = within(await screen.findByRole('dialog', { name: 'Tree T-0056' }));
    const chart = await drawer.findByRole('img', { name: 'Height over time: from 24 cm on 1 Feb 2025 to 32 cm on 1 Mar 2025, 2 measurements.' });
    expect(chart.querySelectorAll('circle')).toHaveLength(2);
    expect(chart.querySelector('path')?.getAttribute('d')).toBe('M40 68 L344 40');
    expect(within(drawer.getByRole('table', { name: 'Height over time' })).getAllByRole('row')).toHaveLength(3);
    // No site chosen and no target site: nothing is asked until one is picked.
    expect(drawer.getByText('Choose a site to see whether this tree can go there.')).toBeTruthy();
  });

  it('edits pot height, filled pot mass (in pounds here) and health with a note', async () => {
    mockNursery({ trees: [tree], tanks: [] });
    let body: unknown = null;
    server.use(
      http.get(`/api/trees/${tree.id}`, () => HttpResponse.json(buildTreeDetail(tree))),
      http.patch(`/api/trees/${tree.id}`, async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ tree: { ...tree, potHeightCm: 30, healthy: false } });
      }),
    );
    const user = userEvent.setup();
    await renderApp(`/nursery/trees/${tree.id}`, coordinator);

    const drawer = within(await screen.findByRole('dialog', { name: 'Tree T-0056' }));
    await user.click(await drawer.findByRole('button', { name: 'Edit pot and health' }));
    const form = within(drawer.getByRole('form', { name: 'Edit tree T-0056' }));
    // 18.5 kg is 40.8 lb (0.45359237 kg to the pound, exact by definition).
    expect((form.getByLabelText('Filled pot mass (lb)') as HTMLInputElement).value).toBe('40.8');
    await user.clear(form.getByLabelText('Pot height (cm)'));
    await user.type(form.getByLabelText('Pot height (cm)'), '30');
    await user.click(form.getByRole('checkbox', { name: 'Healthy' }));
    await user.type(form.getByLabelText('Health note (goes into the history)'), 'scale insects on two leaves');
    await user.click(form.getByRole('button', { name: 'Save changes' }));

    // The untouched mass is not sent back (no rounding drift through pounds).
    await waitFor(() => expect(body).toEqual({ potHeightCm: 30, healthy: false, note: 'scale insects on two leaves' }));
    await waitFor(() => expect(drawer.queryByRole('form', { name: 'Edit tree T-0056' })).toBeNull());
  });

  it('says so when nothing was changed', async () => {
    mockNursery({ trees: [tree], tanks: [] });
    server.use(http.get(`/api/trees/${tree.id}`, () => HttpResponse.json(buildTreeDetail(tree))));
    const user = userEvent.setup();
    await renderApp(`/nursery/trees/${tree.id}`, coordinator);

    const drawer = within(await screen.findByRole('dialog', { name: 'Tree T-0056' }));
    await user.click(await drawer.findByRole('button', { name: 'Edit pot and health' }));
    await user.click(drawer.getByRole('button', { name: 'Save changes' }));
    expect(await drawer.findByText('Nothing has changed.')).toBeTruthy();
  });
});
