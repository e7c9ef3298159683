import { afterEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../../setup/client-setup';
import { buildReadiness, buildTree, mockNursery } from '../support/nursery';
import { renderApp } from '../support/render-app';
import { buildSite } from '../support/sites';
import { buildUser } from '../support/users';
import { setViewport } from '../support/viewport';

const site = buildSite({ name: 'Heron Cove', salinityPpt: 25 });
const ready = buildTree({ tag: 'T-0001', stage: 'ready' });
const short = buildTree({ tag: 'T-0002', stage: 'brining' });
const young = buildTree({ tag: 'T-0003', stage: 'tube' });

function mockSiteReadiness(): { calls: number } {
  const seen = { calls: 0 };
  server.use(
    http.get(`/api/sites/${site.id}/readiness`, () => {
      seen.calls += 1;
      return HttpResponse.json({
        site: { id: site.id, name: 'Heron Cove', salinityPpt: 25 }, today: '2025-03-04', mhhwM: 0.8, mslM: 0.45,
        trees: [
          buildReadiness(ready, { ready: true, reasons: [], cautions: [{ code: 'collar_flooded', message: 'flooded 41% of the time' }] }),
          buildReadiness(short, { reasons: [{ code: 'crown_low', message: 'needs 14 cm more height' }, { code: 'salinity_hold', message: '9 more days at 25 ppt' }] }),
        ],
      });
    }),
  );
  return seen;
}

async function pickSite(user: ReturnType<typeof userEvent.setup>): Promise<void> {
  await user.click(await screen.findByRole('combobox', { name: 'Readiness for site' }));
  await user.click(await screen.findByRole('option', { name: 'Heron Cove' }));
}

describe('Readiness in the ledger', () => {
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('adds a column for the chosen site: ready, or not ready with the first reason; stages not judged show a dash', async () => {
    mockNursery({ trees: [ready, short, young], sites: [site] });
    const seen = mockSiteReadiness();
    const user = userEvent.setup();
    await renderApp('/nursery', buildUser({ role: 'volunteer' }));

    const table = await screen.findByRole('table', { name: 'Trees' });
    expect(within(table).queryByRole('columnheader', { name: /Ready for/ })).toBeNull();
    await pickSite(user);

    expect(await within(table).findByRole('columnheader', { name: 'Ready for Heron Cove' })).toBeTruthy();
    const cells = within(table).getAllByRole('row').slice(1).map((r) => r.lastElementChild?.textContent?.replace(/\s+/g, ' ').trim());
    expect(cells).toEqual(['✓ Ready · 1 caution', 'Not ready: needs 14 cm more height (+1 more)', '— not judged at this stage']);
    expect(seen.calls).toBe(1);

    // Choosing no site hides the column again.
    await user.click(screen.getByRole('combobox', { name: 'Readiness for site' }));
    await user.click(await screen.findByRole('option', { name: 'No site chosen' }));
    await waitFor(() => expect(within(table).queryByRole('columnheader', { name: /Ready for/ })).toBeNull());
  });

  it('shows the same line on the phone cards', async () => {
    await setViewport(375, 812);
    mockNursery({ trees: [ready, short], sites: [site] });
    mockSiteReadiness();
    const user = userEvent.setup();
    await renderApp('/nursery', buildUser({ role: 'volunteer' }));

    await pickSite(user);
    const cards = within(await screen.findByRole('list', { name: 'Trees' }));
    expect(await cards.findByText('needs 14 cm more height', { exact: false })).toBeTruthy();
    expect(cards.getByText(/Ready/, { selector: '.nursery-readiness-cell--ready' })).toBeTruthy();
  });
});

describe('Batch photo', () => {
  it('uploads the photo when chosen, shows its thumbnail and sends its id with the batch', async () => {
    mockNursery();
    const photoId = 'a1a1a1a1-0000-4000-8000-000000000009';
    let uploaded: File | null = null;
    let body: unknown = null;
    server.use(
      http.post('/api/photos', async ({ request }) => {
        const form = await request.formData();
        const file = form.get('photo');
        uploaded = file instanceof File ? file : null;
        return HttpResponse.json({ photo: { id: photoId, url: `/api/photos/${photoId}`, thumbUrl: `/api/photos/${photoId}/thumb` } }, { status: 201 });
      }),
      http.post('/api/batches', async ({ request }) => {
        body = await request.json();
        const batch = { id: 'b1b1b1b1-0000-4000-8000-000000000001', code: 'B-008', collectedOn: '2025-03-01', place: 'Wrack line', latitude: null, longitude: null, collector: '', count: 1, notes: '', photoId, createdAt: '2025-03-04T12:00:00.000Z' };
        return HttpResponse.json({ batch, trees: [{ id: 't1', tag: 'T-0201' }] }, { status: 201 });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/nursery', buildUser({ role: 'coordinator' }));
    await user.click(await screen.findByRole('tab', { name: 'New batch' }));

    const form = within(await screen.findByRole('form', { name: 'New batch' }));
    await user.type(form.getByLabelText('Collected on'), '2025-03-01');
    await user.type(form.getByLabelText('Place'), 'Wrack line');
    await user.upload(form.getByLabelText('Batch photo (optional)'), new File([new Uint8Array([0xff, 0xd8, 0xff])], 'propagules.jpg', { type: 'image/jpeg' }));
    const thumb = await form.findByRole('img', { name: 'Batch photo (optional): thumbnail' });
    expect(thumb.getAttribute('src')).toBe(`/api/photos/${photoId}/thumb`);
    expect(uploaded!.name).toBe('propagules.jpg');
    await user.clear(form.getByLabelText('Number of trees'));
    await user.type(form.getByLabelText('Number of trees'), '1');
    await user.click(form.getByRole('button', { name: 'Create batch' }));

    await waitFor(() => expect(body).toMatchObject({ place: 'Wrack line', count: 1, photoId }));
    const done = within(await screen.findByRole('region', { name: 'Created trees' }));
    expect(done.getByRole('img', { name: 'Photo of batch B-008' }).getAttribute('src')).toBe(`/api/photos/${photoId}/thumb`);
  });
});
