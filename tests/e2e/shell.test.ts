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

  it('when a visitor opens an unknown page on a phone, then the not-found page shows in Nunito', async () => {
    const context = await browser.newContext(PHONE);
    const page = await context.newPage();
    const consoleErrors: string[] = [];
    page.on('console', (m) => m.type() === 'error' && consoleErrors.push(m.text()));
    await page.goto(`${inject('baseUrl')}/no-such-page`);
    await expect(page.getByRole('heading', { name: /couldn't find that page/i }).isVisible()).resolves.toBe(true);
    const font = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(font).toMatch(/Nunito/);
    expect(await page.evaluate(() => document.fonts.check('16px Nunito'))).toBe(true);
    const path = await screenshot(page, 'shell-not-found-phone');
    expect(existsSync(path)).toBe(true);
    expect(consoleErrors).toEqual([]);
    await context.close();
  });
});
