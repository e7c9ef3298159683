/**
 * A coordinator's nursery round, in Debian's Chromium against what `npm start` runs: create a
 * tank, log a hydrometer reading and see it converted to ppt, then open a tree from the ledger
 * and record a measurement.
 */
import { randomBytes } from 'node:crypto';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser } from './browser.js';
import { startLikeNpmStart, type StartedApp } from './start-server.js';

let app: StartedApp;
let browser: BrowserContext;
let page: Page;
const tankName = `Bucket ${randomBytes(3).toString('hex')}`;

beforeAll(async () => {
  app = await startLikeNpmStart();
  browser = await launchBrowser({ width: 1280, height: 900 });
  page = await browser.newPage();
  await page.goto(`${app.url}/login`);
  await page.getByLabel('Email').fill('coordinator@demo.ebbroot.test');
  await page.getByLabel('Password').fill('ebbroot-demo');
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL(`${app.url}/`);
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

/** A fresh one-tree batch through the API (with the session's CSRF token), so the test owns its tree. */
async function freshTree(): Promise<{ id: string; tag: string }> {
  const { token } = (await (await page.request.get(`${app.url}/api/auth/csrf`)).json()) as { token: string };
  const res = await page.request.post(`${app.url}/api/batches`, {
    data: { collectedOn: '2026-09-01', place: 'Browser test wrack line', count: 1 },
    headers: { 'X-CSRF-Token': token },
  });
  expect(res.status()).toBe(201);
  return ((await res.json()) as { trees: { id: string; tag: string }[] }).trees[0]!;
}

describe('the nursery, as a coordinator', () => {
  it('creates a tank typed in US gallons and shows it in both units', async () => {
    await page.goto(`${app.url}/nursery`);
    await page.getByRole('tab', { name: 'Tanks' }).click();
    await page.getByRole('button', { name: 'New tank' }).click();
    const form = page.getByRole('form', { name: 'New tank' });
    await form.getByLabel('Name').fill(tankName);
    await form.getByText('US gallons').click();
    await form.getByLabel('Volume', { exact: true }).fill('5');
    // TRADE.md §4: a 5 US gal bucket holds 18.93 L.
    await expect.poll(() => form.getByText('That is 5 gal (18.9 L).').isVisible()).toBe(true);
    await form.getByRole('button', { name: 'Create tank' }).click();
    await expect.poll(() => page.getByText(`${tankName} added.`).isVisible(), { timeout: 15_000 }).toBe(true);
    const card = page.getByRole('listitem').filter({ has: page.getByRole('heading', { name: tankName }) });
    await expect.poll(() => card.getByText(/5 gal \(18\.9 L\)/).isVisible()).toBe(true);
  });

  it('logs a hydrometer reading and shows the salinity the server converted', async () => {
    const card = page.getByRole('listitem').filter({ has: page.getByRole('heading', { name: tankName }) });
    await card.getByRole('button', { name: 'Log a reading' }).click();
    await card.getByText('Hydrometer (specific gravity)').click();
    await expect.poll(() => card.getByText(/density over pure water's at the same temperature \(t\/t\)/).isVisible()).toBe(true);
    await card.getByLabel('Specific gravity', { exact: true }).fill('1.0150');
    await card.getByLabel('Water temperature (°C)').fill('25');
    await card.getByRole('button', { name: 'Save reading' }).click();
    // TRADE.md §4 check 2 (EOS-80, Millero & Poisson 1981): SG 1.0150 at 25/25 °C is S 19.9.
    await expect.poll(() => card.getByText('Saved: 19.9 ppt.').isVisible(), { timeout: 15_000 }).toBe(true);

    await card.getByRole('button', { name: 'Readings' }).click();
    const row = card.getByRole('table', { name: 'Salinity readings' }).getByRole('row').nth(1);
    await expect.poll(() => row.textContent(), { timeout: 15_000 }).toMatch(/Hydrometer.*19\.9 ppt.*1\.0150.*25 °C/);
  });

  it('opens a tree from the ledger and records a measurement that shows in its growth', async () => {
    const tree = await freshTree();
    await page.goto(`${app.url}/nursery`);
    await page.getByLabel('Tag number').fill(tree.tag);
    await page.getByRole('button', { name: 'Find' }).click();
    await page.getByRole('link', { name: tree.tag, exact: true }).click();
    await page.waitForURL(`${app.url}/nursery/trees/${tree.id}`);

    const drawer = page.getByRole('dialog', { name: `Tree ${tree.tag}` });
    await expect.poll(() => drawer.getByText('No heights measured yet.').isVisible(), { timeout: 15_000 }).toBe(true);
    await drawer.getByLabel('Height (cm)', { exact: true }).fill('33.5');
    await drawer.getByLabel('Leaf count').fill('6');
    await drawer.getByRole('button', { name: 'Save measurement' }).click();
    await expect.poll(() => drawer.getByText('Measurement saved.').isVisible(), { timeout: 15_000 }).toBe(true);
    await expect.poll(() => drawer.getByRole('table', { name: 'Height over time' }).getByRole('cell', { name: '33.5' }).isVisible()).toBe(true);
    expect(await drawer.getByRole('img', { name: /one measurement, 33\.5 cm/ }).count()).toBe(1);
    await expect.poll(() => drawer.getByRole('list', { name: 'History' }).textContent()).toMatch(/Measured: 33\.5 cm, 6 leaves/);
  });

  it('fits a phone: no sideways scrolling on the tanks tab', async () => {
    const phone = await launchBrowser({ width: 375, height: 812 });
    try {
      const p = await phone.newPage();
      await p.goto(`${app.url}/login`);
      await p.getByLabel('Email').fill('coordinator@demo.ebbroot.test');
      await p.getByLabel('Password').fill('ebbroot-demo');
      await p.getByRole('button', { name: 'Sign in', exact: true }).click();
      await p.waitForURL(`${app.url}/`);
      await p.goto(`${app.url}/nursery`);
      await p.getByRole('tab', { name: 'Tanks' }).click();
      const card = p.getByRole('listitem').filter({ has: p.getByRole('heading', { name: tankName }) });
      await card.getByRole('button', { name: 'Readings' }).click();
      await expect.poll(() => card.getByRole('table', { name: 'Salinity readings' }).isVisible(), { timeout: 15_000 }).toBe(true);
      expect(await p.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
    } finally {
      await phone.close();
    }
  });
});
