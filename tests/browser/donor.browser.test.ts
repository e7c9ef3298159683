/**
 * A donor on a phone, against what `npm start` runs: opens the demo campaign, sponsors two trees
 * with the card fee covered, pays on the payments stand-in's hosted page with a test card, lands on
 * the thank-you page with the recorded gift and its trees, and gets the receipt by e-mail; the admin
 * then sees the gift and its trees. A declined test card leaves no donation behind.
 */
import { randomBytes } from 'node:crypto';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser } from './browser.js';
import { startLikeNpmStart, type StartedApp } from './start-server.js';

const CAMPAIGN = 'Heron Reach living shoreline (demo)';
const donor = { name: 'Noor Castellanos', email: `noor.${randomBytes(4).toString('hex')}@test.ebbroot.test` };
const declinedEmail = `ivo.${randomBytes(4).toString('hex')}@test.ebbroot.test`;

let app: StartedApp;
let browser: BrowserContext;
let page: Page;
let tags: string[] = [];

beforeAll(async () => {
  app = await startLikeNpmStart();
  browser = await launchBrowser({ width: 375, height: 812 });
  page = await browser.newPage();
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

async function overflow(p: Page): Promise<number> {
  return p.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
}

/** From the sponsor landing page to the campaign's donate form, filled for `trees` trees. */
async function fillDonateForm(p: Page, who: { name: string; email: string }, trees: number): Promise<void> {
  await p.goto(`${app.url}/sponsor`);
  await p.getByRole('link', { name: CAMPAIGN }).click();
  await p.waitForURL(/\/sponsor\/[0-9a-f-]{36}$/);
  await expect.poll(() => p.getByRole('progressbar', { name: 'Trees sponsored' }).isVisible(), { timeout: 20_000 }).toBe(true);
  for (let n = 1; n < trees; n += 1) await p.getByRole('button', { name: /increase/i }).click();
  await p.getByLabel('Your name').fill(who.name);
  await p.getByLabel('E-mail').fill(who.email);
}

/** On the hosted checkout page: type a test card and press Pay. */
async function payWith(p: Page, cardNumber: string): Promise<void> {
  await p.waitForURL(/\/pay\/cs_/, { timeout: 20_000 });
  await p.getByLabel('Card number').fill(cardNumber);
  await p.getByLabel('Expiry (MM / YY)').fill('12 / 34');
  await p.getByLabel('Security code').fill('123');
  await p.getByLabel('Name on card').fill('N Castellanos');
  await p.getByRole('button', { name: 'Pay' }).click();
}

async function signInAsAdmin(p: Page): Promise<void> {
  const csrf = (await (await p.request.get(`${app.url}/api/auth/csrf`)).json()) as { token: string };
  const res = await p.request.post(`${app.url}/api/auth/login`, {
    data: { email: 'admin@demo.ebbroot.test', password: 'ebbroot-demo' },
    headers: { 'x-csrf-token': csrf.token },
  });
  expect(res.status()).toBe(200);
}

describe('sponsoring a tree on a phone', () => {
  it('prices two trees with the card fee covered and goes to the hosted checkout', async () => {
    await fillDonateForm(page, donor, 2);
    expect(await page.getByRole('checkbox', { name: /Cover the card fees/ }).isChecked()).toBe(true);
    // 2 × $25 = $50, grossed up at 2.9 % + 30¢: (50 + 0.30) / 0.971 = 51.80… → $51.81 (TRADE.md §7 worked example).
    await expect.poll(() => page.getByText('Adds $1.81 to your payment.').isVisible()).toBe(true);
    expect(await overflow(page)).toBeLessThanOrEqual(0);
    await page.getByRole('button', { name: 'Continue to pay $51.81' }).click();

    await page.waitForURL(/\/pay\/cs_/, { timeout: 20_000 });
    expect(await page.getByText('Total 51.81 USD').isVisible()).toBe(true);
  });

  it('pays with the success test card and lands on the thank-you page with the recorded gift', async () => {
    await payWith(page, '4242 4242 4242 4242');
    await page.waitForURL(/\/sponsor\/thanks\?session_id=cs_/, { timeout: 20_000 });
    // Recorded from the signed webhook, which may land a moment after the redirect: the page keeps asking.
    await expect.poll(() => page.getByText(`Your gift of $51.81 sponsors 2 trees in ${CAMPAIGN}.`).isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await page.getByRole('heading', { level: 1, name: 'Thank you, Noor' }).isVisible()).toBe(true);
    tags = (await page.getByRole('list', { name: /Your trees carry the tags/ }).getByRole('listitem').allTextContents()).map((t) => t.trim());
    expect(tags).toHaveLength(2);
    expect(await page.getByRole('heading', { name: 'What happens next' }).isVisible()).toBe(true);
    expect(await overflow(page)).toBeLessThanOrEqual(0);
  });

  it('delivers the receipt to the donor', async () => {
    type Message = { id: string; subject: string; text?: string };
    let receipt: Message | undefined;
    await expect.poll(async () => {
      const list = (await (await fetch(`${app.mailUrl}/messages?to=${encodeURIComponent(donor.email)}`)).json()) as Message[];
      receipt = list.find((m) => /receipt/i.test(m.subject));
      return receipt !== undefined;
    }, { timeout: 30_000, interval: 500 }).toBe(true);
    expect(receipt!.subject).toContain('$51.81');
  });

  it('shows the admin the donation and the trees it sponsors', async () => {
    await signInAsAdmin(page);
    await page.goto(`${app.url}/donations`);
    await page.getByLabel('Donor name, e-mail or checkout session').fill(donor.email);
    await page.getByRole('button', { name: 'Find' }).click();
    const card = page.getByRole('list', { name: 'Donations' }).getByRole('listitem').filter({ hasText: donor.name });
    await expect.poll(() => card.count(), { timeout: 20_000 }).toBe(1);
    expect(await card.getByText('incl. $1.81 fee cover').isVisible()).toBe(true);
    expect(await card.getByText('Paid', { exact: true }).isVisible()).toBe(true);
    const linked = (await card.getByRole('list', { name: 'Sponsored trees' }).getByRole('link').allTextContents()).map((t) => t.trim());
    expect(linked.sort()).toEqual([...tags].sort());
  });

  it('shows a declined card on the checkout page and records no donation', async () => {
    await fillDonateForm(page, { name: 'Ivo Marsh', email: declinedEmail }, 1);
    await page.getByRole('button', { name: 'Continue to pay $26.06' }).click();
    await payWith(page, '4000 0000 0000 0002');

    await expect.poll(() => page.getByRole('alert').textContent(), { timeout: 15_000 }).toMatch(/Your card was declined/);
    expect(page.url()).toMatch(/\/pay\/cs_/);
    // Give a stray webhook time to arrive, then make sure nothing was written.
    await page.waitForTimeout(2000);
    const res = await page.request.get(`${app.url}/api/donations?q=${encodeURIComponent(declinedEmail)}`);
    expect(res.status()).toBe(200);
    expect(((await res.json()) as { total: number }).total).toBe(0);
  });
});
