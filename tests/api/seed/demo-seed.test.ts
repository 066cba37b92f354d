import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cycleStage } from '../../../shared/care';
import { seedDemoClub } from '../../../server/db/seeds/demo-club';
import { careHistory } from '../../../server/modules/tanks';
import { resetDatabase } from '../../helpers/db';
import { signedIn } from '../../helpers/http';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { DEMO_PASSWORD } from '../../../server/db/seeds/demo-people';

describe('the demo club seed', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
    await resetDatabase(t.dataSource);
  });
  afterAll(() => t.close());

  it('when seeded twice, then the second run changes nothing', async () => {
    expect((await seedDemoClub(t.dataSource)).created).toBe(true);
    const count = async () => (await t.dataSource.query(`SELECT (SELECT count(*) FROM club)::int AS clubs, (SELECT count(*) FROM tank)::int AS tanks, (SELECT count(*) FROM water_test)::int AS tests`))[0];
    const first = await count();
    expect((await seedDemoClub(t.dataSource)).created).toBe(false);
    expect(await count()).toEqual(first);
    expect(first).toMatchObject({ clubs: 2, tanks: 3 });
  });

  it('when a demo mentor signs in, then the desk shows the mentees’ tanks with the creeping nitrate flagged', async () => {
    const teodor = await signedIn(t.app, 'teodor@harbourlight.example', DEMO_PASSWORD);
    const me = (await teodor.get('/api/me')).body;
    const clubId = me.memberships.find((m: { clubSlug: string }) => m.clubSlug === 'harbourlight').clubId;
    const desk = (await teodor.get(`/api/clubs/${clubId}/desk`)).body;
    expect(desk.rows.map((r: { name: string }) => r.name).sort()).toEqual(['Reef-edge fish room', 'Seagrass corner']);
    const fish = desk.rows.find((r: { name: string }) => r.name === 'Reef-edge fish room');
    expect(fish.worstConcern.parameter).toBe('nitrate');
  });

  it('when the cycling seahorse tank is read, then it is past the ammonia peak with nitrite on the way down', async () => {
    const [row] = await t.dataSource.query(`SELECT id FROM tank WHERE name = 'Seagrass corner'`);
    const history = await careHistory(t.dataSource.manager, row.id, new Date());
    // The seed's nitrite peaked on day 17 of 28 and ammonia has read 0 since day 17 (see demo-tanks.ts).
    expect(cycleStage(history).stage).toBe('nitrite-falling');
  });
});
