import type { Browser, Page } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { reevaluateTank } from '@server/modules/concerns/reevaluate-tank';
import {
  DESK,
  expectAccessible,
  launchBrowser,
  openPage,
  PHONE,
  screenshot,
  signInOn,
} from '../helpers/browser';
import { resetDatabase } from '../helpers/db';
import { openE2eDataSource } from '../helpers/e2e-db';
import { assignMentor, makeClub, makeMember } from '../helpers/factories';
import { insertTank, insertWaterTest } from '../helpers/tank-rows';

const CALM = {
  temperature: 24,
  salinity: 33,
  pH: 8.1,
  ammonia: 0,
  nitrite: 0,
  nitrate: 2,
  alkalinity: 8,
  calcium: 420,
  magnesium: 1300,
};

const firstRowTank = (page: Page) =>
  page.locator('ol[aria-label="Tanks by need"] > li').first().getAttribute('data-tank-id');

describe('the mentor desk, live', () => {
  let browser: Browser;
  let ds: DataSource;
  let mentorEmail: string;
  let keeperEmail: string;
  let clubId: string;
  let tanks: { keeper: string; other: string };
  beforeAll(async () => {
    browser = await launchBrowser();
    ds = await openE2eDataSource();
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Lanternfish Keepers');
    clubId = club.id;
    const mentor = await makeMember(ds, club, 'Mara Mentor', 'mentor');
    const keeper = await makeMember(ds, club, 'Kai Keeper');
    const other = await makeMember(ds, club, 'Olu Other');
    await assignMentor(ds, club, mentor.user, keeper.user);
    await assignMentor(ds, club, mentor.user, other.user);
    mentorEmail = mentor.user.email;
    keeperEmail = keeper.user.email;
    tanks = {
      keeper: await insertTank(ds, {
        clubId,
        ownerId: keeper.user.id,
        systemType: 'seahorse',
        phase: 'established',
        name: 'Kai’s seahorses',
      }),
      other: await insertTank(ds, {
        clubId,
        ownerId: other.user.id,
        systemType: 'seahorse',
        phase: 'established',
        name: 'Olu’s seahorses',
      }),
    };
    // Olu tested longer ago, so with nothing wrong anywhere Olu's tank comes first.
    await insertWaterTest(ds, tanks.keeper, new Date(Date.now() - 2 * 3_600_000), CALM);
    await insertWaterTest(ds, tanks.other, new Date(Date.now() - 30 * 3_600_000), { ...CALM, nitrate: 8 });
    for (const id of Object.values(tanks)) await ds.transaction((tx) => reevaluateTank(tx, id));
  });
  afterAll(async () => {
    await browser?.close();
    await ds?.destroy();
  });

  it('when the mentee saves an urgent test from another page, then the desk re-orders without a reload', async () => {
    const { page: desk } = await openPage(browser, DESK);
    await signInOn(desk, mentorEmail, '/desk');
    await desk.getByRole('heading', { name: 'Mentor desk' }).waitFor();
    await desk.locator('ol[aria-label="Tanks by need"] > li').nth(1).waitFor();
    expect(await firstRowTank(desk)).toBe(tanks.other);
    // A mark on this page's window: a reload would wipe it.
    await desk.evaluate(() => Object.assign(window, { deskNotReloaded: true }));
    await screenshot(desk, 'desk-before-desk');
    await expectAccessible(desk);

    const { page: phone } = await openPage(browser, PHONE);
    await signInOn(phone, keeperEmail, '/');
    await phone.getByRole('heading', { name: /Hello, Kai/ }).waitFor();
    const status = await phone.evaluate(
      async ({ clubId, tankId }) => {
        const { token } = (await (await fetch('/api/csrf')).json()) as { token: string };
        const res = await fetch(`/api/clubs/${clubId}/tanks/${tankId}/water-tests`, {
          method: 'POST',
          headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': token },
          body: JSON.stringify({
            takenAt: new Date().toISOString(),
            entries: { nitrite: { value: 1, unit: 'mg/L NO2' }, pH: { value: 8.1 } },
          }),
        });
        return res.status;
      },
      { clubId, tankId: tanks.keeper },
    );
    expect(status).toBe(201);

    // The socket event moves the row (how fast belongs in a benchmark, not here), and the page was not reloaded.
    await desk.waitForFunction(
      (id) =>
        document.querySelector('ol[aria-label="Tanks by need"] > li')?.getAttribute('data-tank-id') === id,
      tanks.keeper,
      { timeout: 5_000 },
    );
    await desk
      .getByText(/Nitrite/)
      .first()
      .waitFor();
    await screenshot(desk, 'desk-after-urgent-desk');
    await expectAccessible(desk);
    expect(await desk.evaluate(() => 'deskNotReloaded' in window)).toBe(true);
  });
});
