import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../setup/client-setup';
import { errorResponse } from './support/msw';
import { renderApp } from './support/render-app';
import { setViewport } from './support/viewport';
import { CAMPAIGN_ID, buildCampaignPage, buildManagedCampaign, mockCampaignPage } from './sponsor-fixtures';

function answerCheckout(response?: Response): { bodies: unknown[] } {
  const seen = { bodies: [] as unknown[] };
  server.use(
    http.post('/api/donations/checkout', async ({ request }) => {
      seen.bodies.push(await request.json());
      return response ?? HttpResponse.json({ checkoutUrl: 'http://127.0.0.1:5181/pay/cs_test_abc12345', sessionId: 'cs_test_abc12345' }, { status: 201 });
    }),
  );
  return seen;
}

async function openPage(path = `/sponsor/${CAMPAIGN_ID}`) {
  await renderApp(path, null);
  const main = within(screen.getByRole('main'));
  await main.findByRole('heading', { level: 1, name: 'Gull Spit fringe' });
  return main;
}

describe('SponsorView (public campaign page)', () => {
  afterEach(async () => {
    vi.restoreAllMocks();
    await setViewport(1024, 768);
  });

  it('shows the story, progress as a progress bar with words, and the donor wall without signing in', async () => {
    await setViewport(375, 812);
    mockCampaignPage(buildCampaignPage());
    const main = await openPage();

    const bar = main.getByRole('progressbar', { name: 'Trees sponsored' });
    expect(bar.getAttribute('aria-valuenow')).toBe('42');
    expect(bar.getAttribute('aria-valuemax')).toBe('150');
    expect(main.getByText('42 of 150 trees sponsored')).toBeTruthy();
    expect(main.getByText(/washed out in the winter storms/)).toBeTruthy();
    const wall = within(main.getByRole('list', { name: 'Donors' }));
    expect(wall.getAllByRole('listitem').map((li) => [...li.children].map((c) => c.textContent?.replace(/\s+/g, ' ').trim()))).toEqual([
      ['Tide Pool Readers', '3 trees · 2 Mar 2025'],
      ['Anonymous', '1 tree · 20 Feb 2025'],
    ]);
  });

  it('prices two trees with the fee covered and hands the donor to the hosted checkout', async () => {
    mockCampaignPage(buildCampaignPage());
    const seen = answerCheckout();
    const assign = vi.spyOn(window.location, 'assign').mockImplementation(() => undefined);
    const user = userEvent.setup();
    const main = await openPage();

    expect(main.getByText('$25.00 each')).toBeTruthy();
    await user.click(main.getByRole('button', { name: /increase/i }));
    // 2 × $25 = $50 grossed up at 2.9 % + 30¢ is $51.81 (TRADE.md §7 worked example); the box shows the exact extra.
    expect(main.getByText('Adds $1.81 to your payment.')).toBeTruthy();
    const summary = within(main.getByRole('region', { name: 'Summary' }));
    expect(summary.getByText('You pay').nextElementSibling?.textContent).toBe('$51.81');
    expect(summary.getByText('Harbour Fringe Restoration receives').nextElementSibling?.textContent).toBe('$50.01');
    expect(summary.getByText('2 trees sponsored')).toBeTruthy();

    await user.click(main.getByRole('radio', { name: 'In memory of' }));
    await user.type(main.getByLabelText('In memory of (name)'), 'Abel Okafor');
    await user.type(main.getByLabelText('Your name'), 'Noor Castellanos');
    await user.type(main.getByLabelText('E-mail'), 'noor@example.test');
    await user.click(main.getByRole('radio', { name: 'Show as “Anonymous”' }));
    await user.click(main.getByRole('checkbox', { name: /Send me occasional news/ }));
    await user.click(main.getByRole('button', { name: 'Continue to pay $51.81' }));

    await waitFor(() => expect(assign).toHaveBeenCalledWith('http://127.0.0.1:5181/pay/cs_test_abc12345'));
    expect(seen.bodies).toEqual([{
      campaignId: CAMPAIGN_ID, trees: 2, coverFees: true, donor: { name: 'Noor Castellanos', email: 'noor@example.test' },
      dedication: { kind: 'memory', name: 'Abel Okafor' }, wallName: '', wantsUpdates: true,
    }]);
  });

  it('takes a custom amount without the fee cover', async () => {
    mockCampaignPage(buildCampaignPage());
    const seen = answerCheckout();
    vi.spyOn(window.location, 'assign').mockImplementation(() => undefined);
    const user = userEvent.setup();
    const main = await openPage();

    await user.click(main.getByRole('radio', { name: 'Give another amount' }));
    await user.type(main.getByLabelText('Amount ($)'), '60');
    await user.click(main.getByRole('checkbox', { name: /Cover the card fees so Harbour Fringe Restoration receives the full gift/ }));
    await user.type(main.getByLabelText('Your name'), 'Noor Castellanos');
    await user.type(main.getByLabelText('E-mail'), 'noor@example.test');
    await user.click(main.getByRole('radio', { name: 'Leave my gift off the wall' }));
    expect(main.getByText('2 trees sponsored')).toBeTruthy();
    await user.click(main.getByRole('button', { name: 'Continue to pay $60.00' }));

    await waitFor(() => expect(seen.bodies).toHaveLength(1));
    expect(seen.bodies[0]).toMatchObject({ amountCents: 6000, coverFees: false, wallName: null });
    expect(seen.bodies[0]).not.toHaveProperty('trees');
  });

  it('checks the donor fields before calling the server', async () => {
    mockCampaignPage(buildCampaignPage());
    const seen = answerCheckout();
    const user = userEvent.setup();
    const main = await openPage();

    await user.type(main.getByLabelText('E-mail'), 'not-an-address');
    await user.click(main.getByRole('button', { name: /Continue to pay/ }));

    expect(await main.findByText('Is required')).toBeTruthy();
    expect(await main.findByText('Must be an e-mail address')).toBeTruthy();
    expect(seen.bodies).toHaveLength(0);
    // Focus lands on the first field that needs another look (the name, above the e-mail).
    await waitFor(() => expect(document.activeElement).toBe(main.getByLabelText('Your name')));
  });

  it("shows the server's field messages on the form and a closed campaign above it", async () => {
    mockCampaignPage(buildCampaignPage());
    answerCheckout(errorResponse(400, 'validation_failed', 'Invalid', { 'donor.email': ['must be an e-mail address'], campaignId: ['is not open'] }));
    const user = userEvent.setup();
    const main = await openPage();

    await user.type(main.getByLabelText('Your name'), 'Noor Castellanos');
    await user.type(main.getByLabelText('E-mail'), 'noor@example.test');
    await user.click(main.getByRole('button', { name: /Continue to pay/ }));

    expect(await main.findByText('Must be an e-mail address')).toBeTruthy();
    expect(main.getByText(/This campaign is not open/)).toBeTruthy();
  });

  it('says calmly that a cancelled payment charged nothing', async () => {
    mockCampaignPage(buildCampaignPage());
    const main = await openPage(`/sponsor/${CAMPAIGN_ID}?cancelled=1`);
    expect(main.getByRole('status').textContent).toMatch(/Payment cancelled: nothing was charged/);
    expect(main.getByRole('button', { name: /Continue to pay/ })).toBeTruthy();
  });

  it('shows a closed campaign without the form', async () => {
    mockCampaignPage(buildCampaignPage({ open: false, endsOn: '2025-02-01' }));
    const main = await openPage();
    expect(main.getByText('This campaign has closed.')).toBeTruthy();
    expect(main.queryByRole('button', { name: /Continue to pay/ })).toBeNull();
  });

  it('says so when the campaign does not exist', async () => {
    mockCampaignPage(errorResponse(404, 'not_found', 'Campaign not found'));
    await renderApp(`/sponsor/${CAMPAIGN_ID}`, null);
    expect(await screen.findByText(/This campaign wasn't found/)).toBeTruthy();
  });
});

describe('SponsorCampaignsView and the menu', () => {
  it('lists the open campaigns and links each to its page', async () => {
    server.use(http.get('/api/campaigns', () => HttpResponse.json({ campaigns: [buildManagedCampaign()] })));
    await renderApp('/sponsor', null);
    const list = within(await screen.findByRole('list', { name: 'Open campaigns' }));
    expect(list.getByRole('link', { name: 'Gull Spit fringe' }).getAttribute('href')).toBe(`/sponsor/${CAMPAIGN_ID}`);
    expect(list.getByText('$25.00 sponsors one tree')).toBeTruthy();
    expect(list.getByRole('progressbar', { name: 'Trees sponsored' })).toBeTruthy();
  });

  it('offers "Sponsor a tree" to signed-out visitors', async () => {
    server.use(http.get('/api/campaigns', () => HttpResponse.json({ campaigns: [] })));
    await setViewport(1280, 800);
    await renderApp('/sponsor', null);
    const nav = within(screen.getByRole('navigation', { name: 'Main' }));
    expect(nav.getByRole('link', { name: 'Sponsor a tree' }).getAttribute('href')).toBe('/sponsor');
    expect(await screen.findByText(/No campaign is open for gifts right now/)).toBeTruthy();
    await setViewport(1024, 768);
  });
});
