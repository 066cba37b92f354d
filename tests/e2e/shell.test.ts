import { existsSync } from 'node:fs';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { expectAccessible, launchBrowser, openPage, PHONE, screenshot } from '../helpers/browser';

describe('the app shell in a browser', () => {
  let browser: Browser;
  beforeAll(async () => {
    browser = await launchBrowser();
  });
  afterAll(() => browser?.close());

  it('when a visitor opens a signed-in page on a phone, then they land on sign-in, in Nunito', async () => {
    const { page } = await openPage(browser, PHONE);
    await page.goto(`${inject('baseUrl')}/profile`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    expect(new URL(page.url()).searchParams.get('next')).toBe('/profile');
    const font = await page.evaluate(() => getComputedStyle(document.body).fontFamily);
    expect(font).toMatch(/Nunito/);
    expect(await page.evaluate(() => document.fonts.check('16px Nunito'))).toBe(true);
    const path = await screenshot(page, 'sign-in-phone');
    expect(existsSync(path)).toBe(true);
    await expectAccessible(page);
  });
});
