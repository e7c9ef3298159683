import type Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakes, type RunningFakes } from '../../../fakes/index.js';
import { CANCEL_URL, CARDS, eventRecords, payByShortcut, stripeClient, treeCheckout } from './stripe-helpers.js';

let fakes: RunningFakes;
let stripe: Stripe;
let base: string;

beforeAll(async () => {
  fakes = await startFakes({ smtpPort: 0, mailInspectPort: 0, oauthPort: 0, stripePort: 0 });
  base = `http://127.0.0.1:${fakes.stripePort}`;
  stripe = stripeClient(fakes);
});
afterAll(() => fakes.close());

const thanksUrl = (id: string) => `http://127.0.0.1:5180/sponsor/thanks?session=${id}`;

function submitForm(sessionId: string, fields: Record<string, string>): Promise<Response> {
  return fetch(`${base}/pay/${sessionId}`, { method: 'POST', body: new URLSearchParams(fields), redirect: 'manual' });
}

async function eventsFor(sessionId: string): Promise<string[]> {
  const records = await eventRecords(base);
  return records.filter((record) => (record.event.data.object as { id?: string }).id === sessionId).map((record) => record.event.type);
}

describe('hosted checkout page', () => {
  it('shows the items, the total, a labelled card form, Pay, Cancel and the test cards', async () => {
    const session = await stripe.checkout.sessions.create(treeCheckout());

    const html = await (await fetch(session.url!)).text();

    expect(html).toContain('Local test stand-in');
    expect(html).toContain('<td>Sponsor a mangrove tree</td><td>2</td><td>50.00 USD</td>');
    expect(html).toContain('Total 50.00 USD');
    expect(html).toContain(`<form method="post" action="/pay/${session.id}">`);
    expect(html).toMatch(/<label for="card-number">Card number<\/label><input id="card-number" name="card_number"/);
    expect(html).toMatch(/<label for="card-expiry">Expiry \(MM \/ YY\)<\/label>/);
    expect(html).toMatch(/<label for="card-cvc">Security code<\/label>/);
    expect(html).toContain('<button type="submit">Pay</button>');
    expect(html).toContain(`<a href="${CANCEL_URL}">Cancel</a>`);
    for (const number of ['4242 4242 4242 4242', '4000 0000 0000 0002', '4000 0000 0000 9995']) expect(html).toContain(`<code>${number}</code>`);
  });
});

describe('paying', () => {
  it('completes the session through the form and 303-redirects to success_url with the id filled in', async () => {
    const session = await stripe.checkout.sessions.create(treeCheckout());

    const res = await submitForm(session.id, { card_number: CARDS.paid, card_expiry: '12 / 34', card_cvc: '123', card_name: 'Marisol Test' });

    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe(thanksUrl(session.id));
    const paid = await stripe.checkout.sessions.retrieve(session.id);
    expect(paid).toMatchObject({ status: 'complete', payment_status: 'paid', customer_details: { email: 'marisol.test@example.com', name: 'Marisol Test' } });
    expect(paid.payment_intent).toMatch(/^pi_\w+$/);
    expect(await eventsFor(session.id)).toEqual(['checkout.session.completed']);
  });

  it('does the same through the test shortcut and answers JSON with the redirect URL', async () => {
    const session = await stripe.checkout.sessions.create(treeCheckout());

    const { status, body } = await payByShortcut(base, session.id, CARDS.paid);

    expect(status).toBe(200);
    expect(body).toMatchObject({ paid: true, redirectUrl: thanksUrl(session.id), sessionId: session.id, paymentIntent: expect.stringMatching(/^pi_/), charge: expect.stringMatching(/^ch_/), eventId: expect.stringMatching(/^evt_/) });
    const intent = await stripe.paymentIntents.retrieve(body.paymentIntent as string);
    expect(intent).toMatchObject({ amount: 5000, currency: 'usd', status: 'succeeded', latest_charge: body.charge, metadata: { campaignId: 'camp_1' } });
    expect((await stripe.checkout.sessions.retrieve(session.id)).payment_intent).toBe(body.paymentIntent);
  });

  it.each([
    [CARDS.declined, 'generic_decline', 'Your card was declined.'],
    [CARDS.noFunds, 'insufficient_funds', 'Your card has insufficient funds.'],
  ])('re-shows the page for %s with the reason (%s), keeps the session open and sends no event', async (card, _code, message) => {
    const session = await stripe.checkout.sessions.create(treeCheckout());

    const res = await submitForm(session.id, { card_number: card, card_cvc: '999' });

    expect(res.status).toBe(402);
    const html = await res.text();
    expect(html).toContain(`<p class="error" role="alert" id="card-error">${message}</p>`);
    expect(html).toMatch(/id="card-number"[^>]*value="4000\d+"[^>]*aria-describedby="card-hint card-error" aria-invalid="true"/);
    expect(html).toMatch(/id="card-cvc"[^>]*value=""/);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
    expect(await eventsFor(session.id)).toEqual([]);
  });

  it('answers a decline from the shortcut with the card error, and a malformed number as invalid', async () => {
    const session = await stripe.checkout.sessions.create(treeCheckout());

    const declined = await payByShortcut(base, session.id, CARDS.noFunds);
    const malformed = await payByShortcut(base, session.id, '4242 4242 4242 4241');

    expect(declined).toMatchObject({ status: 402, body: { paid: false, error: { type: 'card_error', code: 'card_declined', decline_code: 'insufficient_funds' } } });
    expect(malformed).toMatchObject({ status: 402, body: { paid: false, error: { code: 'incorrect_number', param: 'number' } } });
    expect(await eventsFor(session.id)).toEqual([]);
  });

  it('refuses a second payment of a completed session, with one event only', async () => {
    const session = await stripe.checkout.sessions.create(treeCheckout());
    await payByShortcut(base, session.id, CARDS.paid);

    const again = await payByShortcut(base, session.id, CARDS.paid);
    const form = await submitForm(session.id, { card_number: CARDS.paid });
    const page = await fetch(session.url!);

    expect(again).toMatchObject({ status: 409, body: { paid: false, status: 'complete' } });
    expect(form.status).toBe(409);
    expect(await page.text()).toContain('This checkout is already paid');
    expect(await eventsFor(session.id)).toEqual(['checkout.session.completed']);
  });

  it('refuses to pay an expired session', async () => {
    const session = await stripe.checkout.sessions.create(treeCheckout());
    await stripe.checkout.sessions.expire(session.id);

    const res = await submitForm(session.id, { card_number: CARDS.paid });

    expect(res.status).toBe(409);
    expect(await res.text()).toContain('This checkout has expired');
    expect(await eventsFor(session.id)).toEqual(['checkout.session.expired']);
  });

  it('expires a session whose expires_at has passed when it is next looked at', async () => {
    const session = await stripe.checkout.sessions.create({ ...treeCheckout(), expires_at: Math.floor(Date.now() / 1000) - 1 });

    const paying = await payByShortcut(base, session.id, CARDS.paid);

    expect(paying).toMatchObject({ status: 409, body: { status: 'expired' } });
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('expired');
  });

  it('answers 404 for an unknown session on the page and the shortcut', async () => {
    expect((await submitForm('cs_test_unknown', { card_number: CARDS.paid })).status).toBe(404);
    expect((await payByShortcut(base, 'cs_test_unknown', CARDS.paid)).status).toBe(404);
  });
});
