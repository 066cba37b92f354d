import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { defineAbilityFor } from '@shared/abilities';
import { whereAllowed } from '@server/modules/access/ability-sql';
import { loadViewer } from '@server/modules/access/viewer.service';
import { Membership } from '@server/modules/clubs/membership.entity';
import { MentorAssignment } from '@server/modules/mentorship/mentor-assignment.entity';
import { listTanks } from '@server/modules/tanks/tank.queries';
import { createTank } from '@server/modules/tanks/tank.service';
import { createTankSchema } from '@shared/schemas/tank.schema';
import { resetDatabase } from '@tests/helpers/db';
import { assignMentor, makeClub, makeMember } from '@tests/helpers/factories';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

/** Lists are filtered in SQL by the same CASL rules (ASVS 8.2.2): no route guard involved here. */
describe('rules translated to SQL', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(() => resetDatabase(t.dataSource));

  it('when a member of club A lists memberships with no club filter at all, then no row of club B comes back', async () => {
    const a = await makeClub(t.dataSource, 'A');
    const b = await makeClub(t.dataSource, 'B');
    const me = await makeMember(t.dataSource, a, 'Me');
    await makeMember(t.dataSource, a, 'Neighbour');
    await makeMember(t.dataSource, b, 'Stranger 1');
    await makeMember(t.dataSource, b, 'Stranger 2');
    const { ability } = (await loadViewer(t.dataSource.manager, me.user.id))!;
    const qb = t.dataSource.getRepository(Membership).createQueryBuilder('m');
    const rows = await whereAllowed(qb, ability, 'read', 'Membership', {
      clubId: 'm.club_id',
      userId: 'm.user_id',
    }).getMany();
    expect(rows).toHaveLength(2);
    expect(new Set(rows.map((r) => r.clubId))).toEqual(new Set([a.id]));
  });

  it('when a mentor lists assignments, then only their own come back; an admin sees the whole club', async () => {
    const a = await makeClub(t.dataSource, 'A');
    const mentor = await makeMember(t.dataSource, a, 'Mentor', 'mentor');
    const other = await makeMember(t.dataSource, a, 'Other mentor', 'mentor');
    const admin = await makeMember(t.dataSource, a, 'Admin', 'admin');
    await assignMentor(t.dataSource, a, mentor.user, (await makeMember(t.dataSource, a, 'M1')).user);
    await assignMentor(t.dataSource, a, other.user, (await makeMember(t.dataSource, a, 'M2')).user);
    const list = async (userId: string) => {
      const { ability } = (await loadViewer(t.dataSource.manager, userId))!;
      const qb = t.dataSource.getRepository(MentorAssignment).createQueryBuilder('x');
      return whereAllowed(qb, ability, 'read', 'MentorAssignment', {
        clubId: 'x.club_id',
        mentorId: 'x.mentor_id',
        menteeId: 'x.mentee_id',
      }).getMany();
    };
    expect((await list(mentor.user.id)).map((r) => r.mentorId)).toEqual([mentor.user.id]);
    expect(await list(admin.user.id)).toHaveLength(2);
  });

  it("when a member of club A lists tanks, then they never receive club B's rows, even with the route guard bypassed and no club filter", async () => {
    const a = await makeClub(t.dataSource, 'A');
    const b = await makeClub(t.dataSource, 'B');
    const me = await makeMember(t.dataSource, a, 'Me');
    const neighbour = await makeMember(t.dataSource, a, 'Neighbour');
    const tankIn = async (clubId: string, ownerId: string) =>
      (
        await t.dataSource.transaction((tx) =>
          createTank(
            tx,
            clubId,
            ownerId,
            createTankSchema.parse({
              name: 'T',
              systemType: 'reef',
              volume: { source: 'entered', value: 100 },
            }),
          ),
        )
      ).id;
    const mine = await tankIn(a.id, me.user.id);
    await tankIn(a.id, neighbour.user.id);
    await tankIn(b.id, (await makeMember(t.dataSource, b, 'Stranger')).user.id);
    // A club B row naming the viewer as owner (as a buggy write might): the club condition still keeps it out.
    await tankIn(b.id, me.user.id);

    const asMe = (await loadViewer(t.dataSource.manager, me.user.id))!.ability;
    const rows = await listTanks(t.dataSource.manager, asMe, undefined, { includeArchived: true });
    expect(rows.map((r) => r.tank.id)).toEqual([mine]);

    const admin = await makeMember(t.dataSource, a, 'Admin A', 'admin');
    const asAdmin = (await loadViewer(t.dataSource.manager, admin.user.id))!.ability;
    const adminRows = await listTanks(t.dataSource.manager, asAdmin, undefined);
    expect(adminRows).toHaveLength(2);
    expect(new Set(adminRows.map((r) => r.tank.clubId))).toEqual(new Set([a.id]));
  });

  it('when the viewer has no rule for a subject, then the condition is FALSE (fail closed)', async () => {
    const ability = defineAbilityFor({
      userId: 'x',
      memberships: [],
      mentorships: [],
      now: new Date().toISOString(),
    });
    await makeMember(t.dataSource, await makeClub(t.dataSource, 'A'), 'Someone');
    const qb = t.dataSource.getRepository(Membership).createQueryBuilder('m');
    expect(
      await whereAllowed(qb, ability, 'read', 'Membership', {
        clubId: 'm.club_id',
        userId: 'm.user_id',
      }).getMany(),
    ).toEqual([]);
  });
});
