import type { Browser } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { reevaluateTank } from '@server/modules/concerns/reevaluate-tank';
import {
  ARTIFACTS,
  DESK,
  expectAccessible,
  launchBrowser,
  openSignedIn,
  PHONE,
  screenshot,
} from '../helpers/browser';
import { resetDatabase } from '../helpers/db';
import { openE2eDataSource } from '../helpers/e2e-db';
import { assignMentor, makeClub, makeMember } from '../helpers/factories';
import { insertTank, insertWaterTest } from '../helpers/tank-rows';
import { DAY_MS } from '@shared/care/time';

describe('questions on a reading in the browser', () => {
  let browser: Browser;
  let ds: DataSource;
  let keeperEmail: string;
  let mentorEmail: string;
  let tankId: string;

  beforeAll(async () => {
    browser = await launchBrowser();
    ds = await openE2eDataSource();
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Harbour Aquarists');
    const keeper = await makeMember(ds, club, 'Bo Beginner');
    const mentor = await makeMember(ds, club, 'Maya Mentor', 'mentor');
    await makeMember(ds, club, 'Ada Admin', 'admin');
    await assignMentor(ds, club, mentor.user, keeper.user);
    keeperEmail = keeper.user.email;
    mentorEmail = mentor.user.email;
    tankId = await insertTank(ds, {
      clubId: club.id,
      ownerId: keeper.user.id,
      systemType: 'seahorse',
      phase: 'established',
      volumeL: 200,
      name: 'Seahorse corner',
    });
    // A week of nitrate creeping up, ending in the test she asks about.
    for (const [daysAgo, nitrate] of [
      [9, 10],
      [7, 15],
      [5, 20],
      [3, 30],
      [1, 40],
    ] as const) {
      await insertWaterTest(ds, tankId, new Date(Date.now() - daysAgo * DAY_MS), {
        nitrate,
        pH: 8.1,
        temperature: 24.5,
        salinity: 33,
      });
    }
    await ds.transaction((tx) => reevaluateTank(tx, tankId));
  });
  afterAll(async () => {
    await browser?.close();
    await ds?.destroy();
  });

  it('when a member asks about a test on her phone, then the mentor answers at a desk and she marks it answered', async () => {
    const bo = await openSignedIn(browser, PHONE, keeperEmail, `/tanks/${tankId}`);
    const ask = bo.page.getByRole('list', { name: 'Recent readings to ask about' });
    await ask.waitFor();
    await ask.getByRole('button', { name: 'Ask about this' }).first().click();
    const form = bo.page.getByRole('form', { name: 'Ask your mentor about this reading' });
    await form.getByLabel('Your question').fill('Is this nitrate OK for my seahorses?');
    await expectAccessible(bo.page);
    await form
      .getByLabel('Details')
      .fill(
        'It has gone up every test this week. I feed **frozen mysis** twice a day.\n- water change 10 % weekly\n- <script>alert(1)</script>',
      );
    // The tank page is long: the section alone shows the form.
    await bo.page
      .getByRole('region', { name: 'Ask your mentor' })
      .screenshot({ path: `${ARTIFACTS}/question-ask-form-phone.png` });
    const touch = await form.getByRole('button', { name: 'Send question' }).boundingBox();
    expect(touch!.height).toBeGreaterThanOrEqual(44);
    await form.getByRole('button', { name: 'Send question' }).click();
    await bo.page.waitForURL(/\/questions\/[0-9a-f-]{36}$/);
    const questionPath = new URL(bo.page.url()).pathname;

    await bo.page.getByRole('heading', { name: 'Is this nitrate OK for my seahorses?' }).waitFor();
    await expect
      .poll(() => bo.page.locator('[data-figure="nitrate"]').textContent())
      .toContain('40 mg/L NO3');
    await bo.page.getByText('Concerns open then').waitFor();
    await bo.page.locator('[data-chart="nitrate"] .recharts-line').waitFor();
    expect(await bo.page.locator('ol[aria-label="Thread"] strong').first().textContent()).toBe(
      'frozen mysis',
    );
    expect(await bo.page.locator('ol[aria-label="Thread"] script').count()).toBe(0);
    await bo.page.getByText('Waiting for an answer').waitFor();
    await screenshot(bo.page, 'question-asked-phone');
    await expectAccessible(bo.page);

    // The mentor finds it among the open questions at a desk.
    const maya = await openSignedIn(browser, DESK, mentorEmail, '/questions');
    await maya.page.getByRole('link', { name: /Is this nitrate OK for my seahorses\?/ }).click();
    await maya.page.waitForURL((u) => u.pathname === questionPath);
    const reply = maya.page.getByLabel('Your reply');
    await reply.waitFor();

    // A failed send keeps the text.
    maya.guard.expectFailure({ path: /\/replies$/ });
    await maya.page.route('**/replies', (route) => route.abort('internetdisconnected'));
    await reply.fill('First try');
    await maya.page.getByRole('button', { name: 'Send reply' }).click();
    await maya.page.getByText('Your reply is kept: try again.').waitFor();
    expect(await reply.inputValue()).toBe('First try');
    await maya.page.unroute('**/replies');

    await reply.fill('');
    await reply.pressSequentially('40 is high for seahorses. @Ad');
    await maya.page.getByRole('option', { name: '@Ada Admin' }).click();
    await reply.pressSequentially('can you check our club guide too?');
    await reply.press('Enter');
    await reply.pressSequentially(
      '- do a **30 %** water change today\n- test again in two days, see https://guide.example/nitrate',
    );
    await maya.page.getByRole('button', { name: 'Send reply' }).click();
    await maya.page.getByText('Ada Admin will be told.').waitFor();
    const answer = maya.page.locator('ol[aria-label="Thread"] > li').nth(1);
    await answer.getByText('30 %').waitFor();
    expect(await answer.locator('a').getAttribute('rel')).toBe('noopener noreferrer nofollow');
    expect(await reply.inputValue()).toBe('');
    await maya.page.locator('[data-chart="nitrate"] .recharts-line').waitFor();
    await screenshot(maya.page, 'question-answered-desk');
    await expectAccessible(maya.page);

    // Her page follows live: the answer appears without a reload; she marks it answered.
    await bo.page
      .locator('ol[aria-label="Thread"] > li')
      .nth(1)
      .getByText('30 %')
      .waitFor({ timeout: 5_000 });
    await bo.page.getByRole('button', { name: 'Mark answered' }).click();
    await bo.page.getByText('✓ Answered').waitFor();
    await expect
      .poll(() => bo.page.getByRole('button', { name: 'Reopen the question' }).isEnabled())
      .toBe(true);
    await screenshot(bo.page, 'question-answered-phone');
    await expectAccessible(bo.page);

    await bo.page.goto(`${inject('baseUrl')}/questions`);
    await bo.page.getByRole('heading', { name: 'My questions' }).waitFor();
    await bo.page.getByRole('link', { name: /Is this nitrate OK/ }).waitFor();
  });
});
