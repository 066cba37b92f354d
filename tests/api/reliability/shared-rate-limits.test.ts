import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { resetDatabase } from '../../helpers/db';
import { Client } from '../../helpers/http';
import { createTestApp, type TestApp } from '../../helpers/test-app';

/**
 * Sign-in throttling that holds however many instances run and whatever proxy sits in front (ASVS 6.3.1, and the
 * express-rate-limit pitfall in SECURITY.md): the counters live in PostgreSQL, and TRUST_PROXY decides which
 * X-Forwarded-For entry is the client.
 */
const ACCOUNT_AND_ADDRESS_LIMIT = 10;

async function failedSignIn(
  app: TestApp['app'],
  email: string,
  forwardedFor?: string,
): Promise<request.Response> {
  const c = new Client(app);
  const token = await c.csrfToken();
  let req = request(app).post('/api/session').set('Cookie', c.cookies).set('X-CSRF-Token', token);
  if (forwardedFor) req = req.set('X-Forwarded-For', forwardedFor);
  return req.send({ email, password: 'not the password' });
}
const failSignIn = async (app: TestApp['app'], email: string, forwardedFor?: string) =>
  (await failedSignIn(app, email, forwardedFor)).status;

describe('rate limits shared by every instance', () => {
  let a: TestApp;
  let b: TestApp;
  beforeAll(async () => {
    [a, b] = await Promise.all([createTestApp(), createTestApp()]);
  });
  afterAll(async () => {
    await Promise.all([a?.close(), b?.close()]);
  });
  beforeEach(() => resetDatabase(a.dataSource));

  it('when 20 failed sign-ins for one account arrive at once, split over two instances, then exactly 10 get through', async () => {
    const email = 'target@test.example';
    const statuses = await Promise.all(
      Array.from({ length: 2 * ACCOUNT_AND_ADDRESS_LIMIT }, (_, i) =>
        failSignIn(i % 2 ? a.app : b.app, email),
      ),
    );
    expect(statuses.filter((s) => s === 401)).toHaveLength(ACCOUNT_AND_ADDRESS_LIMIT);
    expect(statuses.filter((s) => s === 429)).toHaveLength(ACCOUNT_AND_ADDRESS_LIMIT);
    const [row] = (await a.dataSource.query(
      `SELECT hits FROM rate_limit_hit WHERE key LIKE 'sign-in:account+address:%'`,
    )) as [{ hits: number }];
    expect(row.hits).toBe(2 * ACCOUNT_AND_ADDRESS_LIMIT);
  });

  it('when the e-mail is an object whose toString is not a function, then the limiter does not fail: 400 names email', async () => {
    const c = new Client(a.app);
    const token = await c.csrfToken();
    for (const path of ['/api/session', '/api/password-resets']) {
      const res = await request(a.app)
        .post(path)
        .set('Cookie', c.cookies)
        .set('X-CSRF-Token', token)
        .set('Content-Type', 'application/json')
        .send('{"email":{"toString":"x"},"password":"p"}');
      expect(res.status, path).toBe(400);
      expect(res.body.issues).toEqual(expect.arrayContaining([expect.objectContaining({ path: 'email' })]));
    }
  });

  it('when one instance has counted an address to its limit, then the other refuses it too, with Retry-After', async () => {
    const email = 'second@test.example';
    for (let i = 0; i < ACCOUNT_AND_ADDRESS_LIMIT; i++) expect(await failSignIn(a.app, email)).toBe(401);
    const res = await failedSignIn(b.app, email);
    expect(res.status).toBe(429);
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(800);
  });
});

describe('rate limits behind a proxy (TRUST_PROXY)', () => {
  let loopbackProxy: TestApp;
  let oneHop: TestApp;
  beforeAll(async () => {
    [loopbackProxy, oneHop] = await Promise.all([
      createTestApp({ TRUST_PROXY: 'loopback' }),
      createTestApp({ TRUST_PROXY: '1' }),
    ]);
  });
  afterAll(async () => {
    await Promise.all([loopbackProxy?.close(), oneHop?.close()]);
  });
  beforeEach(() => resetDatabase(loopbackProxy.dataSource));

  it('when the trusted proxy forwards two clients, then each has its own limit (not one for everyone behind the proxy)', async () => {
    const email = 'shared-laptop@test.example';
    for (let i = 0; i < ACCOUNT_AND_ADDRESS_LIMIT; i++)
      expect(await failSignIn(loopbackProxy.app, email, '203.0.113.5')).toBe(401);
    expect(await failSignIn(loopbackProxy.app, email, '203.0.113.5')).toBe(429);
    expect(await failSignIn(loopbackProxy.app, email, '198.51.100.7')).toBe(401);
  });

  it('when a client forges entries in front of the address the proxy added, then the limit keys on the real address', async () => {
    const email = 'forger@test.example';
    const statuses: number[] = [];
    for (let i = 0; i <= ACCOUNT_AND_ADDRESS_LIMIT; i++)
      statuses.push(await failSignIn(oneHop.app, email, `10.9.8.${i}, 192.0.2.44`));
    expect(statuses.slice(0, ACCOUNT_AND_ADDRESS_LIMIT).every((s) => s === 401)).toBe(true);
    expect(statuses[ACCOUNT_AND_ADDRESS_LIMIT]).toBe(429);
    const keys: { key: string }[] = await oneHop.dataSource.query(
      `SELECT key FROM rate_limit_hit WHERE key LIKE 'sign-in:address:%'`,
    );
    expect(keys.map((k) => k.key)).toEqual(['sign-in:address:192.0.2.44']);
  });
});
