import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hashToken } from '../../../server/lib/tokens';
import { resetDatabase } from '../../helpers/db';
import { makeClub, makeMember, TEST_PASSWORD } from '../../helpers/factories';
import { Client, signedIn } from '../../helpers/http';
import { linkIn, waitForMail } from '../../helpers/mail';
import { createTestApp, type TestApp } from '../../helpers/test-app';

/**
 * Logs never carry secrets (ASVS 16.2.5, 7.2.x): the app logs every request at the most verbose level into a captured
 * stream while people sign in, reset a password, accept an invite and sign out, and one request fails inside a
 * query that was given a password hash. None of the passwords, session ids, CSRF tokens, link tokens (or their
 * stored hashes), links or password hashes may appear.
 */
const WRONG_PASSWORD = 'wrong-guess-Tidepool-41';
const NEW_PASSWORD = 'a brand new tide 2026';
const INVITE_PASSWORD = 'kelp forest evenings 9';

const sidOf = (c: Client) =>
  decodeURIComponent(c.cookies[0]!.split('=')[1]!).replace(/^s:/, '').split('.')[0]!;

describe('no secrets in logs', () => {
  const lines: string[] = [];
  let t: TestApp;
  beforeAll(async () => {
    // Development logs every request (tests normally do not); trace is the most verbose level.
    t = await createTestApp(
      { NODE_ENV: 'development', LOG_LEVEL: 'trace' },
      { logTo: { write: (line: string) => void lines.push(line) } },
    );
    await resetDatabase(t.dataSource);
  });
  afterAll(async () => {
    await t?.dataSource.query(
      `DROP TRIGGER IF EXISTS refuse_password_change ON app_user; DROP FUNCTION IF EXISTS refuse_password_change()`,
    );
    await t?.close();
  });

  it('when people sign in, reset a password, accept an invite and sign out, then the captured log holds none of their secrets', async () => {
    const club = await makeClub(t.dataSource, 'Quiet Logs Club');
    const admin = await makeMember(t.dataSource, club, 'Lena Logadmin', 'admin');
    const member = await makeMember(t.dataSource, club, 'Levi Logmember');
    const secrets: Record<string, string> = { WRONG_PASSWORD, TEST_PASSWORD, NEW_PASSWORD, INVITE_PASSWORD };

    const stranger = new Client(t.app);
    expect(
      (await stranger.post('/api/session', { email: member.user.email, password: WRONG_PASSWORD })).status,
    ).toBe(401);
    const signedInMember = await signedIn(t.app, member.user.email);
    expect((await signedInMember.get('/api/me')).status).toBe(200);
    secrets.memberSession = sidOf(signedInMember);
    secrets.memberCookie = signedInMember.cookies[0]!;
    secrets.memberCsrf = await signedInMember.csrfToken();

    // Password reset, with the first confirmation failing inside the UPDATE that carries the new hash.
    expect((await new Client(t.app).post('/api/password-resets', { email: member.user.email })).status).toBe(
      202,
    );
    const resetLink = linkIn(await waitForMail(t.dataSource, member.user.email), '/reset-password');
    const resetToken = resetLink.searchParams.get('token')!;
    Object.assign(secrets, {
      resetToken,
      resetTokenHash: hashToken(resetToken),
      resetLink: resetLink.toString(),
    });
    await request(t.app).get(`${resetLink.pathname}${resetLink.search}`);
    await t.dataSource.query(`
      CREATE FUNCTION refuse_password_change() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN RAISE EXCEPTION 'password changes are refused for this test'; END $$;
      CREATE TRIGGER refuse_password_change BEFORE UPDATE OF password_hash ON app_user FOR EACH ROW EXECUTE FUNCTION refuse_password_change()`);
    const resetter = new Client(t.app);
    expect(
      (await resetter.post('/api/password-resets/confirm', { token: resetToken, password: NEW_PASSWORD }))
        .status,
    ).toBe(500);
    await t.dataSource.query(
      `DROP TRIGGER refuse_password_change ON app_user; DROP FUNCTION refuse_password_change()`,
    );
    expect(
      (await resetter.post('/api/password-resets/confirm', { token: resetToken, password: NEW_PASSWORD }))
        .status,
    ).toBe(200);
    secrets.resetSession = sidOf(resetter);

    // An invite, accepted by someone new.
    const signedInAdmin = await signedIn(t.app, admin.user.email);
    secrets.adminSession = sidOf(signedInAdmin);
    const invitee = 'newcomer@test.example';
    expect(
      (await signedInAdmin.post(`/api/clubs/${club.id}/invites`, { email: invitee, role: 'member' })).status,
    ).toBe(201);
    const inviteLink = linkIn(await waitForMail(t.dataSource, invitee), '/invites/accept');
    const inviteToken = inviteLink.searchParams.get('token')!;
    Object.assign(secrets, {
      inviteToken,
      inviteTokenHash: hashToken(inviteToken),
      inviteLink: inviteLink.toString(),
    });
    const newcomer = new Client(t.app);
    expect((await newcomer.get(`/api/invites/${encodeURIComponent(inviteToken)}`)).status).toBe(200);
    expect(
      (
        await newcomer.post('/api/invites/accept', {
          token: inviteToken,
          displayName: 'Nell Newcomer',
          password: INVITE_PASSWORD,
        })
      ).status,
    ).toBeLessThan(300);
    secrets.newcomerSession = sidOf(newcomer);
    // The reset ended the member's other sessions; the one it started signs out.
    expect((await resetter.delete('/api/session')).status).toBe(204);

    const hashes: { password_hash: string }[] = await t.dataSource.query(
      `SELECT password_hash FROM app_user`,
    );
    hashes.forEach((h, i) => (secrets[`passwordHash${i}`] = h.password_hash));
    await new Promise((r) => setTimeout(r, 300)); // mail workers log after the requests

    const log = lines.join('');
    const requestLines = lines.filter((l) => l.includes('"req":')).length;
    const leaked = Object.entries(secrets).filter(
      ([, value]) => log.includes(value) || log.includes(encodeURIComponent(value)),
    );
    console.info(
      `no secrets in logs: ${lines.length} log lines (${requestLines} about requests), ${Object.keys(secrets).length} secrets looked for, ${leaked.length} found`,
    );
    // The log did capture the flows, including the failure inside the query.
    expect(log).toContain('/api/password-resets/confirm');
    expect(log).toMatch(/"statusCode":500/);
    expect(log).toContain('password changes are refused for this test');
    expect(log).not.toContain('$argon2');
    expect(leaked.map(([name]) => name)).toEqual([]);
  });
});
