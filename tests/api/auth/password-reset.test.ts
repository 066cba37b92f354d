import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { PasswordReset } from '@server/modules/auth/password-reset.entity';
import { resetDatabase } from '@tests/helpers/db';
import { makeClub, makeMember } from '@tests/helpers/factories';
import { Client, signedIn } from '@tests/helpers/http';
import { linkIn, waitForMail } from '@tests/helpers/mail';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

describe('password reset by e-mail', () => {
  let t: TestApp;
  let email: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    email = (await makeMember(t.dataSource, await makeClub(t.dataSource), 'Rita Reset')).user.email;
  });

  it('when the address is known or unknown, then the answer is the same 202', async () => {
    const known = await new Client(t.app).post('/api/password-resets', { email });
    const unknown = await new Client(t.app).post('/api/password-resets', { email: 'ghost@test.example' });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
  });

  it('when the user resets, then every other session of theirs ends and the token works once (ASVS 7.4.3)', async () => {
    const phone = await signedIn(t.app, email);
    const laptop = await signedIn(t.app, email);
    expect((await phone.get('/api/me')).status).toBe(200);

    await new Client(t.app).post('/api/password-resets', { email });
    const token = linkIn(await waitForMail(t.dataSource, email), '/reset-password').searchParams.get(
      'token',
    )!;
    const resetter = new Client(t.app);
    const done = await resetter.post('/api/password-resets/confirm', { token, password: 'a brand new tide' });
    expect(done.status).toBe(200);

    expect((await phone.get('/api/me')).status).toBe(401);
    expect((await laptop.get('/api/me')).status).toBe(401);
    expect((await resetter.get('/api/me')).status).toBe(200);
    expect((await new Client(t.app).signIn(email, 'a brand new tide')).status).toBe(200);

    const again = await new Client(t.app).post('/api/password-resets/confirm', {
      token,
      password: 'another new tide',
    });
    expect(again.status).toBe(410);
  });

  it('when the reset link is older than 30 minutes, then it is refused', async () => {
    await new Client(t.app).post('/api/password-resets', { email });
    const token = linkIn(await waitForMail(t.dataSource, email), '/reset-password').searchParams.get(
      'token',
    )!;
    await t.dataSource
      .getRepository(PasswordReset)
      .createQueryBuilder()
      .update()
      .set({ expiresAt: new Date(Date.now() - 1) })
      .execute();
    const res = await new Client(t.app).post('/api/password-resets/confirm', {
      token,
      password: 'a brand new tide',
    });
    expect(res.status).toBe(410);
    expect(res.body.error.message).toMatch(/expired/i);
  });
});
