/**
 * Outcomes, as the demo coordinator in Debian's Chromium against what `npm start` runs: record
 * the planting of a planting workday at the demo site Heron Reach, check one of its trees alive
 * by tag on a phone-width monitoring visit, open the reports and fetch the PDF report.
 *
 * The demo workdays plant no trees today (their plantings are already recorded, or still ahead),
 * so the test sets up its own: two fresh ready trees reserved for a published planting workday at
 * Heron Reach that ended an hour ago.
 */
import { randomBytes } from 'node:crypto';
import type { APIRequestContext, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser } from './browser.js';
import { startLikeNpmStart, type StartedApp } from './start-server.js';

let app: StartedApp;
let browser: BrowserContext;
let page: Page;
const title = `Planting at Heron Reach (test ${randomBytes(3).toString('hex')})`;
let workdayId = '';
let tags: string[] = [];
let treeIds: string[] = [];

async function api<T>(request: APIRequestContext, method: 'get' | 'post', path: string, data?: unknown): Promise<T> {
  const csrf = (await (await request.get(`${app.url}/api/auth/csrf`)).json()) as { token: string };
  const res = await request[method](`${app.url}${path}`, { data, headers: { 'x-csrf-token': csrf.token } });
  if (!res.ok()) throw new Error(`${method} ${path}: HTTP ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** Two new trees, ready, reserved for a published planting workday at Heron Reach that ended an hour ago. */
async function setUpPlantingDay(request: APIRequestContext): Promise<void> {
  const { sites } = await api<{ sites: { id: string; name: string }[] }>(request, 'get', '/api/sites');
  const heron = sites.find((s) => s.name === 'Heron Reach');
  if (!heron) throw new Error('the demo site Heron Reach is missing');
  const collectedOn = new Date(Date.now() - 3 * 86_400_000).toISOString().slice(0, 10);
  const batch = await api<{ trees: { id: string; tag: string }[] }>(request, 'post', '/api/batches', { collectedOn, place: 'Browser test batch', count: 2 });
  treeIds = batch.trees.map((t) => t.id);
  tags = batch.trees.map((t) => t.tag);
  await api(request, 'post', '/api/trees/bulk/move', { treeIds, stage: 'ready', note: 'Browser test' });
  const now = Date.now();
  const { workday } = await api<{ workday: { id: string } }>(request, 'post', '/api/workdays', {
    title, kind: 'planting', siteId: heron.id, status: 'published', capacity: 6,
    startsAt: new Date(now - 3 * 3_600_000).toISOString(), endsAt: new Date(now - 3_600_000).toISOString(),
  });
  workdayId = workday.id;
  await api(request, 'post', `/api/workdays/${workdayId}/reserved-trees`, { treeIds });
}

beforeAll(async () => {
  app = await startLikeNpmStart();
  browser = await launchBrowser({ width: 375, height: 812 });
  page = await browser.newPage();
  await page.goto(`${app.url}/login`);
  await page.getByLabel('Email').fill('coordinator@demo.ebbroot.test');
  await page.getByLabel('Password').fill('ebbroot-demo');
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL(`${app.url}/`);
  await setUpPlantingDay(page.request);
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

const overflow = () => page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);

describe('outcomes, as the coordinator', () => {
  it('records the planting of the reserved trees from the workday page', async () => {
    await page.goto(`${app.url}/workdays/${workdayId}/manage`);
    await page.getByRole('link', { name: 'Record planting' }).click();
    await page.waitForURL(/\/planting$/);
    for (const tag of tags) expect(await page.getByRole('checkbox', { name: `Plant ${tag}` }).isChecked()).toBe(true);
    expect(await page.getByText(/above mean lower low water \(MLLW\)/).isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Record 2 trees as planted' }).click();
    await expect.poll(() => page.getByText('Recorded 2 trees as planted at Heron Reach.').isVisible(), { timeout: 15_000 }).toBe(true);
    expect(await page.getByRole('list', { name: 'Trees planted by this workday' }).getByRole('listitem').count()).toBe(2);
    expect(await overflow()).toBeLessThanOrEqual(0);
  });

  it('checks a planted tree alive by its tag on a monitoring visit, one-handed at phone width', async () => {
    await page.goto(`${app.url}/monitoring`);
    const form = page.getByRole('form', { name: 'Start a visit' });
    await expect.poll(() => form.getByRole('option', { name: 'Heron Reach' }).count(), { timeout: 15_000 }).toBe(1);
    await form.getByLabel('Site').selectOption({ label: 'Heron Reach' });
    await form.getByRole('button', { name: 'Start checking trees' }).click();
    await page.waitForURL(/\/monitoring\/[0-9a-f-]{36}$/);

    const tag = tags[0]!;
    await page.getByRole('textbox', { name: 'Tag number' }).fill(String(Number(tag.replace(/\D/g, ''))));
    await page.getByRole('button', { name: 'Find' }).click();
    await expect.poll(() => page.getByRole('heading', { level: 2, name: tag }).isVisible(), { timeout: 10_000 }).toBe(true);
    const alive = page.locator('label', { has: page.getByRole('radio', { name: /Alive/ }) });
    // Thumb-sized targets, measured in the browser.
    expect((await alive.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    expect((await page.getByRole('button', { name: 'Save and next' }).boundingBox())!.height).toBeGreaterThanOrEqual(44);
    await alive.click();
    await page.getByRole('textbox', { name: 'Height (cm, optional)' }).fill('58');
    await page.getByRole('button', { name: 'Save and next' }).click();
    await expect.poll(() => page.getByText(`Saved ${tag}.`).isVisible(), { timeout: 10_000 }).toBe(true);
    expect(await page.getByRole('list', { name: 'Checked trees' }).getByText(tag).isVisible()).toBe(true);
    expect(await overflow()).toBeLessThanOrEqual(0);

    // The tree's stage follows its check.
    const detail = await api<{ tree: { stage: string } }>(page.request, 'get', `/api/trees/${treeIds[0]}`);
    expect(detail.tree.stage).toBe('alive');
  });

  it('opens the reports and makes the PDF report for the same filters', async () => {
    await page.goto(`${app.url}/reports`);
    await expect.poll(() => page.getByText('Value of volunteer time').isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await page.getByRole('img', { name: /Survival by months since planting/ }).isVisible()).toBe(true);
    expect(await overflow()).toBeLessThanOrEqual(0);

    const href = await page.getByRole('link', { name: 'Make PDF report' }).getAttribute('href');
    const year = new Date().getFullYear();
    expect(href).toBe(`/api/reports/report.pdf?from=${year}-01-01&to=${year}-12-31`);
    const pdf = await page.request.get(`${app.url}${href}`);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toMatch(/^application\/pdf/);
    const body = await pdf.body();
    expect(body.length).toBeGreaterThan(1000);
    expect(body.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  });
});
