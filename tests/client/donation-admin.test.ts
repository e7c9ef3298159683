import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { screen, waitFor, within } from '@testing-library/vue';
import userEvent from '@testing-library/user-event';
import { http, HttpResponse } from 'msw';
import { server } from '../setup/client-setup';
import { groupPanel } from './support/nav';
import { buildSettings } from './support/organisation';
import { renderApp } from './support/render-app';
import { buildUser } from './support/users';
import { setViewport } from './support/viewport';
import { CAMPAIGN_ID, buildDonation, mockDonations } from './sponsor-fixtures';

const admin = buildUser({ role: 'admin' });
const noor = buildDonation({ dedication: { kind: 'memory', name: 'Abel Okafor' } });
const refunded = buildDonation({
  donor: { name: 'Ivo Marsh', email: 'ivo@example.test' }, amountCents: 2500, giftCents: 2500, feeCoverCents: 0, treeCount: 1, trees: [], status: 'refunded', campaign: null,
});

describe('DonationsView', () => {
  beforeEach(async () => {
    await setViewport(1280, 800);
  });
  afterEach(async () => {
    await setViewport(1024, 768);
  });

  it('lists donations with donor, amount and fee cover, status and the sponsored trees, and the totals', async () => {
    mockDonations([noor, refunded]);
    await renderApp('/donations', admin);

    const table = within(await screen.findByRole('table', { name: 'Donations' }));
    expect(table.getByText('Noor Castellanos')).toBeTruthy();
    expect(table.getByText('In memory of Abel Okafor')).toBeTruthy();
    expect(table.getByText('$51.81')).toBeTruthy();
    expect(table.getByText('incl. $1.81 fee cover')).toBeTruthy();
    expect(table.getByRole('link', { name: 'BST-0107' }).getAttribute('href')).toBe(`/nursery/trees/${noor.trees[0]!.id}`);
    expect(table.getByText('Refunded')).toBeTruthy();
    expect(table.getByText('1 tree, back in the nursery')).toBeTruthy();
    expect(table.getAllByRole('button', { name: /^Refund / })).toHaveLength(1);
    const totals = within(screen.getByLabelText('Totals for these filters'));
    expect(totals.getByText('Charged').nextElementSibling?.textContent).toBe('$76.81');
    expect(totals.getByText('Fee cover').nextElementSibling?.textContent).toBe('$1.81');
  });

  it('filters by dates, campaign, status and donor text, back on page 1, and the CSV link follows', async () => {
    const queries = mockDonations([noor]);
    const user = userEvent.setup();
    await renderApp('/donations', admin);
    await screen.findByRole('table', { name: 'Donations' });

    await user.type(screen.getByLabelText('From'), '2025-03-01');
    await user.type(screen.getByLabelText('To'), '2025-03-31');
    await user.click(screen.getByRole('combobox', { name: 'Status' }));
    await user.click(await screen.findByRole('option', { name: 'Paid' }));
    await user.click(screen.getByRole('combobox', { name: 'Campaign' }));
    await user.click(await screen.findByRole('option', { name: 'Gull Spit fringe' }));
    await user.type(screen.getByLabelText('Donor name, e-mail or checkout session'), 'noor{Enter}');

    await waitFor(() => expect(queries.at(-1)?.get('q')).toBe('noor'));
    const last = queries.at(-1)!;
    expect(Object.fromEntries(last)).toEqual({ from: '2025-03-01', to: '2025-03-31', campaignId: CAMPAIGN_ID, status: 'paid', q: 'noor', page: '1', pageSize: '25' });
    expect(screen.getByRole('link', { name: 'Export CSV' }).getAttribute('href')).toBe(
      `/api/donations/export.csv?from=2025-03-01&to=2025-03-31&campaignId=${CAMPAIGN_ID}&status=paid&q=noor`,
    );
  });

  it('pages through many donations', async () => {
    const many = Array.from({ length: 30 }, (_, i) => buildDonation({ donor: { name: `Donor ${i + 1}`, email: `d${i}@example.test` } }));
    const queries = mockDonations(many);
    const user = userEvent.setup();
    await renderApp('/donations', admin);
    await screen.findByText('Donor 1');

    await user.click(screen.getByLabelText('page 2'));
    expect(await screen.findByText('Donor 26')).toBeTruthy();
    expect(queries.at(-1)?.get('page')).toBe('2');
  });

  it('refunds a gift after confirming, then shows it refunded', async () => {
    const rows = [noor];
    mockDonations(rows);
    let refundedId: string | null = null;
    server.use(
      http.post('/api/donations/:id/refund', ({ params }) => {
        refundedId = String(params.id);
        rows[0] = { ...noor, status: 'refunded', trees: [] };
        return HttpResponse.json({ refundId: 're_test_1', status: 'succeeded' }, { status: 202 });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/donations', admin);

    await user.click(await screen.findByRole('button', { name: "Refund Noor Castellanos's gift of $51.81" }));
    const dialog = within(await screen.findByRole('dialog', { name: 'Refund this gift?' }));
    expect(dialog.getByText(/gets the full \$51.81 back on their card. Its 2 trees go back to the nursery/)).toBeTruthy();
    await user.click(dialog.getByRole('button', { name: 'Refund' }));

    await waitFor(() => expect(refundedId).toBe(noor.id));
    const table = within(screen.getByRole('table', { name: 'Donations' }));
    expect(await table.findByText('Refunded')).toBeTruthy();
  });

  it('keeps the gift when the refund is not confirmed', async () => {
    mockDonations([noor]);
    let called = false;
    server.use(http.post('/api/donations/:id/refund', () => { called = true; return HttpResponse.json({ refundId: 'x', status: 'x' }); }));
    const user = userEvent.setup();
    await renderApp('/donations', admin);

    await user.click(await screen.findByRole('button', { name: /^Refund Noor/ }));
    await user.click(within(await screen.findByRole('dialog', { name: 'Refund this gift?' })).getByRole('button', { name: 'Keep the gift' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(called).toBe(false);
  });

  it('shows donations as cards on a phone', async () => {
    await setViewport(375, 812);
    mockDonations([noor]);
    await renderApp('/donations', admin);
    const cards = within(await screen.findByRole('list', { name: 'Donations' }));
    expect(cards.getByRole('heading', { level: 3, name: 'Noor Castellanos' })).toBeTruthy();
    expect(cards.getByRole('link', { name: 'BST-0112' })).toBeTruthy();
  });

  it('gives admins a Donations menu item under Giving & reports, marked while on the page', async () => {
    mockDonations([]);
    const user = userEvent.setup();
    await renderApp('/donations', admin);
    const giving = within(screen.getByRole('navigation', { name: 'Main' })).getByRole('button', { name: 'Giving & reports' });
    expect(giving.getAttribute('aria-current')).toBe('true');
    await user.click(giving);
    const group = within(groupPanel(giving));
    expect(group.getAllByRole('link').map((a) => a.textContent?.trim())).toEqual(['Sponsor a tree', 'Reports', 'Donations', 'Campaigns']);
    expect(group.getByRole('link', { name: 'Donations' }).getAttribute('aria-current')).toBe('page');
  });

  it('keeps coordinators out', async () => {
    const { router } = await renderApp('/donations', buildUser({ role: 'coordinator' }));
    await waitFor(() => expect(router.currentRoute.value.name).toBe('no-access'));
  });
});

describe('OrganisationSettingsGiving', () => {
  it('saves the currency and card fee on their own, with the standard rate noted', async () => {
    let body: unknown = null;
    server.use(
      http.get('/api/organisation/settings', () => HttpResponse.json({ settings: buildSettings() })),
      http.patch('/api/organisation/settings', async ({ request }) => {
        body = await request.json();
        return HttpResponse.json({ settings: buildSettings({ givingRules: { cardFeePercent: 2.2, cardFeeFixedCents: 30 } }) });
      }),
    );
    const user = userEvent.setup();
    await renderApp('/settings', admin);
    const giving = within(await screen.findByRole('region', { name: 'Giving' }));

    expect(giving.getByText(/2.9 % \+ 30¢ per domestic card charge is the payment provider's published US standard rate/)).toBeTruthy();
    // $100 grossed up at 2.9 % + 30¢ is $103.30 (TRADE.md §7 worked example).
    expect(giving.getByText(/A \$100.00 gift with the fees covered is charged \$103.30/)).toBeTruthy();
    expect(giving.getByText('That is $0.30 per charge.')).toBeTruthy();
    const percent = giving.getByLabelText('Card fee (percent of the charge)');
    await user.clear(percent);
    await user.type(percent, '2.2');
    await user.click(giving.getByRole('button', { name: 'Save giving settings' }));

    await waitFor(() => expect(body).toEqual({ currency: 'usd', givingRules: { cardFeePercent: 2.2, cardFeeFixedCents: 30 } }));
    expect(await giving.findByText('Giving settings saved.')).toBeTruthy();
  });

  it('shows a bad currency code under its field', async () => {
    server.use(http.get('/api/organisation/settings', () => HttpResponse.json({ settings: buildSettings() })));
    const user = userEvent.setup();
    await renderApp('/settings', admin);
    const giving = within(await screen.findByRole('region', { name: 'Giving' }));

    await user.clear(giving.getByLabelText('Currency'));
    await user.type(giving.getByLabelText('Currency'), 'us');
    await user.click(giving.getByRole('button', { name: 'Save giving settings' }));
    expect(await giving.findByText('Must be a three-letter currency code such as usd')).toBeTruthy();
  });
});
