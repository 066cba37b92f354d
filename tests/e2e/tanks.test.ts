import type { Browser, Page } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESK, expectAccessible, launchBrowser, openSignedIn, PHONE, screenshot } from '../helpers/browser';
import { resetDatabase } from '../helpers/db';
import { openE2eDataSource } from '../helpers/e2e-db';
import { assignMentor, makeClub, makeMember } from '../helpers/factories';
import { insertTank } from '../helpers/tank-rows';
import { DAY_MS } from '@shared/care/time';

const pad = (n: number) => String(n).padStart(2, '0');
const dmy = (d: Date) => `${pad(d.getDate())}/${pad(d.getMonth() + 1)}/${d.getFullYear()}`;
const round = (n: number) => Number(n.toFixed(2));

/** Five weeks of a fishless cycle written day-first, with three rows no tank could have. */
function cyclingLog(): { csv: string; good: number } {
  const lines = ['Date,Time,Temp (C),SG,pH,Ammonia,Nitrite,Nitrate,Notes'];
  const days = 36;
  for (let d = days; d >= 1; d--) {
    const day = days - d;
    const ammonia = day < 12 ? Math.min(2, 0.25 + day * 0.2) : Math.max(0, 2 - (day - 12) * 0.3);
    const nitrite = day < 8 ? 0 : day < 24 ? Math.min(3, (day - 8) * 0.4) : Math.max(0, 3 - (day - 24) * 0.6);
    const nitrate = day < 14 ? 0 : Math.min(40, (day - 14) * 2.5);
    lines.push(
      `${dmy(new Date(Date.now() - d * DAY_MS))},18:30,25.${d % 3},1.025,8.1,${round(ammonia)},${round(nitrite)},${round(nitrate)},${day === 0 ? 'Dosed ammonia to 2 ppm' : ''}`,
    );
  }
  const bad = new Date(Date.now() - 3 * DAY_MS);
  lines.push(`${dmy(bad)},07:00,25.1,1.025,80,0.25,0.5,10,typo`);
  lines.push(`31/02/${bad.getFullYear()},07:00,25.1,1.025,8.1,0.25,0.5,10,`);
  lines.push(`${dmy(bad)},08:00,25.1,1.025,8.1,lots,0.5,10,`);
  return { csv: lines.join('\n'), good: days };
}

/** 5,000 tests two hours apart, as a logging app of its own might have written them. */
function bigLog(rows = 5000): string {
  const lines = ['taken (UTC),temperature (°C),pH,nitrate (mg/L NO3)'];
  for (let i = rows; i >= 1; i--) {
    lines.push(
      `${new Date(Date.now() - i * 2 * 3_600_000).toISOString()},${(24 + (i % 10) / 10).toFixed(1)},${(7 + (i % 5) / 10).toFixed(1)},${5 + (i % 20)}`,
    );
  }
  return lines.join('\n');
}

async function importFile(page: Page, name: string, csv: string) {
  await page
    .locator('input[type=file]')
    .setInputFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(csv) });
  await page.getByRole('button', { name: 'Check the rows' }).waitFor({ timeout: 30_000 });
}

describe('tanks in the browser', () => {
  let browser: Browser;
  let ds: DataSource;
  let member: { email: string; id: string };
  let mentorEmail: string;
  let strangerEmail: string;
  let reefTankId: string;

  beforeAll(async () => {
    browser = await launchBrowser();
    ds = await openE2eDataSource();
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Harbour Aquarists');
    const bo = await makeMember(ds, club, 'Bo Beginner');
    const mentor = await makeMember(ds, club, 'Maya Mentor', 'mentor');
    strangerEmail = (await makeMember(ds, club, 'Sam Stranger')).user.email;
    await assignMentor(ds, club, mentor.user, bo.user);
    member = { email: bo.user.email, id: bo.user.id };
    mentorEmail = mentor.user.email;
    await insertTank(ds, {
      clubId: club.id,
      ownerId: bo.user.id,
      systemType: 'tropical-freshwater',
      phase: 'established',
      volumeL: 180,
      name: 'Living-room community',
    });
  });
  afterAll(async () => {
    await browser?.close();
    await ds?.destroy();
  });

  it('when a beginner adds a cycling seahorse tank at a desk and imports their log, then bad rows are named before saving and the cycle is charted', async () => {
    const { page } = await openSignedIn(browser, DESK, member.email, '/tanks/new');
    await page.getByRole('heading', { name: 'Add a tank' }).waitFor();
    await page.getByRole('button', { name: 'Add the tank' }).click();
    await page.getByText('Give the tank a name.').waitFor();
    await page.getByLabel('Name', { exact: true }).fill('Seahorse nursery');
    await page.getByLabel('Kind of tank').selectOption('seahorse');
    await page.getByLabel('Work it out from the size').check({ force: true });
    await page.getByLabel('Length (side to side), cm').fill('90');
    await page.getByLabel('Depth (front to back), cm').fill('45');
    await page.getByLabel('Height, cm').fill('60');
    await page.getByLabel('Taken up by rock and sand, %').fill('10');
    await page.getByText('Full to the brim: 243 L').waitFor();
    await page
      .getByLabel('Equipment notes (optional)')
      .fill('Sponge filter and a 150 W heater on a timer-free socket.');
    await page.getByText(/RCD\/GFCI/).waitFor();
    await screenshot(page, 'tank-form-desk');
    await expectAccessible(page);
    await page.getByRole('button', { name: 'Add the tank' }).click();
    await page.getByRole('heading', { name: 'Seahorse nursery' }).waitFor();
    reefTankId = new URL(page.url()).pathname.split('/')[2]!;
    expect(await page.getByText('Water: 219 L (tank 243 L)').isVisible()).toBe(true);

    await page.getByRole('link', { name: /Import a CSV log/ }).click();
    const { csv, good } = cyclingLog();
    await importFile(page, 'cycle-log.csv', csv);
    expect(await page.getByLabel('What “Date” holds').inputValue()).toBe('takenAt');
    expect(await page.getByLabel('Unit of “SG”').inputValue()).toBe('SG');
    await page.getByRole('button', { name: 'Check the rows' }).click();
    await page.getByText('3 rows will not be saved').waitFor();
    const problems = page.getByRole('table', { name: 'Rows with errors' });
    expect(await problems.getByRole('row').count()).toBe(4);
    await problems.getByText('pH 80 is not possible — did you mean 8.0?').waitFor();
    await problems.getByText(/is not a real date/).waitFor();
    await problems.getByText('"lots" is not a number.').waitFor();
    await screenshot(page, 'tank-import-review-desk');
    await expectAccessible(page);
    await page.getByRole('button', { name: `Save ${good} tests` }).click();
    await page
      .getByText(`Saved ${good} tests from cycle-log.csv. 3 rows with errors were left out.`)
      .waitFor({ timeout: 30_000 });
    await page.getByRole('link', { name: 'See them on the charts' }).click();

    await page.locator('figure[data-chart="nitrogen-cycle"]').waitFor();
    await page.locator('figure[data-chart="ammonia"] .recharts-line').waitFor();
    expect(await page.locator('figure[data-chart="pH"] [role=img]').getAttribute('aria-label')).toContain(
      `${good} readings`,
    );
    await screenshot(page, 'tank-page-desk');
    await expectAccessible(page);
  });

  it('when the beginner logs a test at the tank on a phone, then the preview judges it and the new point is on the chart', async () => {
    const { page } = await openSignedIn(browser, PHONE, member.email, `/tanks/${reefTankId}`);
    await page.getByRole('link', { name: /Log a water test/ }).click();
    await page.getByRole('heading', { name: 'Log a water test' }).waitFor();
    await page.getByLabel('Temperature', { exact: true }).fill('25.4');
    await page.getByLabel('Salinity', { exact: true }).fill('1.0245');
    await page.getByLabel('pH', { exact: true }).fill('80');
    await page.getByText('pH 80 is not possible — did you mean 8.0?').waitFor();
    await page.getByLabel('pH', { exact: true }).fill('8.12');
    await page.getByLabel('Ammonia (total)', { exact: true }).fill('0.5');
    await page.getByLabel('Nitrite', { exact: true }).fill('1');
    await page.getByLabel('Nitrate', { exact: true }).fill('10');
    await page
      .getByTestId('preview-salinity')
      .getByText(/Practical salinity 3\d\.\d/)
      .waitFor();
    await page
      .getByTestId('preview-ammonia')
      .getByText(/Free ammonia \(the toxic part\)/)
      .waitFor();
    await page.getByText('6 readings ready to save.').waitFor();
    await screenshot(page, 'water-test-form-phone');
    await expectAccessible(page);

    await page.getByRole('button', { name: 'Save test' }).click();
    await page.getByText(/Test saved: 6 readings/).waitFor();
    const ph = page.locator('figure[data-chart="pH"]');
    await ph.locator('figcaption').getByText('pH 8.12').waitFor();
    expect(await ph.locator('[role=img]').getAttribute('aria-label')).toMatch(
      /37 readings, latest pH 8\.12 /,
    );
    await ph.scrollIntoViewIfNeeded();
    // Nothing may push the page sideways on a phone (wide tables scroll inside their own box).
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(390);
    await screenshot(page, 'tank-page-after-test-phone');
    await expectAccessible(page);

    await page.getByRole('link', { name: 'Add a water change or note' }).click();
    await page.getByRole('heading', { name: 'Add to the timeline' }).waitFor();
    await page.getByText(/same temperature and, for salt water, the same salinity/).waitFor();
    await page.getByLabel('How much was changed, %').fill('20');
    await page.getByText("About 43.7 L of the tank's 219 L.").waitFor();
    await page.getByLabel('New water').selectOption('mixed-salt');
    await screenshot(page, 'water-change-form-phone');
    await expectAccessible(page);
    await page.getByRole('button', { name: 'Save water change' }).click();
    await page.getByText('Water change saved. It is on the timeline.').waitFor();
    await page
      .locator('figure[data-chart="pH"] .recharts-reference-line')
      .first()
      .waitFor({ state: 'attached' });
    await page.getByText('43.7 L (20 %) · Salt water I mixed').waitFor();

    // A slip noticed later: the newest test is edited, and the chart follows.
    await page.getByRole('link', { name: 'Edit', exact: true }).first().click();
    await page.getByRole('heading', { name: 'Change a water test' }).waitFor();
    expect(await page.getByLabel('Salinity', { exact: true }).inputValue()).toBe('1.0245');
    await page.getByLabel('pH', { exact: true }).fill('8.2');
    await page.getByRole('button', { name: 'Save changes' }).click();
    await page.getByText(/Changes saved/).waitFor();
    await page.locator('figure[data-chart="pH"] figcaption').getByText('pH 8.2').waitFor();
  });

  it(
    'when the beginner imports 5,000 old tests, then a bar shows while they save in one transaction and every one arrives',
    { timeout: 240_000 },
    async () => {
      const { page } = await openSignedIn(browser, DESK, member.email, '/tanks');
      await page.getByRole('link', { name: /Living-room community/ }).click();
      await page.getByRole('link', { name: /Import a CSV log/ }).click();
      await importFile(page, 'five-thousand.csv', bigLog());
      await page.getByText('five-thousand.csv · 5,000 rows').waitFor();
      await page.getByRole('button', { name: 'Check the rows' }).click();
      await page.getByRole('button', { name: 'Save 5,000 tests' }).click();
      // The upload is quick on loopback; what a person sees is the bar while the server saves everything at once.
      await page.getByRole('progressbar').first().waitFor();
      await page.getByText('Saved 5,000 tests from five-thousand.csv.').waitFor({ timeout: 120_000 });
      const [{ count }] = await ds.query(
        `SELECT count(*)::int AS count FROM water_test w JOIN tank t ON t.id = w.tank_id WHERE t.name = 'Living-room community'`,
      );
      expect(count).toBe(5000);
      await page.goto(`${inject('baseUrl')}/tanks`);
      await page.getByText('Last test 2 hours ago').waitFor();
      await screenshot(page, 'tank-list-desk');
      await expectAccessible(page);
    },
  );

  it("when the mentor opens the list, then they see whose tanks they are; another member is told the tank isn't theirs to see", async () => {
    const mentor = await openSignedIn(browser, DESK, mentorEmail, '/tanks');
    await mentor.page.getByRole('heading', { name: 'Tanks' }).waitFor();
    await mentor.page.getByText('Kept by Bo Beginner').first().waitFor();
    await mentor.page
      .getByText(/^Last test/)
      .nth(1)
      .waitFor();
    expect(await mentor.page.getByText('Kept by Bo Beginner').count()).toBe(2);
    await screenshot(mentor.page, 'tank-list-mentor-desk');
    await expectAccessible(mentor.page);
    await mentor.page.getByRole('link', { name: /Seahorse nursery/ }).click();
    await mentor.page.getByText('Kept by:').waitFor();
    expect(await mentor.page.getByRole('link', { name: /Log a water test/ }).count()).toBe(0);

    const stranger = await openSignedIn(browser, PHONE, strangerEmail, `/tanks/${reefTankId}`);
    stranger.guard.expectFailure({ path: new RegExp(`/tanks/${reefTankId}$`), status: 403 });
    await stranger.page.getByRole('heading', { name: "That isn't yours to see" }).waitFor();
    await screenshot(stranger.page, 'tank-not-yours-phone');
    await expectAccessible(stranger.page);
  });
});
