import { describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../setup/client-setup';
import { buildSettings } from './support/organisation';
import { errorResponse } from './support/msw';
import { renderApp } from './support/render-app';
import { buildUser } from './support/users';
import { CAMPAIGN_ID, buildManagedCampaign } from './sponsor-fixtures';

const admin = buildUser({ role: 'admin' });

function answerCampaigns(): { posts: unknown[]; patches: unknown[] } {
  const seen = { posts: [] as unknown[], patches: [] as unknown[] };
  const existing = buildManagedCampaign();
  server.use(
    http.get('/api/campaigns/manage', () => HttpResponse.json({ campaigns: [existing] })),
    http.post('/api/campaigns', async ({ request }) => {
      const body = (await request.json()) as Record<string, unknown>;
      seen.posts.push(body);
      return HttpResponse.json({ campaign: buildManagedCampaign({ ...body, id: '0b7e6c1a-2d3f-4e5a-9b8c-7d6e5f4a3b2c', sponsoredTrees: 0, raisedCents: 0, donationCount: 0 }) }, { status: 201 });
    }),
    http.patch('/api/campaigns/:id', async ({ request }) => {
      const body = (await request.json()) as Record<string, unknown>;
      seen.patches.push(body);
      return HttpResponse.json({ campaign: { ...existing, ...body } });
    }),
  );
  return seen;
}

async function openAdmin() {
  await renderApp('/settings/campaigns', admin);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 2, name: 'Gull Spit fringe' });
  return main;
}

describe('CampaignsAdminView', () => {
  it('lists campaigns with their progress, what they raised, and links', async () => {
    answerCampaigns();
    const main = await openAdmin();

    const item = within(main.getByRole('list', { name: 'Campaigns' }).querySelector('li')!);
    expect(item.getByText('Taking gifts')).toBeTruthy();
    expect(item.getByText('From 1 Jan 2025, no end date · $25.00 a tree')).toBeTruthy();
    expect(item.getByRole('progressbar', { name: 'Trees sponsored' }).getAttribute('aria-valuetext')).toBe('42 of 150 trees sponsored');
    expect(item.getByText('$1,050.00 raised from 12 gifts')).toBeTruthy();
    expect(item.getByRole('link', { name: 'Public page' }).getAttribute('href')).toBe(`/sponsor/${CAMPAIGN_ID}`);
    expect(item.getByRole('link', { name: 'Donations' }).getAttribute('href')).toBe(`/donations?campaignId=${CAMPAIGN_ID}`);
  });

  it('creates a campaign with the price in cents', async () => {
    const seen = answerCampaigns();
    const user = userEvent.setup();
    const main = await openAdmin();

    await user.click(main.getByRole('button', { name: 'New campaign' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'New campaign' }));
    await user.type(dialog.getByLabelText('Name'), 'Osprey Cove');
    await user.type(dialog.getByLabelText('Story'), 'A new fringe for the cove.');
    await user.clear(dialog.getByLabelText('Price per tree ($)'));
    await user.type(dialog.getByLabelText('Price per tree ($)'), '30.50');
    await user.clear(dialog.getByLabelText('Starts on'));
    await user.type(dialog.getByLabelText('Starts on'), '2025-06-01');
    await user.click(dialog.getByRole('button', { name: 'Create campaign' }));

    await waitFor(() => expect(seen.posts).toEqual([{
      name: 'Osprey Cove', story: 'A new fringe for the cove.', priceCents: 3050, goalTrees: 100, startsOn: '2025-06-01', endsOn: null, active: true,
    }]));
    expect(await main.findByRole('heading', { level: 2, name: 'Osprey Cove' })).toBeTruthy();
  });

  it('sends only what changed when editing', async () => {
    const seen = answerCampaigns();
    const user = userEvent.setup();
    const main = await openAdmin();

    await user.click(main.getByRole('button', { name: 'Edit Gull Spit fringe' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Edit campaign' }));
    expect((dialog.getByLabelText('Price per tree ($)') as HTMLInputElement).value).toBe('25.00');
    await user.clear(dialog.getByLabelText('Goal (trees)'));
    await user.type(dialog.getByLabelText('Goal (trees)'), '200');
    await user.type(dialog.getByLabelText('Ends on (optional)'), '2025-12-31');
    await user.click(dialog.getByRole('button', { name: 'Save changes' }));

    await waitFor(() => expect(seen.patches).toEqual([{ goalTrees: 200, endsOn: '2025-12-31' }]));
  });

  it('shows the rules under the fields and the server message above the form', async () => {
    const seen = answerCampaigns();
    server.use(http.post('/api/campaigns', () => errorResponse(400, 'validation_failed', 'Invalid', { name: ['is taken'] })));
    const user = userEvent.setup();
    const main = await openAdmin();

    await user.click(main.getByRole('button', { name: 'New campaign' }));
    const dialog = within(await screen.findByRole('dialog', { name: 'New campaign' }));
    await user.type(dialog.getByLabelText('Ends on (optional)'), '2000-01-01');
    await user.click(dialog.getByRole('button', { name: 'Create campaign' }));
    expect(await dialog.findByText('Is required')).toBeTruthy();
    expect(await dialog.findByText('Must be on or after the start')).toBeTruthy();
    expect(seen.posts).toHaveLength(0);

    await user.type(dialog.getByLabelText('Name'), 'Osprey Cove');
    await user.clear(dialog.getByLabelText('Ends on (optional)'));
    await user.click(dialog.getByRole('button', { name: 'Create campaign' }));
    expect(await dialog.findByText('Is taken')).toBeTruthy();
  });

  it('is linked from the organisation settings, with the giving card', async () => {
    server.use(http.get('/api/organisation/settings', () => HttpResponse.json({ settings: buildSettings() })));
    await renderApp('/settings', admin);
    const giving = within(await screen.findByRole('region', { name: 'Giving' }));
    expect(giving.getByRole('link', { name: 'Campaigns' }).getAttribute('href')).toBe('/settings/campaigns');
  });
});
