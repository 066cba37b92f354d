import { mkdirSync } from 'node:fs';
import { chromium, type Browser, type BrowserContextOptions, type Page } from 'playwright-core';

export const ARTIFACTS = 'tests/e2e/artifacts';

/** Debian's Chromium, with the flags this closed network needs. */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: [
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
      '--disable-gpu',
    ],
  });
}

export const PHONE: BrowserContextOptions = { viewport: { width: 390, height: 844 }, deviceScaleFactor: 2, isMobile: true, hasTouch: true };
export const DESK: BrowserContextOptions = { viewport: { width: 1366, height: 900 } };

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(ARTIFACTS, { recursive: true });
  const path = `${ARTIFACTS}/${name}.png`;
  await page.screenshot({ path, fullPage: true });
  return path;
}
