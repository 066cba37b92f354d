import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Invite } from '@server/modules/invites/invite.entity';
import { resetDatabase } from '@tests/helpers/db';
import { makeClub, makeMember, makeUser } from '@tests/helpers/factories';
import { Client, signedIn } from '@tests/helpers/http';
import { linkIn, waitForMail } from '@tests/helpers/mail';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

describe('invites by e-mail, end to end through the fake SMTP server', () => {
  let t: TestApp;
  let admin: Client;
  let clubId: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    const club = await makeClub(t.dataSource, 'Lagoon Keepers');
    clubId = club.id;
    const { user } = await makeMember(t.dataSource, club, 'Ada Admin', 'admin');
    admin = await signedIn(t.app, user.email);
  });

  async function invite(email: string, role = 'member') {
    const res = await admin.post(`/api/clubs/${clubId}/invites`, { email, role });
    expect(res.status).toBe(201);
    const mail = await waitForMail(t.dataSource, email);
    return { res, mail, token: linkIn(mail, '/invites/accept').searchParams.get('token')! };
  }

  it('when an admin invites an address, then the invitee accepts from the e-mail link and is signed in as a member', async () => {
    const { mail, token } = await invite('newcomer@test.example');
    expect(mail.subject).toContain('Lagoon Keepers');
    expect(mail.html).toContain('Lagoon Keepers');
    expect(mail.text).toContain(t.config.baseUrl);
    // Only the token's hash is stored (ASVS 6.4.1).
    const stored = await t.dataSource
      .getRepository(Invite)
      .findOneByOrFail({ email: 'newcomer@test.example' });
    expect(stored.tokenHash).not.toContain(token);
    expect(stored.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(Buffer.from(token, 'base64url').length * 8).toBeGreaterThanOrEqual(128);

    const invitee = new Client(t.app);
    const preview = await invitee.get(`/api/invites/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ clubName: 'Lagoon Keepers', role: 'member', accountExists: false });

    const accepted = await invitee.post('/api/invites/accept', {
      token,
      displayName: 'New Comer',
      password: 'a long sea breeze',
    });
    expect(accepted.status).toBe(200);
    const me = await invitee.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe('newcomer@test.example');
    expect(me.body.memberships).toEqual([
      expect.objectContaining({ clubId, role: 'member', status: 'active' }),
    ]);
  });

  it('when the token is used twice, then the second time is refused with a clear message', async () => {
    const { token } = await invite('twice@test.example');
    expect(
      (
        await new Client(t.app).post('/api/invites/accept', {
          token,
          displayName: 'T',
          password: 'a long sea breeze',
        })
      ).status,
    ).toBe(200);
    const again = await new Client(t.app).post('/api/invites/accept', {
      token,
      displayName: 'T',
      password: 'a long sea breeze',
    });
    expect(again.status).toBe(410);
    expect(again.body.error.message).toMatch(/already used/i);
  });

  it('when the invite has expired, then it is refused with a clear message', async () => {
    const { token } = await invite('late@test.example');
    await t.dataSource
      .getRepository(Invite)
      .update({ email: 'late@test.example' }, { expiresAt: new Date(Date.now() - 1000) });
    const res = await new Client(t.app).post('/api/invites/accept', {
      token,
      displayName: 'L',
      password: 'a long sea breeze',
    });
    expect(res.status).toBe(410);
    expect(res.body.error.message).toMatch(/expired/i);
  });

  it('when the admin revokes the invite, then the link is refused and the list no longer shows it', async () => {
    const { res, token } = await invite('revoked@test.example');
    expect((await admin.delete(`/api/clubs/${clubId}/invites/${res.body.invite.id}`)).status).toBe(204);
    const accept = await new Client(t.app).post('/api/invites/accept', {
      token,
      displayName: 'R',
      password: 'a long sea breeze',
    });
    expect(accept.status).toBe(410);
    expect(accept.body.error.message).toMatch(/withdrawn/i);
    expect((await admin.get(`/api/clubs/${clubId}/invites`)).body.invites).toEqual([]);
  });

  it('when the admin resends, then the old link stops working and the new one works', async () => {
    const first = await invite('resend@test.example');
    await t.dataSource.query(`DELETE FROM captured_mail`);
    expect((await admin.post(`/api/clubs/${clubId}/invites/${first.res.body.invite.id}/resend`)).status).toBe(
      200,
    );
    const second = linkIn(
      await waitForMail(t.dataSource, 'resend@test.example'),
      '/invites/accept',
    ).searchParams.get('token')!;
    expect((await new Client(t.app).get(`/api/invites/${first.token}`)).status).toBe(404);
    expect((await new Client(t.app).get(`/api/invites/${second}`)).status).toBe(200);
  });

  it('when the invitee already has an account, then they must sign in first and the membership is added', async () => {
    const existing = await makeUser(t.dataSource, 'Old Hand', 'oldhand@test.example');
    const { token } = await invite(existing.email, 'mentor');
    const anonymous = await new Client(t.app).post('/api/invites/accept', { token });
    expect(anonymous.status).toBe(401);
    const c = await signedIn(t.app, existing.email);
    const res = await c.post('/api/invites/accept', { token });
    expect(res.status).toBe(200);
    expect((await c.get('/api/me')).body.memberships).toEqual([
      expect.objectContaining({ clubId, role: 'mentor' }),
    ]);
  });

  it('when the new account has a weak password, then 400 names the field', async () => {
    const { token } = await invite('weak@test.example');
    const res = await new Client(t.app).post('/api/invites/accept', {
      token,
      displayName: 'W',
      password: 'password123',
    });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([expect.objectContaining({ path: 'password' })]);
  });
});
