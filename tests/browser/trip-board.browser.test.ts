/**
 * A coordinator's trip plan, in Debian's Chromium against what `npm start` runs: opens the demo
 * boat day from its manage page, builds the plan, sees a lane per craft with runs and load bars
 * (never above the rating), sends a pot ashore with the stepper, and the board fits a phone.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_BOAT_DAY_TITLE } from '../../server/db/seeds/demo-fleet.js';
import { launchBrowser } from './browser.js';
import { startLikeNpmStart, type StartedApp } from './start-server.js';

let app: StartedApp;
let browser: BrowserContext;
let page: Page;

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

describe('the trip board, as a coordinator', () => {
  it('opens the demo boat day’s trip board from its manage page', async () => {
    const res = await page.request.get(`${app.url}/api/workdays?status=published`);
    const { workdays } = (await res.json()) as { workdays: { id: string; title: string }[] };
    const boatDay = workdays.find((w) => w.title === DEMO_BOAT_DAY_TITLE);
    expect(boatDay).toBeDefined();
    await page.goto(`${app.url}/workdays/${boatDay!.id}/manage`);
    await page.getByRole('link', { name: 'Trip plan' }).click();
    await page.waitForURL(`${app.url}/workdays/${boatDay!.id}/trips`);
    await expect.poll(() => page.getByRole('heading', { level: 1, name: `Trip plan: ${DEMO_BOAT_DAY_TITLE}` }).isVisible(), { timeout: 20_000 }).toBe(true);
  });

  it('builds a plan and shows lanes with runs and load bars within the rating', async () => {
    // An earlier run on the same database may have left a plan: then the button re-plans.
    const build = page.getByRole('button', { name: /^(Build plan|Re-plan)$/ });
    await expect.poll(() => build.isVisible(), { timeout: 20_000 }).toBe(true);
    await build.click();
    const confirm = page.getByRole('dialog', { name: 'Re-plan from scratch?' });
    if (await confirm.isVisible().catch(() => false)) await confirm.getByRole('button', { name: 'Re-plan' }).click();
    await expect.poll(() => page.getByText(/^(Proven best|Workable)$/).first().isVisible(), { timeout: 30_000 }).toBe(true);

    await expect.poll(() => page.getByRole('region', { name: 'Skimmer' }).isVisible()).toBe(true);
    const meters = page.getByRole('meter', { name: /^Load on / });
    expect(await meters.count()).toBeGreaterThan(2);
    for (const share of await meters.evaluateAll((els) => els.map((e) => Number(e.getAttribute('aria-valuenow'))))) {
      expect(share).toBeGreaterThan(0);
      expect(share).toBeLessThanOrEqual(100);
    }
    expect(await page.getByRole('article', { name: /^Skimmer run \d+$/ }).count()).toBeGreaterThan(0);
    expect(await page.getByRole('img', { name: /window closes at \d\d:\d\d/ }).isVisible()).toBe(true);
    expect(await page.getByRole('link', { name: 'Float plan (PDF)' }).getAttribute('href')).toMatch(/\/trip-plan\/float-plan\.pdf$/);
    expect(await page.getByText(/licensed operator’s judgement/).first().isVisible()).toBe(true);
  });

  it('sends a pot back ashore with the stepper, and the edit is saved', async () => {
    // Fewer pots on a run never breaks a rule, so this edit must be accepted.
    const fewer = page.getByRole('button', { name: /^One pot fewer: Pots on / }).and(page.locator(':not([disabled])')).first();
    const label = (await fewer.getAttribute('aria-label')) ?? '';
    const run = label.replace('One pot fewer: Pots on ', '');
    const ashore = async () => Number(/\((\d+) of/.exec((await page.getByText(/^Pots \(\d+ of \d+\)$/).textContent()) ?? '')?.[1]);
    const before = await ashore();
    await fewer.click();
    await expect.poll(() => page.getByText(`Saved: setting ${run} to`, { exact: false }).count(), { timeout: 15_000 }).toBe(1);
    await expect.poll(() => page.getByText('Edited by hand', { exact: true }).isVisible()).toBe(true);
    expect(await ashore()).toBe(before + 1);
  });

  it('fits a phone’s width', async () => {
    await page.setViewportSize({ width: 375, height: 812 });
    await page.reload();
    await expect.poll(() => page.getByRole('region', { name: 'Skimmer' }).isVisible(), { timeout: 20_000 }).toBe(true);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
  });
});
