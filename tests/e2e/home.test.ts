import type { Browser } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { reevaluateTank } from '../../server/modules/concerns/reevaluate-tank';
import { DESK, launchBrowser, PHONE, screenshot, signInOn } from '../helpers/browser';
import { resetDatabase } from '../helpers/db';
import { openE2eDataSource } from '../helpers/e2e-db';
import { assignMentor, makeClub, makeMember } from '../helpers/factories';
import { insertTank, insertWaterTest } from '../helpers/tank-rows';

const HOUR = 3_600_000;

describe('the home, on a phone at the tank and at a desk', () => {
  let browser: Browser;
  let ds: DataSource;
  let clubId: string;
  let tankId: string;
  let emails: Record<'keeper' | 'mentor' | 'admin' | 'newcomer', string>;
  beforeAll(async () => {
    browser = await launchBrowser();
    ds = await openE2eDataSource();
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Driftwood Keepers');
    clubId = club.id;
    const mentor = await makeMember(ds, club, 'Mara Mentor', 'mentor');
    const admin = await makeMember(ds, club, 'Ada Admin', 'admin');
    const keeper = await makeMember(ds, club, 'Kai Keeper');
    const newcomer = await makeMember(ds, club, 'Nia Newcomer');
    await assignMentor(ds, club, mentor.user, keeper.user);
    // Kai lives where "today" is rarely the UTC date; the home groups by his own calendar.
    await ds.query(`UPDATE app_user SET time_zone = 'Pacific/Auckland' WHERE id = $1`, [keeper.user.id]);
    emails = {
      keeper: keeper.user.email,
      mentor: mentor.user.email,
      admin: admin.user.email,
      newcomer: newcomer.user.email,
    };

    tankId = await insertTank(ds, {
      clubId,
      ownerId: keeper.user.id,
      systemType: 'tropical-freshwater',
      phase: 'cycling',
      name: 'Kai’s first tank',
      createdAt: new Date(Date.now() - 20 * 24 * HOUR),
    });
    // Cycling, tropical freshwater: ammonia and nitrite daily, nitrate every 2 days, pH and temperature every 3
    // (the profile's cadences: common practice, no source). Ammonia and nitrite were last read 25 hours ago;
    // nitrate, pH and temperature 2 hours ago, so only ammonia and nitrite are due.
    await insertWaterTest(ds, tankId, new Date(Date.now() - 49 * HOUR), { ammonia: 0.5, nitrite: 0.25 });
    await insertWaterTest(ds, tankId, new Date(Date.now() - 25 * HOUR), { ammonia: 1, nitrite: 0.5 });
    await insertWaterTest(ds, tankId, new Date(Date.now() - 2 * HOUR), {
      nitrate: 5,
      pH: 7.4,
      temperature: 26,
    });
    await ds.transaction((tx) => reevaluateTank(tx, tankId));

    // Work waiting for the admin: a member asking for a mentor and an invite not yet accepted.
    await ds.query(
      `INSERT INTO mentor_request (club_id, requester_id, note, state, created_at) VALUES ($1, $2, 'Starting a tank next week.', 'open', now() - interval '2 days')`,
      [clubId, newcomer.user.id],
    );
    await ds.query(
      `INSERT INTO invite (club_id, email, role, token_hash, invited_by_id, expires_at, last_sent_at) VALUES ($1, 'reef.friend@test.example', 'member', 'home-e2e-hash', $2, now() + interval '5 days', now())`,
      [clubId, admin.user.id],
    );
  });
  afterAll(async () => {
    await browser?.close();
    await ds?.destroy();
  });

  it('when a cycling tank has ammonia and nitrite due, then one action logs them first and the new test shows on the home without a reload', async () => {
    // Kai's laptop keeps the home open while he logs at the tank on his phone.
    const laptop = await (await browser.newContext(DESK)).newPage();
    await signInOn(laptop, emails.keeper, '/');
    await laptop.getByRole('heading', { name: 'Hello, Kai' }).waitFor();
    const laptopCard = laptop.locator(`li[data-tank-id="${tankId}"]`);
    await laptopCard
      .getByText('Ammonia: due today')
      .or(laptopCard.getByText(/Ammonia: 1 day late/))
      .waitFor();
    await laptop.evaluate(() => Object.assign(window, { homeNotReloaded: true }));

    const phone = await (await browser.newContext(PHONE)).newPage();
    const errors: string[] = [];
    phone.on('pageerror', (e) => errors.push(e.message));
    await signInOn(phone, emails.keeper, '/');
    await phone.getByRole('heading', { name: 'Hello, Kai' }).waitFor();
    const card = phone.locator(`li[data-tank-id="${tankId}"]`);
    await card.getByText('To test today').waitFor();
    await card.getByText('Cycling: nitrite up').waitFor();
    // Both due, nothing else, and one action for them.
    const due = await card.locator('[data-due]').allInnerTexts();
    expect(due.map((d) => d.replace(/^[▲●]\s*/, '').split(':')[0])).toEqual(['Ammonia', 'Nitrite']);
    const action = card.getByRole('link', { name: /^Log / });
    expect(await action.count()).toBe(1);
    expect(await action.innerText()).toBe('Log Ammonia and Nitrite');
    // Big enough to hit with a wet thumb.
    const box = (await action.boundingBox())!;
    expect(box.height).toBeGreaterThanOrEqual(44);
    await screenshot(phone, 'home-member-phone');

    await action.click();
    await phone.waitForURL(
      (u) => u.pathname === `/tanks/${tankId}/tests/new` && u.searchParams.get('first') === 'ammonia,nitrite',
    );
    await phone.getByText('To test today, at the top: Ammonia (total) and Nitrite.').waitFor();
    const order = await phone
      .locator('fieldset[data-parameter]')
      .evaluateAll((sets) => sets.map((s) => s.getAttribute('data-parameter')));
    expect(order.slice(0, 2)).toEqual(['ammonia', 'nitrite']);
    await screenshot(phone, 'home-log-test-phone');
    await phone.getByLabel('Ammonia (total)', { exact: true }).fill('2');
    await phone.getByLabel('Nitrite', { exact: true }).fill('1');
    await phone.getByRole('button', { name: 'Save test' }).click();
    await phone.waitForURL((u) => u.pathname === `/tanks/${tankId}`);

    // The laptop's home follows over the socket: nothing left to test today, the new figures shown, no reload.
    await laptopCard.getByText('Nothing to test today.').waitFor({ timeout: 10_000 });
    await laptopCard
      .getByTestId('last-test')
      .getByText(/Ammonia 2 mg\/L NH3 · Nitrite 1 mg\/L NO2/)
      .waitFor();
    expect(
      await laptop.evaluate(() => (window as unknown as { homeNotReloaded?: boolean }).homeNotReloaded),
    ).toBe(true);
    await screenshot(laptop, 'home-member-desk-after-test');

    // Back home on the phone through the app's own navigation.
    await phone.getByRole('link', { name: 'Home' }).first().click();
    await phone.locator(`li[data-tank-id="${tankId}"]`).getByText('Nothing to test today.').waitFor();
    expect(errors).toEqual([]);
  });

  it('when the mentor replies to a question, then the keeper’s home shows the reply as new at once', async () => {
    const phone = await (await browser.newContext(PHONE)).newPage();
    await signInOn(phone, emails.keeper, '/');
    await phone.getByRole('heading', { name: 'Hello, Kai' }).waitFor();
    const questionId = await phone.evaluate(
      async ({ clubId, tankId }) => {
        const { token } = (await (await fetch('/api/csrf')).json()) as { token: string };
        const tests = (await (await fetch(`/api/clubs/${clubId}/tanks/${tankId}/water-tests`)).json()) as {
          items: { id: string }[];
        };
        const res = await fetch(`/api/clubs/${clubId}/tanks/${tankId}/questions`, {
          method: 'POST',
          headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': token },
          body: JSON.stringify({
            title: 'Is ammonia 2 too much?',
            body: 'Day 20 of cycling.',
            waterTestId: tests.items[0]!.id,
          }),
        });
        return ((await res.json()) as { question: { id: string } }).question.id;
      },
      { clubId, tankId },
    );
    await phone.getByText('Is ammonia 2 too much?').waitFor();
    await phone.getByText('Waiting for an answer.').waitFor();

    const desk = await (await browser.newContext(DESK)).newPage();
    await signInOn(desk, emails.mentor, '/');
    await desk.getByRole('heading', { name: 'Hello, Mara' }).waitFor();
    const status = await desk.evaluate(
      async ({ clubId, questionId }) => {
        const { token } = (await (await fetch('/api/csrf')).json()) as { token: string };
        const res = await fetch(`/api/clubs/${clubId}/questions/${questionId}/replies`, {
          method: 'POST',
          headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': token },
          body: JSON.stringify({ body: 'Fine for an empty tank while cycling. Keep testing daily.' }),
        });
        return res.status;
      },
      { clubId, questionId },
    );
    expect(status).toBe(201);
    await phone.getByText('New reply').waitFor({ timeout: 10_000 });
    await phone.getByText('Fine for an empty tank while cycling.', { exact: false }).waitFor();
    await screenshot(phone, 'home-member-reply-phone');
  });

  it('when a mentor or an admin opens the home, then it leads to their work: the desk’s top tanks, requests, invites', async () => {
    const mentor = await (await browser.newContext(DESK)).newPage();
    await signInOn(mentor, emails.mentor, '/');
    await mentor.getByRole('heading', { name: 'Your mentees’ tanks, most in need first' }).waitFor();
    await mentor.getByRole('list', { name: 'Tanks most in need' }).getByText('Kai’s first tank').waitFor();
    await mentor.getByRole('link', { name: 'Open the mentor desk (1 tank)' }).waitFor();
    expect(await mentor.getByRole('heading', { name: 'Waiting for a mentor' }).count()).toBe(0);
    await screenshot(mentor, 'home-mentor-desk');

    const admin = await (await browser.newContext(DESK)).newPage();
    await signInOn(admin, emails.admin, '/');
    await admin.getByRole('heading', { name: 'The club’s tanks, most in need first' }).waitFor();
    await admin.getByText('Nia Newcomer', { exact: true }).waitFor();
    await admin.getByRole('link', { name: 'Pair Nia Newcomer with a mentor' }).waitFor();
    await admin.getByText('1 not accepted yet').waitFor();
    await screenshot(admin, 'home-admin-desk');

    const adminPhone = await (await browser.newContext(PHONE)).newPage();
    await signInOn(adminPhone, emails.admin, '/');
    await adminPhone.getByRole('heading', { name: 'Waiting for a mentor' }).waitFor();
    await screenshot(adminPhone, 'home-admin-phone');
  });

  it('when a member has no tank yet, then the home starts them off with the nitrogen cycle and the ammonia caution', async () => {
    const phone = await (await browser.newContext(PHONE)).newPage();
    await signInOn(phone, emails.newcomer, '/');
    await phone.getByRole('heading', { name: 'Start with your first tank' }).waitFor();
    await phone.getByRole('link', { name: 'Add my first tank' }).waitFor();
    const caution = phone.locator('aside').filter({ hasText: 'Ammonia is a hazardous chemical' });
    await caution.waitFor();
    const text = await caution.innerText();
    for (const part of ['no soap, scent or colour', 'wear gloves', 'away from children', 'label'])
      expect(text).toContain(part);
    await screenshot(phone, 'home-first-tank-phone');
  });
});
