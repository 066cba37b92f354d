import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cycleStage } from '@shared/care';
import { seedDemoClub } from '@server/db/seeds/demo-club';
import { careHistory } from '@server/modules/tanks';
import { resetDatabase } from '@tests/helpers/db';
import { signedIn } from '@tests/helpers/http';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { DEMO_PASSWORD } from '@server/db/seeds/demo-people';

describe('the demo club seed', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
    await resetDatabase(t.dataSource);
  });
  afterAll(() => t.close());

  it('when seeded twice, then the second run changes nothing', async () => {
    expect((await seedDemoClub(t.dataSource)).created).toBe(true);
    const count = async () =>
      (
        await t.dataSource.query(
          `SELECT (SELECT count(*) FROM club)::int AS clubs, (SELECT count(*) FROM tank)::int AS tanks, (SELECT count(*) FROM water_test)::int AS tests`,
        )
      )[0];
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
    expect(desk.rows.map((r: { name: string }) => r.name).sort()).toEqual([
      'Reef-edge fish room',
      'Seagrass corner',
    ]);
    const fish = desk.rows.find((r: { name: string }) => r.name === 'Reef-edge fish room');
    expect(fish.worstConcern.parameter).toBe('nitrate');
  });

  it('when a demo member opens the meetups, then the club’s coming evenings are there: a clinic slot booked, a full swap with a waitlist', async () => {
    const jonah = await signedIn(t.app, 'jonah@harbourlight.example', DEMO_PASSWORD);
    const me = (await jonah.get('/api/me')).body;
    const clubId = me.memberships.find((m: { clubSlug: string }) => m.clubSlug === 'harbourlight').clubId;
    const meetups = (await jonah.get(`/api/clubs/${clubId}/meetups`)).body.meetups as {
      id: string;
      kind: string;
      title: string;
      goingCount: number;
      capacity: number;
      waitlistCount: number;
      mine: { status: string; slotStartsAt: string | null; tank: { name: string } | null } | null;
    }[];
    expect(meetups.map((m) => m.kind)).toEqual(['talk', 'clinic', 'online', 'swap']);
    const clinic = meetups.find((m) => m.kind === 'clinic')!;
    expect(clinic.mine).toMatchObject({ status: 'going', tank: { name: 'Seagrass corner' } });
    expect(clinic.mine!.slotStartsAt).not.toBeNull();
    const swap = meetups.find((m) => m.kind === 'swap')!;
    expect(swap).toMatchObject({ goingCount: 3, capacity: 3, waitlistCount: 1 });
    const wendell = await signedIn(t.app, 'wendell@harbourlight.example', DEMO_PASSWORD);
    expect((await wendell.get(`/api/clubs/${clubId}/meetups/${swap.id}`)).body.meetup.mine).toMatchObject({
      status: 'waitlisted',
      waitlistPosition: 1,
    });
  });

  it('when the cycling seahorse tank is read, then it is past the ammonia peak with nitrite on the way down', async () => {
    const [row] = await t.dataSource.query(`SELECT id FROM tank WHERE name = 'Seagrass corner'`);
    const history = await careHistory(t.dataSource.manager, row.id, new Date());
    // The seed's nitrite peaked on day 17 of 28 and ammonia has read 0 since day 17 (see demo-tanks.ts).
    expect(cycleStage(history).stage).toBe('nitrite-falling');
  });
});
