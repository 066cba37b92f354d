import type { Browser } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Club } from '../../server/modules/clubs/club.entity';
import { expectAccessible, launchBrowser, openSignedIn, PHONE, screenshot } from '../helpers/browser';
import { resetDatabase } from '../helpers/db';
import { openE2eDataSource } from '../helpers/e2e-db';
import { makeClub, makeMember } from '../helpers/factories';
import { waitForMail } from '../helpers/mail';
import { insertTank } from '../helpers/tank-rows';

describe('meetups on a phone', () => {
  let browser: Browser;
  let ds: DataSource;
  let adminEmail: string;
  let memberEmail: string;
  let mentorEmail: string;
  let clubId: string;

  beforeAll(async () => {
    browser = await launchBrowser();
    ds = await openE2eDataSource();
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Harbour Aquarists');
    await ds.getRepository(Club).update({ id: club.id }, { timeZone: 'Europe/London' });
    adminEmail = (await makeMember(ds, club, 'Ada Admin', 'admin')).user.email;
    memberEmail = (await makeMember(ds, club, 'Bo Beginner')).user.email;
    mentorEmail = (await makeMember(ds, club, 'Maya Mentor', 'mentor')).user.email;
    clubId = club.id;
  });
  afterAll(async () => {
    await browser?.close();
    await ds?.destroy();
  });

  it('when an admin plans a meetup, a member says she is going and the admin ticks her in at the door, then every screen agrees', async () => {
    const ada = await openSignedIn(browser, PHONE, adminEmail, '/meetups');
    await ada.page.getByRole('link', { name: 'Plan a meetup' }).click();
    const form = ada.page.getByRole('form', { name: 'Plan the meetup' });
    await form.getByLabel('Kind of meetup').selectOption('talk');
    await form.getByLabel('Title').fill('Your first nitrogen cycle');
    await form.getByLabel('What it is about').fill('A short talk, then questions. Bring your test results.');
    await form.getByLabel('Where').fill('Room 2, the invented harbour hall');
    await form.getByLabel('Places').fill('12');
    // A mistake first: the field says what is wrong before anything is sent.
    await form.getByLabel('Ends').fill(
      await form
        .getByLabel('Starts')
        .inputValue()
        .then((v) => v.replace('19:00', '18:00')),
    );
    await form.getByRole('button', { name: 'Plan the meetup' }).click();
    await form.getByText('It has to end after it starts.').waitFor();
    await form.getByLabel('Ends').fill(
      await form
        .getByLabel('Starts')
        .inputValue()
        .then((v) => v.replace('19:00', '21:00')),
    );
    await screenshot(ada.page, 'meetup-plan-phone');
    await expectAccessible(ada.page);
    await form.getByRole('button', { name: 'Plan the meetup' }).click();
    await ada.page.waitForURL(/\/meetups\/[0-9a-f-]{36}$/);
    const meetupPath = new URL(ada.page.url()).pathname;
    await ada.page.getByRole('heading', { name: 'Your first nitrogen cycle' }).waitFor();
    await ada.page
      .getByText(/19:00–21:00 \((GMT|BST)\)/)
      .first()
      .waitFor();

    // The member finds it in the list on her phone and says she is going.
    const bo = await openSignedIn(browser, PHONE, memberEmail, '/meetups');
    await bo.page.getByRole('link', { name: /Your first nitrogen cycle/ }).click();
    await bo.page.waitForURL((u) => u.pathname === meetupPath);
    const going = bo.page.getByRole('button', { name: 'I’m going' });
    expect((await going.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    await going.click();
    await bo.page.getByText('✓ You’re going').waitFor();
    await bo.page.getByText('1 of 12 places taken').waitFor();
    await screenshot(bo.page, 'meetup-member-going-phone');
    await expectAccessible(bo.page);

    // At the door: the admin ticks her in; the tick shows at once even though the first attempt is lost.
    await ada.page.reload();
    await ada.page.getByRole('link', { name: 'Check people in' }).click();
    await ada.page.waitForURL((u) => u.pathname === `${meetupPath}/check-in`);
    let dropped = 0;
    ada.guard.expectFailure({ path: /\/attendance\/[^/]+$/ });
    await ada.page.route('**/attendance/*', async (route) => {
      if (route.request().method() === 'PUT' && dropped++ === 0) return route.abort('internetdisconnected');
      return route.continue();
    });
    const row = ada.page.getByRole('button', { name: /^Bo Beginner:/ });
    await row.waitFor();
    expect(await row.getAttribute('aria-pressed')).toBe('false');
    await row.click();
    // Ticked on screen well before the retry (2 s after the lost attempt) has reached the server.
    await expect.poll(() => row.getAttribute('aria-pressed'), { timeout: 1_500 }).toBe('true');
    await ada.page.getByText('1 of 1 here').waitFor({ timeout: 1_500 });
    expect(
      (await ds.query(`SELECT count(*)::int AS n FROM meetup_rsvp WHERE checked_in_at IS NOT NULL`))[0].n,
    ).toBe(0);
    // The retry reaches the server: after a reload the list still says she is here.
    await expect
      .poll(
        async () =>
          (await ds.query(`SELECT count(*)::int AS n FROM meetup_rsvp WHERE checked_in_at IS NOT NULL`))[0].n,
        { timeout: 10_000 },
      )
      .toBe(1);
    expect(dropped).toBeGreaterThanOrEqual(2);
    await ada.page.unroute('**/attendance/*');
    await ada.page.reload();
    await ada.page.getByRole('button', { name: 'Bo Beginner: here' }).waitFor();
    await screenshot(ada.page, 'meetup-check-in-phone');
    await expectAccessible(ada.page);

    // An edit asks first, because Bo is e-mailed about it.
    await ada.page.goto(new URL(`${meetupPath}/edit`, ada.page.url()).href);
    await ada.page.getByLabel('Where').fill('The bigger hall next door');
    await ada.page.getByRole('button', { name: 'Save changes' }).click();
    const dialog = ada.page.getByRole('dialog', { name: 'Tell everyone about the change?' });
    await dialog.waitFor();
    await screenshot(ada.page, 'meetup-edit-confirm-phone');
    await expectAccessible(ada.page);
    await dialog.getByRole('button', { name: 'Save and e-mail 1 person' }).click();
    await ada.page.waitForURL((u) => u.pathname === meetupPath);
    await ada.page.getByText('The bigger hall next door').waitFor();
    const mail = await waitForMail(ds, memberEmail);
    expect(mail.text).toContain('New place: The bigger hall next door');

    // Her history counts the evening she was ticked in at.
    await bo.page.goto(new URL('/meetups', bo.page.url()).href);
    await bo.page.getByRole('link', { name: 'My attendance' }).click();
    await bo.page.getByRole('heading', { name: 'My meetups' }).waitFor();
    await bo.page.getByText('✓ Was there').waitFor();
  });
  it('when a member books a clinic slot for her tank, then the mentor running it saves the results straight onto that tank', async () => {
    const [bo] = await ds.query(`SELECT id FROM app_user WHERE email = $1`, [memberEmail]);
    const [maya] = await ds.query(`SELECT id FROM app_user WHERE email = $1`, [mentorEmail]);
    const tankId = await insertTank(ds, {
      clubId,
      ownerId: bo.id,
      systemType: 'tropical-freshwater',
      phase: 'cycling',
      volumeL: 60,
      name: 'Guppy starter',
    });
    const [clinic] = await ds.query(
      `INSERT INTO meetup (club_id, kind, title, starts_at, ends_at, place_text, capacity, host_id, slot_minutes)
       VALUES ($1, 'clinic', 'Bring-a-sample clinic', date_trunc('hour', now()) + interval '2 days', date_trunc('hour', now()) + interval '2 days 1 hour', 'The back room', 6, $2, 20)
       RETURNING id`,
      [clubId, maya.id],
    );
    const member = await openSignedIn(browser, PHONE, memberEmail, `/meetups/${clinic.id}`);
    await member.page.getByRole('button', { name: 'I’m going' }).click();
    const booking = member.page.locator('section', { hasText: 'Bring a water sample' });
    await booking.getByLabel('Water from').waitFor();
    const slots = booking.getByRole('group', { name: 'Slot' }).getByRole('button');
    expect(await slots.count()).toBe(3);
    await slots.nth(1).click();
    await booking.getByRole('button', { name: 'Book this slot' }).click();
    await booking.getByText(/✓ Your slot: \d\d:\d\d, water from Guppy starter/).waitFor();
    await screenshot(member.page, 'meetup-clinic-booked-phone');
    await expectAccessible(member.page);

    const host = await openSignedIn(browser, PHONE, mentorEmail, `/meetups/${clinic.id}/check-in`);
    await host.page.getByText(/water from Guppy starter/).waitFor();
    await host.page.getByRole('button', { name: 'Record results for Guppy starter' }).click();
    const results = host.page.getByRole('form', { name: 'Results for Bo Beginner' });
    await results.getByLabel('Nitrite (mg/L NO2)').fill('0.5');
    await results.getByLabel('pH', { exact: true }).fill('7.4');
    await screenshot(host.page, 'meetup-clinic-results-phone');
    await expectAccessible(host.page);
    await results.getByRole('button', { name: 'Save on their tank' }).click();
    await host.page.getByRole('button', { name: '✓ Results saved · record again' }).waitFor();
    await host.page.getByRole('button', { name: 'Bo Beginner: here' }).waitFor();

    const saved = await ds.query(
      `SELECT w.created_by_id AS "by", w.ph FROM water_test w WHERE w.tank_id = $1`,
      [tankId],
    );
    expect(saved).toEqual([{ by: maya.id, ph: 7.4 }]);
  });
});
