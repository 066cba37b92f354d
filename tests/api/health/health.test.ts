import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

describe('GET /api/health', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('when the database answers, then it reports ok', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'ok', database: 'up' });
  });

  it('when an unknown API route is asked for, then it answers a JSON 404', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error).toMatchObject({ code: 'not_found' });
  });

  it('when the body is not JSON, then it answers 400 without a stack trace', async () => {
    const res = await request(t.app)
      .post('/api/health')
      .set('Content-Type', 'application/json')
      .send('{"oops":');
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
  });

  it('when the pool is stopped, then it reports 503 quickly', async () => {
    const down = await createTestApp();
    await down.dataSource.destroy();
    const started = Date.now();
    const res = await request(down.app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toMatchObject({ status: 'unavailable', database: 'down' });
    expect(Date.now() - started).toBeLessThan(3_000);
    await down.close();
  });
});
