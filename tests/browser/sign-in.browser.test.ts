/**
 * A new user's first minutes, in Debian's Chromium against the server `npm start` runs:
 * register, sign out, sign in, sign in through the Google stand-in; then Ctrl-C.
 */
import { randomBytes } from 'node:crypto';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser } from './browser.js';
import { startLikeNpmStart, type StartedApp } from './start-server.js';

let app: StartedApp;
let browser: BrowserContext;
let page: Page;
const email = `rin.${randomBytes(4).toString('hex')}@test.ebbroot.test`;
const password = 'mud flats at dawn';

beforeAll(async () => {
  app = await startLikeNpmStart();
  browser = await launchBrowser();
  page = await browser.newPage();
});

afterAll(async () => {
  await browser?.close();
});

async function signOut(p: Page) {
  await p.getByRole('button', { name: 'Sign out' }).first().click();
  await p.waitForURL('**/login**');
}

describe('signing in, as a new volunteer would', () => {
  it('prints the address and the demo sign-ins at start', () => {
    expect(app.output()).toContain(`Ebbroot is running at ${app.url}`);
    expect(app.output()).toContain('coordinator@demo.ebbroot.test');
  });

  it('registers and lands on the volunteer home', async () => {
    await page.goto(`${app.url}/register`);
    await page.getByLabel('Name').fill('Rin Harbor');
    await page.getByLabel('Email').fill(email);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Create account' }).click();
    await expect.poll(() => page.getByRole('heading', { name: 'Hello, Rin' }).isVisible(), { timeout: 15_000 }).toBe(true);
    await expect.poll(() => page.getByText('Your next workday').isVisible()).toBe(true);
  });

  it('signs out and back in with e-mail and password', async () => {
    await signOut(page);
    await page.getByLabel('Email').fill(email);
    await page.getByLabel('Password').fill('not the password');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await expect.poll(() => page.getByRole('alert').first().textContent()).toMatch(/don't match/i);
    await page.getByLabel('Password').fill(password);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await expect.poll(() => page.getByRole('heading', { name: 'Hello, Rin' }).isVisible(), { timeout: 15_000 }).toBe(true);
  });

  it('signs in through the Google stand-in with a typed identity', async () => {
    await signOut(page);
    await page.getByRole('button', { name: 'Continue with Google' }).click();
    await page.waitForURL(/\/o\/oauth2\/v2\/auth/);
    await page.getByLabel('Name').fill('Gale Pereira');
    await page.getByLabel('Email').fill(`gale.${randomBytes(4).toString('hex')}@example.com`);
    await page.getByRole('button', { name: 'Continue as this person' }).click();
    await page.waitForURL(`${app.url}/`);
    await expect.poll(() => page.getByRole('heading', { name: 'Hello, Gale' }).isVisible(), { timeout: 15_000 }).toBe(true);
  });

  it('shows the demo coordinator the people list at phone width without sideways scrolling', async () => {
    const phone = await launchBrowser({ width: 375, height: 812 });
    const p = await phone.newPage();
    await p.goto(`${app.url}/login`);
    await p.getByLabel('Email').fill('coordinator@demo.ebbroot.test');
    await p.getByLabel('Password').fill('ebbroot-demo');
    await p.getByRole('button', { name: 'Sign in', exact: true }).click();
    await expect.poll(() => p.getByRole('heading', { name: /Hello/ }).isVisible(), { timeout: 15_000 }).toBe(true);
    await p.getByRole('button', { name: 'Menu' }).click();
    await p.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'People' }).click();
    await expect.poll(() => p.getByText('Unverified').first().isVisible(), { timeout: 15_000 }).toBe(true);
    const overflow = await p.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await phone.close();
  });

  it('stops the server and the fakes on Ctrl-C', async () => {
    expect(await app.stop()).toBe(0);
    expect(app.output()).toContain('Stopped: server, fakes and PostgreSQL.');
    await expect(fetch(`${app.url}/api/health`)).rejects.toThrow();
    await expect(fetch(`${app.mailUrl}/messages`)).rejects.toThrow();
  });
});
