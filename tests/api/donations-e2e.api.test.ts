/**
 * The whole donor path through the payments fake, nothing delivered by hand: checkout, the
 * hosted page, paying, the fake's signed webhook to the app listening on a free port, the
 * recorded donation with its trees and receipt, then an admin refund and its webhook.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { listenHttp, type ListeningServer } from '../../fakes/support/http-server.js';
import { buildCampaign } from '../factories/donation.factory.js';
import { buildTree } from '../factories/tree.factory.js';
import { uniqueEmail } from '../factories/user.factory.js';
import { eventually, waitForMail } from '../setup/mail-inbox.js';
import { authAgentFor, createTestApp, type TestApp } from '../setup/test-app.js';
import { CARDS, payInFake } from './donations-helpers.js';

let t: TestApp;
let listening: ListeningServer;
let endpointUrl: string;
const fake = (path: string, init?: RequestInit) => fetch(`${t.config.STRIPE_API_URL}${path}`, init);

beforeAll(async () => {
  t = await createTestApp({ ownDatabase: 'donation_e2e' });
  listening = await listenHttp(t.app, 0, '127.0.0.1');
  endpointUrl = `http://127.0.0.1:${listening.port}/api/webhooks/stripe`;
  const res = await fake('/__fake/webhook-endpoint', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ url: endpointUrl, secret: t.config.STRIPE_WEBHOOK_SECRET, retryDelaysMs: [200, 400, 800] }),
  });
  expect(res.status).toBe(200);
});
afterAll(async () => {
  // Only this file points the shared fake at an app; leave it pointing nowhere.
  await fake('/__fake/webhook-endpoint', { method: 'DELETE' });
  await listening.close();
  await t.close();
});

describe('sponsor a tree, end to end through the payments fake', () => {
  it('two trees with the fee covered: pay on the hosted page, the webhook records the gift, the receipt goes out; a refund frees the trees', async () => {
    const campaign = await buildCampaign(t.db, { name: 'End-to-end appeal', priceCents: 2500 });
    // Spare trees: another test file's payments may reach this app while the fake points here.
    await Promise.all(Array.from({ length: 12 }, () => buildTree(t.db, { stage: 'ready' })));
    const email = uniqueEmail('e2e');

    const checkout = await request(t.app).post('/api/donations/checkout')
      .send({ campaignId: campaign.id, trees: 2, coverFees: true, donor: { name: 'Eda Endtoend', email }, wallName: 'Eda E.', wantsUpdates: true })
      .expect(201);
    const { checkoutUrl, sessionId } = checkout.body as { checkoutUrl: string; sessionId: string };
    const page = await fetch(checkoutUrl);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('Sponsor 2 trees — End-to-end appeal');
    expect(html).toContain('Card fee cover');

    const paid = await payInFake(t.config, sessionId, CARDS.paid);
    expect(paid.status).toBe(200);
    expect((paid.body as { redirectUrl?: string }).redirectUrl).toBe(`http://127.0.0.1:5180/sponsor/thanks?session_id=${sessionId}`);

    const thanks = await eventually(async () => {
      const res = await request(t.app).get(`/api/donations/thanks/${sessionId}`);
      return res.body.recorded === true ? res.body : undefined;
    }, 'the webhook to record the gift');
    expect(thanks).toMatchObject({ status: 'paid', donorName: 'Eda Endtoend', amountCents: 5181, treeCount: 2, campaignName: 'End-to-end appeal' });
    expect(thanks.trees).toHaveLength(2);

    const receipt = await waitForMail(t.config, email, /receipt/i);
    expect(receipt.text).toContain('Amount: $51.81');
    expect(receipt.text).toContain(`Trees sponsored: ${[...thanks.trees].sort().join(', ')}`);

    const admin = await authAgentFor(t, 'admin');
    const listed = await admin.agent.get(`/api/donations?q=${encodeURIComponent(email)}`).expect(200);
    expect(listed.body.items).toHaveLength(1);
    const row = listed.body.items[0];
    expect(row).toMatchObject({ checkoutSessionId: sessionId, amountCents: 5181, status: 'paid', campaign: { id: campaign.id } });
    expect(row.trees.map((x: { tag: string }) => x.tag).sort()).toEqual([...thanks.trees].sort());
    const wall = await request(t.app).get(`/api/campaigns/${campaign.id}`).expect(200);
    expect(wall.body.wall).toContainEqual(expect.objectContaining({ name: 'Eda E.', trees: 2 }));

    await admin.agent.post(`/api/donations/${row.id}/refund`).set('X-CSRF-Token', admin.token).expect(202);
    const after = await eventually(async () => {
      const res = await request(t.app).get(`/api/donations/thanks/${sessionId}`);
      return res.body.status === 'refunded' ? res.body : undefined;
    }, 'the refund webhook');
    expect(after.trees).toEqual([]);
    expect((await request(t.app).get(`/api/campaigns/${campaign.id}`)).body.sponsoredTrees).toBe(0);
  });

  it('a declined card records nothing', async () => {
    const campaign = await buildCampaign(t.db);
    const checkout = await request(t.app).post('/api/donations/checkout').send({ campaignId: campaign.id, trees: 1, coverFees: false, donor: { name: 'Dee Clined', email: uniqueEmail('declined') } }).expect(201);
    const declined = await payInFake(t.config, checkout.body.sessionId, CARDS.declined);
    expect(declined.status).toBe(402);
    // Give a stray delivery time to land, then check nothing was recorded.
    await new Promise((r) => setTimeout(r, 500));
    expect((await request(t.app).get(`/api/donations/thanks/${checkout.body.sessionId}`)).body).toMatchObject({ recorded: false, status: 'pending' });
  });
});
