import type { Browser } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DESK, expectAccessible, launchBrowser, openPage, PHONE, screenshot } from '../helpers/browser';
import { resetDatabase } from '../helpers/db';
import { openE2eDataSource } from '../helpers/e2e-db';
import { makeClub, makeMember, TEST_PASSWORD } from '../helpers/factories';
import { linkIn, waitForMail } from '../helpers/mail';

describe('accounts in the browser', () => {
  let browser: Browser;
  let ds: DataSource;
  let adminEmail: string;
  beforeAll(async () => {
    browser = await launchBrowser();
    ds = await openE2eDataSource();
    await resetDatabase(ds);
    const club = await makeClub(ds, 'Reedbank Keepers');
    adminEmail = (await makeMember(ds, club, 'Astrid Admin', 'admin')).user.email;
    await makeMember(ds, club, 'Maya Mentor', 'mentor');
  });
  afterAll(async () => {
    await browser?.close();
    await ds?.destroy();
  });

  it('when an admin invites a beginner at a desk, then the beginner joins from the e-mail link on a phone', async () => {
    const { page: desk } = await openPage(browser, DESK);
    await desk.goto(`${inject('baseUrl')}/club`);
    await desk.getByLabel('E-mail').fill(adminEmail);
    await desk.getByLabel('Password').fill(TEST_PASSWORD);
    await desk.getByRole('button', { name: 'Sign in' }).click();
    await desk.getByRole('heading', { name: 'Reedbank Keepers' }).waitFor();

    await desk.getByRole('button', { name: 'Send invite' }).click();
    await desk.getByText('Enter a valid e-mail address.').waitFor();
    await desk.getByLabel('E-mail').fill('Beginner.Bo@test.example');
    await desk.getByRole('button', { name: 'Send invite' }).click();
    await desk.getByText('Invitation sent to beginner.bo@test.example.').waitFor();
    await desk.getByText('beginner.bo@test.example', { exact: true }).waitFor();
    await screenshot(desk, 'club-admin-invites-desk');
    await expectAccessible(desk);

    const mail = await waitForMail(ds, 'beginner.bo@test.example');
    const link = linkIn(mail, '/invites/accept');
    const { page: phone } = await openPage(browser, PHONE);
    await phone.goto(`${inject('baseUrl')}${link.pathname}${link.search}`);
    await phone.getByText('Reedbank Keepers').first().waitFor();
    await phone.getByLabel('Your name').fill('Bo Beginner');
    await phone.getByLabel('Choose a password').fill('password123');
    await phone.getByLabel('Type it again').fill('password123');
    await phone.getByRole('button', { name: /create my account/i }).click();
    await phone.getByText(/too common/i).waitFor();
    await screenshot(phone, 'accept-invite-weak-password-phone');
    await expectAccessible(phone);
    await phone.getByLabel('Choose a password').fill('slow tides at dusk');
    await phone.getByLabel('Type it again').fill('slow tides at dusk');
    await phone.getByRole('button', { name: /create my account/i }).click();
    await phone.getByRole('heading', { name: 'Hello, Bo' }).waitFor();
    expect(await phone.getByText('Reedbank Keepers · Member').isVisible()).toBe(true);
    await screenshot(phone, 'home-new-member-phone');
    await expectAccessible(phone);
  });
});
