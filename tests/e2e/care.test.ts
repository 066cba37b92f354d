import type { Browser } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESK, expectAccessible, launchBrowser, openPage, PHONE, screenshot } from '../helpers/browser';
import { resetDatabase } from '../helpers/db';
import { openE2eDataSource } from '../helpers/e2e-db';
import { makeClub, makeMember, TEST_PASSWORD } from '../helpers/factories';
import { insertTank } from '../helpers/tank-rows';

describe('concerns on the tank page', () => {
  let browser: Browser;
  let ds: DataSource;
  let keeperEmail: string;
  let clubId: string;
  let tankId: string;
  beforeAll(async () => {
    browser = await launchBrowser();
    ds = await openE2eDataSource();
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Pipefish Circle');
    clubId = club.id;
    const keeper = await makeMember(ds, club, 'Noor Keeper');
    keeperEmail = keeper.user.email;
    tankId = await insertTank(ds, {
      clubId,
      ownerId: keeper.user.id,
      systemType: 'seahorse',
      phase: 'established',
      name: 'Noor’s seahorses',
    });
  });
  afterAll(async () => {
    await browser?.close();
    await ds?.destroy();
  });

  it('when a test with nitrite 1.0 is saved on a seahorse tank, then an urgent concern shows on the tank page and stays in history once resolved', async () => {
    const { page } = await openPage(browser, PHONE);
    await page.goto(`${inject('baseUrl')}/tanks/${tankId}`);
    await page.getByLabel('E-mail').fill(keeperEmail);
    await page.getByLabel('Password').fill(TEST_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Noor’s seahorses' }).waitFor();
    const status = await page.evaluate(
      async ({ clubId, tankId }) => {
        const { token } = (await (await fetch('/api/csrf')).json()) as { token: string };
        const res = await fetch(`/api/clubs/${clubId}/tanks/${tankId}/water-tests`, {
          method: 'POST',
          headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': token },
          body: JSON.stringify({
            takenAt: new Date().toISOString(),
            entries: {
              nitrite: { value: 1, unit: 'mg/L NO2' },
              temperature: { value: 24, unit: '°C' },
              pH: { value: 8.1 },
            },
          }),
        });
        return res.status;
      },
      { clubId, tankId },
    );
    expect(status).toBe(201);
    await page.reload();
    const concern = page.getByText(/Nitrite 1 mg\/L NO2: toxic/).first();
    await concern.waitFor();
    expect(await page.getByText('Act now').first().isVisible()).toBe(true);
    await screenshot(page, 'tank-urgent-concern-phone');
    await expectAccessible(page);

    await page
      .getByRole('listitem')
      .filter({ hasText: /Nitrite 1 mg\/L NO2: toxic/ })
      .getByRole('button', { name: 'Mark resolved' })
      .click();
    await page
      .getByText(/Nitrite 1 mg\/L NO2: toxic/)
      .first()
      .waitFor({ state: 'detached' });
    await page.getByRole('button', { name: 'Show resolved concerns' }).click();
    await page
      .getByText(/Nitrite 1 mg\/L NO2: toxic/)
      .first()
      .waitFor();
    expect(
      await page
        .getByText(/^resolved/)
        .first()
        .isVisible(),
    ).toBe(true);
    await screenshot(page, 'tank-concern-history-phone');
    await expectAccessible(page);
  });

  it('when a club admin opens the care profiles at a desk, then shipped profiles show their sources', async () => {
    const club = await makeClub(ds, 'Profile Viewers');
    const admin = await makeMember(ds, club, 'Ava Admin', 'admin');
    const { page } = await openPage(browser, DESK);
    await page.goto(`${inject('baseUrl')}/club/profiles/seahorse-large`);
    await page.getByLabel('E-mail').fill(admin.user.email);
    await page.getByLabel('Password').fill(TEST_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Shipped with Shoalwise (make a club copy to adjust it)').waitFor();
    expect(await page.getByText(/common practice, no source/i).count()).toBeGreaterThan(0);
    await screenshot(page, 'care-profile-desk');
    await expectAccessible(page);
  });
});
