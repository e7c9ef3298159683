/**
 * A volunteer on a phone, against what `npm start` runs: finds an open workday in the
 * calendar, signs up through the stepper with the waiver, sees the confirmation, and the
 * SMTP stand-in holds the confirmation e-mail with a valid .ics (parsed per RFC 5545).
 */
import { randomBytes } from 'node:crypto';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseCalendar } from '../setup/ics.js';
import { launchBrowser } from './browser.js';
import { startLikeNpmStart, type StartedApp } from './start-server.js';

let app: StartedApp;
let browser: BrowserContext;
let page: Page;
const email = `shore.${randomBytes(4).toString('hex')}@test.ebbroot.test`;

beforeAll(async () => {
  app = await startLikeNpmStart();
  browser = await launchBrowser({ width: 375, height: 812 });
  page = await browser.newPage();
  const csrf = (await (await page.request.get(`${app.url}/api/auth/csrf`)).json()) as { token: string };
  const reg = await page.request.post(`${app.url}/api/auth/register`, { data: { name: 'Sol Marsh', email, password: 'roots in the mud' }, headers: { 'x-csrf-token': csrf.token } });
  expect(reg.status()).toBe(201);
});

afterAll(async () => {
  await browser?.close();
  await app?.stop();
});

describe('signing up for a workday on a phone', () => {
  it('finds an open workday in the calendar list', async () => {
    await page.goto(`${app.url}/workdays?view=list`);
    const link = page.getByRole('list', { name: 'Upcoming workdays' }).getByRole('link', { name: /Saltmarsh Point/ }).first();
    await expect.poll(() => link.isVisible(), { timeout: 20_000 }).toBe(true);
    await link.click();
    await page.waitForURL(/\/workdays\/[0-9a-f-]{36}/);
    await expect.poll(() => page.getByRole('heading', { name: /Saltmarsh Point/ }).first().isVisible()).toBe(true);
    expect(await page.getByText(/life jacket/i).first().isVisible()).toBe(true);
  });

  it('signs up with the waiver and sees the confirmation', async () => {
    await page.getByRole('button', { name: 'Sign up for this workday' }).click();
    // Element Plus hides the native radio; people tap its label.
    await page.locator('label', { has: page.getByRole('radio', { name: /Planter/ }) }).first().click();
    await page.getByRole('button', { name: 'Next' }).click();
    await page.getByLabel('Date of birth').fill('1990-05-01');
    await page.getByLabel("Emergency contact's name").fill('Rae Marsh');
    await page.getByLabel("Emergency contact's phone").fill('727 555 0142');
    await page.getByRole('button', { name: 'Next' }).click();
    await page.locator('label', { hasText: 'I have read and accept the waiver' }).click();
    await page.getByLabel('Your full name, typed as your signature').fill('Sol Marsh');
    await page.getByRole('button', { name: 'Join the crew' }).click();
    await expect.poll(() => page.getByText("You're on the crew as planter.").isVisible(), { timeout: 15_000 }).toBe(true);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
  });

  it('delivers the confirmation e-mail with a valid calendar file', async () => {
    type Message = { id: string; subject: string; attachments: string[] };
    let mail: Message | undefined;
    await expect.poll(async () => {
      const list = (await (await fetch(`${app.mailUrl}/messages?to=${encodeURIComponent(email)}`)).json()) as Message[];
      mail = list.find((m) => m.attachments.some((a) => a.endsWith('.ics')));
      return mail !== undefined;
    }, { timeout: 30_000, interval: 500 }).toBe(true);
    expect(mail!.subject).toMatch(/Saltmarsh Point|confirmed|on the crew/i);
    const index = mail!.attachments.findIndex((a) => a.endsWith('.ics'));
    const ics = await (await fetch(`${app.mailUrl}/messages/${mail!.id}/attachments/${index}`)).text();
    const { events: [event] } = parseCalendar(ics); // throws unless a VCALENDAR with VERSION and PRODID
    expect(event).toMatchObject({ allUtc: true });
    expect(event!.uid).toMatch(/^workday-[0-9a-f-]{36}@/);
    expect(event!.end.getTime()).toBeGreaterThan(event!.start.getTime());
  });
});
