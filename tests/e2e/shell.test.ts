import { existsSync } from 'node:fs';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { launchBrowser, PHONE, screenshot } from '../helpers/browser';

describe('the app shell in a browser', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('when a visitor opens a signed-in page on a phone, then they land on sign-in, in Nunito', async () => {
    const context = await browser.newContext(PHONE);
    const page = await context.newPage();
    const consoleErrors: string[] = [];
    // The browser itself logs the expected 401 of /api/me for a signed-out visitor; anything else is a bug.
    page.on('console', (m) => m.type() === 'error' && !/status of 401/.test(m.text()) && consoleErrors.push(m.text()));
    await page.goto(`${inject('baseUrl')}/profile`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    expect(new URL(page.url()).searchParams.get('next')).toBe('/profile');
    const font = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(font).toMatch(/Nunito/);
    expect(await page.evaluate(() => document.fonts.check('16px Nunito'))).toBe(true);
    const path = await screenshot(page, 'sign-in-phone');
    expect(existsSync(path)).toBe(true);
    expect(consoleErrors).toEqual([]);
    await context.close();
  });
});
