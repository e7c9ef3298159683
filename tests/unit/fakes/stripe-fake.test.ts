import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakes, type RunningFakes } from '../../../fakes/index.js';

let fakes: RunningFakes;
let stripe: Stripe;
let base: string;

beforeAll(async () => {
  fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
  base = `http://127.0.0.1:${fakes.stripePort}`;
  stripe = client('sk_test_x');
});
afterAll(() => fakes.close());

function client(key: string): Stripe {
  return new Stripe(key, { host: '127.0.0.1', port: fakes.stripePort, protocol: 'http', maxNetworkRetries: 0 });
}

const workdayCheckout = (): Stripe.Checkout.SessionCreateParams => ({
  mode: 'payment',
  customer_email: 'payer@example.com',
  success_url: 'http://127.0.0.1:5180/donations/thanks',
  cancel_url: 'http://127.0.0.1:5180/donations',
  metadata: { workdayId: 'wd_42', kind: 'seedlings' },
  line_items: [
    { quantity: 3, price_data: { currency: 'usd', unit_amount: 2500, product_data: { name: 'Propagule bag' } } },
    { quantity: 1, price_data: { currency: 'usd', unit_amount: 1000, product_data: { name: 'Boat fuel' } } },
  ],
});

describe('payments fake with the Stripe SDK', () => {
  it('creates a checkout session with totals computed from the line items', async () => {
    const session = await stripe.checkout.sessions.create(workdayCheckout());

    expect(session).toMatchObject({
      object: 'checkout.session',
      mode: 'payment',
      amount_total: 8500,
      amount_subtotal: 8500,
      currency: 'usd',
      status: 'open',
      payment_status: 'unpaid',
      customer_email: 'payer@example.com',
      metadata: { workdayId: 'wd_42', kind: 'seedlings' },
      success_url: 'http://127.0.0.1:5180/donations/thanks',
      cancel_url: 'http://127.0.0.1:5180/donations',
    });
    expect(session.id).toMatch(/^cs_test_[A-Za-z0-9]+$/);
    expect(session.url).toBe(`${base}/pay/${session.id}`);
    expect(session.created).toBeCloseTo(Date.now() / 1000, -1);
  });

  it('retrieves a created session by id', async () => {
    const created = await stripe.checkout.sessions.create(workdayCheckout());

    const retrieved = await stripe.checkout.sessions.retrieve(created.id);

    expect(retrieved).toMatchObject({ id: created.id, amount_total: 8500, metadata: { workdayId: 'wd_42' } });
  });

  it('rejects an unknown session id with a resource_missing StripeError', async () => {
    const retrieval = stripe.checkout.sessions.retrieve('cs_test_unknown');

    await expect(retrieval).rejects.toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    await expect(retrieval).rejects.toMatchObject({ code: 'resource_missing', statusCode: 404 });
  });

  it('rejects a key that is not a test secret key', async () => {
    const creation = client('sk_live_nope').checkout.sessions.create(workdayCheckout());

    await expect(creation).rejects.toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
  });

  it('answers an unimplemented endpoint with a Stripe-shaped 404', async () => {
    const listing = stripe.customers.list();

    await expect(listing).rejects.toMatchObject({ type: 'StripeInvalidRequestError', statusCode: 404, message: expect.stringContaining('GET: /v1/customers') });
  });

  it('names the missing parameter when mode is absent', async () => {
    const { mode: _mode, ...withoutMode } = workdayCheckout();

    const creation = stripe.checkout.sessions.create(withoutMode);

    await expect(creation).rejects.toMatchObject({ type: 'StripeInvalidRequestError', code: 'parameter_missing', param: 'mode' });
  });

  it('replays the first response for a repeated idempotency key', async () => {
    const idempotencyKey = `retry-${Date.now()}`;

    const first = await stripe.checkout.sessions.create(workdayCheckout(), { idempotencyKey });
    const second = await stripe.checkout.sessions.create(workdayCheckout(), { idempotencyKey });

    expect(second.id).toBe(first.id);
  });

  it('refuses an idempotency key reused with other parameters', async () => {
    const idempotencyKey = `reuse-${Date.now()}`;
    await stripe.checkout.sessions.create(workdayCheckout(), { idempotencyKey });

    const other = stripe.checkout.sessions.create({ ...workdayCheckout(), customer_email: 'other@example.com' }, { idempotencyKey });

    await expect(other).rejects.toMatchObject({ type: 'StripeIdempotencyError', statusCode: 400 });
  });
});

describe('payments fake inspection and hosted page', () => {
  it('records each API request with its bracket-encoded body parsed into objects, newest first', async () => {
    const session = await stripe.checkout.sessions.create(workdayCheckout());
    await stripe.checkout.sessions.retrieve(session.id);

    const requests = (await (await fetch(`${base}/__fake/requests`)).json()) as Array<{ method: string; path: string; body: unknown }>;

    expect(requests[0]).toMatchObject({ method: 'GET', path: `/v1/checkout/sessions/${session.id}` });
    expect(requests[1]).toMatchObject({
      method: 'POST',
      path: '/v1/checkout/sessions',
      body: {
        mode: 'payment',
        metadata: { workdayId: 'wd_42' },
        line_items: [{ quantity: '3', price_data: { currency: 'usd', unit_amount: '2500', product_data: { name: 'Propagule bag' } } }, { quantity: '1' }],
      },
    });
  });

  it('lists created sessions newest first', async () => {
    const older = await stripe.checkout.sessions.create(workdayCheckout());
    const newer = await stripe.checkout.sessions.create(workdayCheckout());

    const sessions = (await (await fetch(`${base}/__fake/sessions`)).json()) as Array<{ id: string }>;

    expect(sessions.slice(0, 2).map((s) => s.id)).toEqual([newer.id, older.id]);
  });

  it('shows the checkout page with the total for a session and 404 for an unknown one', async () => {
    const session = await stripe.checkout.sessions.create(workdayCheckout());

    const page = await fetch(session.url ?? '');
    const missing = await fetch(`${base}/pay/cs_test_unknown`);

    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('Total 85.00 USD');
    expect(html).toContain('<td>Propagule bag</td><td>3</td><td>75.00 USD</td>');
    expect(missing.status).toBe(404);
  });
});
