/** Debian's Chromium through playwright-core, with the flags this machine needs. */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';

export async function launchBrowser(viewport = { width: 1280, height: 800 }): Promise<BrowserContext> {
  const phone = viewport.width < 600;
  return chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), 'ebbroot-browser-')), {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport,
    isMobile: phone,
    hasTouch: phone,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking',
      '--disable-component-update', '--disable-sync', '--disable-dev-shm-usage'],
  });
}
