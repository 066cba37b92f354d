import type { Browser } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MentorAssignment } from '@server/modules/mentorship/mentor-assignment.entity';
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
import { makeClub, makeMember } from '../helpers/factories';

describe('mentor requests and live notifications in the browser', () => {
  let browser: Browser;
  let ds: DataSource;
  let admin: Awaited<ReturnType<typeof makeMember>>;
  let mentor: Awaited<ReturnType<typeof makeMember>>;
  let beginner: Awaited<ReturnType<typeof makeMember>>;
  beforeAll(async () => {
    browser = await launchBrowser();
    ds = await openE2eDataSource();
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Reedbank Keepers');
    admin = await makeMember(ds, club, 'Astrid Admin', 'admin');
    mentor = await makeMember(ds, club, 'Maya Mentor', 'mentor');
    beginner = await makeMember(ds, club, 'Bo Beginner');
  });
  afterAll(async () => {
    await browser?.close();
    await ds?.destroy();
  });

  it('when a beginner asks for a mentor on a phone, then the admin’s bell rises without a reload and the admin accepts', async () => {
    const { page: desk } = await openPage(browser, DESK);
    await signInOn(desk, admin.user.email, '/club');
    await desk.getByRole('heading', { name: 'Reedbank Keepers' }).waitFor();
    await desk.getByText('No one is waiting.', { exact: false }).waitFor();
    await desk.getByRole('button', { name: 'Notifications, none unread' }).waitFor();

    const { page: phone } = await openPage(browser, PHONE);
    await signInOn(phone, beginner.user.email, '/');
    await phone.getByRole('heading', { name: 'Hello, Bo' }).waitFor();
    await phone.getByRole('heading', { name: 'Ask for a mentor' }).waitFor();
    await phone
      .getByLabel('What would you like help with? (optional)')
      .fill('My first 60 litre tank, cycling since Sunday.');
    await phone
      .getByLabel('Someone in mind? (optional)')
      .selectOption({ label: 'Maya Mentor — 0 of 5 mentees' });
    await phone.getByRole('button', { name: 'Ask for a mentor' }).click();
    await phone.getByRole('heading', { name: 'Your mentor request' }).waitFor();
    await phone.getByText('You asked for Maya Mentor.').waitFor();
    await screenshot(phone, 'mentor-request-sent-phone');
    await expectAccessible(phone);

    // The admin's page was never reloaded: the socket event refreshed the bell and the panel.
    await desk.getByRole('button', { name: 'Notifications, 1 unread' }).waitFor({ timeout: 5_000 });
    await desk.getByText('“My first 60 litre tank, cycling since Sunday.”').waitFor();
    await desk.getByRole('button', { name: 'Notifications, 1 unread' }).click();
    await desk
      .getByRole('dialog', { name: 'Notifications' })
      .getByText('Bo Beginner asks for a mentor')
      .waitFor();
    await screenshot(desk, 'admin-bell-mentor-request-desk');
    await expectAccessible(desk);
    await desk.keyboard.press('Escape');

    const mentorSelect = desk.getByLabel('Pair Bo Beginner with');
    expect(await mentorSelect.inputValue()).toBe(mentor.user.id);
    await desk.getByRole('button', { name: 'Accept' }).click();
    await desk.getByText('No one is waiting.', { exact: false }).waitFor();
    await desk.getByText(/Maya Mentor.*mentoring 1 of 5/).waitFor();
    await screenshot(desk, 'admin-accepted-request-desk');
    await expectAccessible(desk);

    // The beginner's home follows too, live.
    await phone.getByText('is your mentor.', { exact: false }).waitFor({ timeout: 5_000 });
    await screenshot(phone, 'mentor-assigned-phone');
    await phone.getByRole('button', { name: 'Notifications, 1 unread' }).click();
    const item = phone
      .getByRole('dialog', { name: 'Notifications' })
      .getByRole('button', { name: /^Maya Mentor is now your mentor/ });
    await item.waitFor();
    await screenshot(phone, 'bell-open-phone');
    await expectAccessible(phone);
    await item.click();
    await phone.getByRole('button', { name: 'Notifications, none unread' }).waitFor();
    const rows = await ds.getRepository(MentorAssignment).findBy({ menteeId: beginner.user.id });
    expect(rows).toEqual([expect.objectContaining({ mentorId: mentor.user.id, endedAt: null })]);
  });
});
