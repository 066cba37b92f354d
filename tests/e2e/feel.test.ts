import type { Browser } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESK, expectAccessible, launchBrowser, openSignedIn, PHONE, screenshot } from '../helpers/browser';
import { resetDatabase } from '../helpers/db';
import { openE2eDataSource } from '../helpers/e2e-db';
import { makeClub, makeMember } from '../helpers/factories';
import { insertTank, insertWaterTest } from '../helpers/tank-rows';

const DAY = 86_400_000;

describe('the feel of the app: keyboard, titles, dialogs, offline, dark mode', () => {
  let browser: Browser;
  let ds: DataSource;
  let keeperEmail: string;
  let tankId: string;
  beforeAll(async () => {
    browser = await launchBrowser();
    ds = await openE2eDataSource();
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Kelpwater Circle');
    const keeper = await makeMember(ds, club, 'Rosa Keeper');
    keeperEmail = keeper.user.email;
    tankId = await insertTank(ds, {
      clubId: club.id,
      ownerId: keeper.user.id,
      systemType: 'tropical-freshwater',
      phase: 'established',
      volumeL: 120,
      name: 'Rosa’s river tank',
    });
    for (const [daysAgo, nitrate] of [
      [6, 10],
      [4, 15],
      [2, 20],
    ] as const) {
      await insertWaterTest(ds, tankId, new Date(Date.now() - daysAgo * DAY), {
        nitrate,
        pH: 7.2,
        temperature: 25,
      });
    }
  });
  afterAll(async () => {
    await browser?.close();
    await ds?.destroy();
  });

  it('when a keeper uses only the keyboard at a desk, then the skip link, page titles, the charts’ table and the archive dialog all work', async () => {
    const { page } = await openSignedIn(browser, DESK, keeperEmail, `/tanks/${tankId}`);
    await page.getByRole('heading', { name: 'Rosa’s river tank' }).waitFor();
    expect(await page.title()).toBe('Rosa’s river tank · Shoalwise');

    await page.keyboard.press('Tab');
    const skip = page.getByRole('link', { name: 'Skip to the page' });
    expect(await skip.evaluate((el) => el === document.activeElement)).toBe(true);
    await page.keyboard.press('Enter');
    expect(await page.evaluate(() => document.activeElement?.id)).toBe('main');

    const nitrate = page.locator('figure[data-chart="nitrate"]');
    await nitrate.getByRole('button', { name: 'Show the figures as a table' }).click();
    const table = nitrate.getByRole('table');
    await table.getByText(/Nitrate: 3 readings/).waitFor();
    expect(await table.getByRole('row').count()).toBe(4);
    await expectAccessible(page);

    await page.goto(`${inject('baseUrl')}/tanks/${tankId}/edit`);
    await page.getByRole('heading', { name: 'Edit Rosa’s river tank' }).waitFor();
    expect(await page.title()).toBe('Edit Rosa’s river tank · Shoalwise');
    const archive = page.getByRole('button', { name: 'Archive…' });
    await archive.focus();
    await page.keyboard.press('Enter');
    const dialog = page.getByRole('dialog', { name: 'Archive Rosa’s river tank?' });
    await dialog.waitFor();
    // Focus stays inside the modal dialog however far the keyboard goes.
    for (let i = 0; i < 4; i++) {
      await page.keyboard.press('Tab');
      expect(await dialog.evaluate((d) => d.contains(document.activeElement))).toBe(true);
    }
    await screenshot(page, 'archive-dialog-desk', { fullPage: false });
    await expectAccessible(page);
    await page.keyboard.press('Escape');
    await dialog.waitFor({ state: 'hidden' });
    expect(await archive.evaluate((el) => el === document.activeElement)).toBe(true);

    await page.goto(`${inject('baseUrl')}/tank-list-typo`);
    await page.getByRole('heading', { name: 'There is nothing at this address' }).waitFor();
    expect(await page.title()).toBe('Page not found · Shoalwise');
    await page.getByText('/tank-list-typo').waitFor();
    await screenshot(page, 'not-found-desk');
    await expectAccessible(page);
  });

  it('when the phone loses its network, then a banner says so and goes when it is back; saving units shows a toast; dark mode follows the phone', async () => {
    const { context, page } = await openSignedIn(browser, PHONE, keeperEmail, '/profile');
    await page.getByLabel('Your name').waitFor();
    await context.setOffline(true);
    const banner = page.getByText(/You are offline/);
    await banner.waitFor();
    await screenshot(page, 'offline-banner-phone');
    await context.setOffline(false);
    await banner.waitFor({ state: 'detached' });

    await page.getByLabel('Temperature').selectOption('F');
    await page.getByRole('button', { name: /save/i }).click();
    await page.getByRole('status').getByText('Profile and units saved.').waitFor();

    await page.emulateMedia({ colorScheme: 'dark' });
    await page.goto(`${inject('baseUrl')}/tanks/${tankId}`);
    await page.getByRole('heading', { name: 'Rosa’s river tank' }).waitFor();
    await page.locator('figure[data-chart="nitrate"] .recharts-line').waitFor();
    const background = await page.evaluate(() => getComputedStyle(document.body).backgroundColor);
    expect(background).toBe('rgb(11, 30, 38)');
    await screenshot(page, 'tank-page-dark-phone');
    await expectAccessible(page);
  });
});
