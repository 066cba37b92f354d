import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { resetDatabase } from '@tests/helpers/db';
import { Client, signedIn } from '@tests/helpers/http';
import { listRoutes } from '@tests/helpers/route-table';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { MATRIX_ROWS as ROWS } from './matrix-rows';
import { buildWorld, PERSONAS, type Persona } from './world';

/**
 * The authorization matrix (ASVS 8.2.1, 8.2.2, 8.4.1): every API route × every kind of person.
 * Each cell is the exact status expected (rows in ./matrix-rows.ts). A route served by the app without a row fails the first test.
 */

describe('authorization matrix', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('when the app serves a route, then the matrix has a row for it (and no row names a route that does not exist)', () => {
    expect(ROWS.map((r) => r.route).sort()).toEqual(listRoutes(t.api));
  });

  for (const row of ROWS) {
    it(`${row.route}: ${PERSONAS.map((p) => `${p} ${row.expect[p]}`).join(', ')}`, async () => {
      const outcome: Partial<Record<Persona, number>> = {};
      for (const persona of PERSONAS) {
        await resetDatabase(t.dataSource);
        const world = await buildWorld(t.deps);
        const client =
          persona === 'anonymous'
            ? new Client(t.app)
            : await signedIn(t.app, world.people[persona].user.email);
        const { path, body, files } = row.request(world);
        const method = row.route.split(' ')[0]!.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
        const res = files
          ? await client.upload(`/api${path}`, files)
          : await client.send(method, `/api${path}`, body);
        outcome[persona] = res.status;
        // Another club's request never succeeds on this club's objects.
        if (persona === 'outsider' && path.includes(world.club.id))
          expect(res.status).toBeGreaterThanOrEqual(400);
      }
      expect(outcome).toEqual(row.expect);
    });
  }
});
