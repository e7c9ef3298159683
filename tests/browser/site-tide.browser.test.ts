/**
 * A coordinator's path through tides, in Debian's Chromium against what `npm start` runs:
 * create a site from coordinates, see its tide board and low-water windows, open a draft
 * workday from a window.
 */
import { randomBytes } from 'node:crypto';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser } from './browser.js';
import { startLikeNpmStart, type StartedApp } from './start-server.js';

let app: StartedApp;
let browser: BrowserContext;
let page: Page;
const siteName = `Mudflat ${randomBytes(3).toString('hex')}`;

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

describe('tides, as a coordinator', () => {
  it('creates a site from pasted coordinates with the nearest station', async () => {
    await page.goto(`${app.url}/sites/new`);
    await page.getByLabel('Site name').fill(siteName);
    await page.getByLabel('Latitude').fill('27.99, -82.69');
    await page.getByLabel('Latitude').blur();
    await expect.poll(() => page.getByLabel('Longitude').inputValue()).toBe('-82.69');
    await page.getByRole('button', { name: 'Nearest to these coordinates' }).click();
    await expect.poll(() => page.getByRole('list', { name: 'Stations' }).getByRole('button').first().textContent(), { timeout: 20_000 }).toMatch(/Safety Harbor/);
    await page.getByRole('list', { name: 'Stations' }).getByRole('button').first().click();
    await page.getByLabel(/Bed elevation/).fill('0.8');
    await page.getByLabel(/Route's shallowest point/).fill('-0.4');
    await page.getByRole('button', { name: 'Create site' }).click();
    await page.waitForURL(/\/sites\/[0-9a-f-]{36}/, { timeout: 20_000 });
    await expect.poll(() => page.getByRole('heading', { name: siteName }).isVisible()).toBe(true);
  });

  it('shows the tide board with windows and opens a draft workday from one', async () => {
    const plan = page.getByRole('button', { name: /Plan a workday/ }).first();
    await expect.poll(() => plan.isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await page.locator('svg').count()).toBeGreaterThan(0);
    await plan.click();
    await page.getByRole('button', { name: 'Create draft workday' }).click();
    await expect.poll(() => page.getByText(/draft/i).first().isVisible(), { timeout: 15_000 }).toBe(true);
    const res = await page.request.get(`${app.url}/api/workdays?status=draft`);
    const drafts = (await res.json()) as { workdays: { site: { name: string } }[] };
    expect(drafts.workdays.some((w) => w.site.name === siteName)).toBe(true);
  });

  it('shows the window calendar for the month', async () => {
    await page.goto(`${app.url}/windows`);
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent(), { timeout: 20_000 }).toBeTruthy();
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
  });
});
