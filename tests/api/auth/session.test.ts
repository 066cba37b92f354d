import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '@tests/helpers/db';
import { makeClub, makeMember, TEST_PASSWORD } from '@tests/helpers/factories';
import { Client, signedIn } from '@tests/helpers/http';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

describe('sessions and sign-in', () => {
  let t: TestApp;
  let email: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    const club = await makeClub(t.dataSource);
    email = (await makeMember(t.dataSource, club, 'Nadia Test')).user.email;
  });

  it('when the password is right, then 200 with the user and an httpOnly SameSite=Lax cookie (ASVS 3.3.1, 3.3.2, 3.3.4)', async () => {
    const c = new Client(t.app);
    await c.csrfToken();
    const res = await c.signIn(email.toUpperCase());
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email, displayName: 'Nadia Test' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const cookie = (res.headers['set-cookie'] as unknown as string[]).join(';');
    expect(cookie).toMatch(/shoalwise\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('when the e-mail is unknown or the password wrong, then the same 401 answer (ASVS 6.3.8)', async () => {
    const wrong = await new Client(t.app).signIn(email, 'not the password');
    const unknown = await new Client(t.app).signIn('nobody@test.example', 'not the password');
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('when signing in, then the session id changes (fixation, ASVS 7.2.4)', async () => {
    const c = new Client(t.app);
    await c.csrfToken();
    const before = c.cookies.join();
    expect(before).toMatch(/shoalwise\.sid=/);
    await c.signIn(email);
    expect(c.cookies.join()).not.toEqual(before);
  });

  it('when signed out, then the old cookie gets 401', async () => {
    const c = await signedIn(t.app, email);
    const old = [...c.cookies];
    expect((await c.get('/api/me')).status).toBe(200);
    expect((await c.delete('/api/session')).status).toBe(204);
    const replay = new Client(t.app);
    replay.cookies = old;
    expect((await replay.get('/api/me')).status).toBe(401);
  });

  it('when an unsafe request lacks the CSRF token, then 403 (ASVS 3.5.1)', async () => {
    const c = await signedIn(t.app, email);
    const res = await c.send('patch', '/api/me', { displayName: 'Changed' }, { csrf: false });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it('when signed in, then /api/me returns memberships and packed rules', async () => {
    const c = await signedIn(t.app, email);
    const res = await c.get('/api/me');
    expect(res.status).toBe(200);
    expect(res.body.memberships).toHaveLength(1);
    expect(res.body.memberships[0]).toMatchObject({ clubName: 'Test Club', role: 'member' });
    expect(Array.isArray(res.body.rules)).toBe(true);
    expect(res.body.rules.length).toBeGreaterThan(3);
  });

  it('when the 11th failed sign-in comes within the window, then 429 with Retry-After (ASVS 6.3.1)', async () => {
    const c = new Client(t.app);
    for (let i = 0; i < 10; i++) expect((await c.signIn(email, `wrong-${i}`)).status).toBe(401);
    const res = await c.signIn(email, 'wrong-11');
    expect(res.status).toBe(429);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('when X-Forwarded-For rotates, then the limit still holds', async () => {
    const c = new Client(t.app);
    await c.csrfToken();
    const token = await c.csrfToken();
    const request = (await import('supertest')).default;
    let last = 0;
    for (let i = 0; i < 11; i++) {
      const res = await request(t.app)
        .post('/api/session')
        .set('Cookie', c.cookies)
        .set('X-CSRF-Token', token)
        .set('X-Forwarded-For', `203.0.113.${i}`)
        .send({ email, password: `nope-${i}` });
      last = res.status;
    }
    expect(last).toBe(429);
  });

  it('when the profile is updated with a bad value, then 400 names the field', async () => {
    const c = await signedIn(t.app, email);
    const res = await c.patch('/api/me', { temperatureUnit: 'kelvin' });
    expect(res.status).toBe(400);
    expect(res.body.issues[0].path).toBe('temperatureUnit');
    const ok = await c.patch('/api/me', { temperatureUnit: 'F', salinityDisplay: 'ppt' });
    expect(ok.status).toBe(200);
    expect(ok.body.user).toMatchObject({ temperatureUnit: 'F', salinityDisplay: 'ppt' });
  });

  it('when the password is stored, then it is an argon2id hash with m>=19456,t>=2,p=1 and the plain text is nowhere (ASVS 11.4.2)', async () => {
    const rows: { password_hash: string }[] = await t.dataSource.query(
      `SELECT password_hash FROM app_user WHERE email = $1`,
      [email],
    );
    const hash = rows[0]!.password_hash;
    expect(hash).toMatch(/^\$argon2id\$v=19\$m=(\d+),t=(\d+),p=1\$/);
    const [, m, tCost] = hash.match(/m=(\d+),t=(\d+)/)!;
    expect(Number(m)).toBeGreaterThanOrEqual(19456);
    expect(Number(tCost)).toBeGreaterThanOrEqual(2);
    const { verify } = await import('@node-rs/argon2');
    expect(await verify(hash, TEST_PASSWORD)).toBe(true);
    await signedIn(t.app, email);
    const dump: { hit: number }[] = await t.dataSource.query(
      `SELECT count(*)::int AS hit FROM (
         SELECT row_to_json(u)::text AS j FROM app_user u UNION ALL SELECT sess::text FROM "session" UNION ALL SELECT row_to_json(a)::text FROM audit_event a
       ) x WHERE j LIKE '%' || $1 || '%'`,
      [TEST_PASSWORD],
    );
    expect(dump[0]!.hit).toBe(0);
  });
});
