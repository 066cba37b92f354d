import { mkdirSync } from 'node:fs';
import { TEST_PASSWORD } from './factories';
import { chromium, type Browser, type BrowserContext, type BrowserContextOptions, type Page } from 'playwright-core';

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

/** Opens `path` as a visitor and signs in on the form it is sent to, the way a person would. */
export async function signInOn(page: Page, email: string, path: string, password = TEST_PASSWORD): Promise<void> {
  const { inject } = await import('vitest');
  await page.goto(`${inject('baseUrl')}${path}`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** A fresh browser context signed in as `email`, landed on `path`, collecting page errors. */
export async function openSignedIn(browser: Browser, viewport: BrowserContextOptions, email: string, path: string): Promise<{ context: BrowserContext; page: Page; errors: string[] }> {
  const context = await browser.newContext(viewport);
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  await signInOn(page, email, path);
  await page.waitForURL((u) => u.pathname === path);
  return { context, page, errors };
}
